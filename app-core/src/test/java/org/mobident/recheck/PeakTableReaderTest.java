package org.mobident.recheck;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.StringReader;
import java.io.StringWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.mobident.InputException;
import org.mobident.report.PeakTableCsv;

class PeakTableReaderTest {

    private static String table() throws IOException {
        StringWriter w = new StringWriter();
        PeakTableCsv.write(List.of(RecheckFixtures.okRun("=spring-01"), RecheckFixtures.failedRun("well-09"),
                RecheckFixtures.noPeaksRun("well-10")), w);
        return w.toString();
    }

    @Test
    void readsBackWhatThePeakTableWriterWrites(@TempDir Path dir) throws Exception {
        Path file = dir.resolve("peaks.csv");
        Files.writeString(file, table(), StandardCharsets.UTF_8);
        List<PeakTableRow> rows = PeakTableReader.read(file);
        assertEquals(6, rows.size());
        PeakTableRow chloride = rows.get(0);
        assertEquals("=spring-01", chloride.run(), "the spreadsheet-safety apostrophe is removed");
        assertEquals(1, chloride.peak());
        assertEquals("analyte", chloride.role());
        assertEquals(-71.52, chloride.mobility(), 0);
        assertEquals(0.21, chloride.mobilitySd(), 0);
        assertEquals(-71.4, chloride.mobilityAtLibraryTemp(), 0);
        assertEquals(-71.4, chloride.comparedMobility(), 0);
        assertEquals("chloride", chloride.assigned());
        assertEquals(0.973, chloride.confidence(), 0, "3 decimals as written");
        assertEquals("identified", chloride.status());
        assertEquals(2, chloride.line());
        assertTrue(chloride.isAssignment());

        PeakTableRow odd = rows.get(1);
        assertEquals("-odd name", odd.assigned());
        assertEquals("ambiguous", odd.status());
        assertTrue(odd.isAssignment());

        PeakTableRow none = rows.get(2);
        assertNull(none.assigned());
        assertEquals("unassigned", none.status());
        assertFalse(none.isAssignment());

        PeakTableRow marker = rows.get(3);
        assertEquals("neutral marker", marker.role());
        assertEquals("marker", marker.status());
        assertTrue(Double.isNaN(marker.mobilitySd()));

        assertEquals("failed", rows.get(4).status());
        assertEquals(0, rows.get(4).peak());
        assertEquals("no_peaks", rows.get(5).status());
        assertEquals(7, rows.get(5).line());
    }

    private static InputException reject(String text) {
        return assertThrows(InputException.class, () -> PeakTableReader.read(new StringReader(text), "t.csv"));
    }

    @Test
    void rejectsBadFilesWithLineAndField() throws IOException {
        String good = table();
        String[] lines = good.split("\n");

        InputException missing = reject(lines[0].replace("mobility_sd", "sd") + "\n");
        assertEquals(1, missing.line());
        assertEquals("mobility_sd", missing.field());

        InputException badNumber = reject(lines[0] + "\n" + lines[1].replace("-71.520", "abc") + "\n");
        assertEquals(2, badNumber.line());
        assertEquals("mobility", badNumber.field());
        assertEquals("t.csv", badNumber.file());

        InputException badStatus = reject(lines[0] + "\n" + lines[1] + "\n" + lines[2].replace("ambiguous", "maybe"));
        assertEquals(3, badStatus.line(), "the last line without a line break still has its number");
        assertEquals("status", badStatus.field());

        InputException duplicate = reject(lines[0] + "\n" + lines[1] + "\n\n" + lines[1] + "\n");
        assertEquals(4, duplicate.line(), "blank lines are counted");
        assertEquals("peak", duplicate.field());

        InputException confidence = reject(lines[0] + "\n" + lines[1].replace("0.973", "1.7") + "\n");
        assertEquals("confidence", confidence.field());

        assertEquals(0, reject("").line());
    }

    @Test
    void missingFileIsAnInputError(@TempDir Path dir) {
        InputException ex = assertThrows(InputException.class, () -> PeakTableReader.read(dir.resolve("none.csv")));
        assertTrue(ex.getMessage().contains("cannot read"));
    }

    @Test
    void theJsonTableIsRecognisedAndRefusedWithAHint() {
        org.mobident.InputException e = org.junit.jupiter.api.Assertions.assertThrows(org.mobident.InputException.class,
                () -> PeakTableReader.read(new java.io.StringReader("{\n  \"runs\": []\n}\n"), "peaks.json"));
        org.junit.jupiter.api.Assertions.assertEquals(1, e.line());
        org.junit.jupiter.api.Assertions.assertTrue(e.problem().contains("identify --csv"), e.problem());
    }
}
