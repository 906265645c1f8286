package org.mobident.pipeline;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.mobident.library.Library;
import org.mobident.library.LibraryEntry;
import org.mobident.result.RunResult;
import org.mobident.settings.IdentifySettings;
import org.mobident.simulate.SimulationSpec;
import org.mobident.simulate.TraceSimulator;
import org.mobident.trace.Detection;
import org.mobident.trace.RunConditions;
import org.mobident.trace.RunSpec;
import org.mobident.trace.Trace;

/** The run's note when its earliest zones are narrower than two sampling intervals. */
class SamplingCheckTest {

    private static final SamplingCheck.Span TWO_HZ = new SamplingCheck.Span(0, 600, 0.5);

    @Test
    void aZoneUnderTwoIntervalsWideIsNoted() {
        // width 0.006 × 110 s = 0.66 s = 1.32 intervals of 0.5 s; 8 samples across it need 8 / 0.66 = 12.1 Hz
        String note = SamplingCheck.note(TWO_HZ, 0.006, "potassium", 110.0);
        assertTrue(note.startsWith("sampled too slowly"), note);
        assertTrue(note.contains("potassium, expected at 110.0 s"), note);
        assertTrue(note.contains("0.66 s wide at half height, 1.3 sampling intervals of 0.500 s"), note);
        assertTrue(note.contains("about 13 Hz"), note);
    }

    @Test
    void aZoneTwoIntervalsWideOrMoreIsNot() {
        assertEquals("", SamplingCheck.note(TWO_HZ, 0.006, "potassium", 170.0)); // 1.02 s: 2.04 intervals
        assertEquals("", SamplingCheck.note(new SamplingCheck.Span(0, 600, 0.25), 0.006, "potassium", 110.0));
    }

    @Test
    void nothingIsSaidWithoutAWidthOrOutsideTheRun() {
        assertEquals("", SamplingCheck.note(TWO_HZ, Double.NaN, "potassium", 110.0));
        assertEquals("", SamplingCheck.note(TWO_HZ, 0.006, "potassium", 700.0));
        assertEquals("", SamplingCheck.note(SamplingCheck.Span.UNKNOWN, 0.006, "potassium", 110.0));
    }

    /**
     * The limit of two intervals: a Gaussian zone two intervals wide at half height, its apex midway
     * between two samples, keeps shoulders (the samples 1.5 intervals from the apex) at about a quarter
     * of its two top samples (0.5 interval from it): exp(−(1.5² − 0.5²)/(2σ²)) with σ = w½/(2√(2 ln 2))
     * (the Gaussian's width at half height, a textbook identity), which the spike filter tells from a
     * spike; at 1.5 intervals they fall to under a tenth, which it cannot.
     */
    @Test
    void twoIntervalsLeaveAZoneItsShoulders() {
        assertEquals(0.25, shoulderFraction(SamplingCheck.MIN_SAMPLES_ACROSS_WIDTH), 0.001);
        assertTrue(shoulderFraction(1.5) < 0.1);
    }

    private static double shoulderFraction(double widthIntervals) {
        double sigma = widthIntervals / (2 * Math.sqrt(2 * Math.log(2)));
        return Math.exp(-(1.5 * 1.5 - 0.5 * 0.5) / (2 * sigma * sigma));
    }

    /** Cations, effective mobilities in 1e-9 m²/(V s); invented test values, not a source. */
    private static final Library CATIONS = new Library(List.of(
            entry("potassium", 70.2), entry("calcium", 54.8), entry("sodium", 46.2), entry("lithium", 36.5)),
            "test", List.of());

    private static LibraryEntry entry(String name, double mobility) {
        return new LibraryEntry(name, mobility, 0.4, 6, 1, Double.NaN, List.of(), List.of(),
                "test buffer", Double.NaN, Double.NaN, 25.0, "test");
    }

    /**
     * End to end: the same four zones (150,000 plates: about 0.61 s wide at half height at
     * potassium's 108 s) recorded at 2 Hz get the note, at 20 Hz and 4 Hz they do not.
     */
    @ParameterizedTest(name = "{0} Hz")
    @ValueSource(ints = {2, 4, 20})
    void theEarliestZoneDecides(int hz) {
        RunConditions c = new RunConditions(60, 52, 25, 0, 25.0, "test buffer", 200, 400, Detection.DIRECT,
                Double.NaN, Double.NaN, Double.NaN);
        SimulationSpec.Builder b = SimulationSpec.builder(c).eofMobility(45).neutralMarker(1.0).samplingHz(hz)
                .durationS(420).noiseSd(0.002).baseline(0.1).seed(5);
        for (LibraryEntry e : CATIONS.entries()) {
            b.zone(e.name(), e.mobility(), 0.5, 150_000);
        }
        Trace t = TraceSimulator.simulate("sampled-" + hz, b.build());
        RunSpec spec = new RunSpec("sampled-" + hz, Path.of("sampled-" + hz + ".csv"), c, "test", 0);
        RunResult r = new Identifier(CATIONS, IdentifySettings.defaults().withThreads(1)).identify(spec, t);
        assertTrue(r.mobilityKnown(), r.scaleNote());
        boolean noted = r.notes().stream().anyMatch(n -> n.startsWith("sampled too slowly") && n.contains("potassium"));
        if (hz == 2) {
            assertTrue(noted, r.notes().toString());
        } else {
            assertFalse(noted, r.notes().toString());
        }
    }
}
