package org.mobident.recheck;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.StringReader;
import java.io.StringWriter;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.mobident.InputException;
import org.mobident.report.PeakTableCsv;

/** The optional columns of the peak table that the scoring reads: apex time, width, S/N, corrected mobility. */
class PeakTableReaderMeasuresTest {

    private static String table() throws Exception {
        StringWriter w = new StringWriter();
        PeakTableCsv.write(List.of(RecheckFixtures.okRun("spring-01")), w);
        return w.toString();
    }

    @Test
    void readsThePeakMeasuresWhenPresent() throws Exception {
        List<PeakTableRow> rows = PeakTableReader.read(new StringReader(table()), "t.csv");
        PeakTableRow first = rows.get(0);
        // RecheckFixtures.peak(223.4): apex 223.4 s, width at half height 1.5 s, S/N 57.25 (written with 1 decimal)
        assertEquals(223.4, first.apexTimeS(), 0);
        assertEquals(1.5, first.widthHalfS(), 0);
        assertEquals(57.25, first.signalToNoise(), 0.05);
        // the fixture's run was not scale-corrected: the corrected mobility is the one at the library temperature
        assertEquals(first.comparedMobility(), first.mobilityCorrected(), 0);
    }

    @Test
    void readsTheCorrectedMobility() throws Exception {
        String[] lines = table().split("\n");
        String text = lines[0].replace(",mobility_corrected,", ",old_corrected,") + ",mobility_corrected\n"
                + lines[1] + ",-71.250\n" + lines[2] + ",\n";
        List<PeakTableRow> rows = PeakTableReader.read(new StringReader(text), "t.csv");
        assertEquals(-71.25, rows.get(0).mobilityCorrected(), 0);
        assertTrue(Double.isNaN(rows.get(1).mobilityCorrected()), "an empty cell is unknown");
    }

    @Test
    void anOlderTableWithoutTheMeasuresStillReads() throws Exception {
        String text = "run,peak,role,mobility,mobility_sd,mobility_at_library_temp,assigned,confidence,status\n"
                + "r1,1,analyte,-70.1,0.1,-70.1,nitrate,0.95,identified\n";
        PeakTableRow row = PeakTableReader.read(new StringReader(text), "t.csv").get(0);
        assertTrue(Double.isNaN(row.apexTimeS()) && Double.isNaN(row.widthHalfS()) && Double.isNaN(row.signalToNoise()));
        assertTrue(row.isAssignment());
    }

    @Test
    void aBadMeasureOrATwiceNamedOneIsRefused() throws Exception {
        String[] lines = table().split("\n");
        InputException bad = assertThrows(InputException.class, () -> PeakTableReader.read(
                new StringReader(lines[0] + "\n" + lines[1].replace("223.4000", "soon") + "\n"), "t.csv"));
        assertEquals("apex_time_s", bad.field());
        assertEquals(2, bad.line());
        InputException twice = assertThrows(InputException.class, () -> PeakTableReader.read(
                new StringReader(lines[0] + ",width_half_s\n"), "t.csv"));
        assertEquals("width_half_s", twice.field());
    }
}
