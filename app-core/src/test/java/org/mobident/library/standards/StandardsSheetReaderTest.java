package org.mobident.library.standards;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.mobident.InputException;
import org.mobident.trace.RunSpec;

class StandardsSheetReaderTest {

    @TempDir
    Path dir;

    private Path write(String text) throws IOException {
        Path p = dir.resolve("standards.csv");
        Files.writeString(p, text, StandardCharsets.UTF_8);
        return p;
    }

    @Test
    void readsMixesWithOptionalColumns() throws Exception {
        Path p = write("""
                # standards for the cation method
                mix,analyte,charge,approx_mobility,order
                cations,potassium,+,76.2,1
                cations,sodium,1,51.9,3
                cations,calcium,2+,61.7,2

                anions,sulfate,-2,-82.9,
                anions,chloride,-,,
                anions,nitrate,1-,-74.1,2
                """);
        StandardsSheet s = StandardsSheetReader.read(p);
        assertEquals(p.toString(), s.sourceFile());
        assertEquals(List.of("cations", "anions"), s.mixes().stream().map(StandardsMix::name).toList());
        StandardsMix cations = s.mix("CATIONS ").orElseThrow();
        StandardAnalyte k = cations.analytes().get(0);
        assertEquals("potassium", k.name());
        assertEquals(0, k.chargeNumber());
        assertEquals(1, k.chargeSign());
        assertEquals(76.2, k.approxMobility());
        assertEquals(1, k.order());
        assertEquals(3, k.line());
        assertEquals(2, cations.analytes().get(2).chargeNumber());
        StandardsMix anions = s.mix("anions").orElseThrow();
        assertEquals(-2, anions.analytes().get(0).chargeNumber());
        assertEquals(0, anions.analytes().get(0).order());
        StandardAnalyte cl = anions.analytes().get(1);
        assertEquals(-1, cl.chargeSign());
        assertTrue(Double.isNaN(cl.approxMobility()));
        assertEquals(-1, anions.analytes().get(2).chargeNumber());
        assertFalse(s.mix("unknown").isPresent());
    }

    @Test
    void semicolonSheetsAcceptDecimalCommaAndHeaderVariants() throws Exception {
        Path p = write("\uFEFFMix;Analyte;Approx-Mobility\nm1;lithium;40,1\nm1;x;−3,5\n");
        StandardsSheet s = StandardsSheetReader.read(p);
        assertEquals(40.1, s.mixes().get(0).analytes().get(0).approxMobility(), 1e-12);
        assertEquals(-3.5, s.mixes().get(0).analytes().get(1).approxMobility(), 1e-12);
    }

    @Test
    void unknownColumnIsNamed() throws Exception {
        InputException e = assertThrows(InputException.class,
                () -> StandardsSheetReader.read(write("mix,analyte,mobilty\nm,a,1\n")));
        assertEquals(1, e.line());
        assertEquals("mobilty", e.field());
        assertTrue(e.problem().contains("unknown column"), e.getMessage());
    }

    @Test
    void missingRequiredColumn() throws Exception {
        InputException e = assertThrows(InputException.class,
                () -> StandardsSheetReader.read(write("analyte,order\na,1\n")));
        assertEquals("mix", e.field());
    }

    @Test
    void duplicateAnalyteInAMixNamesBothLines() throws Exception {
        InputException e = assertThrows(InputException.class,
                () -> StandardsSheetReader.read(write("mix,analyte\nm,Chloride\nn,chloride\nm,chloride\n")));
        assertEquals(4, e.line());
        assertEquals("analyte", e.field());
        assertTrue(e.problem().contains("lines 2 and 4"), e.getMessage());
    }

    @Test
    void sameAnalyteInTwoMixesIsAllowed() throws Exception {
        StandardsSheet s = StandardsSheetReader.read(write("mix,analyte\nm,chloride\nn,chloride\n"));
        assertEquals(2, s.mixes().size());
    }

    @Test
    void badNumbersAreReportedWithLineAndField() throws Exception {
        InputException approx = assertThrows(InputException.class,
                () -> StandardsSheetReader.read(write("mix,analyte,approx_mobility\nm,a,-7x\n")));
        assertEquals(2, approx.line());
        assertEquals("approx_mobility", approx.field());
        InputException order = assertThrows(InputException.class,
                () -> StandardsSheetReader.read(write("mix,analyte,order\nm,a,first\n")));
        assertEquals("order", order.field());
        InputException zero = assertThrows(InputException.class,
                () -> StandardsSheetReader.read(write("mix,analyte,order\nm,a,0\n")));
        assertEquals("order", zero.field());
        InputException charge = assertThrows(InputException.class,
                () -> StandardsSheetReader.read(write("mix,analyte,charge\nm,a,plus\n")));
        assertEquals("charge", charge.field());
        InputException comma = assertThrows(InputException.class,
                () -> StandardsSheetReader.read(write("mix,analyte,approx_mobility\nm,a,\"-7,5\"\n")));
        assertTrue(comma.problem().contains("semicolon"), comma.getMessage());
    }

    @Test
    void repeatedOrderAndContradictorySignAreErrors() throws Exception {
        InputException order = assertThrows(InputException.class,
                () -> StandardsSheetReader.read(write("mix,analyte,order\nm,a,1\nm,b,1\n")));
        assertEquals(3, order.line());
        assertEquals("order", order.field());
        InputException sign = assertThrows(InputException.class,
                () -> StandardsSheetReader.read(write("mix,analyte,charge,approx_mobility\nm,a,-1,55\n")));
        assertEquals("approx_mobility", sign.field());
    }

    @Test
    void emptySheetAndEmptyCells() throws Exception {
        assertThrows(InputException.class, () -> StandardsSheetReader.read(write("# nothing\n\n")));
        assertThrows(InputException.class, () -> StandardsSheetReader.read(write("mix,analyte\n")));
        InputException e = assertThrows(InputException.class,
                () -> StandardsSheetReader.read(write("mix,analyte\nm,\n")));
        assertEquals("analyte", e.field());
        InputException extra = assertThrows(InputException.class,
                () -> StandardsSheetReader.read(write("mix,analyte\nm,a,stray\n")));
        assertEquals(2, extra.line());
    }

    @Test
    void missingFileIsAnInputException() {
        InputException e = assertThrows(InputException.class,
                () -> StandardsSheetReader.read(dir.resolve("nope.csv")));
        assertEquals(0, e.line());
    }

    @Test
    void unknownMixOfARunIsReportedAtItsRunSheetLine() throws Exception {
        StandardsSheet s = StandardsSheetReader.read(write("mix,analyte\ncations,sodium\n"));
        RunSpec ok = new RunSpec("r1", dir.resolve("r1.csv"), StandardsRuns.conditions(25, "b"), "runs.csv", 2);
        RunSpec bad = new RunSpec("r2", dir.resolve("r2.csv"), StandardsRuns.conditions(25, "b"), "runs.csv", 3);
        s.requireMixes(List.of(ok), Map.of("r1", "Cations"));
        InputException e = assertThrows(InputException.class,
                () -> s.requireMixes(List.of(ok, bad), Map.of("r1", "cations", "r2", "catoins")));
        assertEquals("runs.csv", e.file());
        assertEquals(3, e.line());
        assertEquals("mix", e.field());
        assertTrue(e.problem().contains("unknown mix 'catoins'"), e.getMessage());
        InputException none = assertThrows(InputException.class,
                () -> s.requireMixes(List.of(bad), Map.of()));
        assertEquals(3, none.line());
    }

    /**
     * The lab's own model data: pKa values and limiting mobilities per form, space-separated as in
     * the library. The numbers are invented (a dicarboxylic acid and an amine of typical size).
     */
    @Test
    void readsTheLabsPkaAndLimitingMobilities() throws InputException {
        StandardsSheet s = StandardsSheetReader.read("""
                mix,analyte,charge,order,pka,limiting_mobility
                A,drug acid,-2,1,3.1 5.4,0 -30.5 -55.2
                A,drug base,+1,2,9.1,25.0 0
                A,plain,,3,,
                B,drug acid,-2,1,3.1 5.4,0 -30.5 -55.2
                B,other,,2,,
                """, "sheet.csv");
        StandardAnalyte acid = s.mixes().get(0).analytes().get(0);
        assertEquals(List.of(3.1, 5.4), acid.pKa());
        assertEquals(List.of(0.0, -30.5, -55.2), acid.limitingMobilities());
        assertTrue(acid.hasModelData());
        assertEquals(List.of(9.1), s.mixes().get(0).analytes().get(1).pKa());
        assertFalse(s.mixes().get(0).analytes().get(2).hasModelData());
        // semicolon sheet with decimal commas
        StandardsSheet semi = StandardsSheetReader.read("mix;analyte;charge;pka;limiting_mobility\nA;x;-1;4,2;0 -33,5\n",
                "semi.csv");
        assertEquals(List.of(4.2), semi.mixes().get(0).analytes().get(0).pKa());
        assertEquals(List.of(0.0, -33.5), semi.mixes().get(0).analytes().get(0).limitingMobilities());
    }

    @Test
    void inconsistentModelDataAreInputErrorsNamingLineAndColumn() {
        InputException noCharge = assertThrows(InputException.class, () -> StandardsSheetReader.read(
                "mix,analyte,pka,limiting_mobility\nA,x,4.2,0 -33\n", "s.csv"));
        assertEquals("charge", noCharge.field());
        assertEquals(2, noCharge.line());
        InputException count = assertThrows(InputException.class, () -> StandardsSheetReader.read(
                "mix,analyte,charge,pka,limiting_mobility\nA,x,-2,3 5,0 -33\n", "s.csv"));
        assertEquals("limiting_mobility", count.field());
        InputException sign = assertThrows(InputException.class, () -> StandardsSheetReader.read(
                "mix,analyte,charge,pka,limiting_mobility\nA,x,-1,4.2,0 33\n", "s.csv"));
        assertEquals("limiting_mobility", sign.field());
        InputException notNumber = assertThrows(InputException.class, () -> StandardsSheetReader.read(
                "mix,analyte,charge,pka,limiting_mobility\nA,x,-1,4.2a,0 -33\n", "s.csv"));
        assertEquals("pka", notNumber.field());
        InputException differs = assertThrows(InputException.class, () -> StandardsSheetReader.read(
                "mix,analyte,charge,pka,limiting_mobility\nA,x,-1,4.2,0 -33\nB,x,-1,4.3,0 -33\n", "s.csv"));
        assertEquals(3, differs.line());
        assertTrue(differs.getMessage().contains("line 2"), differs.getMessage());
    }
}
