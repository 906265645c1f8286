package org.mobident.report;

import java.util.Locale;
import org.mobident.matching.RunScale;
import org.mobident.pipeline.RunResult;

/**
 * A run's scale correction μ_obs = a·μ_lib + b in words, the same in the HTML report and the
 * viewer: the fitted a and b with their SDs, why they were not fitted, or that the correction is off.
 */
public final class ScaleCorrectionText {

    private ScaleCorrectionText() {
    }

    /** E.g. "a = 1.0021 ± 0.0010, b = +0.12 ± 0.05 (from 4.9 matched peaks)", "none" without a scale. */
    public static String of(RunResult r) {
        RunScale s = r.runScale();
        if (!r.mobilityKnown() || s.status() == RunScale.Status.OFF) {
            return "none";
        }
        if (!s.fitted()) {
            return String.format(Locale.ROOT, "not fitted (%.1f peaks matched, 2 needed)", s.anchors());
        }
        return String.format(Locale.ROOT, "a = %.4f ± %.4f, b = %+.2f ± %.2f (from %.1f matched peaks)",
                s.factor(), s.factorSd(), s.offset(), s.offsetSd(), s.anchors());
    }

    /** The short form for narrow places: "a = 1.0021, b = +0.12", "not fitted", "none". */
    public static String brief(RunResult r) {
        RunScale s = r.runScale();
        if (!r.mobilityKnown() || s.status() == RunScale.Status.OFF) {
            return "none";
        }
        if (!s.fitted()) {
            return "not fitted";
        }
        return String.format(Locale.ROOT, "a = %.4f, b = %+.2f", s.factor(), s.offset());
    }
}
