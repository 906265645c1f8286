package org.mobident.simulate;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Collectors;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.mobident.trace.RunConditions;

/** Checks that the demo scenario is well formed: markers inside their windows, zones on the trace. */
class DemoDataGeneratorTest {

    /** The demo folder must stay small enough to ship in the repository. */
    private static final long MAX_DEMO_BYTES = 5L * 1024 * 1024;

    /** EOF drift between sample runs of the same method, as the scenario promises (±15 %). */
    private static final double MAX_EOF_DRIFT = 0.15;

    private static SimulationSpec spec(DemoDataGenerator.RunPlan plan) {
        double f = DemoDataGenerator.viscosityFactor(plan.temperatureC());
        SimulationSpec.Builder b = SimulationSpec.builder(DemoDataGenerator.conditions(plan))
                .eofMobility(plan.eof25() * f).durationS(plan.durationS());
        return b.build();
    }

    @Test
    void everyRunHasItsMarkerInTheWindowAndItsZonesBeforeIt() {
        List<DemoDataGenerator.RunPlan> all = new java.util.ArrayList<>(DemoDataGenerator.samplePlans());
        all.addAll(DemoDataGenerator.standardPlans());
        for (DemoDataGenerator.RunPlan plan : all) {
            SimulationSpec spec = spec(plan);
            RunConditions c = spec.conditions();
            double marker = TraceSimulator.apexTimeS(spec, 0.0);
            assertTrue(marker > c.markerFromS() && marker < c.markerToS(), plan.file() + ": marker at " + marker);
            assertTrue(plan.markerHeight() > 0, plan.file());
            double f = DemoDataGenerator.viscosityFactor(plan.temperatureC());
            for (DemoDataGenerator.Component z : plan.components()) {
                DemoDataGenerator.Analyte a = DemoDataGenerator.analyte(z.name());
                double mu = (a == null ? DemoDataGenerator.UNKNOWN_MOBILITY : a.trueMobility()) * f;
                double t = TraceSimulator.apexTimeS(spec, mu);
                assertTrue(t > 60 && t < c.markerFromS(), plan.file() + " " + z.name() + " at " + t);
            }
        }
    }

    @Test
    void eofDriftStaysWithinTheStatedRange() {
        double sum = 0;
        int n = 0;
        for (DemoDataGenerator.RunPlan p : DemoDataGenerator.samplePlans()) {
            if (!p.cation()) {
                sum += p.eof25();
                n++;
            }
        }
        double mean = sum / n;
        for (DemoDataGenerator.RunPlan p : DemoDataGenerator.samplePlans()) {
            if (!p.cation()) {
                assertTrue(Math.abs(p.eof25() / mean - 1) <= MAX_EOF_DRIFT, p.file());
            }
        }
    }

    @Test
    void writesTheDocumentedFilesSmallAndDeterministic(@TempDir Path dir) throws IOException {
        List<Path> written = DemoDataGenerator.generate(dir.resolve("a"));
        List<String> names = written.stream().map(p -> dir.resolve("a").relativize(p).toString().replace('\\', '/'))
                .collect(Collectors.toList());
        assertEquals(List.of("library.csv", "spring-01.csv", "spring-02.csv", "well-01.csv", "well-02.csv",
                "well-03.csv", "spring-03-uv214.csv", "well-04-cations.csv", "runs.csv",
                "standards/std-mixA-1.csv", "standards/std-mixA-2.csv", "standards/std-mixA-3.csv",
                "standards/std-mixA-4.csv", "standards/std-mixB-1.csv", "standards/std-mixB-2.csv",
                "standards/std-mixB-3.csv", "standards/std-mixB-4.csv", "standards/standards-runs.csv",
                "standards/mixes.csv", "README.md", "TRUTH.md"), names);
        long bytes = 0;
        for (Path p : written) {
            bytes += Files.size(p);
        }
        assertTrue(bytes < MAX_DEMO_BYTES, bytes + " bytes");
        assertEquals("Time (min);Signal", Files.readAllLines(dir.resolve("a/well-03.csv")).get(0));
        assertEquals("time_s,signal", Files.readAllLines(dir.resolve("a/spring-01.csv")).get(0));
        String truth = Files.readString(dir.resolve("a/TRUTH.md"));
        assertTrue(truth.contains("unknown-X") && truth.contains("**no**"), "the non-library zone is flagged");
        // Same seeds, same bytes: regenerate two files and compare.
        List<Path> again = DemoDataGenerator.generate(dir.resolve("b"));
        assertEquals(Files.readString(written.get(1)), Files.readString(again.get(1)));
        assertEquals(Files.readString(written.get(written.size() - 1)), Files.readString(again.get(again.size() - 1)));
        try (Stream<Path> s = Files.list(dir.resolve("a"))) {
            assertTrue(s.noneMatch(p -> p.getFileName().toString().endsWith(".tmp")), "no temporary files left");
        }
    }
}
