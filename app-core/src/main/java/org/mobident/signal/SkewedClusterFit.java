package org.mobident.signal;

import java.util.ArrayList;
import java.util.List;
import org.apache.commons.math3.fitting.leastsquares.MultivariateJacobianFunction;
import org.apache.commons.math3.fitting.leastsquares.ParameterValidator;
import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.ArrayRealVector;
import org.apache.commons.math3.linear.SingularMatrixException;
import org.apache.commons.math3.util.Pair;

/**
 * Least-squares fit of a sum of skewed zones to one cluster: K zones of one form
 * ({@link ZoneForm}: exponentially modified Gaussians, Grushka, Anal. Chem. 44 (1972) 1733, or
 * triangles smoothed by diffusion) that share their Gaussian SD σ, their form and their skew
 * direction, each with its own area A_k, sharp-side position μ_k and size a_k (the distance from
 * its sharp side to its first moment: the EMG's |τ_k|, a third of the triangle's base).
 *
 * <p><b>Why.</b> Two analytes one or two per cent apart in mobility, one of them concentrated, give
 * two zones whose diffuse flanks (electromigration dispersion: Mikkers, Everaerts &amp; Verheggen,
 * J. Chromatogr. 169 (1979) 1) run into each other. A sum of Gaussians follows such a pair with
 * zones at the wrong places, and the moments of the samples on either side of the valley mix the
 * two zones; the sum of skewed zones recovers each zone and its first moment μ_k + τ_k (Grushka
 * 1972), the time that belongs to its mobility.
 *
 * <p><b>Model.</b> {@code f(t) = Σ_k A_k g(s(t − μ_k); σ, a_k)} with g the unit-area form of {@link
 * ZoneForm} and s = ±1 the common direction (tailing +1, fronting −1; both directions and both
 * forms are fitted; of each form the fit that places every zone with the smallest residual, and the
 * EMGs unless the triangles are clearly better, as {@link #fit(double[], double[], int, int,
 * double[], double, double, double, double)} says: a sum of EMGs follows a triangle's straight
 * flank with its zones misplaced, a sum of triangles an EMG's convex one): zones one or two per cent apart
 * sit on the same side of the background co-ion's mobility, so their dispersion has the same
 * direction. The zones are close in time, so diffusion gives them the same σ (a modelling choice
 * that takes a parameter per extra zone away). Parameters by Levenberg–Marquardt (Apache Commons
 * Math) with the analytic Jacobian of {@link ZoneForm}; a_k is kept at least {@link
 * SkewedZoneFit#MIN_TAU_FRACTION} of the starting σ.
 *
 * <p><b>Uncertainty.</b> s²(JᵀJ)⁻¹ at the optimum with s² = RSS/(n − p) (Bates &amp; Watts 1988
 * §2.3; from memory); the centre's variance is Var(μ) + Var(a) + 2s·Cov(μ, a).
 */
final class SkewedClusterFit {

    /** Up to this many zones, every owner of the long flank is tried as a start (2^K starts). */
    private static final int MAX_ZONES_FOR_ALL_STARTS = 3;
    /** τ of a zone started as nearly symmetric, as a fraction of the starting σ. */
    private static final double SMALL_TAU_FRACTION = 0.5;
    /** Caps of one fit. */
    private static final int MAX_EVALUATIONS = 1500;
    private static final int MAX_ITERATIONS = 300;
    /** Steps per σ of the search for a zone's apex and half-height points. */
    private static final int STEPS_PER_SIGMA = 8;
    /** Bisection steps for a crossing (2⁻⁴⁰ of the bracket). */
    private static final int BISECTION_STEPS = 40;

    /**
     * One fitted skewed zone.
     *
     * @param areaTimesS A, signal units × s
     * @param centreS    μ, the Gaussian part's centre, s
     * @param sigmaS     σ, s
     * @param tauS       τ, s, signed (negative: fronting)
     * @param firstMomentSdS standard uncertainty of μ + τ, s
     * @param centreSdS  standard uncertainty of μ, s
     */
    record Zone(double areaTimesS, double centreS, double sigmaS, double tauS, double firstMomentSdS,
                double centreSdS, ZoneForm form) {

        /** The first moment μ + τ (Grushka 1972), s. */
        double firstMomentS() {
            return centreS + tauS;
        }

        /** The zone's value at a time. */
        double value(double timeS) {
            return areaTimesS * form.value(Math.signum(tauS) * (timeS - centreS), sigmaS, Math.abs(tauS));
        }

        /** The time of the zone's maximum (between μ and the first moment for an EMG), s. */
        double apexTimeS() {
            double s = Math.signum(tauS);
            double step = sigmaS / STEPS_PER_SIGMA;
            double reach = Math.min(Math.abs(tauS), 3 * sigmaS) + sigmaS;
            double best = centreS;
            double bestValue = value(centreS);
            for (double x = -sigmaS; x <= reach; x += step) {
                double time = centreS + s * x;
                double v = value(time);
                if (v > bestValue) {
                    bestValue = v;
                    best = time;
                }
            }
            // parabola through the best grid point and its neighbours
            double l = value(best - step);
            double r = value(best + step);
            double denominator = l - 2 * bestValue + r;
            if (denominator < 0) {
                double shift = 0.5 * (l - r) / denominator;
                if (Math.abs(shift) <= 1) {
                    best += shift * step;
                }
            }
            return best;
        }

        /**
         * True when the fit places the zone's first moment to better than its own width at half
         * height: a component the fit cannot place within its width is not a resolved zone (two
         * components sharing one dispersed zone get SDs of seconds to minutes).
         */
        boolean placed() {
            return firstMomentSdS < widthHalfS();
        }

        /** The zone's full width at half its maximum, s. */
        double widthHalfS() {
            double apex = apexTimeS();
            double half = 0.5 * value(apex);
            return crossing(apex, half, +1) - crossing(apex, half, -1);
        }

        private double crossing(double apex, double level, int direction) {
            double step = sigmaS / 2;
            double inside = apex;
            double outside = apex + direction * step;
            int guard = 0;
            while (value(outside) > level && guard++ < 10_000) {
                inside = outside;
                outside += direction * step;
            }
            for (int k = 0; k < BISECTION_STEPS; k++) {
                double mid = 0.5 * (inside + outside);
                if (value(mid) > level) {
                    inside = mid;
                } else {
                    outside = mid;
                }
            }
            return 0.5 * (inside + outside);
        }
    }

    /**
     * A converged fit.
     *
     * @param zones                zones in order of first moment
     * @param residualSumOfSquares RSS, signal units²
     * @param points               samples fitted
     * @param fixedShapes          zones whose size a was held, not fitted
     */
    record Result(List<Zone> zones, double residualSumOfSquares, int points, int fixedShapes) {
        Result {
            zones = List.copyOf(zones);
        }

        /** Fitted parameters: σ, and A, μ and a of each zone (a only where its shape is not held). */
        int parameters() {
            return 1 + 3 * zones.size() - fixedShapes;
        }

        /** True when every zone is placed to better than its width ({@link Zone#placed()}). */
        boolean allPlaced() {
            for (Zone z : zones) {
                if (!z.placed()) {
                    return false;
                }
            }
            return true;
        }

        /** Where zone k+1 starts to dominate zone k: the crossing of their values between their apexes. */
        double dominanceBoundaryS(int k) {
            Zone a = zones.get(k);
            Zone b = zones.get(k + 1);
            double lo = a.apexTimeS();
            double hi = b.apexTimeS();
            if (!(hi > lo)) {
                return 0.5 * (a.firstMomentS() + b.firstMomentS());
            }
            if (a.value(lo) - b.value(lo) <= 0 || a.value(hi) - b.value(hi) >= 0) {
                return lo + (hi - lo) * a.sigmaS() / (a.sigmaS() + b.sigmaS());
            }
            for (int i = 0; i < BISECTION_STEPS; i++) {
                double mid = 0.5 * (lo + hi);
                if (a.value(mid) > b.value(mid)) {
                    lo = mid;
                } else {
                    hi = mid;
                }
            }
            return 0.5 * (lo + hi);
        }
    }

    private SkewedClusterFit() {
    }

    /**
     * Fits {@code startApexS.length} skewed zones to {@code v[first..last]}.
     *
     * @param t           sample times, s
     * @param v           baseline-corrected signal, peaks up
     * @param first       first sample (inclusive)
     * @param last        last sample (inclusive)
     * @param startApexS  starting apex times, one per zone, increasing
     * @param startSigmaS starting σ, s
     * @param minSigmaS   least σ, s (&gt; 0)
     * @param maxSigmaS   largest σ, s
     * @return the fit, or null when the samples show no skew, are too few, or the fit fails
     */
    static Result fit(double[] t, double[] v, int first, int last, double[] startApexS, double startSigmaS,
                      double minSigmaS, double maxSigmaS) {
        return fit(t, v, first, last, startApexS, startSigmaS, minSigmaS, maxSigmaS, Double.NaN);
    }

    /**
     * As {@link #fit(double[], double[], int, int, double[], double, double, double)}, knowing the
     * noise SD of the samples. The zones are taken as smoothed triangles only when the triangles
     * lower n·ln(RSS) by {@link SignalLimits#TRIANGLE_FORM_MIN_GAIN}, place every zone if the EMGs
     * do, and either explain the cluster down to the noise (residual variance at most
     * {@link SignalLimits#SKEWED_CLUSTER_MISFIT_RATIO} times the noise variance) or leave at most
     * 1/{@link SignalLimits#TRIANGLE_FORM_MIN_RSS_RATIO} of the EMGs' residual. Where neither form
     * comes near the noise, the zones have some third form, and the EMG, the form the detector was
     * first built and checked with, stays: a sum of triangles, more flexible on a straight flank,
     * was seen to fit such a pair better with its zones in the wrong places.
     *
     * @param noiseSd SD of the noise of {@code v}; NaN when not known
     */
    static Result fit(double[] t, double[] v, int first, int last, double[] startApexS, double startSigmaS,
                      double minSigmaS, double maxSigmaS, double noiseSd) {
        return fit(t, v, first, last, startApexS, startSigmaS, minSigmaS, maxSigmaS, noiseSd, 0);
    }

    /**
     * As {@link #fit(double[], double[], int, int, double[], double, double, double, double)}, in one
     * skew direction only when {@code direction} is +1 (tailing) or −1 (fronting), in both when 0.
     */
    static Result fit(double[] t, double[] v, int first, int last, double[] startApexS, double startSigmaS,
                      double minSigmaS, double maxSigmaS, double noiseSd, int direction) {
        return fit(t, v, first, last, startApexS, startSigmaS, minSigmaS, maxSigmaS, noiseSd, direction,
                new boolean[startApexS.length]);
    }

    /**
     * As {@link #fit(double[], double[], int, int, double[], double, double, double, double, int)},
     * with the zones marked in {@code nearlySymmetric} held at the least size a (nearly Gaussian):
     * a dilute zone is hardly dispersed by electromigration, and a free size lets a small zone
     * behind a tall one take over the tall zone's flank, which moves its first moment far from its
     * own top.
     */
    static Result fit(double[] t, double[] v, int first, int last, double[] startApexS, double startSigmaS,
                      double minSigmaS, double maxSigmaS, double noiseSd, int direction, boolean[] nearlySymmetric) {
        int k = startApexS.length;
        int n = last - first + 1;
        int parameters = 1 + 3 * k;
        if (k == 0 || n <= parameters + 1) {
            return null;
        }
        double ref = t[first];
        double span = t[last] - ref;
        double[] u = new double[n];
        double[] target = new double[n];
        double[] w = new double[n];
        double area = 0;
        for (int i = 0; i < n; i++) {
            u[i] = t[first + i] - ref;
            target[i] = v[first + i];
        }
        for (int i = 0; i < n; i++) {
            double left = i > 0 ? u[i] - u[i - 1] : 0;
            double right = i < n - 1 ? u[i + 1] - u[i] : 0;
            w[i] = 0.5 * (left + right) * Math.max(0.0, target[i]);
            area += w[i];
        }
        if (!(area > 0)) {
            return null;
        }
        boolean tailing = direction >= 0;
        boolean fronting = direction <= 0;
        Result emg = better(
                tailing ? fit(u, target, w, area, ref, span, +1, ZoneForm.EXPONENTIAL, startApexS, startSigmaS,
                        minSigmaS, maxSigmaS, nearlySymmetric) : null,
                fronting ? fit(u, target, w, area, ref, span, -1, ZoneForm.EXPONENTIAL, startApexS, startSigmaS,
                        minSigmaS, maxSigmaS, nearlySymmetric) : null);
        Result triangle = better(
                tailing ? fit(u, target, w, area, ref, span, +1, ZoneForm.TRIANGLE, startApexS, startSigmaS,
                        minSigmaS, maxSigmaS, nearlySymmetric) : null,
                fronting ? fit(u, target, w, area, ref, span, -1, ZoneForm.TRIANGLE, startApexS, startSigmaS,
                        minSigmaS, maxSigmaS, nearlySymmetric) : null);
        if (emg == null || triangle == null) {
            return emg == null ? triangle : emg;
        }
        // the EMG stays the form unless triangles fit clearly better (SkewedZoneFit.clearlyBetter),
        // place every zone as well, and fit down to the noise
        double rssTriangle = triangle.residualSumOfSquares();
        double rssEmg = emg.residualSumOfSquares();
        double noiseVariance = noiseSd * noiseSd;
        boolean adequate = Double.isNaN(noiseSd)
                || rssTriangle / (n - triangle.parameters()) <= SignalLimits.SKEWED_CLUSTER_MISFIT_RATIO * noiseVariance
                || rssEmg >= SignalLimits.TRIANGLE_FORM_MIN_RSS_RATIO * rssTriangle;
        return adequate && SkewedZoneFit.clearlyBetter(rssTriangle, rssEmg, n)
                && (triangle.allPlaced() || !emg.allPlaced()) ? triangle : emg;
    }

    /** Of two fits (either may be null), the one that places every zone, else the smaller residual. */
    private static Result better(Result a, Result b) {
        if (a == null || b == null) {
            return a == null ? b : a;
        }
        if (a.allPlaced() != b.allPlaced()) {
            return a.allPlaced() ? a : b;
        }
        return a.residualSumOfSquares() <= b.residualSumOfSquares() ? a : b;
    }

    /** One fit with the skew direction {@code sign} (+1 tailing, −1 fronting) and one form; offsets u from
     *  {@code ref}. */
    private static Result fit(double[] u, double[] target, double[] w, double area, double ref, double span,
                              double sign, ZoneForm form, double[] startApexS, double startSigmaS, double minSigmaS,
                              double maxSigmaS, boolean[] nearlySymmetric) {
        int k = startApexS.length;
        int n = u.length;
        int parameters = 1 + 3 * k;
        double sigma0 = Math.min(maxSigmaS, Math.max(minSigmaS, startSigmaS));
        double minTau = SkewedZoneFit.MIN_TAU_FRACTION * sigma0;
        // two starts, the better fit kept: τ of each zone from the spread of the samples nearest to
        // its apex, and one common τ from the spread of the whole cluster (a long diffuse flank runs
        // under the neighbour's apex, where the nearest samples give it to the wrong zone); the
        // Gaussian centres at the apexes, the areas by linear least squares for those shapes
        double[] shareArea = new double[k];
        double[] shareMoment = new double[k];
        double moment = 0;
        int tallest = 0;
        for (int i = 0; i < n; i++) {
            int nearest = 0;
            for (int j = 1; j < k; j++) {
                if (Math.abs(u[i] - (startApexS[j] - ref)) < Math.abs(u[i] - (startApexS[nearest] - ref))) {
                    nearest = j;
                }
            }
            shareArea[nearest] += w[i];
            shareMoment[nearest] += w[i] * u[i];
            moment += w[i] * u[i];
            if (target[i] > target[tallest]) {
                tallest = i;
            }
        }
        double commonTau = Math.max(minTau, Math.min(span, Math.abs(moment / area - u[tallest])));
        double[] byShares = new double[parameters];
        double[] common = new double[parameters];
        byShares[0] = sigma0;
        common[0] = sigma0;
        for (int j = 0; j < k; j++) {
            double apex = Math.min(span, Math.max(0, startApexS[j] - ref));
            double centroid = shareArea[j] > 0 ? shareMoment[j] / shareArea[j] : apex;
            byShares[2 + 3 * j] = apex;
            byShares[3 + 3 * j] = nearlySymmetric[j] ? minTau : Math.max(minTau, Math.min(span, Math.abs(centroid - apex)));
            common[2 + 3 * j] = apex;
            common[3 + 3 * j] = nearlySymmetric[j] ? minTau : commonTau;
        }
        List<double[]> starts = new ArrayList<>();
        starts.add(byShares);
        starts.add(common);
        if (k <= MAX_ZONES_FOR_ALL_STARTS) {
            // every zone either nearly symmetric or with the common τ: the long flank belongs to one
            // of the zones, and a local search from the wrong owner does not find the right one
            // (an owner's τ reaches from its apex to the centre of the whole cluster)
            double centroid = moment / area;
            int held = 0;
            for (int j = 0; j < k; j++) {
                held |= nearlySymmetric[j] ? 1 << j : 0;
            }
            for (int mask = 1; mask < (1 << k); mask++) {
                if ((mask & held) != 0) {
                    continue; // a held zone keeps its least size in every start
                }
                double[] start = common.clone();
                for (int j = 0; j < k; j++) {
                    double owner = Math.max(minTau, Math.min(span, Math.abs(centroid - start[2 + 3 * j])));
                    start[3 + 3 * j] = nearlySymmetric[j] ? minTau
                            : (mask & (1 << j)) != 0 ? owner : Math.max(minTau, SMALL_TAU_FRACTION * sigma0);
                }
                starts.add(start);
            }
        }
        // the best fit among those that place every zone (a start that lets a zone wander onto its
        // neighbour's flank may fit the noise a little better while placing nothing); the best of
        // all only when none does
        Result best = null;
        Result bestPlaced = null;
        for (double[] start : starts) {
            if (!startAreas(u, target, sign, form, start, k, area)) {
                continue;
            }
            Result r = solve(u, target, ref, span, sign, form, start, k, area, minTau, minSigmaS, maxSigmaS,
                    startApexS, nearlySymmetric);
            if (r != null && (best == null || r.residualSumOfSquares() < best.residualSumOfSquares())) {
                best = r;
            }
            if (r != null && r.allPlaced()
                    && (bestPlaced == null || r.residualSumOfSquares() < bestPlaced.residualSumOfSquares())) {
                bestPlaced = r;
            }
        }
        return bestPlaced != null ? bestPlaced : best;
    }

    /** Sets the starting areas of {@code start} by linear least squares for its shapes, floored at a
     *  twentieth of the cluster's area; false when the shapes are not independent. */
    private static boolean startAreas(double[] u, double[] target, double sign, ZoneForm form, double[] start, int k,
                                      double area) {
        int n = u.length;
        double[][] x = new double[n][k];
        for (int i = 0; i < n; i++) {
            for (int j = 0; j < k; j++) {
                x[i][j] = form.value(sign * (u[i] - start[2 + 3 * j]), start[0], start[3 + 3 * j]);
            }
        }
        double[] a;
        try {
            a = new org.apache.commons.math3.linear.QRDecomposition(new Array2DRowRealMatrix(x, false)).getSolver()
                    .solve(new ArrayRealVector(target, false)).toArray();
        } catch (SingularMatrixException e) {
            return false;
        }
        for (int j = 0; j < k; j++) {
            start[1 + 3 * j] = Double.isFinite(a[j]) ? Math.max(a[j], 0.05 * area) : 0.05 * area;
        }
        return true;
    }

    /** Levenberg–Marquardt from one start; null when it fails. */
    private static Result solve(double[] u, double[] target, double ref, double span, double sign, ZoneForm form,
                                double[] start, int k, double area, double minTau, double minSigmaS,
                                double maxSigmaS, double[] startApexS, boolean[] nearlySymmetric) {
        int n = u.length;
        Layout layout = Layout.of(nearlySymmetric);
        int parameters = layout.size();
        double minArea = 1e-6 * area;
        // each zone's Gaussian centre (its sharp flank) stays between the midpoints to its neighbours'
        // starting apexes: a zone may change its shape, not take over a neighbour's top
        double[] lo = new double[k];
        double[] hi = new double[k];
        for (int j = 0; j < k; j++) {
            lo[j] = j == 0 ? 0 : Math.max(0, 0.5 * (startApexS[j - 1] + startApexS[j]) - ref);
            hi[j] = j == k - 1 ? span : Math.min(span, 0.5 * (startApexS[j] + startApexS[j + 1]) - ref);
        }
        ParameterValidator validator = p -> {
            double[] q = p.toArray();
            q[0] = Math.min(maxSigmaS, Math.max(minSigmaS, q[0]));
            for (int j = 0; j < k; j++) {
                int b = layout.areaIndex(j);
                q[b] = Math.max(minArea, q[b]);
                q[b + 1] = Math.min(hi[j], Math.max(lo[j], q[b + 1]));
                if (layout.shapeFree(j)) {
                    q[b + 2] = Math.min(span, Math.max(minTau, q[b + 2]));
                }
            }
            return new ArrayRealVector(q, false);
        };
        LevenbergMarquardt.Solution solution = LevenbergMarquardt.fit(layout.pack(start),
                model(u, k, sign, form, layout, minTau), target, validator, MAX_EVALUATIONS, MAX_ITERATIONS, true);
        if (solution == null) {
            return null;
        }
        double[] p = solution.point();
        double rss = solution.rss();
        double[][] covariance = solution.covariance();
        double residualVariance = rss / (n - parameters);
        List<Zone> zones = new ArrayList<>(k);
        for (int j = 0; j < k; j++) {
            int c = layout.areaIndex(j) + 1;
            int a = c + 1;
            boolean free = layout.shapeFree(j);
            double varCentre = covariance[c][c] * residualVariance;
            double varMoment = free ? (covariance[c][c] + covariance[a][a] + 2 * sign * covariance[c][a])
                    * residualVariance : varCentre;
            if (!(varCentre >= 0) || !(varMoment >= 0) || !Double.isFinite(p[c])) {
                return null;
            }
            zones.add(new Zone(p[c - 1], ref + p[c], p[0], sign * (free ? p[a] : minTau), Math.sqrt(varMoment),
                    Math.sqrt(varCentre), form));
        }
        zones.sort(java.util.Comparator.comparingDouble(Zone::firstMomentS));
        return new Result(zones, rss, n, layout.heldCount());
    }

    /**
     * Where each zone's parameters sit in the fitted vector: σ first, then per zone A, μ and, unless
     * the zone's shape is held at the least size, a.
     */
    private record Layout(int[] firstIndex, boolean[] fixed, int size) {

        static Layout of(boolean[] nearlySymmetric) {
            int k = nearlySymmetric.length;
            int[] index = new int[k];
            int next = 1;
            for (int j = 0; j < k; j++) {
                index[j] = next;
                next += nearlySymmetric[j] ? 2 : 3;
            }
            return new Layout(index, nearlySymmetric.clone(), next);
        }

        int areaIndex(int zone) {
            return firstIndex[zone];
        }

        boolean shapeFree(int zone) {
            return !fixed[zone];
        }

        int heldCount() {
            int count = 0;
            for (boolean h : fixed) {
                count += h ? 1 : 0;
            }
            return count;
        }

        /** The fitted vector from a full one (σ, then A, μ, a of every zone). */
        double[] pack(double[] full) {
            double[] p = new double[size];
            p[0] = full[0];
            for (int j = 0; j < firstIndex.length; j++) {
                p[firstIndex[j]] = full[1 + 3 * j];
                p[firstIndex[j] + 1] = full[2 + 3 * j];
                if (!fixed[j]) {
                    p[firstIndex[j] + 2] = full[3 + 3 * j];
                }
            }
            return p;
        }
    }

    /** The sum of zones of one form and its Jacobian (parameters as {@link Layout} places them; a held
     *  zone's size is {@code heldTau}). */
    private static MultivariateJacobianFunction model(double[] u, int k, double s, ZoneForm form, Layout layout,
                                                      double heldTau) {
        return point -> {
            double[] p = point.toArray();
            double sigma = p[0];
            int n = u.length;
            double[] value = new double[n];
            double[][] jacobian = new double[n][layout.size()];
            double[] g = new double[4];
            for (int j = 0; j < k; j++) {
                int b = layout.areaIndex(j);
                boolean free = layout.shapeFree(j);
                double area = p[b];
                double mu = p[b + 1];
                double a = free ? p[b + 2] : heldTau;
                for (int i = 0; i < n; i++) {
                    form.evaluate(s * (u[i] - mu), sigma, a, g);
                    value[i] += area * g[0];
                    jacobian[i][0] += area * g[2];
                    jacobian[i][b] = g[0];
                    jacobian[i][b + 1] = -s * area * g[1];
                    if (free) {
                        jacobian[i][b + 2] = area * g[3];
                    }
                }
            }
            return new Pair<>(new ArrayRealVector(value, false), new Array2DRowRealMatrix(jacobian, false));
        };
    }
}
