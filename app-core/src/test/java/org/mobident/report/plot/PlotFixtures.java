package org.mobident.report.plot;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.mobident.InputException;
import org.mobident.library.Library;
import org.mobident.library.LibraryEntry;
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
 * Synthetic runs for the plot and report tests, built by hand so that they depend on no other
 * stage of the pipeline. Geometry: Ld = 50 cm, Lt = 60 cm, V = +25 kV, so
 * μ_app = 100·Ld·Lt/(V·t) = 12000/t (DESIGN.md convention, 1e-9 m²/(V s)).
 */
public final class PlotFixtures {

    /** 100·Ld·Lt/V for Ld = 50 cm, Lt = 60 cm, V = 25 kV. */
    public static final double A = 12000.0;
    public static final double DT_S = 0.05;
    public static final double END_S = 700.0;
    public static final double BASELINE = 0.5;
    public static final double SIGMA_S = 1.5;

    public static final double CATION_MOBILITY = 20.0;
    public static final double ANION_MOBILITY = -30.0;
    public static final double UNKNOWN_MOBILITY = -10.0;

    public static final double CATION_HEIGHT = 8.0;
    public static final double EOF_HEIGHT = 3.0;
    public static final double UNKNOWN_HEIGHT = 5.0;
    public static final double ANION_HEIGHT = 10.0;

    private PlotFixtures() {
    }

    /** μ = a/t + b: the form of every marker scheme without ramp (tiny test implementation). */
    public record InverseTimeScale(double a, double b) implements MobilityScale {
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

    /** A run and its trace. */
    public record SyntheticRun(Trace trace, RunResult result) {
    }

    /** The scale of a run whose neutral marker passes at {@code eofTimeS}. */
    public static InverseTimeScale scaleFor(double eofTimeS) {
        return new InverseTimeScale(A, -A / eofTimeS);
    }

    /**
     * A run with a cation ("lithium", ambiguous with "sodium"), the EOF marker, an unknown anion
     * and an anion ("nitrate", identified), all Gaussian on a flat baseline, heights scaled by
     * {@code heightScale}.
     */
    public static SyntheticRun run(String name, double eofTimeS, double heightScale) {
        InverseTimeScale scale = scaleFor(eofTimeS);
        double[] mobilities = {CATION_MOBILITY, 0.0, UNKNOWN_MOBILITY, ANION_MOBILITY};
        double[] heights = {CATION_HEIGHT, EOF_HEIGHT, UNKNOWN_HEIGHT, ANION_HEIGHT};
        int n = (int) Math.round(END_S / DT_S) + 1;
        double[] t = new double[n];
        double[] s = new double[n];
        double[] apex = new double[mobilities.length];
        for (int k = 0; k < mobilities.length; k++) {
            apex[k] = scale.timeS(mobilities[k]);
        }
        for (int i = 0; i < n; i++) {
            t[i] = i * DT_S;
            double v = BASELINE;
            for (int k = 0; k < apex.length; k++) {
                double z = (t[i] - apex[k]) / SIGMA_S;
                v += heightScale * heights[k] * Math.exp(-0.5 * z * z);
            }
            s[i] = v;
        }
        List<PeakResult> peaks = new ArrayList<>();
        PeakMatch[] matches = {
            new PeakMatch("lithium", 0.55, MatchStatus.AMBIGUOUS, "sodium", 0.40, List.of()),
            PeakMatch.none(),
            new PeakMatch(null, 0.93, MatchStatus.UNASSIGNED, "chlorate", 0.05, List.of()),
            new PeakMatch("nitrate", 0.97, MatchStatus.IDENTIFIED, "chlorate", 0.02, List.of())};
        PeakRole[] roles = {PeakRole.ANALYTE, PeakRole.NEUTRAL_MARKER, PeakRole.ANALYTE, PeakRole.ANALYTE};
        for (int k = 0; k < apex.length; k++) {
            peaks.add(new PeakResult(peak(apex[k], heightScale * heights[k]), roles[k], mobilities[k], 0.05,
                    mobilities[k], matches[k]));
        }
        RunResult result = new RunResult(spec(name, "borate 20 mM"), null,
                "neutral marker at " + eofTimeS + " s", A / eofTimeS, scale, peaks,
                List.of("temperature not given: 25 °C assumed"), 0.01);
        return new SyntheticRun(new Trace(name, name + ".csv", t, s), result);
    }

    /** A Gaussian peak's measures at {@code apexS} (FWHM = 2.3548 σ; plates 5.54 (t/w½)², Ph. Eur. 2.2.46). */
    public static Peak peak(double apexS, double height) {
        double w = 2.3548 * SIGMA_S;
        double area = height * SIGMA_S * Math.sqrt(2 * Math.PI);
        return new Peak((int) Math.round(apexS / DT_S), apexS, 0.01, apexS - 4 * SIGMA_S, apexS + 4 * SIGMA_S,
                height, area, area / apexS, w, 5.54 * (apexS / w) * (apexS / w), Double.NaN, 200, false);
    }

    public static RunSpec spec(String name, String buffer) {
        RunConditions c = new RunConditions(60, 50, 25, 0, 25, buffer, Double.NaN, Double.NaN,
                Detection.DIRECT, Double.NaN, Double.NaN, Double.NaN);
        return new RunSpec(name, Path.of(name + ".csv"), c, "runs.csv", 2);
    }

    /** A run that failed as a whole, with {@code reason}. */
    public static RunResult failed(String name, String reason) {
        return RunResult.failure(spec(name, null), new InputException(name + ".csv", 3, "time", reason));
    }

    public static Library library() {
        return new Library(List.of(
                LibraryEntry.of("lithium", CATION_MOBILITY, 0.4),
                LibraryEntry.of("sodium", 21.5, 0.5),
                LibraryEntry.of("nitrate", ANION_MOBILITY, 0.3),
                LibraryEntry.of("chlorate", -33.0, 0.6)), "test-library.csv", List.of());
    }
}
