package org.mobident.pipeline;

import java.util.Locale;
import org.mobident.matching.RunMatch;
import org.mobident.mobility.MobilityMath;
import org.mobident.result.RunScale;
import org.mobident.settings.MatchSettings;

/** The sentences a run's notes carry about its scale correction and about a likely wrong voltage sign. */
final class ScaleNotes {

    /** Temperature offsets searched when a scale factor is put into kelvin, K (beyond: not said). */
    static final double MAX_EQUIVALENT_K = 10.0;
    /** Resolution of that search, K. */
    static final double EQUIVALENT_RESOLUTION_K = 1e-3;
    /** A scale factor closer to 1 than this is not put into kelvin. */
    static final double NEGLIGIBLE_FACTOR = 0.002;
    /** The opposite voltage sign is suggested when it lets the library explain this many more peaks. */
    static final double SIGN_HINT_GAIN = 1.5;
    /** Fewest analyte peaks for a voltage-sign hint (one peak says nothing about a sign). */
    static final int MIN_PEAKS_FOR_SIGN_HINT = 2;

    private ScaleNotes() {
    }

    static String describe(RunScale scale, int modes, double libraryTempC, MatchSettings ms) {
        if (scale.status() == RunScale.Status.OFF) {
            return "run scale taken as stated (scale correction switched off)";
        }
        if (!scale.fitted()) {
            return String.format(Locale.ROOT, "run scale not corrected: only %.1f peak(s) matched, 2 are needed; the "
                            + "stated conditions are taken with an uncertainty of ±%.1f %% in scale and ±%.2f units in "
                            + "offset, which widens every match", scale.anchors(),
                    100 * ms.scalePrior().factorSd(), ms.scalePrior().offsetSd());
        }
        String kelvin = "";
        if (Math.abs(scale.factor() - 1.0) >= NEGLIGIBLE_FACTOR) {
            double dt = equivalentKelvin(scale.factor(), libraryTempC);
            if (Double.isFinite(dt)) {
                kelvin = String.format(Locale.ROOT, "; as if the capillary ran %.1f K %s than stated (or the field "
                        + "differed by %+.1f %%)", Math.abs(dt), dt > 0 ? "warmer" : "cooler", 100 * (scale.factor() - 1));
            }
        }
        String multi = modes > 1 ? String.format(Locale.ROOT, "; the peaks fit the library in %d ways, and the "
                + "confidences weigh them all", modes) : "";
        return String.format(Locale.ROOT, "run scale corrected from %.1f matched peaks: mobilities compared with the "
                        + "library are (μ − b)/a with a = %.4f ± %.4f, b = %+.2f ± %.2f%s%s", scale.anchors(),
                scale.factor(), scale.factorSd(), scale.offset(), scale.offsetSd(), kelvin, multi);
    }

    /**
     * The capillary temperature offset ΔT for which the viscosity of water (IAPWS 2008) scales
     * mobilities by {@code factor}: a = η(T)/η(T + ΔT); NaN beyond ±{@value #MAX_EQUIVALENT_K} K.
     */
    static double equivalentKelvin(double factor, double temperatureC) {
        double lo = -MAX_EQUIVALENT_K;
        double hi = MAX_EQUIVALENT_K;
        if (ratio(lo, temperatureC) > factor || ratio(hi, temperatureC) < factor) {
            return Double.NaN;
        }
        while (hi - lo > EQUIVALENT_RESOLUTION_K) {
            double mid = 0.5 * (lo + hi);
            if (ratio(mid, temperatureC) < factor) {
                lo = mid;
            } else {
                hi = mid;
            }
        }
        return 0.5 * (lo + hi);
    }

    private static double ratio(double offsetK, double temperatureC) {
        return MobilityMath.atTemperature(1.0, temperatureC, temperatureC + offsetK);
    }

    /**
     * A hint when the library explains the run's peaks far better with every mobility mirrored (the
     * voltage sign typed the wrong way round); null otherwise.
     */
    static String voltageSignHint(MarkerLocator.Hypothesis best, RunMatch match, MarkerLocator.Evaluator evaluator) {
        int n = best.analytes().length;
        if (evaluator == null || n < MIN_PEAKS_FOR_SIGN_HINT || match.explainedPeaks() >= MarkerLocator.WELL_EXPLAINED_SHARE * n) {
            return null;
        }
        double[] mirrored = new double[n];
        for (int k = 0; k < n; k++) {
            mirrored[k] = -best.mobility()[k];
        }
        RunMatch other = evaluator.match(mirrored, best.mobilitySd(), best.mobilityUsualSd());
        if (other.explainedPeaks() >= match.explainedPeaks() + SIGN_HINT_GAIN && other.explainedPeaks() >= MarkerLocator.WELL_EXPLAINED_SHARE * n) {
            return String.format(Locale.ROOT, "the library explains %.1f of %d peaks as measured but %.1f with the "
                    + "opposite voltage sign: check the sign of voltage_kv (negative when the inlet is at the "
                    + "negative potential)", match.explainedPeaks(), n, other.explainedPeaks());
        }
        return null;
    }
}
