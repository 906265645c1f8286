package org.mobident.recheck;

import java.util.ArrayList;
import java.util.List;
import java.util.function.DoubleFunction;
import java.util.function.DoubleUnaryOperator;
import org.mobident.InputException;
import org.mobident.buffer.BufferConditions;
import org.mobident.buffer.PhInterval;
import org.mobident.library.Library;
import org.mobident.library.LibraryEntry;

/**
 * Predicted mobility against pH for the analytes of a library, and the pH intervals in which two
 * of them would comigrate.
 *
 * <p>Each point is a {@link BufferTransfer} transfer of the measured library value to a buffer of that
 * pH at the given ionic strength and temperature, so the curves pass through the measured values
 * and carry the prediction uncertainty. Two analytes are <em>not resolved</em> at a pH when their
 * predicted mobilities are closer than the {@link SeparationRule} asks (|Δμ| &lt; max(floor, k·u_c),
 * u_c from the comparison uncertainties, {@link PredictedMobility#comparisonUncertainty()}).
 *
 * <h2>How the intervals are found</h2>
 * <ol>
 *   <li>every run of table points that are not resolved gives one interval; each end is refined by
 *       bisection between the two table points around it to {@value #PH_RESOLUTION} pH;</li>
 *   <li>where Δμ changes sign between two neighbouring table points that are both resolved, the
 *       curves cross between them: the crossing is located by bisection and the interval around
 *       it refined in the same way (so a crossing is never lost to a coarse step);</li>
 *   <li>inside each interval the smallest |Δμ| is searched on the interval itself, not on the table:
 *       a crossing gives (nearly) 0, otherwise the minimum is refined by golden-section search. An
 *       interval is reported only when |Δμ| there is below the threshold there.</li>
 * </ol>
 * An interval that touches the first or last pH of the scan is marked as such: it may go on
 * beyond the scanned range. A dip of |Δμ| below the threshold that lies entirely between two
 * table points without a crossing can still be missed; a smaller step finds it.
 */
public final class PhScan {

    /** pH resolution of the refined interval ends. */
    public static final double PH_RESOLUTION = 1e-4;
    /** Largest number of pH points of one scan. */
    public static final int MAX_POINTS = 10_001;
    /** Even steps on which the smallest |Δμ| of an interval is first looked for. */
    static final int CLOSEST_SAMPLES = 32;
    /** (√5 − 1)/2, the golden-section ratio. */
    private static final double GOLDEN = 0.5 * (Math.sqrt(5.0) - 1.0);
    /** Slack for counting steps, so that a range that is a whole number of steps is not padded. */
    private static final double STEP_COUNT_SLACK = 1e-9;

    private PhScan() {
    }

    /**
     * One analyte's curve.
     *
     * @param name        analyte
     * @param basis       where its model data came from ({@link PredictionBasis#NO_MODEL}: flat in pH)
     * @param mobility    predicted mobility at each pH of the scan
     * @param uncertainty its standard uncertainty
     * @param comparisonUncertainty the part that matters against other analytes
     *                              ({@link PredictedMobility#comparisonUncertainty()}), used for comigration
     */
    public record Curve(String name, PredictionBasis basis, List<Double> mobility, List<Double> uncertainty,
                        List<Double> comparisonUncertainty) {
        public Curve {
            mobility = List.copyOf(mobility);
            uncertainty = List.copyOf(uncertainty);
            comparisonUncertainty = List.copyOf(comparisonUncertainty);
        }
    }

    /**
     * A pH interval in which two analytes are not resolved.
     *
     * @param first          one analyte
     * @param second         the other (later in library order)
     * @param interval       the pH interval
     * @param closestUnits   smallest |Δμ| inside the interval (searched on the interval, not only at
     *                       the table points; 0 where the curves cross), always below {@code thresholdUnits}
     * @param closestPh      the pH where it occurs
     * @param thresholdUnits the |Δμ| the separation rule asks for at {@code closestPh}
     * @param fromScanStart  the interval begins at the first scanned pH (it may extend below it)
     * @param toScanEnd      the interval ends at the last scanned pH (it may extend above it)
     */
    public record Comigration(String first, String second, PhInterval interval, double closestUnits, double closestPh,
                              double thresholdUnits, boolean fromScanStart, boolean toScanEnd) {

        /**
         * True when the zones would overlap even if the predictions were exact: the smallest
         * |Δμ| is below the rule's floor ({@link SeparationRule#minimumUnits()}). Otherwise the
         * two are predicted apart, but not by enough to be sure of it given the prediction
         * uncertainty.
         */
        public boolean overlapping(SeparationRule rule) {
            return closestUnits < rule.minimumUnits();
        }
    }

    /**
     * The scan.
     *
     * @param pH           the scanned pH values, ascending
     * @param curves       one per analyte, library order
     * @param comigrations every comigration interval, by pair in library order, then by pH
     * @param rule         the separation rule used
     */
    public record Result(List<Double> pH, List<Curve> curves, List<Comigration> comigrations, SeparationRule rule) {
        public Result {
            pH = List.copyOf(pH);
            curves = List.copyOf(curves);
            comigrations = List.copyOf(comigrations);
        }
    }

    /**
     * Scans a pH range.
     *
     * @param predictor          the predictor
     * @param libraryA           the measured library
     * @param bufferA            its buffer (for entries that state none; may be null)
     * @param analytes           names to include (empty: all), in the order wanted
     * @param pHFrom             first pH
     * @param pHTo               last pH (included; the last step may be shorter)
     * @param pHStep             step, &gt; 0
     * @param ionicStrengthMolar ionic strength of the scanned buffers, mol/L
     * @param temperatureC       their temperature, °C
     * @param rule               when two analytes count as resolved
     * @throws InputException           when a named analyte is not in the library or an entry's buffer is unknown
     * @throws IllegalArgumentException for a bad range or step, or more than {@value #MAX_POINTS} points
     */
    public static Result scan(BufferTransfer predictor, Library libraryA, BufferSpec bufferA, List<String> analytes,
                              double pHFrom, double pHTo, double pHStep, double ionicStrengthMolar,
                              double temperatureC, SeparationRule rule) throws InputException {
        if (!(pHFrom >= BufferConditions.MIN_PH && pHTo <= BufferConditions.MAX_PH && pHTo >= pHFrom)) {
            throw new IllegalArgumentException("pH range must lie within 0–14 with from ≤ to, got "
                    + pHFrom + "–" + pHTo);
        }
        if (!(pHStep > 0) || Double.isInfinite(pHStep)) {
            throw new IllegalArgumentException("pH step must be positive, got " + pHStep);
        }
        double stepsExact = Math.ceil((pHTo - pHFrom) / pHStep - STEP_COUNT_SLACK);
        if (stepsExact + 1 > MAX_POINTS) {
            throw new IllegalArgumentException("a pH scan has at most " + MAX_POINTS + " points; use a larger step");
        }
        int steps = (int) stepsExact;
        BufferSpec base = new BufferSpec("pH scan", pHFrom, ionicStrengthMolar, temperatureC);
        List<LibraryEntry> entries = select(libraryA, analytes);
        List<BufferSpec> buffersA = new ArrayList<>(entries.size());
        for (LibraryEntry e : entries) {
            buffersA.add(BufferSpec.forEntry(e, bufferA, libraryA.sourceFile()));
        }
        List<Double> grid = new ArrayList<>(steps + 1);
        for (int k = 0; k <= steps; k++) {
            grid.add(k == steps ? pHTo : pHFrom + k * pHStep);
        }
        List<Curve> curves = new ArrayList<>(entries.size());
        for (int i = 0; i < entries.size(); i++) {
            List<Double> mu = new ArrayList<>(grid.size());
            List<Double> u = new ArrayList<>(grid.size());
            List<Double> uc = new ArrayList<>(grid.size());
            PredictionBasis basis = null;
            for (double pH : grid) {
                PredictedMobility p = predictor.predict(entries.get(i), buffersA.get(i), base.withPh(pH),
                        libraryA.sourceFile());
                mu.add(p.predicted());
                u.add(p.uncertainty());
                uc.add(p.comparisonUncertainty());
                basis = p.basis();
            }
            curves.add(new Curve(entries.get(i).name(), basis, mu, u, uc));
        }
        List<Comigration> found = new ArrayList<>();
        for (int i = 0; i < entries.size(); i++) {
            for (int j = i + 1; j < entries.size(); j++) {
                int fi = i;
                int fj = j;
                DoubleFunction<PairAt> at = pH -> {
                    PredictedMobility a = predictor.predict(entries.get(fi), buffersA.get(fi), base.withPh(pH),
                            libraryA.sourceFile());
                    PredictedMobility b = predictor.predict(entries.get(fj), buffersA.get(fj), base.withPh(pH),
                            libraryA.sourceFile());
                    return new PairAt(a.predicted() - b.predicted(),
                            rule.threshold(a.comparisonUncertainty(), b.comparisonUncertainty()));
                };
                found.addAll(intervals(curves.get(i), curves.get(j), grid, rule, at));
            }
        }
        return new Result(grid, curves, found, rule);
    }

    private static List<LibraryEntry> select(Library library, List<String> analytes) throws InputException {
        if (analytes.isEmpty()) {
            return library.entries();
        }
        List<LibraryEntry> out = new ArrayList<>(analytes.size());
        for (String name : analytes) {
            LibraryEntry e = library.find(name).orElse(null);
            if (e == null) {
                throw new InputException(library.sourceFile(), 0, "name", "analyte '" + name + "' is not in the library");
            }
            if (!out.contains(e)) {
                out.add(e);
            }
        }
        return out;
    }

    /** The signed difference μ_first − μ_second and the separation threshold at one pH. */
    private record PairAt(double delta, double threshold) {
        double excess() {
            return Math.abs(delta) - threshold;
        }
    }

    private static List<Comigration> intervals(Curve a, Curve b, List<Double> grid, SeparationRule rule,
                                               DoubleFunction<PairAt> at) {
        int n = grid.size();
        double[] delta = new double[n];
        boolean[] inside = new boolean[n];
        for (int k = 0; k < n; k++) {
            delta[k] = a.mobility().get(k) - b.mobility().get(k);
            inside[k] = Math.abs(delta[k]) < rule.threshold(a.comparisonUncertainty().get(k),
                    b.comparisonUncertainty().get(k));
        }
        DoubleUnaryOperator excess = pH -> at.apply(pH).excess();
        List<double[]> spans = new ArrayList<>();
        // runs of grid points inside, ends refined between the grid points around them
        int k = 0;
        while (k < n) {
            if (!inside[k]) {
                k++;
                continue;
            }
            int first = k;
            while (k + 1 < n && inside[k + 1]) {
                k++;
            }
            double from = first == 0 ? grid.get(0) : bisect(excess, grid.get(first - 1), grid.get(first), false);
            double to = k == n - 1 ? grid.get(n - 1) : bisect(excess, grid.get(k), grid.get(k + 1), true);
            spans.add(new double[] {from, to});
            k++;
        }
        // curves that cross between two grid points both outside: the crossing itself is inside
        for (int j = 1; j < n; j++) {
            if (!inside[j - 1] && !inside[j] && Math.signum(delta[j - 1]) * Math.signum(delta[j]) < 0) {
                double root = root(pH -> at.apply(pH).delta(), grid.get(j - 1), grid.get(j));
                if (excess.applyAsDouble(root) < 0.0) {
                    spans.add(new double[] {bisect(excess, grid.get(j - 1), root, false),
                            bisect(excess, root, grid.get(j), true)});
                }
            }
        }
        spans.sort((x, y) -> Double.compare(x[0], y[0]));
        List<Comigration> out = new ArrayList<>();
        double first = grid.get(0);
        double last = grid.get(n - 1);
        for (double[] span : spans) {
            double pH = closest(at, span[0], span[1])[0];
            PairAt there = at.apply(pH);
            if (!(there.excess() < 0.0)) {
                // the threshold moves with pH: fall back to the sampled point deepest below it
                pH = deepest(at, span[0], span[1]);
                there = at.apply(pH);
            }
            if (!(there.excess() < 0.0)) {
                continue; // no point of the span is below the threshold: not an interval
            }
            out.add(new Comigration(a.name(), b.name(), new PhInterval(span[0], span[1]), Math.abs(there.delta()),
                    pH, there.threshold(), span[0] <= first, span[1] >= last));
        }
        return out;
    }

    /**
     * The pH of smallest |Δμ| in [lo, hi] and nothing else ({pH}): a sign change of Δμ on
     * {@value #CLOSEST_SAMPLES} even steps is refined by bisection to the crossing (|Δμ| ≈ 0);
     * otherwise the smallest sampled |Δμ| is refined by golden-section search between its two
     * neighbours (Kiefer, Proc. AMS 4 (1953) 502), both to {@value #PH_RESOLUTION} pH.
     */
    private static double[] closest(DoubleFunction<PairAt> at, double lo, double hi) {
        if (hi - lo <= PH_RESOLUTION) {
            return new double[] {0.5 * (lo + hi)};
        }
        double[] x = new double[CLOSEST_SAMPLES + 1];
        double[] d = new double[CLOSEST_SAMPLES + 1];
        int best = 0;
        for (int i = 0; i <= CLOSEST_SAMPLES; i++) {
            x[i] = i == CLOSEST_SAMPLES ? hi : lo + (hi - lo) * i / CLOSEST_SAMPLES;
            d[i] = at.apply(x[i]).delta();
            if (i > 0 && Math.signum(d[i - 1]) * Math.signum(d[i]) < 0) {
                return new double[] {root(pH -> at.apply(pH).delta(), x[i - 1], x[i])};
            }
            if (d[i] == 0.0) {
                return new double[] {x[i]};
            }
            if (Math.abs(d[i]) < Math.abs(d[best])) {
                best = i;
            }
        }
        double a = x[Math.max(0, best - 1)];
        double b = x[Math.min(CLOSEST_SAMPLES, best + 1)];
        double c = b - GOLDEN * (b - a);
        double e = a + GOLDEN * (b - a);
        while (b - a > PH_RESOLUTION) {
            if (Math.abs(at.apply(c).delta()) < Math.abs(at.apply(e).delta())) {
                b = e;
            } else {
                a = c;
            }
            c = b - GOLDEN * (b - a);
            e = a + GOLDEN * (b - a);
        }
        double m = 0.5 * (a + b);
        return new double[] {Math.abs(at.apply(m).delta()) < Math.abs(d[best]) ? m : x[best]};
    }

    /** The sampled pH of [lo, hi] where |Δμ| lies furthest below the threshold. */
    private static double deepest(DoubleFunction<PairAt> at, double lo, double hi) {
        double best = lo;
        double bestExcess = Double.POSITIVE_INFINITY;
        for (int i = 0; i <= CLOSEST_SAMPLES; i++) {
            double x = i == CLOSEST_SAMPLES ? hi : lo + (hi - lo) * i / CLOSEST_SAMPLES;
            double e = at.apply(x).excess();
            if (e < bestExcess) {
                bestExcess = e;
                best = x;
            }
        }
        return best;
    }

    /** A zero of f between lo and hi, where f changes sign, by bisection. */
    private static double root(DoubleUnaryOperator f, double lo, double hi) {
        double fLo = f.applyAsDouble(lo);
        while (hi - lo > PH_RESOLUTION) {
            double mid = 0.5 * (lo + hi);
            double fMid = f.applyAsDouble(mid);
            if (fMid == 0.0) {
                return mid;
            }
            if (Math.signum(fMid) == Math.signum(fLo)) {
                lo = mid;
                fLo = fMid;
            } else {
                hi = mid;
            }
        }
        return 0.5 * (lo + hi);
    }

    /** The boundary between lo (inside = loInside) and hi (the other state). */
    private static double bisect(DoubleUnaryOperator excess, double lo, double hi, boolean loInside) {
        while (hi - lo > PH_RESOLUTION) {
            double mid = 0.5 * (lo + hi);
            if ((excess.applyAsDouble(mid) < 0.0) == loInside) {
                lo = mid;
            } else {
                hi = mid;
            }
        }
        return 0.5 * (lo + hi);
    }
}
