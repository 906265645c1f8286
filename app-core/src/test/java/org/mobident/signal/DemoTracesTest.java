package org.mobident.signal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.mobident.InputException;
import org.mobident.result.Peak;
import org.mobident.settings.PeakSettings;
import org.mobident.trace.Detection;
import org.mobident.trace.Trace;
import org.mobident.trace.io.DelimitedTraceReader;
import org.mobident.trace.io.TraceReadOptions;

/**
 * The simulated demo runs: every zone listed in demo-data/TRUTH.md is found within 0.2 s of its
 * predicted time (the zones carry a slight electromigration-dispersion asymmetry), and nothing
 * else is. Detection modes from demo-data/runs.csv.
 */
class DemoTracesTest {

    private static final Path DEMO = Path.of("..", "demo-data");
    /** Tolerance on the apex time against the predicted time of TRUTH.md, s. */
    private static final double APEX_TOLERANCE_S = 0.2;

    private static List<Peak> peaks(String file, Detection detection) throws InputException {
        Path path = DEMO.resolve(file);
        assertTrue(Files.isRegularFile(path), "missing " + path.toAbsolutePath());
        Trace trace = DelimitedTraceReader.read(path, TraceReadOptions.DEFAULT);
        return PeakDetector.analyse(trace, detection, PeakSettings.DEFAULT).peaks();
    }

    private static void assertZones(String file, Detection detection, double... timesS) throws InputException {
        List<Peak> found = peaks(file, detection);
        assertEquals(timesS.length, found.size(), file + ": " + found);
        for (int k = 0; k < timesS.length; k++) {
            assertEquals(timesS[k], found.get(k).apexTimeS(), APEX_TOLERANCE_S, file + " zone " + k);
            assertEquals(detection == Detection.INDIRECT, found.get(k).dip());
        }
    }

    @Test
    void nitriteAndNitrateMergedIntoOneMaximumAreBothFound() throws InputException {
        // TRUTH.md, spring-03-uv214 (direct): bromide 231.57, nitrite 244.17 (height 1.20),
        // nitrate 246.13 (height 3.00), neutral marker 596.81
        assertZones("spring-03-uv214.csv", Detection.DIRECT, 231.57, 244.17, 246.13, 596.81);
        List<Peak> p = peaks("spring-03-uv214.csv", Detection.DIRECT);
        assertEquals(1.20, p.get(1).height(), 0.1);
        assertEquals(3.00, p.get(2).height(), 0.1);
        // plates 130,000 and 140,000 (TRUTH.md), within 10 %
        assertEquals(130_000, p.get(1).plates(), 13_000);
        assertEquals(140_000, p.get(2).plates(), 14_000);
        assertTrue(p.get(1).resolution() > 0.5 && p.get(1).resolution() < 0.9, "Rs " + p.get(1).resolution());
    }

    @Test
    void theOtherDemoRunsGiveTheirZonesAndNoMore() throws InputException {
        // all times from demo-data/TRUTH.md; all these runs are indirect (dips)
        assertZones("spring-01.csv", Detection.INDIRECT, 228.30, 232.61, 241.30, 271.51, 576.00);
        assertZones("spring-02.csv", Detection.INDIRECT, 238.63, 241.37, 246.67, 254.66, 297.24, 316.71, 648.74);
        assertZones("well-01.csv", Detection.INDIRECT, 219.46, 223.27, 227.88, 230.61, 242.67, 251.23, 509.15);
        assertZones("well-02.csv", Detection.INDIRECT, 214.32, 218.02, 225.70, 254.47, 277.97, 297.12, 551.64);
        // well-03: nitrite 230.83 and nitrate 232.89 merge like spring-03's pair
        assertZones("well-03.csv", Detection.INDIRECT, 221.67, 225.66, 230.83, 232.89, 263.55, 268.42, 535.32);
        assertZones("well-04-cations.csv", Detection.INDIRECT, 115.14, 116.57, 133.25, 139.28, 146.06, 307.39);
    }
}
