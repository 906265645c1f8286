package org.mobident.recheck;

import java.util.ArrayList;
import java.util.List;
import java.util.function.DoubleUnaryOperator;
import org.mobident.InputException;
import org.mobident.chem.BufferConditions;
import org.mobident.chem.PhInterval;
import org.mobident.library.Library;
import org.mobident.library.LibraryEntry;

/**
 * Predicted mobility against pH for the analytes of a library, and the pH intervals in which two
 * of them would comigrate.
 *
 * <p>Each point is a {@link Predictor} transfer of the measured library value to a buffer of that
 * pH at the given ionic strength and temperature, so the curves pass through the measured values
 * and carry the prediction uncertainty. Two analytes comigrate at a pH when their predicted
 * mobilities are not resolved by the {@link SeparationRule} (|Δμ| &lt; max(floor, k·u_c), u_c from the
 * comparison uncertainties, {@link PredictedMobility#comparisonUncertainty()}). The
 * intervals are found on the table and each end is refined by bisection between the two grid
 * points around it to {@value #PH_RESOLUTION} pH; an interval narrower than the step can be missed
 * (the same limitation as {@link org.mobident.chem.MobilityPredictor#comigrationRanges}).
 */
public final class PhScan {

    /** pH resolution of the refined interval ends. */
    public static final double PH_RESOLUTION = 1e-4;
    /** Largest number of pH points of one scan. */
    public static final int MAX_POINTS = 10_001;
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
     * A pH interval in which two analytes comigrate.
     *
     * @param first            one analyte
     * @param second           the other (later in library order)
     * @param interval         the pH interval
     * @param closestUnits     smallest |Δμ| at the scanned points inside it (NaN when none lies inside)
     */
    public record Comigration(String first, String second, PhInterval interval, double closestUnits) {
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
    public static Result scan(Predictor predictor, Library libraryA, BufferSpec bufferA, List<String> analytes,
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
                DoubleUnaryOperator excess = pH -> {
                    PredictedMobility a = predictor.predict(entries.get(fi), buffersA.get(fi), base.withPh(pH),
                            libraryA.sourceFile());
                    PredictedMobility b = predictor.predict(entries.get(fj), buffersA.get(fj), base.withPh(pH),
                            libraryA.sourceFile());
                    return Math.abs(a.predicted() - b.predicted()) - rule.threshold(a.comparisonUncertainty(), b.comparisonUncertainty());
                };
                found.addAll(intervals(curves.get(i), curves.get(j), grid, rule, excess));
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

    private static List<Comigration> intervals(Curve a, Curve b, List<Double> grid, SeparationRule rule,
                                               DoubleUnaryOperator excess) {
        List<Comigration> out = new ArrayList<>();
        double start = Double.NaN;
        double closest = Double.NaN;
        boolean prevInside = false;
        for (int k = 0; k < grid.size(); k++) {
            double delta = Math.abs(a.mobility().get(k) - b.mobility().get(k));
            boolean inside = delta < rule.threshold(a.comparisonUncertainty().get(k),
                    b.comparisonUncertainty().get(k));
            if (k == 0) {
                if (inside) {
                    start = grid.get(0);
                }
            } else if (inside != prevInside) {
                double edge = bisect(excess, grid.get(k - 1), grid.get(k), prevInside);
                if (inside) {
                    start = edge;
                } else {
                    out.add(new Comigration(a.name(), b.name(), new PhInterval(start, edge), closest));
                    closest = Double.NaN;
                }
            }
            if (inside) {
                closest = Double.isNaN(closest) ? delta : Math.min(closest, delta);
            }
            prevInside = inside;
        }
        if (prevInside) {
            out.add(new Comigration(a.name(), b.name(), new PhInterval(start, grid.get(grid.size() - 1)), closest));
        }
        return out;
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
