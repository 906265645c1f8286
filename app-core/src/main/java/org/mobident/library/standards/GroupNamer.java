package org.mobident.library.standards;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.HashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.mobident.library.Library;
import org.mobident.library.LibraryEntry;

/**
 * Gives the groups of one mix their analyte names, in this order of evidence:
 * <ol>
 *   <li>approx_mobility of the standards sheet: the one-to-one assignment of analytes to groups that
 *       minimises Σ(Δμ/w)² with w = {@link BuildSettings#approxWindow()} and |Δμ| ≤ w, signs agreeing
 *       ({@link MonotoneMatcher});</li>
 *   <li>expected migration order: the groups in migration order are paired with the analytes in
 *       expected order, in each stretch between analytes already named by step 1; when a stretch holds
 *       more groups than analytes, the groups seen in most runs (then the tallest) are taken;
 *       when it holds fewer, nothing in it is named (which analyte is missing cannot be told);</li>
 *   <li>the reference library: an analyte whose name the reference holds takes the nearest group of
 *       the same charge sign within max({@link BuildSettings#referenceWindow()}, entry tolerance),
 *       one-to-one, but only when that pairing is clear (see below);</li>
 *   <li>a mix of one analyte that gave exactly one group;</li>
 *   <li>elimination: when k analytes of the mix are still unnamed and exactly k unnamed groups were
 *       seen in (nearly) every run of the mix, k = 1 pairs them (sign agreeing and the reference value,
 *       where there is one, within reach); for 2 ≤ k ≤ {@value #MAX_ELIMINATION} with reference values
 *       for all, the one-to-one pairing of least total distance is taken when every other pairing is
 *       clearly worse (by the rule below, applied to the totals); otherwise the analytes and groups are
 *       named in a warning as pairs that nothing tells apart.</li>
 * </ol>
 * A name from steps 2 or 4 whose group has the wrong mobility sign for the analyte's charge is
 * withdrawn with a {@link BuildWarning.Kind#NAMING_CONFLICT} warning.
 *
 * <p><b>Clear reference pairings.</b> A reference value is only an estimate of the mobility in the
 * standards' buffer: a predicted effective mobility is off by about a unit, a limiting
 * (infinite-dilution) value by several units, differently for each ion (multivalent ions and weak
 * acids near their pKa most). A pairing of analyte A (reference value r_A) with group G (mean μ_G),
 * d = |μ_G − r_A|, is kept only when every rival is clearly farther: every other analyte B of the
 * mix still to be named from the reference, of the group's sign, has |μ_G − r_B| ≥ max(2·d, d + m),
 * and every other unnamed group H of A's sign has |μ_H − r_A| ≥ max(2·d, d + m). The margin m is
 * {@value #PREDICTED_MARGIN} unit when the values compared were predicted for the buffer, and half
 * the reference window ({@link BuildSettings#referenceWindow()}) when any of them is a value taken
 * as stated (a limiting value, or one whose buffer is unknown). A value taken as stated is moreover
 * a rival wherever the buffer could have moved it: a group within max(reference window,
 * {@value #AS_STATED_SHIFT} × |r|) of a stated value r is a rival for it (at 10–50 mM ionic strength,
 * effective mobilities of divalent ions lie 10–25 % below their limiting values, and weak acids near
 * their pKa even lower; common practice). A pairing that fails is not made: the group stays unnamed
 * and a {@link BuildWarning.Kind#DOUBTFUL_REFERENCE_NAME} warning names the rival. (The factor 2,
 * the margins and the shift are this program's rule, chosen so that a wrong name needs a reference
 * error larger than they allow; not from a publication.)
 */
final class GroupNamer {

    /**
     * What is known of one group for naming.
     *
     * @param mean           mean mobility
     * @param runCount       number of runs with a peak in the group
     * @param relativeHeight mean height relative to each run's largest peak
     * @param migrationRank  0 for the group that passes the detector first
     */
    record GroupInfo(double mean, int runCount, double relativeHeight, int migrationRank) {
    }

    /**
     * The names given.
     *
     * @param analyteOfGroup  per group, its analyte or null
     * @param basisOfGroup    per group, how it was named, or null
     * @param notFoundReasons for analytes left unnamed because naming was ambiguous, why
     * @param warnings        conflicts found while naming
     * @param comparedAsStated analytes whose reference value was compared as stated (not predicted)
     */
    record Naming(StandardAnalyte[] analyteOfGroup, NamingBasis[] basisOfGroup,
                  Map<StandardAnalyte, String> notFoundReasons, List<BuildWarning> warnings,
                  List<String> comparedAsStated) {
    }

    /** Rival clearance when the compared reference values were predicted for the buffer, mobility units. */
    static final double PREDICTED_MARGIN = 1.0;
    /** Fraction of a stated (limiting) value by which a buffer may move an effective mobility. */
    static final double AS_STATED_SHIFT = 0.20;
    /** A rival must be at least this many times as far as the chosen pairing. */
    static final double CLEAR_RATIO = 2.0;
    /** Most analytes left for a joint pairing by elimination (k! pairings are compared). */
    static final int MAX_ELIMINATION = 6;
    /** The common factor tried on a mix's approx_mobility values: from, to and step (a modelling
     *  choice: effective mobilities lie up to a quarter below limiting ones, common practice) ... */
    static final double APPROX_SCALE_MIN = 0.75;
    static final double APPROX_SCALE_MAX = 1.30;
    static final double APPROX_SCALE_STEP = 0.005;
    /** ... the SD of its prior around 1 ... */
    static final double APPROX_SCALE_SD = 0.10;
    /** ... and how far from 1 it is reported. */
    static final double APPROX_SCALE_NOTICE = 0.05;

    private final StandardsMix mix;
    private final List<GroupInfo> groups;
    private final Library reference;
    private final java.util.Set<String> predicted;
    private final BuildSettings settings;
    private final StandardAnalyte[] analyteOf;
    private final NamingBasis[] basisOf;
    private final Map<StandardAnalyte, Integer> groupOf = new HashMap<>();
    private final Map<StandardAnalyte, String> reasons = new HashMap<>();
    private final List<BuildWarning> warnings = new ArrayList<>();
    private final List<String> asStated = new ArrayList<>();

    private GroupNamer(StandardsMix mix, List<GroupInfo> groups, Library reference, java.util.Set<String> predicted,
                       BuildSettings settings) {
        this.mix = mix;
        this.groups = groups;
        this.reference = reference;
        this.predicted = predicted;
        this.settings = settings;
        this.analyteOf = new StandardAnalyte[groups.size()];
        this.basisOf = new NamingBasis[groups.size()];
    }

    /**
     * @param mix       the mix
     * @param groups    its groups, ordered by mean mobility
     * @param reference reference library for naming (its values predicted for the buffer where
     *                  possible), or null
     * @param predicted lower-case names of the reference entries whose values were predicted for the
     *                  standards' buffer; the others are compared as stated, with the wider margin
     * @param settings  windows
     */
    static Naming name(StandardsMix mix, List<GroupInfo> groups, Library reference, java.util.Set<String> predicted,
                       BuildSettings settings) {
        GroupNamer n = new GroupNamer(mix, groups, reference, predicted, settings);
        n.byApproxMobility();
        n.byOrder();
        n.byReference();
        n.onlyAnalyte();
        n.byElimination();
        return new Naming(n.analyteOf, n.basisOf, n.reasons, n.warnings, n.asStated);
    }

    private void assign(StandardAnalyte a, int group, NamingBasis basis) {
        analyteOf[group] = a;
        basisOf[group] = basis;
        groupOf.put(a, group);
    }

    private List<Integer> freeGroupsByMobility() {
        List<Integer> free = new ArrayList<>();
        for (int g = 0; g < groups.size(); g++) {
            if (analyteOf[g] == null) {
                free.add(g);
            }
        }
        return free;
    }

    private boolean signAgrees(int expectedSign, double mobility) {
        return expectedSign == 0 || Math.signum(mobility) == expectedSign;
    }

    /** One-to-one nearest assignment of analytes with a target mobility to free groups. */
    private void nearest(List<StandardAnalyte> analytes, List<Double> target, List<Double> window,
                         List<Integer> sign, NamingBasis basis) {
        Pairing p = pairing(target, window, sign);
        for (int i = 0; i < p.partner().length; i++) {
            if (p.partner()[i] >= 0) {
                assign(analytes.get(p.order().get(i)), p.free().get(p.partner()[i]), basis);
            }
        }
    }

    /**
     * The monotone one-to-one pairing of targets (in increasing order) with the free groups (by
     * mobility) at least Σ(Δμ/w)², |Δμ| ≤ w and signs agreeing.
     *
     * @param order   target indices in increasing order of target
     * @param free    the free groups
     * @param partner for each position of {@code order}, the index into {@code free}, or −1
     * @param cost    the cost of each pair, by positions
     */
    private record Pairing(List<Integer> order, List<Integer> free, int[] partner, MonotoneMatcher.Cost cost) {
    }

    private Pairing pairing(List<Double> target, List<Double> window, List<Integer> sign) {
        List<Integer> idx = new ArrayList<>();
        for (int i = 0; i < target.size(); i++) {
            idx.add(i);
        }
        idx.sort(Comparator.comparingDouble(target::get));
        List<Integer> free = freeGroupsByMobility();
        MonotoneMatcher.Cost cost = (i, j) -> {
            int a = idx.get(i);
            double m = groups.get(free.get(j)).mean();
            double d = Math.abs(m - target.get(a));
            if (d > window.get(a) || !signAgrees(sign.get(a), m)) {
                return Double.POSITIVE_INFINITY;
            }
            double z = d / window.get(a);
            return z * z;
        };
        return new Pairing(idx, free, MonotoneMatcher.match(idx.size(), free.size(), cost, 1.0), cost);
    }

    /**
     * Names groups after the approx_mobility values, all of a mix scaled by one common factor s: a
     * mix's values often come from the literature (limiting mobilities, 10–20 % above effective ones
     * in a buffer of some ionic strength) or from another buffer, and are then off by much the same
     * share for every analyte, which moves the pattern as a whole beyond the window while keeping
     * its order and its proportions. Over s from {@value #APPROX_SCALE_MIN} to
     * {@value #APPROX_SCALE_MAX} (steps of {@value #APPROX_SCALE_STEP}) the assignment that names the
     * most analytes wins, then the one of least Σ(Δμ/w)² + ((s − 1)/{@value #APPROX_SCALE_SD})²
     * (the second term a prior that keeps s near 1 where the values fit as given). A factor more than
     * {@value #APPROX_SCALE_NOTICE} from 1 is reported.
     */
    private void byApproxMobility() {
        List<StandardAnalyte> as = new ArrayList<>();
        List<Double> approx = new ArrayList<>();
        List<Double> window = new ArrayList<>();
        List<Integer> sign = new ArrayList<>();
        for (StandardAnalyte a : mix.analytes()) {
            if (a.hasApproxMobility()) {
                as.add(a);
                approx.add(a.approxMobility());
                window.add(settings.approxWindow());
                sign.add(a.expectedSign());
            }
        }
        if (as.isEmpty()) {
            return;
        }
        double bestScale = 1.0;
        int bestNamed = -1;
        double bestCost = Double.POSITIVE_INFINITY;
        int steps = (int) Math.round((APPROX_SCALE_MAX - APPROX_SCALE_MIN) / APPROX_SCALE_STEP);
        for (int k = 0; k <= steps; k++) {
            double scale = APPROX_SCALE_MIN + k * APPROX_SCALE_STEP;
            double[] fit = scaledFit(scaled(approx, scale), window, sign);
            double prior = (scale - 1) / APPROX_SCALE_SD;
            double cost = fit[1] + prior * prior;
            if (fit[0] > bestNamed || (fit[0] == bestNamed && cost < bestCost)) {
                bestNamed = (int) fit[0];
                bestCost = cost;
                bestScale = scale;
            }
        }
        nearest(as, scaled(approx, bestScale), window, sign, NamingBasis.APPROX_MOBILITY);
        if (Math.abs(bestScale - 1) > APPROX_SCALE_NOTICE) {
            warnings.add(new BuildWarning(BuildWarning.Kind.APPROX_SCALED, mix.name(), null, null,
                    String.format(Locale.ROOT, "Mix %s: the approx_mobility values fit the peaks only at %.3f times "
                            + "their values (values from the literature or another buffer are often off by one "
                            + "common share); the groups were named at that factor: check the names and the sheet.",
                            mix.name(), bestScale)));
        }
    }

    private static List<Double> scaled(List<Double> values, double factor) {
        List<Double> out = new ArrayList<>(values.size());
        for (double v : values) {
            out.add(factor * v);
        }
        return out;
    }

    /** {analytes named, Σ(Δμ/w)² of the names} of the one-to-one nearest assignment to free groups. */
    private double[] scaledFit(List<Double> target, List<Double> window, List<Integer> sign) {
        Pairing p = pairing(target, window, sign);
        double named = 0;
        double sum = 0;
        for (int i = 0; i < p.partner().length; i++) {
            if (p.partner()[i] >= 0) {
                named++;
                sum += p.cost().of(i, p.partner()[i]);
            }
        }
        return new double[] {named, sum};
    }

    private void byOrder() {
        List<StandardAnalyte> ordered = new ArrayList<>();
        List<StandardAnalyte> anchors = new ArrayList<>();
        for (StandardAnalyte a : mix.analytes()) {
            if (!a.hasOrder()) {
                continue;
            }
            if (groupOf.containsKey(a)) {
                anchors.add(a);
            } else {
                ordered.add(a);
            }
        }
        if (ordered.isEmpty()) {
            return;
        }
        ordered.sort(Comparator.comparingInt(StandardAnalyte::order));
        anchors.sort(Comparator.comparingInt(StandardAnalyte::order));
        for (int k = 1; k < anchors.size(); k++) {
            StandardAnalyte before = anchors.get(k - 1);
            StandardAnalyte after = anchors.get(k);
            if (rank(before) > rank(after)) {
                warnings.add(new BuildWarning(BuildWarning.Kind.NAMING_CONFLICT, mix.name(), after.name(), null,
                        "In mix " + mix.name() + ", the approximate mobilities put " + after.name() + " before "
                                + before.name() + " in migration, against the expected order ("
                                + before.order() + " before " + after.order()
                                + "); no analyte of this mix was named by its order."));
                for (StandardAnalyte a : ordered) {
                    reasons.put(a, "the expected migration order contradicts the approximate mobilities");
                }
                return;
            }
        }
        for (int k = 0; k <= anchors.size(); k++) {
            int loOrder = k == 0 ? 0 : anchors.get(k - 1).order();
            int hiOrder = k == anchors.size() ? Integer.MAX_VALUE : anchors.get(k).order();
            int loRank = k == 0 ? -1 : rank(anchors.get(k - 1));
            int hiRank = k == anchors.size() ? Integer.MAX_VALUE : rank(anchors.get(k));
            List<StandardAnalyte> as = new ArrayList<>();
            for (StandardAnalyte a : ordered) {
                if (a.order() > loOrder && a.order() < hiOrder) {
                    as.add(a);
                }
            }
            if (as.isEmpty()) {
                continue;
            }
            List<Integer> gs = new ArrayList<>();
            for (int g : freeGroupsByMobility()) {
                int r = groups.get(g).migrationRank();
                if (r > loRank && r < hiRank) {
                    gs.add(g);
                }
            }
            if (gs.size() < as.size()) {
                String why = "only " + gs.size() + " unnamed peak group(s) for " + as.size()
                        + " analyte(s) expected in that part of the migration order, so which is missing cannot be told";
                for (StandardAnalyte a : as) {
                    reasons.put(a, why);
                }
                continue;
            }
            if (gs.size() > as.size()) {
                List<Integer> byPresence = new ArrayList<>(gs);
                byPresence.sort(Comparator.comparingInt((Integer g) -> -groups.get(g).runCount())
                        .thenComparingDouble(g -> -groups.get(g).relativeHeight())
                        .thenComparingInt(g -> groups.get(g).migrationRank()));
                gs = new ArrayList<>(byPresence.subList(0, as.size()));
            }
            gs.sort(Comparator.comparingInt(g -> groups.get(g).migrationRank()));
            for (int i = 0; i < as.size(); i++) {
                assign(as.get(i), gs.get(i), NamingBasis.ORDER);
            }
        }
        withdrawWrongSigns(NamingBasis.ORDER);
    }

    private int rank(StandardAnalyte named) {
        return groups.get(groupOf.get(named)).migrationRank();
    }

    private void byReference() {
        if (reference == null) {
            return;
        }
        List<StandardAnalyte> as = new ArrayList<>();
        List<Double> target = new ArrayList<>();
        List<Double> window = new ArrayList<>();
        List<Integer> sign = new ArrayList<>();
        List<Boolean> wasPredicted = new ArrayList<>();
        for (StandardAnalyte a : mix.analytes()) {
            if (groupOf.containsKey(a)) {
                continue;
            }
            LibraryEntry e = findReference(reference, a.name());
            if (e == null || !Double.isFinite(e.mobility())) {
                continue;
            }
            int entrySign = e.charge() != 0 ? Integer.signum(e.charge()) : (int) Math.signum(e.mobility());
            if (a.expectedSign() != 0 && entrySign != 0 && entrySign != a.expectedSign()) {
                continue;
            }
            as.add(a);
            target.add(e.mobility());
            double tol = Double.isFinite(e.tolerance()) ? e.tolerance() : 0.0;
            window.add(Math.max(settings.referenceWindow(), tol));
            sign.add(a.expectedSign() != 0 ? a.expectedSign() : entrySign);
            boolean p = predicted.contains(LibraryBuilder.key(e.name()));
            wasPredicted.add(p);
            if (!p) {
                asStated.add(a.name());
            }
        }
        List<Integer> free = freeGroupsByMobility();
        nearest(as, target, window, sign, NamingBasis.REFERENCE_LIBRARY);
        for (int i = 0; i < as.size(); i++) {
            StandardAnalyte a = as.get(i);
            Integer g = groupOf.get(a);
            if (g == null || basisOf[g] != NamingBasis.REFERENCE_LIBRARY) {
                continue;
            }
            String rival = rival(i, g, as, target, sign, wasPredicted, free);
            if (rival != null) {
                double mu = groups.get(g).mean();
                warnings.add(new BuildWarning(BuildWarning.Kind.DOUBTFUL_REFERENCE_NAME, mix.name(), a.name(), null,
                        String.format(Locale.ROOT, "In mix %s, the group at %.3f is nearest to the %s value of %s"
                                        + " (%.3f), but %s; the name would be doubtful, so the group was left unnamed.",
                                mix.name(), mu, wasPredicted.get(i) ? "predicted" : "reference", a.name(),
                                target.get(i), rival)));
                analyteOf[g] = null;
                basisOf[g] = null;
                groupOf.remove(a);
                reasons.put(a, "its reference value does not point clearly to one peak group (" + rival + ")");
            }
        }
        for (StandardAnalyte a : as) {
            if (!groupOf.containsKey(a)) {
                reasons.putIfAbsent(a, "no peak group of the same charge sign within the window around its"
                        + " reference mobility");
            }
        }
    }

    /**
     * The first rival that is not clearly farther than the pairing of analyte {@code i} with group
     * {@code g} (see the class comment), described for the analyst; null when the pairing is clear.
     */
    private String rival(int i, int g, List<StandardAnalyte> as, List<Double> target, List<Integer> sign,
                         List<Boolean> wasPredicted, List<Integer> free) {
        double mu = groups.get(g).mean();
        double d = Math.abs(mu - target.get(i));
        for (int b = 0; b < as.size(); b++) {
            if (b == i || !signAgrees(sign.get(b), mu)) {
                continue;
            }
            double m = margin(wasPredicted.get(i) && wasPredicted.get(b));
            double d2 = Math.abs(mu - target.get(b));
            if (!wasPredicted.get(b) && d2 <= reach(target.get(b))) {
                return String.format(Locale.ROOT, "the reference value of %s (%.3f) is taken as stated and the"
                        + " buffer may shift it as far as this group (%.3f away)", as.get(b).name(), target.get(b), d2);
            }
            if (d2 < Math.max(CLEAR_RATIO * d, d + m)) {
                return String.format(Locale.ROOT, "that of %s (%.3f) is only %.3f farther (a clear name needs"
                        + " %.3f more)", as.get(b).name(), target.get(b), d2 - d, Math.max(CLEAR_RATIO * d, d + m) - d);
            }
        }
        double m = margin(wasPredicted.get(i));
        for (int h : free) {
            if (h == g || !signAgrees(sign.get(i), groups.get(h).mean())) {
                continue;
            }
            double d2 = Math.abs(groups.get(h).mean() - target.get(i));
            if (!wasPredicted.get(i) && d2 <= reach(target.get(i))) {
                return String.format(Locale.ROOT, "the value is taken as stated and the buffer may shift it as far as"
                        + " the group at %.3f (%.3f away)", groups.get(h).mean(), d2);
            }
            if (d2 < Math.max(CLEAR_RATIO * d, d + m)) {
                return String.format(Locale.ROOT, "the group at %.3f is only %.3f farther from it (a clear name"
                        + " needs %.3f more)", groups.get(h).mean(), d2 - d, Math.max(CLEAR_RATIO * d, d + m) - d);
            }
        }
        return null;
    }

    /** How far the buffer may move a value taken as stated. */
    private double reach(double statedValue) {
        return Math.max(settings.referenceWindow(), AS_STATED_SHIFT * Math.abs(statedValue));
    }

    /** How much farther a rival must be: small for values predicted for the buffer, wide otherwise. */
    private double margin(boolean predictedValues) {
        return predictedValues ? PREDICTED_MARGIN : settings.referenceWindow() / 2.0;
    }

    private void onlyAnalyte() {
        if (mix.analytes().size() == 1 && groups.size() == 1 && analyteOf[0] == null) {
            StandardAnalyte a = mix.analytes().get(0);
            if (!groupOf.containsKey(a) && !reasons.containsKey(a)) {
                assign(a, 0, NamingBasis.ONLY_ANALYTE);
                withdrawWrongSigns(NamingBasis.ONLY_ANALYTE);
            }
        }
    }

    private void byElimination() {
        List<StandardAnalyte> left = new ArrayList<>();
        for (StandardAnalyte a : mix.analytes()) {
            if (!groupOf.containsKey(a)) {
                left.add(a);
            }
        }
        int most = 0;
        for (GroupInfo g : groups) {
            most = Math.max(most, g.runCount());
        }
        int seenIn = most >= 3 ? most - 1 : most;
        List<Integer> free = new ArrayList<>();
        for (int g : freeGroupsByMobility()) {
            if (groups.get(g).runCount() >= seenIn) {
                free.add(g);
            }
        }
        int k = left.size();
        if (k == 0 || k != free.size() || k > MAX_ELIMINATION) {
            return;
        }
        double[] target = new double[k];
        double[] reach = new double[k];
        boolean[] stated = new boolean[k];
        for (int i = 0; i < k; i++) {
            LibraryEntry e = reference == null ? null : findReference(reference, left.get(i).name());
            target[i] = e != null && Double.isFinite(e.mobility()) ? e.mobility() : Double.NaN;
            stated[i] = e != null && !predicted.contains(LibraryBuilder.key(e.name()));
            double tol = e != null && Double.isFinite(e.tolerance()) ? e.tolerance() : 0.0;
            reach[i] = stated[i] ? Math.max(reach(target[i]), tol) : Math.max(settings.referenceWindow(), tol);
            if (k > 1 && Double.isNaN(target[i])) {
                return;
            }
        }
        int[] best = null;
        double bestCost = Double.POSITIVE_INFINITY;
        double secondCost = Double.POSITIVE_INFINITY;
        for (int[] perm : permutations(k)) {
            double cost = 0;
            for (int i = 0; i < k && cost < Double.POSITIVE_INFINITY; i++) {
                cost += pairCost(left.get(i), target[i], reach[i], groups.get(free.get(perm[i])).mean());
            }
            if (cost < bestCost) {
                secondCost = bestCost;
                bestCost = cost;
                best = perm;
            } else if (cost < secondCost) {
                secondCost = cost;
            }
        }
        if (best == null || bestCost == Double.POSITIVE_INFINITY) {
            return;
        }
        boolean anyStated = false;
        for (boolean b : stated) {
            anyStated |= b;
        }
        double needed = Math.max(CLEAR_RATIO * bestCost, bestCost + margin(!anyStated));
        if (k > 1 && secondCost < needed) {
            List<String> names = new ArrayList<>();
            List<String> values = new ArrayList<>();
            List<String> means = new ArrayList<>();
            for (int i = 0; i < k; i++) {
                names.add(left.get(i).name());
                values.add(String.format(Locale.ROOT, "%.3f", target[i]));
                means.add(String.format(Locale.ROOT, "%.3f", groups.get(free.get(i)).mean()));
            }
            String why = String.format(Locale.ROOT, "the groups at %s are %s in some order, but their %s values (%s)"
                            + " do not tell which: the closest pairing is %.3f units off in all, the next %.3f (a clear"
                            + " pairing needs %.3f); give approx_mobility or order for one of them",
                    String.join(", ", means), String.join(" and ", names), anyStated ? "reference" : "predicted",
                    String.join(", ", values), bestCost, secondCost, needed);
            // this one warning replaces the pairwise ones of step 3 about the same analytes
            warnings.removeIf(w -> w.kind() == BuildWarning.Kind.DOUBTFUL_REFERENCE_NAME && names.contains(w.analyte()));
            warnings.add(new BuildWarning(BuildWarning.Kind.DOUBTFUL_REFERENCE_NAME, mix.name(),
                    String.join(", ", names), null, "In mix " + mix.name() + ", " + why + "."));
            for (StandardAnalyte a : left) {
                reasons.put(a, why);
            }
            return;
        }
        for (int i = 0; i < k; i++) {
            assign(left.get(i), free.get(best[i]), NamingBasis.ELIMINATION);
            reasons.remove(left.get(i));
            String name = left.get(i).name();
            // the pairwise doubts of step 3 about this analyte are settled
            warnings.removeIf(w -> w.kind() == BuildWarning.Kind.DOUBTFUL_REFERENCE_NAME && name.equals(w.analyte()));
        }
    }

    /**
     * Distance of the pairing of analyte {@code a} (reference value {@code target}, NaN for none)
     * with a group of mean {@code mean}; infinite where the sign disagrees or the value is out of reach.
     */
    private double pairCost(StandardAnalyte a, double target, double reach, double mean) {
        if (!signAgrees(a.expectedSign(), mean)) {
            return Double.POSITIVE_INFINITY;
        }
        if (Double.isNaN(target)) {
            return 0.0;
        }
        double d = Math.abs(mean - target);
        return Math.signum(target) == Math.signum(mean) && d <= reach ? d : Double.POSITIVE_INFINITY;
    }

    /** All orderings of 0 … k − 1 (Heap's algorithm would do; k ≤ {@value #MAX_ELIMINATION}). */
    private static List<int[]> permutations(int k) {
        List<int[]> out = new ArrayList<>();
        permute(new int[k], new boolean[k], 0, out);
        return out;
    }

    private static void permute(int[] current, boolean[] used, int pos, List<int[]> out) {
        if (pos == current.length) {
            out.add(current.clone());
            return;
        }
        for (int v = 0; v < current.length; v++) {
            if (!used[v]) {
                used[v] = true;
                current[pos] = v;
                permute(current, used, pos + 1, out);
                used[v] = false;
            }
        }
    }

    private void withdrawWrongSigns(NamingBasis basis) {
        for (int g = 0; g < groups.size(); g++) {
            StandardAnalyte a = analyteOf[g];
            if (a != null && basisOf[g] == basis && !signAgrees(a.expectedSign(), groups.get(g).mean())) {
                warnings.add(new BuildWarning(BuildWarning.Kind.NAMING_CONFLICT, mix.name(), a.name(), null,
                        String.format(Locale.ROOT, "In mix %s, the group at %.3f that the %s would name %s has the"
                                        + " wrong sign for its charge; it was left unnamed.", mix.name(),
                                groups.get(g).mean(), basis == NamingBasis.ORDER ? "migration order" : "single-analyte rule",
                                a.name())));
                analyteOf[g] = null;
                basisOf[g] = null;
                groupOf.remove(a);
                reasons.put(a, "the peak group its position points to has the wrong mobility sign");
            }
        }
    }

    /** The reference entry of that name: exact first, else ignoring case. */
    static LibraryEntry findReference(Library reference, String name) {
        for (LibraryEntry e : reference.entries()) {
            if (e.name().equals(name)) {
                return e;
            }
        }
        for (LibraryEntry e : reference.entries()) {
            if (e.name().equalsIgnoreCase(name)) {
                return e;
            }
        }
        return null;
    }
}
