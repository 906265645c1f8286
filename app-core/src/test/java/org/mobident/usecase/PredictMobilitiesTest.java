package org.mobident.usecase;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.PrintWriter;
import java.io.StringWriter;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.mobident.InputException;
import org.mobident.library.Library;
import org.mobident.recheck.BufferSpec;
import org.mobident.recheck.BufferTransfer;
import org.mobident.recheck.PhScan;
import org.mobident.recheck.PredictedMobility;
import org.mobident.report.prediction.PhScanCsv;
import org.mobident.report.prediction.PredictionText;

/** Predictions for another buffer from the demo library (invented values with pKa data, demo-data/library.csv). */
class PredictMobilitiesTest {

    private static final BufferSpec PH_4_5 = BufferSpec.of("", 4.5, 8, 25);

    private static PredictMobilities job(List<String> analytes) throws InputException {
        return new PredictMobilities(DemoInputs.library(), BufferTransfer.withoutReference(), null, analytes);
    }

    @Test
    void aWeakAcidNearItsPkaLosesMostOfItsMobilityAndAStrongIonHardlyMoves() throws InputException {
        PredictMobilities.Prediction p = job(List.of()).inBuffer(PH_4_5);
        assertEquals(DemoInputs.library().size(), p.all().size());
        assertEquals(p.all(), p.shown());
        PredictedMobility acetate = find(p, "acetate");
        // Henderson-Hasselbalch with acetic acid's pKa 4.76 (demo library; 4.756 in Lide, CRC Handbook):
        // the ionised share at pH 4.5 is 1/(1 + 10^0.26) = 0.355; activity shifts it by a few per cent
        double share = acetate.predicted() / -42.4;
        assertTrue(share > 0.33 && share < 0.42, "ionised share " + share);
        PredictedMobility chloride = find(p, "chloride");
        assertEquals(chloride.measuredA(), chloride.predicted(), 2.0);
        assertTrue(chloride.uncertainty() > 0);
    }

    @Test
    void onlyTheAnalytesAskedForAreShownButTheLibraryHasThemAll() throws InputException {
        PredictMobilities.Prediction p = job(List.of("chloride", "acetate")).inBuffer(PH_4_5);
        assertEquals(List.of("chloride", "acetate"), p.shown().stream().map(PredictedMobility::name).toList());
        Library predicted = p.asLibrary(PH_4_5);
        assertEquals(DemoInputs.library().size(), predicted.size());
        assertEquals(find(p, "acetate").predicted(), predicted.find("acetate").orElseThrow().mobility(), 1e-9);
        StringWriter text = new StringWriter();
        PredictionText.write(PH_4_5, p.shown(), new PrintWriter(text, true));
        assertTrue(text.toString().lines().anyMatch(l -> l.startsWith("acetate ")));
        assertTrue(text.toString().lines().noneMatch(l -> l.startsWith("sulfate ")));
    }

    @Test
    void theScanFollowsTheIonisationOfAWeakAcid() throws InputException {
        PhScan.Result r = job(List.of("acetate", "chloride")).scan(3, 7, 0.5, 10, 25);
        assertEquals(9, r.pH().size());
        PhScan.Curve acetate = r.curves().stream().filter(c -> c.name().equals("acetate")).findFirst().orElseThrow();
        for (int i = 1; i < acetate.mobility().size(); i++) {
            assertTrue(acetate.mobility().get(i) < acetate.mobility().get(i - 1), "more ionised at higher pH");
        }
        String csv = PhScanCsv.text(r);
        assertEquals(1 + r.pH().size(), csv.lines().count());
        assertTrue(csv.startsWith("ph,"));
        assertTrue(csv.lines().skip(1).allMatch(l -> l.split(",").length == 1 + r.curves().size()));
    }

    @Test
    void aRangeThatCannotBeScannedNamesTheOption() {
        InputException e = assertThrows(InputException.class, () -> job(List.of()).scan(7, 3, 0.5, 10, 25));
        assertEquals("--scan", e.field());
    }

    private static PredictedMobility find(PredictMobilities.Prediction p, String name) {
        return p.all().stream().filter(x -> x.name().equals(name)).findFirst().orElseThrow();
    }
}
