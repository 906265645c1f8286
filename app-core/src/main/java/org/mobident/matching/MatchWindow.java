package org.mobident.matching;

import org.apache.commons.math3.distribution.TDistribution;
import org.apache.commons.math3.special.Erf;
import org.mobident.library.LibraryEntry;
import org.mobident.settings.MatchSettings;

/**
 * The one definition of a library entry's match window: a peak is a candidate for an entry only
 * when its mobility, as compared with the library (converted to the entry's temperature and
 * corrected for the run's scale), lies within ± {@link #halfWidth} of the entry's mobility. The
 * matcher applies exactly this; plots, the viewer, {@code library check} and {@code recheck} draw
 * and print exactly this. The window is a filter, not part of the probability model: inside it
 * the likelihood is unchanged.
 *
 * <p>Rules, in order:
 * <ol>
 *   <li>the entry's own {@code tolerance}, when the library gives one;</li>
 *   <li>{@link MatchSettings.WindowRule#ABSOLUTE}: the settings' fixed half-width;</li>
 *   <li>{@link MatchSettings.WindowRule#RELATIVE}: a fraction of |μ_entry|, at least the floor;</li>
 *   <li>{@link MatchSettings.WindowRule#SPREAD} (the default): a prediction interval,
 *       k·√v with v = the entry's predictive variance ({@link SpreadModel}) + the variance the run
 *       adds (the peak's own uncertainty and that of the run's scale correction), at least the
 *       floor. When part of v is a spread estimated from few runs, k is widened to the Student-t
 *       quantile of the same two-sided coverage, with the Welch–Satterthwaite degrees of freedom
 *       ν = v² / [u²/ν_u] of that part u (JCGM 100:2008, GUM, G.4.1), at most
 *       {@value #MAX_T_WIDENING} × k.</li>
 * </ol>
 */
public final class MatchWindow {

    /** Degrees of freedom beyond which Student's t is replaced by the normal (they differ by &lt; 0.1 %). */
    static final double NORMAL_DF = 1000.0;

    /**
     * Largest widening of the spread window for spreads from few runs (a modelling choice: with
     * n = 2 the t quantile would be ~80 × k and make nearly every entry a candidate).
     */
    static final double MAX_T_WIDENING = 3.0;

    private MatchWindow() {
    }

    /**
     * The half-width of entry {@code j}'s window, mobility units.
     *
     * @param entry         the entry (its tolerance and mobility)
     * @param spread        the library's spread model, whose entry {@code j} is {@code entry}
     * @param j             the entry's index in the spread model
     * @param extraVariance variance the run adds: the peak's own (0 for a window drawn without a
     *                      peak) plus the run's scale correction ({@link RunScale#varianceAt}),
     *                      (mobility units)²
     * @param s             the settings
     */
    public static double halfWidth(LibraryEntry entry, SpreadModel spread, int j, double extraVariance,
                                   MatchSettings s) {
        if (Double.isFinite(entry.tolerance()) && entry.tolerance() > 0) {
            return entry.tolerance();
        }
        switch (s.windowRule()) {
            case ABSOLUTE:
                return s.windowValue();
            case RELATIVE:
                return Math.max(s.windowValue() * Math.abs(entry.mobility()), s.minimumWindow());
            default:
                double v = spread.predictiveVariance(j) + extraVariance;
                double df = combinedDf(v, spread.estimatedVariance(j), spread.degreesOfFreedom(j));
                double k = spread.coverageFactor(s.windowValue(), df);
                return Math.max(k * Math.sqrt(v), s.minimumWindow());
        }
    }

    /**
     * The half-width applied to each entry of {@code library} for a peak measured without
     * uncertainty, as identification applies it: an entry labelled with a buffer is judged with the
     * spreads of that buffer's entries (the ones a run in that buffer is matched against), an
     * unlabelled one with those of the whole library.
     */
    public static double[] halfWidths(org.mobident.library.Library library, MatchSettings s) {
        java.util.Map<String, SpreadModel> byBuffer = new java.util.HashMap<>();
        SpreadModel all = SpreadModel.of(library, s);
        double[] w = new double[library.size()];
        for (int j = 0; j < w.length; j++) {
            LibraryEntry e = library.entries().get(j);
            if (e.buffer() == null || library.bufferLabels().size() <= 1) {
                w[j] = halfWidth(e, all, j, 0.0, s);
                continue;
            }
            org.mobident.library.Library mine = library.forBuffer(e.buffer());
            SpreadModel spread = byBuffer.computeIfAbsent(e.buffer().trim().toLowerCase(java.util.Locale.ROOT),
                    k -> SpreadModel.of(mine, s));
            w[j] = halfWidth(e, spread, mine.entries().indexOf(e), 0.0, s);
        }
        return w;
    }

    /**
     * Welch–Satterthwaite degrees of freedom of a variance {@code total} of which only
     * {@code estimated} (with {@code df} degrees of freedom) is an estimate; infinite when nothing is.
     */
    static double combinedDf(double total, double estimated, double df) {
        if (!(estimated > 0) || !(df < NORMAL_DF)) {
            return Double.POSITIVE_INFINITY;
        }
        return total * total / (estimated * estimated / df);
    }

    /**
     * The multiple of the combined standard uncertainty with the same two-sided coverage under
     * Student's t with {@code df} degrees of freedom (rounded down, so never narrower) as k has
     * under the normal distribution, at most {@value #MAX_T_WIDENING} × k.
     */
    public static double coverageFactor(double k, double df) {
        if (!(df < NORMAL_DF)) {
            return k;
        }
        double upper = 1.0 - 0.5 * Erf.erfc(k / Math.sqrt(2.0));
        double t = new TDistribution(null, Math.max(1.0, Math.floor(df))).inverseCumulativeProbability(upper);
        return Math.min(t, MAX_T_WIDENING * k);
    }
}
