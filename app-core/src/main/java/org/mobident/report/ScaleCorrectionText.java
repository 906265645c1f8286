package org.mobident.report;

import org.mobident.result.RunResult;
import org.mobident.result.RunScale;
import org.mobident.text.NumberText;

/**
 * A run's scale correction μ_obs = a·μ_lib + b in words, the same in the HTML report and the
 * viewer: the fitted a and b with their SDs, why they were not fitted, or that the correction is off.
 */
public final class ScaleCorrectionText {

    /** Written where a number is not known. */
    private static final String MISSING = "–";

    private ScaleCorrectionText() {
    }

    /** E.g. "a = 1.0021 ± 0.0010, b = +0.12 ± 0.05 (from 4.9 matched peaks)", "none" without a scale. */
    public static String of(RunResult r) {
        RunScale s = r.runScale();
        if (!r.mobilityKnown() || s.status() == RunScale.Status.OFF) {
            return "none";
        }
        if (!s.fitted()) {
            return "not fitted (" + NumberText.fixed(s.anchors(), 1, MISSING) + " peaks matched, 2 needed)";
        }
        return "a = " + NumberText.fixed(s.factor(), 4, MISSING) + " ± " + NumberText.fixed(s.factorSd(), 4, MISSING)
                + ", b = " + NumberText.signed(s.offset(), 2, MISSING) + " ± " + NumberText.fixed(s.offsetSd(), 2, MISSING)
                + " (from " + NumberText.fixed(s.anchors(), 1, MISSING) + " matched peaks)";
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
        return "a = " + NumberText.fixed(s.factor(), 4, MISSING) + ", b = " + NumberText.signed(s.offset(), 2, MISSING);
    }
}
