package org.mobident.report;

import java.nio.file.Path;
import java.util.List;
import org.mobident.InputException;
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

/** Hand-built pipeline results for the report tests (values invented, not measured). */
final class ReportFixtures {

    private ReportFixtures() {
    }

    /** A fixed scale standing in for a real marker scale: μ = a/t + b. */
    static final class FixedScale implements MobilityScale {
        private final double eof;

        FixedScale(double eof) {
            this.eof = eof;
        }

        @Override
        public double mobility(double timeS) {
            return -28800.0 / timeS - eof;
        }

        @Override
        public double mobilitySd(double timeS, double timeSdS) {
            return 0.1;
        }

        @Override
        public double timeS(double mobility) {
            return -28800.0 / (mobility + eof);
        }

        @Override
        public double eofMobility() {
            return eof;
        }

        @Override
        public String describe() {
            return "fixed test scale";
        }
    }

    static MobilityScale scale() {
        return new FixedScale(-50.0);
    }

    static RunConditions conditions() {
        return new RunConditions(80, 72, -20, 0, 25, "chromate pH 8", 450, 700, Detection.INDIRECT,
                Double.NaN, Double.NaN, Double.NaN);
    }

    static RunSpec spec(String name) {
        return new RunSpec(name, Path.of("samples", name + ".csv"), conditions(), "runs.csv", 2);
    }

    static Peak peak(double apexS, double height, boolean dip) {
        return peak(apexS, height, dip, 57.25);
    }

    /** A peak whose zone centre lies 0.04321 s after its apex (uncertainty 0.02109 s). */
    static Peak peak(double apexS, double height, boolean dip, double signalToNoise) {
        return new Peak(100, apexS, 0.0123, apexS + 0.04321, 0.02109, apexS - 2.5, apexS + 3.25, height,
                height * 1.7, height * 1.7 / apexS, 1.5, 123456.4, 2.345, signalToNoise, dip);
    }

    /** An ok run: one identified, one ambiguous, one unassigned analyte and the neutral marker. */
    static RunResult okRun() {
        PeakMatch chloride = new PeakMatch("chloride", 0.9731, MatchStatus.IDENTIFIED, "bromide", 0.0269,
                List.of(new Candidate("chloride", -71.6, 0.08, 0.2, 0.9731),
                        new Candidate("bromide", -73.0, 1.48, 2.9, 0.0269)));
        PeakMatch nitrate = new PeakMatch("nitrate", 0.62, MatchStatus.AMBIGUOUS, "nitrite", 0.38,
                List.of(new Candidate("nitrate", -69.6, 0.1, 0.3, 0.62),
                        new Candidate("nitrite", -70.9, -1.2, -1.9, 0.38)));
        PeakMatch none = new PeakMatch(null, 0.99, MatchStatus.UNASSIGNED, null, 0.0, List.of());
        List<PeakResult> peaks = List.of(
                new PeakResult(peak(223.45678, 3.2, true), PeakRole.ANALYTE, -71.52, 0.21, -71.52, chloride),
                new PeakResult(peak(240.1, 1.1, true), PeakRole.ANALYTE, -69.5, 0.25, -69.5, nitrate),
                new PeakResult(peak(261.0, 0.8, true, 6.5), PeakRole.ANALYTE, -59.6, 0.3, -59.6, none),
                new PeakResult(new Peak(900, 576.0, 0.02, 574.0, 578.0, 2.0, 4.0, 4.0 / 576.0, 1.9,
                        Double.NaN, Double.NaN, 40.0, true), PeakRole.NEUTRAL_MARKER, 0.0, Double.NaN,
                        Double.NaN, PeakMatch.none()));
        return new RunResult(spec("spring-01"), null, "neutral marker at 576.0 s", -50.0, scale(), peaks,
                List.of("run at 30.0 C; mobilities converted to the library temperature 25.0 C"), 0.021);
    }

    /** A run that could not be read. */
    static RunResult failedRun() {
        return RunResult.failure(spec("well-09"),
                new InputException("samples/well-09.csv", 3, "signal", "not a number: 'abc'"));
    }

    /** An ok run with no neutral marker: peaks without mobilities. */
    static RunResult noMarkerRun() {
        List<PeakResult> peaks = List.of(new PeakResult(peak(300.0, 2.0, false), PeakRole.ANALYTE,
                Double.NaN, Double.NaN, Double.NaN, PeakMatch.none()));
        return new RunResult(spec("spring-02"), null, "no neutral marker found", Double.NaN, null, peaks,
                List.of(), 0.03);
    }
}
