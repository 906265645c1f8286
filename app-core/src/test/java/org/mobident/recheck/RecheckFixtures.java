package org.mobident.recheck;

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

/**
 * Hand-built pipeline results (values invented), in the manner of the report tests' fixtures,
 * for writing peak tables to read back.
 */
final class RecheckFixtures {

    private RecheckFixtures() {
    }

    /** μ = −28800/t − eof; a stand-in for a marker scale. */
    static final class FixedScale implements MobilityScale {
        @Override
        public double mobility(double timeS) {
            return -28800.0 / timeS + 50.0;
        }

        @Override
        public double mobilitySd(double timeS, double timeSdS) {
            return 0.1;
        }

        @Override
        public double timeS(double mobility) {
            return -28800.0 / (mobility - 50.0);
        }

        @Override
        public double eofMobility() {
            return -50.0;
        }

        @Override
        public String describe() {
            return "fixed test scale";
        }
    }

    static RunSpec spec(String name) {
        RunConditions c = new RunConditions(80, 72, -20, 0, 25, "chromate pH 8", 450, 700, Detection.INDIRECT,
                Double.NaN, Double.NaN, Double.NaN);
        return new RunSpec(name, Path.of("samples", name + ".csv"), c, "runs.csv", 2);
    }

    static Peak peak(double apexS) {
        return new Peak(100, apexS, 0.0123, apexS - 2.5, apexS + 3.25, 2.0, 3.4, 3.4 / apexS, 1.5, 123456.4, 2.345,
                57.25, true);
    }

    /** One identified, one ambiguous (analyte name needing spreadsheet protection), one unassigned, the marker. */
    static RunResult okRun(String name) {
        PeakMatch chloride = new PeakMatch("chloride", 0.9731, MatchStatus.IDENTIFIED, "bromide", 0.0269,
                List.of(new Candidate("chloride", -71.6, 0.08, 0.2, 0.9731),
                        new Candidate("bromide", -73.0, 1.48, 2.9, 0.0269)));
        PeakMatch odd = new PeakMatch("-odd name", 0.62, MatchStatus.AMBIGUOUS, "nitrite", 0.38,
                List.of(new Candidate("-odd name", -69.6, 0.1, 0.3, 0.62),
                        new Candidate("nitrite", -70.9, -1.2, -1.9, 0.38)));
        PeakMatch none = new PeakMatch(null, 0.99, MatchStatus.UNASSIGNED, null, 0.0, List.of());
        List<PeakResult> peaks = List.of(
                new PeakResult(peak(223.4), PeakRole.ANALYTE, -71.52, 0.21, -71.4, chloride),
                new PeakResult(peak(240.1), PeakRole.ANALYTE, -69.5, 0.25, -69.5, odd),
                new PeakResult(peak(261.0), PeakRole.ANALYTE, -59.6, 0.3, -59.6, none),
                new PeakResult(peak(576.0), PeakRole.NEUTRAL_MARKER, 0.0, Double.NaN, Double.NaN, PeakMatch.none()));
        return new RunResult(spec(name), null, "neutral marker at 576.0 s", -50.0, new FixedScale(), peaks,
                List.of(), 0.02);
    }

    static RunResult failedRun(String name) {
        return RunResult.failure(spec(name), new InputException("samples/" + name + ".csv", 3, "signal", "not a number"));
    }

    static RunResult noPeaksRun(String name) {
        return new RunResult(spec(name), null, "no neutral marker found", Double.NaN, null, List.of(), List.of(), 0.03);
    }
}
