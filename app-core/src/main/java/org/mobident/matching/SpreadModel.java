package org.mobident.matching;

import java.util.ArrayList;
import java.util.List;
import org.apache.commons.math3.analysis.UnivariateFunction;
import org.apache.commons.math3.analysis.solvers.BrentSolver;
import org.apache.commons.math3.special.Gamma;
import org.mobident.library.Library;
import org.mobident.library.LibraryEntry;
import org.mobident.settings.MatchSettings;

/**
 * How far a new run's mobility of each library analyte may lie from the library value: the
 * variance of a new observation about the library mean, with its degrees of freedom. Computed once
 * per library; immutable.
 *
 * <h2>Replicate spread, moderated</h2>
 * A spread from three or four standards runs is itself very uncertain (its 95 % interval spans a
 * factor of about six for n = 3). The spreads of all analytes of a library are therefore pooled as
 * relative spreads (RSD, since run-to-run errors of μ_eff grow with |μ|) and each analyte's spread
 * is drawn towards the pooled value by empirical-Bayes moderation (Smyth, Stat. Appl. Genet. Mol.
 * Biol. 3 (2004) art. 3, eq. for the posterior variance):
 * <pre>  s̃_j² = (d₀·s₀²·μ_j² + d_j·s_j²) / (d₀ + d_j),   degrees of freedom d₀ + d_j,</pre>
 * with d_j = n_j − 1. The prior RSD s₀ and its degrees of freedom d₀ are estimated from the
 * spreads themselves by Smyth's moment method on log variances (sect. 6.2 of the paper: the mean
 * and variance of log s_j² − ψ(d_j/2) + ln(d_j/2) give ψ′(d₀/2) and s₀²). With fewer than
 * {@value #MIN_ENTRIES_FOR_PRIOR_DF} analytes that method is too noisy and d₀ is fixed at
 * {@value #DEFAULT_PRIOR_DF}; with fewer than {@value #MIN_ENTRIES_FOR_POOLING} no pooling is done. An analyte
 * without a spread takes the pooled RSD (d₀ degrees of freedom), or {@link MatchSettings#assumedEntrySd()}
 * when nothing can be pooled.
 *
 * <h2>A new observation</h2>
 * The variance of one new run's value about a mean of n earlier ones is s̃²·(1 + 1/n) (the
 * prediction interval for a new observation, e.g. Montgomery &amp; Runger, Applied Statistics and
 * Probability for Engineers, sect. 8.4). Samples are measured on other days than the standards,
 * so a between-session spread is added: the analyte's own {@code session_sd} when the library
 * learned one from pooled sessions, else the pooled between-session RSD of the analytes that
 * have one, else {@link MatchSettings#sessionRsd()}. Finally {@link MatchSettings#sdFloor()} is
 * added in quadrature (rounding of tabulated values).
 */
public final class SpreadModel {

    /** Fewest analytes with a replicate spread for pooling at all. */
    static final int MIN_ENTRIES_FOR_POOLING = 3;
    /** Fewest analytes with a replicate spread for estimating the prior degrees of freedom. */
    static final int MIN_ENTRIES_FOR_PRIOR_DF = 8;
    /** Prior degrees of freedom when they cannot be estimated (a modelling choice: worth 5 runs). */
    static final double DEFAULT_PRIOR_DF = 4.0;
    /** Largest prior degrees of freedom kept finite; beyond it the spreads count as known exactly. */
    static final double MAX_PRIOR_DF = 1000.0;
    /** Smallest |μ| used to turn a spread into an RSD, mobility units (keeps near-neutral analytes finite). */
    static final double MIN_MOBILITY_FOR_RSD = 10.0;

    /** Coverage factors of the window rule's k per whole number of degrees of freedom, filled as needed. */
    private final java.util.concurrent.ConcurrentHashMap<Long, Double> coverage = new java.util.concurrent.ConcurrentHashMap<>();
    private final double[] predictiveVariance;
    private final double[] replicateVariance;
    private final double[] df;
    private final double priorRsd;
    private final double priorDf;
    private final double sessionRsd;
    private final int pooled;

    private SpreadModel(double[] predictiveVariance, double[] replicateVariance, double[] df, double priorRsd,
                        double priorDf, double sessionRsd, int pooled) {
        this.predictiveVariance = predictiveVariance;
        this.replicateVariance = replicateVariance;
        this.df = df;
        this.priorRsd = priorRsd;
        this.priorDf = priorDf;
        this.sessionRsd = sessionRsd;
        this.pooled = pooled;
    }

    /** The model of {@code library}'s entries (in its order) under {@code settings}. */
    public static SpreadModel of(Library library, MatchSettings settings) {
        return of(library.entries(), settings);
    }

    /** The model of {@code entries} (in that order) under {@code settings}. */
    public static SpreadModel of(List<LibraryEntry> entries, MatchSettings settings) {
        List<double[]> sample = new ArrayList<>();
        for (LibraryEntry e : entries) {
            if (Double.isFinite(e.mobilitySd()) && e.mobilitySd() > 0 && e.n() >= 2) {
                double scale = rsdScale(e);
                double rel = e.mobilitySd() / scale;
                sample.add(new double[] {rel * rel, e.n() - 1});
            }
        }
        double s0sq = Double.NaN;
        double d0 = 0.0;
        if (sample.size() >= MIN_ENTRIES_FOR_POOLING) {
            double[] prior = sample.size() >= MIN_ENTRIES_FOR_PRIOR_DF ? smythPrior(sample) : null;
            if (prior != null) {
                s0sq = prior[0];
                d0 = prior[1];
            } else {
                s0sq = pooledVariance(sample);
                d0 = DEFAULT_PRIOR_DF;
            }
        }
        double session = pooledSessionRsd(entries, settings);
        int m = entries.size();
        double[] pred = new double[m];
        double[] rep = new double[m];
        double[] dfs = new double[m];
        double floor2 = settings.sdFloor() * settings.sdFloor();
        for (int j = 0; j < m; j++) {
            LibraryEntry e = entries.get(j);
            double scale = rsdScale(e);
            double variance;
            double dof;
            boolean own = Double.isFinite(e.mobilitySd()) && e.mobilitySd() >= 0;
            if (own && e.n() >= 2 && Double.isFinite(s0sq)) {
                double dj = e.n() - 1.0;
                if (d0 >= MAX_PRIOR_DF) {
                    variance = s0sq * scale * scale;
                    dof = Double.POSITIVE_INFINITY;
                } else {
                    variance = (d0 * s0sq * scale * scale + dj * e.mobilitySd() * e.mobilitySd()) / (d0 + dj);
                    dof = d0 + dj;
                }
            } else if (own && e.n() >= 2) {
                variance = e.mobilitySd() * e.mobilitySd();
                dof = e.n() - 1.0;
            } else if (own) {
                // a spread stated without n (or from one run): taken as known
                variance = e.mobilitySd() * e.mobilitySd();
                dof = Double.POSITIVE_INFINITY;
            } else if (Double.isFinite(s0sq)) {
                variance = s0sq * scale * scale;
                dof = d0 >= MAX_PRIOR_DF ? Double.POSITIVE_INFINITY : d0;
            } else {
                variance = settings.assumedEntrySd() * settings.assumedEntrySd();
                dof = Double.POSITIVE_INFINITY;
            }
            double factor = e.n() > 0 ? 1.0 + 1.0 / e.n() : 1.0;
            double sessionSd = Double.isFinite(e.sessionSd()) ? e.sessionSd() : session * Math.abs(e.mobility());
            rep[j] = variance * factor;
            pred[j] = rep[j] + sessionSd * sessionSd + floor2;
            dfs[j] = dof;
        }
        return new SpreadModel(pred, rep, dfs, Double.isFinite(s0sq) ? Math.sqrt(s0sq) : Double.NaN,
                Double.isFinite(s0sq) ? d0 : Double.NaN, session, sample.size());
    }

    /**
     * Variance of a new run's value of entry {@code j} about the library value, (mobility units)²:
     * moderated replicate part × (1 + 1/n), between-session part and the floor.
     */
    public double predictiveVariance(int j) {
        return predictiveVariance[j];
    }

    /**
     * Degrees of freedom of the estimated part of {@link #predictiveVariance}, for the
     * Welch–Satterthwaite combination (infinite when nothing is estimated from few runs).
     */
    public double degreesOfFreedom(int j) {
        return df[j];
    }

    /** The estimated (replicate) part of {@link #predictiveVariance}, (mobility units)². */
    public double estimatedVariance(int j) {
        return replicateVariance[j];
    }

    /**
     * {@link MatchWindow#coverageFactor}(k, df), remembered for this library (thread-safe): the
     * Student-t quantile is costly and the same few degrees of freedom recur in every run.
     */
    double coverageFactor(double k, double df) {
        if (!(df < MatchWindow.NORMAL_DF)) {
            return k;
        }
        int d = (int) Math.max(1.0, Math.floor(df));
        long key = ((long) Double.hashCode(k) << 32) ^ d;
        return coverage.computeIfAbsent(key, x -> MatchWindow.coverageFactor(k, d));
    }

    /** Pooled replicate RSD (a fraction) the spreads were drawn towards; NaN when nothing was pooled. */
    public double pooledRsd() {
        return priorRsd;
    }

    /** Prior degrees of freedom of the pooled RSD; NaN when nothing was pooled. */
    public double pooledDf() {
        return priorDf;
    }

    /** The between-session RSD applied to analytes without their own {@code session_sd}. */
    public double sessionRsd() {
        return sessionRsd;
    }

    /** Number of analytes whose replicate spreads were pooled. */
    public int pooledCount() {
        return pooled;
    }

    private static double rsdScale(LibraryEntry e) {
        return Math.max(Math.abs(e.mobility()), MIN_MOBILITY_FOR_RSD);
    }

    /** df-weighted mean of the relative variances. */
    private static double pooledVariance(List<double[]> sample) {
        double num = 0;
        double den = 0;
        for (double[] s : sample) {
            num += s[1] * s[0];
            den += s[1];
        }
        return num / den;
    }

    /**
     * Smyth's (2004, sect. 6.2) moment estimates {s₀², d₀} from variances s_g² with d_g degrees of
     * freedom; d₀ is {@link #MAX_PRIOR_DF} when the observed scatter of the log variances is no
     * larger than sampling alone explains. Null when the estimate cannot be formed.
     */
    static double[] smythPrior(List<double[]> sample) {
        int g = sample.size();
        double[] e = new double[g];
        double mean = 0;
        double meanTrigamma = 0;
        for (int k = 0; k < g; k++) {
            double s2 = sample.get(k)[0];
            double d = sample.get(k)[1];
            if (!(s2 > 0)) {
                return null;
            }
            e[k] = Math.log(s2) - Gamma.digamma(d / 2) + Math.log(d / 2);
            mean += e[k];
            meanTrigamma += Gamma.trigamma(d / 2);
        }
        mean /= g;
        meanTrigamma /= g;
        double var = 0;
        for (double v : e) {
            var += (v - mean) * (v - mean);
        }
        var /= g - 1;
        double target = var - meanTrigamma;
        if (!(target > 0)) {
            return new double[] {Math.exp(mean), MAX_PRIOR_DF};
        }
        double half = inverseTrigamma(target);
        double d0 = Math.min(2 * half, MAX_PRIOR_DF);
        double s0sq = Math.exp(mean + Gamma.digamma(d0 / 2) - Math.log(d0 / 2));
        return new double[] {s0sq, d0};
    }

    /** The y &gt; 0 with ψ′(y) = x (ψ′ decreases from +∞ to 0), by Brent's method. */
    static double inverseTrigamma(double x) {
        UnivariateFunction f = y -> Gamma.trigamma(y) - x;
        // ψ′(y) ≈ 1/y + 1/(2y²) for large y and ≈ 1/y² for small y: bracket generously around 1/x.
        double lo = 1e-8;
        double hi = Math.max(10.0, 10.0 / x);
        while (f.value(hi) > 0) {
            hi *= 10;
        }
        return new BrentSolver(1e-12, 1e-10).solve(1000, f, lo, hi);
    }

    /**
     * Between-session RSD: the root mean square of the analytes' own session_sd/|μ| when any
     * carries one, else the settings' default.
     */
    private static double pooledSessionRsd(List<LibraryEntry> entries, MatchSettings settings) {
        double sum = 0;
        int count = 0;
        for (LibraryEntry e : entries) {
            if (Double.isFinite(e.sessionSd())) {
                double rel = e.sessionSd() / rsdScale(e);
                sum += rel * rel;
                count++;
            }
        }
        return count > 0 ? Math.sqrt(sum / count) : settings.sessionRsd();
    }
}
