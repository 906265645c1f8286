package org.mobident.assess;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.mobident.InputException;

/** The known-identities format as fixed in the shared spec (columns run, kind, analyte, time_s, mobility, height_sd). */
class KnownIdentitiesReaderTest {

    /** The example of the spec. */
    private static final String SPEC_EXAMPLE = String.join("\n",
            "run,kind,analyte,time_s,mobility,height_sd",
            "lab-s001,marker,,562.31,0,180",
            "lab-s001,analyte,chloride,221.07,-76.30,45.2",
            "lab-s001,analyte,nitrate,236.40,-69.50,6.1",
            "lab-s001,foreign,foreign-1,301.90,-48.80,22.0",
            "lab-s001,spike,,410.55,,",
            "");

    private static InputException refused(String text) {
        return assertThrows(InputException.class, () -> KnownIdentitiesReader.read(text, "known.csv"));
    }

    @Test
    void readsTheSpecExample() throws InputException {
        KnownIdentities k = KnownIdentitiesReader.read(SPEC_EXAMPLE, "known.csv");
        assertEquals("known.csv", k.source());
        assertEquals(5, k.rows().size());
        KnownIdentity marker = k.rows().get(0);
        assertEquals(KnownKind.MARKER, marker.kind());
        assertNull(marker.name());
        assertEquals(562.31, marker.timeS(), 0);
        assertEquals(2, marker.line());
        KnownIdentity chloride = k.rows().get(1);
        assertEquals(KnownKind.ANALYTE, chloride.kind());
        assertEquals("chloride", chloride.name());
        assertEquals(-76.30, chloride.mobility(), 0);
        assertEquals(45.2, chloride.heightSd(), 0);
        KnownIdentity spike = k.rows().get(4);
        assertEquals(KnownKind.SPIKE, spike.kind());
        assertTrue(Double.isNaN(spike.mobility()) && Double.isNaN(spike.heightSd()));
        assertEquals(List.of("lab-s001"), List.copyOf(k.byRun().keySet()));
    }

    @Test
    void byteOrderMarkCommentsBlankLinesAnyColumnOrderAndDefaultKind(@TempDir Path dir) throws InputException,
            java.io.IOException {
        Path file = dir.resolve("known.csv");
        String text = "\uFEFF# what is in the spiked runs\n\nAnalyte,RUN,time_s\n# a note between rows\r\n"
                + "nitrate,s1,236.4\r\n\"chloride, spiked\",s1,\n";
        Files.writeString(file, text, StandardCharsets.UTF_8);
        KnownIdentities k = KnownIdentitiesReader.read(file);
        assertEquals(2, k.rows().size());
        assertEquals(KnownKind.ANALYTE, k.rows().get(0).kind(), "an absent kind column means analyte");
        assertEquals("nitrate", k.rows().get(0).name());
        assertEquals(5, k.rows().get(0).line());
        assertEquals("chloride, spiked", k.rows().get(1).name());
        assertTrue(Double.isNaN(k.rows().get(1).timeS()), "an empty time is unknown");
        assertEquals(file.toString(), k.source());
    }

    @Test
    void aSpreadsheetsSemicolonsAndDecimalCommasReadAsTheCommaTable() throws InputException {
        KnownIdentities commas = KnownIdentitiesReader.read(SPEC_EXAMPLE, "known.csv");
        String semicolons = SPEC_EXAMPLE.replace(',', ';').replace('.', ',');
        KnownIdentities read = KnownIdentitiesReader.read(semicolons, "known.csv");
        assertEquals(commas.rows().size(), read.rows().size());
        for (int i = 0; i < commas.rows().size(); i++) {
            KnownIdentity a = commas.rows().get(i);
            KnownIdentity b = read.rows().get(i);
            assertEquals(a.name(), b.name());
            assertEquals(a.timeS(), b.timeS(), 0.0);
            assertEquals(a.mobility(), b.mobility(), 0.0);
            assertEquals(a.heightSd(), b.heightSd(), 0.0);
        }
    }

    @Test
    void aNoteColumnIsAllowedAndNotRead() throws InputException {
        KnownIdentities k = KnownIdentitiesReader.read("run,analyte,note\ns1,nitrate,spiked at 2 mg/L\n", "known.csv");
        assertEquals(1, k.rows().size());
        assertEquals("nitrate", k.rows().get(0).name());
        InputException e = refused("run,analyte,notes_x\ns1,nitrate,spiked\n");
        assertEquals("notes_x", e.field());
    }

    @Test
    void missingRunColumnIsNamed() {
        InputException e = refused("kind,analyte\nanalyte,chloride\n");
        assertEquals("known.csv", e.file());
        assertEquals(1, e.line());
        assertEquals("run", e.field());
    }

    @Test
    void unknownColumnGetsAHint() {
        InputException e = refused("run,analyte,time_sec\ns1,chloride,12.0\n");
        assertEquals(1, e.line());
        assertEquals("time_sec", e.field());
        assertTrue(e.getMessage().contains("did you mean 'time_s'?"), e.getMessage());
    }

    @Test
    void unknownKindGetsAHint() {
        InputException e = refused("run,kind,analyte\ns1,analyte,chloride\ns1,markr,\n");
        assertEquals(3, e.line());
        assertEquals("kind", e.field());
        assertTrue(e.getMessage().contains("did you mean 'marker'?"), e.getMessage());
    }

    @Test
    void badNumbersAreRefusedWithLineAndColumn() {
        InputException text = refused("run,analyte,time_s\ns1,chloride,abc\n");
        assertEquals(2, text.line());
        assertEquals("time_s", text.field());
        InputException nan = refused("run,analyte,mobility\ns1,chloride,NaN\n");
        assertEquals("mobility", nan.field());
        InputException negativeTime = refused("run,analyte,time_s\ns1,chloride,-3.0\n");
        assertEquals("time_s", negativeTime.field());
        InputException negativeHeight = refused("run,analyte,height_sd\ns1,chloride,-1\n");
        assertEquals("height_sd", negativeHeight.field());
        // a decimal comma splits the row into one cell too many
        InputException comma = refused("run,analyte,time_s\ns1,chloride,221,07\n");
        assertEquals(2, comma.line());
        assertTrue(comma.getMessage().contains("decimal comma"), comma.getMessage());
    }

    @Test
    void analyteRowsNeedANameAndAppearOncePerRun() {
        InputException noName = refused("run,kind,analyte\ns1,analyte,\n");
        assertEquals("analyte", noName.field());
        InputException twice = refused("run,analyte\ns1,Chloride\ns2,chloride\ns1,chloride\n");
        assertEquals(4, twice.line());
        assertTrue(twice.getMessage().contains("lines 2 and 4"), twice.getMessage());
        InputException twoMarkers = refused("run,kind,time_s\ns1,marker,500\ns1,marker,510\n");
        assertEquals(3, twoMarkers.line());
    }

    @Test
    void emptyTablesAndBrokenHeadersAreRefused() {
        assertEquals(0, refused("# only a comment\n\n").line());
        assertTrue(refused("run,analyte\n").getMessage().contains("no rows"));
        assertEquals("run", refused("run,run\ns1,s1\n").field().toLowerCase(java.util.Locale.ROOT));
        assertTrue(refused("run,,analyte\ns1,,x\n").getMessage().contains("no name"));
        assertTrue(refused("run,analyte\ns1,\"open\n").getMessage().contains("quotes"));
        InputException emptyRun = refused("run,analyte\n,chloride\n");
        assertEquals("run", emptyRun.field());
    }

    @Test
    void notUtf8IsRefusedNamingTheFile(@TempDir Path dir) throws java.io.IOException {
        Path file = dir.resolve("latin1.csv");
        Files.write(file, "run,analyte\ns1,chlorure \u00e9\n".getBytes(StandardCharsets.ISO_8859_1));
        InputException e = assertThrows(InputException.class, () -> KnownIdentitiesReader.read(file));
        assertEquals(file.toString(), e.file());
        assertTrue(e.getMessage().contains("UTF-8"), e.getMessage());
    }
}
