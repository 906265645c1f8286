package org.mobident.viewer;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.mobident.library.Library;
import org.mobident.library.LibraryEntry;
import org.mobident.report.plot.ToleranceBand;
import org.mobident.result.Candidate;
import org.mobident.result.MatchStatus;
import org.mobident.result.MobilityScale;
import org.mobident.result.Peak;
import org.mobident.result.PeakMatch;
import org.mobident.result.PeakResult;
import org.mobident.result.PeakRole;
import org.mobident.result.RunResult;
import org.mobident.trace.Detection;
import org.mobident.trace.RunConditions;
import org.mobident.trace.RunSpec;
import org.mobident.trace.Trace;

/**
 * Hand-built runs for the viewer tests (no other pipeline stage involved). Geometry Ld = 50 cm,
 * Lt = 60 cm, V = +25 kV, so μ_app = Ld·Lt/(V·t) = 12000/t in 1e-9 m²/(V s) (DESIGN.md), and
 * μ_eff = 12000/t − 12000/t_eof for a neutral marker at t_eof.
 */
final class ViewerFixtures {

    static final double A = 12000.0;
    static final double DT_S = 0.1;
    static final double END_S = 720.0;
    static final double BASELINE = 1.0;
    static final double SIGMA_S = 1.2;

    /** Effective mobilities of the peaks: a cation, the neutral marker, an unknown anion, an anion. */
    static final double[] MOBILITIES = {20.0, 0.0, -10.0, -30.0};
    static final double[] HEIGHTS = {8.0, 3.0, 5.0, 10.0};
    static final int NITRATE = 3;

    private ViewerFixtures() {
    }

    /** μ = a/t + b, the form of a neutral-marker scale without ramp. */
    record InverseTimeScale(double a, double b) implements MobilityScale {
        @Override
        public double mobility(double timeS) {
            return a / timeS + b;
        }

        @Override
        public double mobilitySd(double timeS, double timeSdS) {
            return Math.abs(a) / (timeS * timeS) * timeSdS;
        }

        @Override
        public double timeS(double mobility) {
            double t = a / (mobility - b);
            return t > 0 && Double.isFinite(t) ? t : Double.NaN;
        }

        @Override
        public double eofMobility() {
            return -b;
        }

        @Override
        public String describe() {
            return "test scale";
        }
    }

    static InverseTimeScale scaleFor(double eofTimeS) {
        return new InverseTimeScale(A, -A / eofTimeS);
    }

    /** A ready run whose neutral marker passes at {@code eofTimeS}; {@code withScale} false drops its scale. */
    static ViewerRun run(String name, double eofTimeS, boolean withScale) {
        return run(name, eofTimeS, withScale, 1.0);
    }

    /** As {@link #run(String, double, boolean)} with every peak height multiplied by {@code heightScale}. */
    static ViewerRun run(String name, double eofTimeS, boolean withScale, double heightScale) {
        InverseTimeScale scale = scaleFor(eofTimeS);
        int n = (int) Math.round(END_S / DT_S) + 1;
        double[] t = new double[n];
        double[] s = new double[n];
        double[] apex = new double[MOBILITIES.length];
        for (int k = 0; k < apex.length; k++) {
            apex[k] = scale.timeS(MOBILITIES[k]);
        }
        for (int i = 0; i < n; i++) {
            t[i] = i * DT_S;
            double v = BASELINE;
            for (int k = 0; k < apex.length; k++) {
                double z = (t[i] - apex[k]) / SIGMA_S;
                v += heightScale * HEIGHTS[k] * Math.exp(-0.5 * z * z);
            }
            s[i] = v;
        }
        PeakMatch[] matches = {
            new PeakMatch("lithium", 0.55, MatchStatus.AMBIGUOUS, "sodium", 0.40, List.of(
                    new Candidate("lithium", 20.1, -0.1, -0.2, 0.55), new Candidate("sodium", 20.6, -0.6, -1.1, 0.40))),
            PeakMatch.none(),
            new PeakMatch(null, 0.93, MatchStatus.UNASSIGNED, null, 0.0, List.of()),
            new PeakMatch("nitrate", 0.97, MatchStatus.IDENTIFIED, null, 0.0, List.of(
                    new Candidate("nitrate", -30.05, 0.05, 0.2, 0.97)))};
        PeakRole[] roles = {PeakRole.ANALYTE, PeakRole.NEUTRAL_MARKER, PeakRole.ANALYTE, PeakRole.ANALYTE};
        List<PeakResult> peaks = new ArrayList<>();
        for (int k = 0; k < apex.length; k++) {
            peaks.add(new PeakResult(peak(apex[k], heightScale * HEIGHTS[k]), roles[k], MOBILITIES[k], 0.05, MOBILITIES[k],
                    withScale ? matches[k] : PeakMatch.none()));
        }
        RunSpec spec = spec(name);
        RunResult result = new RunResult(spec, null, withScale ? "neutral marker at " + eofTimeS + " s" : "no marker",
                withScale ? A / eofTimeS : Double.NaN, withScale ? scale : null, peaks, List.of(), 0.01);
        return new ViewerRun(spec, new Trace(name, name + ".csv", t, s), result);
    }

    /** A Gaussian peak's measures (FWHM = 2.3548 σ; N = 5.54 (t/w½)², Ph. Eur. 2.2.46). */
    static Peak peak(double apexS, double height) {
        double w = 2.3548 * SIGMA_S;
        double area = height * SIGMA_S * Math.sqrt(2 * Math.PI);
        return new Peak((int) Math.round(apexS / DT_S), apexS, 0.01, apexS - 4 * SIGMA_S, apexS + 4 * SIGMA_S,
                height, area, area / apexS, w, 5.54 * (apexS / w) * (apexS / w), Double.NaN, 250, false);
    }

    static RunSpec spec(String name) {
        RunConditions c = new RunConditions(60, 50, 25, 0, 25, "borate", Double.NaN, Double.NaN,
                Detection.DIRECT, Double.NaN, Double.NaN, Double.NaN);
        return new RunSpec(name, Path.of(name + ".csv"), c, "runs.csv", 2);
    }

    static Library library() {
        return new Library(List.of(
                LibraryEntry.of("lithium", 20.1, 0.3),
                LibraryEntry.of("sodium", 20.6, 0.3),
                LibraryEntry.of("nitrate", -30.05, 0.3)), "test-library.csv", List.of());
    }

    /**
     * Two runs of the same sample with different EOF (marker at 200 s and 250 s; the second at half
     * the height) and one without a scale.
     */
    static ViewerData data() {
        return new ViewerData(library(), ToleranceBand.matching(library(), org.mobident.settings.MatchSettings.DEFAULT),
                List.of(run("early", 200, true), run("late", 250, true, 0.5), run("unscaled", 220, false)));
    }
}
