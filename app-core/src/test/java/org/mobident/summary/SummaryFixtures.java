package org.mobident.summary;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.mobident.result.MatchStatus;
import org.mobident.result.MobilityScale;
import org.mobident.result.Peak;
import org.mobident.result.PeakMatch;
import org.mobident.result.PeakResult;
import org.mobident.result.PeakRole;
import org.mobident.result.RunResult;
import org.mobident.result.RunScale;
import org.mobident.trace.Detection;
import org.mobident.trace.RunConditions;
import org.mobident.trace.RunSpec;

/** Constructed batch results for the summary tests (values invented). */
final class SummaryFixtures {
    private SummaryFixtures() {
    }

    /** A stand-in scale; the summaries only ask whether a run has one. */
    static final MobilityScale SCALE = new MobilityScale() {
        @Override
        public double mobility(double timeS) {
            return -30000.0 / timeS + 40.0;
        }

        @Override
        public double mobilitySd(double timeS, double timeSdS) {
            return 0.01;
        }

        @Override
        public double timeS(double mobility) {
            return -30000.0 / (mobility - 40.0);
        }

        @Override
        public double eofMobility() {
            return 40.0;
        }

        @Override
        public String describe() {
            return "test scale";
        }
    };

    /** A peak description: mobility (compared), assigned name or null, status. */
    record P(double mobility, String assigned, MatchStatus status, double height) {
        static P unknown(double mobility) {
            return new P(mobility, null, MatchStatus.UNASSIGNED, 1.0);
        }

        static P called(String name, double mobility) {
            return new P(mobility, name, MatchStatus.IDENTIFIED, 2.0);
        }
    }

    static RunResult run(String name, String buffer, P... peaks) {
        return run(name, buffer, 0.0, peaks);
    }

    /** A run whose uncorrected mobilities lie {@code shift} above the compared ones (scale offset b). */
    static RunResult run(String name, String buffer, double shift, P... peaks) {
        RunConditions c = new RunConditions(60, 50, -25, 0, 25, buffer, 100, 200, Detection.INDIRECT,
                Double.NaN, Double.NaN, Double.NaN);
        RunSpec spec = new RunSpec(name, Path.of(name + ".csv"), c, "runs.csv", 2, "sample " + name);
        List<PeakResult> out = new ArrayList<>();
        double t = 200;
        for (P p : peaks) {
            t += 10;
            Peak peak = new Peak(100, t, 0.01, t, 0.01, t - 1, t + 1, p.height(), p.height() * 2, p.height() * 2 / t,
                    0.5, 50000, 2.0, 40, true);
            PeakMatch m = p.assigned() == null ? new PeakMatch(null, 0.95, MatchStatus.UNASSIGNED, null, 0, List.of())
                    : new PeakMatch(p.assigned(), 0.9, p.status(), null, 0, List.of());
            out.add(new PeakResult(peak, PeakRole.ANALYTE, p.mobility() + shift, 0.01, p.mobility() + shift, m,
                    p.mobility()));
        }
        RunScale scale = new RunScale(RunScale.Status.FITTED, 1.0, 0.0, shift, 0.0, 0.0, 3);
        return new RunResult(spec, null, "neutral marker at 150.0 s", 40.0, SCALE, out, List.of(), 0.01, scale, 1.0);
    }
}
