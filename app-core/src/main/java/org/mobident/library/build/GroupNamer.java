package org.mobident.library.build;

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
 *       one-to-one;</li>
 *   <li>a mix of one analyte that gave exactly one group.</li>
 * </ol>
 * A name from steps 2 or 4 whose group has the wrong mobility sign for the analyte's charge is
 * withdrawn with a {@link BuildWarning.Kind#NAMING_CONFLICT} warning.
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
     */
    record Naming(StandardAnalyte[] analyteOfGroup, NamingBasis[] basisOfGroup,
                  Map<StandardAnalyte, String> notFoundReasons, List<BuildWarning> warnings) {
    }

    private final StandardsMix mix;
    private final List<GroupInfo> groups;
    private final Library reference;
    private final BuildSettings settings;
    private final StandardAnalyte[] analyteOf;
    private final NamingBasis[] basisOf;
    private final Map<StandardAnalyte, Integer> groupOf = new HashMap<>();
    private final Map<StandardAnalyte, String> reasons = new HashMap<>();
    private final List<BuildWarning> warnings = new ArrayList<>();

    private GroupNamer(StandardsMix mix, List<GroupInfo> groups, Library reference, BuildSettings settings) {
        this.mix = mix;
        this.groups = groups;
        this.reference = reference;
        this.settings = settings;
        this.analyteOf = new StandardAnalyte[groups.size()];
        this.basisOf = new NamingBasis[groups.size()];
    }

    /**
     * @param mix       the mix
     * @param groups    its groups, ordered by mean mobility
     * @param reference reference library for naming, or null
     * @param settings  windows
     */
    static Naming name(StandardsMix mix, List<GroupInfo> groups, Library reference, BuildSettings settings) {
        GroupNamer n = new GroupNamer(mix, groups, reference, settings);
        n.byApproxMobility();
        n.byOrder();
        n.byReference();
        n.onlyAnalyte();
        return new Naming(n.analyteOf, n.basisOf, n.reasons, n.warnings);
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
        List<Integer> idx = new ArrayList<>();
        for (int i = 0; i < analytes.size(); i++) {
            idx.add(i);
        }
        idx.sort(Comparator.comparingDouble(target::get));
        List<Integer> free = freeGroupsByMobility();
        int[] partner = MonotoneMatcher.match(idx.size(), free.size(), (i, j) -> {
            int a = idx.get(i);
            double m = groups.get(free.get(j)).mean();
            double d = Math.abs(m - target.get(a));
            if (d > window.get(a) || !signAgrees(sign.get(a), m)) {
                return Double.POSITIVE_INFINITY;
            }
            double z = d / window.get(a);
            return z * z;
        }, 1.0);
        for (int i = 0; i < partner.length; i++) {
            if (partner[i] >= 0) {
                assign(analytes.get(idx.get(i)), free.get(partner[i]), basis);
            }
        }
    }

    private void byApproxMobility() {
        List<StandardAnalyte> as = new ArrayList<>();
        List<Double> target = new ArrayList<>();
        List<Double> window = new ArrayList<>();
        List<Integer> sign = new ArrayList<>();
        for (StandardAnalyte a : mix.analytes()) {
            if (a.hasApproxMobility()) {
                as.add(a);
                target.add(a.approxMobility());
                window.add(settings.approxWindow());
                sign.add(a.expectedSign());
            }
        }
        nearest(as, target, window, sign, NamingBasis.APPROX_MOBILITY);
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
        }
        nearest(as, target, window, sign, NamingBasis.REFERENCE_LIBRARY);
        for (StandardAnalyte a : as) {
            if (!groupOf.containsKey(a)) {
                reasons.putIfAbsent(a, "no peak group of the same charge sign within the window around its"
                        + " reference mobility");
            }
        }
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
