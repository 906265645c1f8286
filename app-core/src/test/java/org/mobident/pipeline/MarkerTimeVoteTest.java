package org.mobident.pipeline;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.mobident.library.Library;
import org.mobident.library.LibraryEntry;
import org.mobident.result.Peak;
import org.mobident.trace.Detection;
import org.mobident.trace.RunConditions;

/**
 * Where the library and the peaks put a neutral marker that was not seen. Check values from the
 * definition of the apparent mobility, μ_app = Ld·Lt/(V·t) (IUPAC Compendium, "electrophoretic
 * mobility"), and μ_eff = μ_app − μ_eof with μ_eof = Ld·Lt/(V·t_marker): the peak times below are
 * computed from it, in SI units, here and not by the engine.
 */
class MarkerTimeVoteTest {

    /** Invented test mobilities, 1e-9 m²/(V s); not a source. */
    private static final double[] MOBILITIES = {-79.3, -72.2, -68.0, -56.3, -49.6, -35.4, -30.1};

    private static LibraryEntry entry(String name, double mobility) {
        return new LibraryEntry(name, mobility, 0.1, 6, -1, Double.NaN, List.of(), List.of(),
                "test buffer", Double.NaN, Double.NaN, 25.0, "test");
    }

    private static Library library() {
        List<LibraryEntry> entries = new ArrayList<>();
        for (int i = 0; i < MOBILITIES.length; i++) {
            entries.add(entry("a" + i, MOBILITIES[i]));
        }
        return new Library(entries, "test", List.of());
    }

    /** Time (s) of a zone of effective mobility μ (1e-9 m²/(V s)) on a 60/50 cm capillary at −25 kV
     *  whose EOF mobility is μ_eof, all mobilities scaled by {@code factor} (a temperature error). */
    private static double timeS(double mobility, double eofMobility, double factor) {
        double ld = 0.50;
        double lt = 0.60;
        double volts = -25_000;
        double apparent = factor * (mobility + eofMobility) * 1e-9;
        return ld * lt / (volts * apparent);
    }

    private static Peak peak(double timeS, double height) {
        return new Peak(0, timeS, 0.01, timeS - 1, timeS + 1, height, height, height / timeS, 1.0, 1e5, 5, 50,
                false);
    }

    private static RunConditions conditions() {
        return new RunConditions(60, 50, -25, 0, 25.0, "test buffer", Double.NaN, Double.NaN, Detection.DIRECT,
                Double.NaN, Double.NaN, Double.NaN);
    }

    @Test
    void fourAnalytesPutTheMarkerWhereItIsEvenWithTheMobilitiesTwoPerCentOff() {
        double eof = -40.0;
        double factor = 1.02; // a capillary about 1 K warmer than stated
        double markerS = timeS(0, eof, factor);
        List<Peak> peaks = new ArrayList<>();
        for (int i : new int[] {0, 2, 3, 6}) {
            peaks.add(peak(timeS(MOBILITIES[i], eof, factor), 10 + i));
        }
        peaks.add(peak(0.9 * markerS, 2)); // a foreign zone
        peaks.sort(java.util.Comparator.comparingDouble(Peak::apexTimeS));
        double predicted = Identifier.predictedMarkerTimeS(conditions(), peaks, library());
        assertTrue(Double.isFinite(predicted));
        // the votes lean by (a − 1)·μ/μ_eof, about 2.7 % here: the search around the prediction must reach it
        assertEquals(markerS, predicted, 0.8 * Identifier.MARKER_SEARCH_REACH * markerS,
                "marker at " + markerS + " s");
    }

    @Test
    void twoPeaksAreNotEnoughToPlaceIt() {
        List<Peak> peaks = List.of(peak(timeS(MOBILITIES[0], -40, 1.0), 10), peak(timeS(MOBILITIES[5], -40, 1.0), 10));
        assertTrue(Double.isNaN(Identifier.predictedMarkerTimeS(conditions(), peaks, library())));
    }
}
