package org.mobident.library.standards;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.time.Instant;
import java.util.Arrays;
import java.util.List;
import org.apache.commons.math3.stat.descriptive.DescriptiveStatistics;
import org.junit.jupiter.api.Test;
import org.mobident.library.LibraryCsv;
import org.mobident.library.Library;
import org.mobident.library.LibraryEntry;

class LibraryMergerTest {

    private static final BuildStamp STAMP = new BuildStamp(Instant.parse("2024-06-01T10:00:00Z"), "mobident 0.2.0");
    private static final double CLOSE = 1e-12;

    private static LibraryEntry measured(String name, double[] values, String source) {
        DescriptiveStatistics ds = new DescriptiveStatistics(values);
        BuildSettings s = BuildSettings.defaults();
        return new LibraryEntry(name, ds.getMean(), values.length > 1 ? ds.getStandardDeviation() : Double.NaN,
                values.length, 1, s.toleranceFor(ds.getStandardDeviation()), List.of(), List.of(), "buffer A",
                Double.NaN, Double.NaN, 25.0, source);
    }

    private static BuildResult fresh(LibraryEntry... entries) {
        Library lib = new Library(List.of(entries), "built from standards standards.csv",
                List.of("Mobility library built from standards runs by mobident 0.2.0 on 2024-06-01T10:00:00Z"));
        return new BuildResult(lib, List.of(), List.of(), List.of(), List.of(), List.of(), BuildSettings.defaults(),
                STAMP);
    }

    @Test
    void pooledMeanAndSdEqualThoseOfAllValuesAtOnce() throws Exception {
        double[] day1 = {51.91, 51.95, 51.87, 51.99, 51.93};
        double[] day2 = {51.92, 51.97, 51.89, 51.96};
        double[] all = new double[day1.length + day2.length];
        System.arraycopy(day1, 0, all, 0, day1.length);
        System.arraycopy(day2, 0, all, day1.length, day2.length);
        Library existing = new Library(List.of(measured("sodium", day1, "standards: d1")), "lib.csv",
                List.of("first build"));
        MergeResult m = LibraryMerger.merge(existing, fresh(measured("sodium", day2, "standards: d2")));
        LibraryEntry e = m.library().find("sodium").orElseThrow();
        // Reference implementation: Apache Commons Math DescriptiveStatistics over all nine values.
        DescriptiveStatistics ds = new DescriptiveStatistics(all);
        // pooled exactly, then kept to 6 significant digits for the file (LibraryCsv.computedValue)
        assertEquals(LibraryCsv.computedValue(ds.getMean()), e.mobility(), CLOSE);
        assertEquals(LibraryCsv.computedValue(ds.getStandardDeviation()), e.mobilitySd(), CLOSE);
        assertEquals(9, e.n());
        assertEquals(BuildSettings.defaults().toleranceFor(ds.getStandardDeviation()), e.tolerance(), CLOSE);
        assertEquals("standards: d1; standards: d2", e.source());
        assertEquals(List.of("sodium"), m.pooled());
        assertTrue(m.warnings(BuildWarning.Kind.MEANS_DIFFER).isEmpty(), m.warnings().toString());
    }

    @Test
    void anotherSessionTeachesTheBetweenSessionSpread() throws Exception {
        // four analytes measured on two days, n = 4 each with SD 0.02 (s²/n = 1e-4 per mean); day 2 is 1 %
        // higher across the board (a session-wide scale the line a·m + b takes out) and differs by
        // r = +0.3, −0.3, +0.3, −0.3 around that line (a, b: least squares through the four pairs).
        double[] day1 = {-70.0, -60.0, -50.0, -40.0};
        double[] offsets = {0.3, -0.3, 0.3, -0.3};
        LibraryEntry[] first = new LibraryEntry[4];
        LibraryEntry[] second = new LibraryEntry[4];
        for (int k = 0; k < 4; k++) {
            first[k] = new LibraryEntry("a" + k, day1[k], 0.02, 4, -1, Double.NaN, List.of(), List.of(), "B",
                    Double.NaN, Double.NaN, 25.0, "d1");
            second[k] = new LibraryEntry("a" + k, 1.01 * day1[k] + offsets[k], 0.02, 4, -1, Double.NaN, List.of(),
                    List.of(), "B", Double.NaN, Double.NaN, 25.0, "d2");
        }
        MergeResult m = LibraryMerger.merge(new Library(List.of(first), "lib.csv", List.of()), fresh(second));
        // the least-squares residuals of (m1, m2) are the offsets minus their projection on the line
        double sx = 0, sy = 0, sxx = 0, sxy = 0;
        for (int k = 0; k < 4; k++) {
            sx += first[k].mobility();
            sy += second[k].mobility();
            sxx += first[k].mobility() * first[k].mobility();
            sxy += first[k].mobility() * second[k].mobility();
        }
        double a = (4 * sxy - sx * sy) / (4 * sxx - sx * sx);
        double b = (sy - a * sx) / 4;
        for (int k = 0; k < 4; k++) {
            double r = second[k].mobility() - (a * first[k].mobility() + b);
            // σ_B² = (r²·G/(G − 2) − s²/n − s²/n) / 2 with G = 4 (method of moments, see LibraryMerger)
            double expected = Math.sqrt(Math.max(0, (r * r * 2.0 - 1e-4 - 1e-4) / 2));
            assertEquals(expected, m.library().entries().get(k).sessionSd(), 1e-9, "a" + k);
            assertTrue(m.library().entries().get(k).sessionSd() > 0.1, "a few tenths off the line give a real spread");
        }
    }

    @Test
    void handExampleOfThePooling() {
        // {1, 2, 3} and {4, 5}: all five have mean 3 and SD √2.5 = 1.5811 (hand computation);
        // Chan, Golub & LeVeque: M2 = 2 + 0.5 + 2.5²·3·2/5 = 10, SD = √(10/4).
        ReplicateStatistics a = ReplicateStatistics.of(new double[] {1, 2, 3});
        ReplicateStatistics b = ReplicateStatistics.of(new double[] {4, 5});
        ReplicateStatistics ab = a.combine(b);
        assertEquals(5, ab.n());
        assertEquals(3.0, ab.mean(), CLOSE);
        assertEquals(10.0, ab.m2(), CLOSE);
        assertEquals(Math.sqrt(2.5), ab.sd(), CLOSE);
        ReplicateStatistics fromPublished = ReplicateStatistics.fromMeanSd(3, 2.0, 1.0)
                .combine(ReplicateStatistics.fromMeanSd(2, 4.5, Math.sqrt(0.5)));
        assertEquals(ab.mean(), fromPublished.mean(), CLOSE);
        assertEquals(ab.sd(), fromPublished.sd(), CLOSE);
    }

    @Test
    void poolingInManyPiecesMatchesDescriptiveStatistics() {
        double[] v = new double[40];
        for (int i = 0; i < v.length; i++) {
            v[i] = -56.3 + 0.1 * Math.sin(1.7 * i) + 0.02 * (i % 7);
        }
        ReplicateStatistics pooled = ReplicateStatistics.EMPTY;
        int[] cuts = {0, 1, 4, 11, 12, 25, 40};
        for (int k = 1; k < cuts.length; k++) {
            pooled = pooled.combine(ReplicateStatistics.of(Arrays.copyOfRange(v, cuts[k - 1], cuts[k])));
        }
        DescriptiveStatistics ds = new DescriptiveStatistics(v);
        assertEquals(ds.getMean(), pooled.mean(), CLOSE);
        assertEquals(ds.getStandardDeviation(), pooled.sd(), 1e-10);
        assertEquals(ds.getStandardDeviation() / Math.abs(ds.getMean()) * 100, pooled.rsdPercent(), 1e-9);
    }

    @Test
    void newAnalytesAreAddedAndOthersKept() throws Exception {
        LibraryEntry handbook = new LibraryEntry("phosphate", -33.0, Double.NaN, 0, -2, Double.NaN, List.of(2.15, 7.2,
                12.35), List.of(), null, Double.NaN, Double.NaN, 25.0, "handbook");
        Library existing = new Library(List.of(measured("sodium", new double[] {51.9, 52.0, 51.95}, "d1"), handbook),
                "lib.csv", List.of("first build"));
        MergeResult m = LibraryMerger.merge(existing,
                fresh(measured("lithium", new double[] {40.1, 40.15, 40.05}, "d2")));
        assertEquals(List.of("sodium", "phosphate", "lithium"),
                m.library().entries().stream().map(LibraryEntry::name).toList());
        assertEquals(existing.entries().get(0), m.library().entries().get(0));
        assertEquals(handbook, m.library().entries().get(1));
        assertEquals(List.of("lithium"), m.added());
        assertEquals("lib.csv", m.library().sourceFile());
        List<String> notes = m.library().notes();
        assertEquals("first build", notes.get(0));
        assertTrue(notes.get(1).startsWith("Merged with a fresh build from standards on 2024-06-01T10:00:00Z"), notes.get(1));
        assertEquals("Mobility library built from standards runs by mobident 0.2.0 on 2024-06-01T10:00:00Z", notes.get(2));
    }

    @Test
    void differingMeansAreWarnedAbout() throws Exception {
        // 0.5 units apart with SDs of a few hundredths: far beyond 2·√(s₁²/n₁ + s₂²/n₂).
        Library existing = new Library(List.of(measured("sodium", new double[] {51.9, 51.95, 51.85}, "d1")),
                "lib.csv", List.of());
        MergeResult m = LibraryMerger.merge(existing, fresh(measured("sodium", new double[] {52.4, 52.45, 52.35}, "d2")));
        assertEquals(1, m.warnings(BuildWarning.Kind.MEANS_DIFFER).size());
        assertEquals("sodium", m.warnings(BuildWarning.Kind.MEANS_DIFFER).get(0).analyte());
        assertEquals(6, m.library().find("sodium").orElseThrow().n());
    }

    @Test
    void handbookValueIsReplacedNotPooledKeepingItsChemistry() throws Exception {
        LibraryEntry handbook = new LibraryEntry("phosphate", -33.0, Double.NaN, 0, -2, Double.NaN,
                List.of(2.15, 7.2, 12.35), List.of(-35.0, -61.0), null, Double.NaN, Double.NaN, 25.0, "handbook");
        Library existing = new Library(List.of(handbook), "lib.csv", List.of());
        LibraryEntry measured = measured("phosphate", new double[] {-30.1, -30.2, -30.15}, "standards: p1, p2, p3");
        MergeResult m = LibraryMerger.merge(existing, fresh(measured));
        LibraryEntry e = m.library().find("phosphate").orElseThrow();
        assertEquals(measured.mobility(), e.mobility());
        assertEquals(3, e.n());
        assertEquals(-2, e.charge());
        assertEquals(handbook.pKa(), e.pKa());
        assertEquals(handbook.limitingMobilities(), e.limitingMobilities());
        assertEquals(List.of("phosphate"), m.replaced());
        assertEquals(1, m.warnings(BuildWarning.Kind.NOT_POOLED).size());
    }
}
