package org.mobident.library.standards;

import java.io.IOException;
import java.nio.file.NoSuchFileException;
import java.time.Instant;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Set;
import java.util.function.Function;
import org.apache.commons.math3.stat.descriptive.rank.Median;
import org.mobident.buffer.BufferConditions;
import org.mobident.chem.ReferenceIons;
import org.mobident.library.Library;
import org.mobident.library.LibraryCsv;
import org.mobident.library.LibraryEntry;
import org.mobident.result.PeakResult;
import org.mobident.result.PeakRole;
import org.mobident.result.RunResult;
import org.mobident.settings.MatchSettings;
import org.mobident.text.NumberText;
import org.mobident.trace.RunConditions;

/**
 * Builds a mobility library from replicate runs of standard mixtures.
 *
 * <p>For each mix, the analyte peaks of its runs are grouped into one group per zone, at most one
 * peak per run ({@link PeakAligner}); peaks lower than
 * {@link BuildSettings#minRelativeHeight()} of their run's largest are set aside first. Groups are
 * named from the standards sheet and the reference library ({@link GroupNamer}); unnamed groups are
 * reported, never entered. Per analyte (pooled over the mixes that hold it): mean, sample SD, n,
 * range, RSD, a Grubbs test for one outlying replicate ({@link Grubbs}, ASTM E178) and the match
 * window max(k·SD, floor). The library's notes record conditions and provenance: build date and
 * tool, standards sheet, buffer, temperature, lengths and voltage (or "mixed"), the method settings,
 * and every run's trace file with its SHA-256.
 *
 * <p>The build never fails on questionable data; it reports {@link BuildWarning}s instead.
 */
public final class LibraryBuilder {
    private static final double PERCENT = 100.0;

    /** Label of {@link Library#sourceFile()} for a built library, followed by the standards sheet. */
    public static final String SOURCE_LABEL = "built from standards ";

    /** Relative difference under which two conditions count as the same (they come from one sheet). */
    private static final double SAME_CONDITION_RELATIVE = 1e-9;

    /**
     * A Grubbs outlier whose own stated uncertainty (its peak's mobility SD: timing, shape and
     * boundaries) is more than this many times the median of the other replicates' is left out of
     * the statistics even when outliers are kept: the measurement itself says it is poor, the
     * assignable cause under which ASTM E178 allows a value to be rejected. A modelling choice: an
     * SD ratio of 3 is a variance ratio of 9, far beyond the scatter of SDs between replicate peaks
     * of one standard.
     */
    static final double POORLY_MEASURED_RATIO = 3.0;

    private LibraryBuilder() {
    }

    /**
     * Builds with the current time and the version of this package as the stamp.
     *
     * @see #build(List, Map, StandardsSheet, BuildSettings, Library, BuildStamp)
     */
    public static BuildResult build(List<RunResult> runs, Map<String, String> mixByRun, StandardsSheet sheet,
                                    BuildSettings settings, Library reference) {
        String version = LibraryBuilder.class.getPackage().getImplementationVersion();
        return build(runs, mixByRun, sheet, settings, reference,
                new BuildStamp(Instant.now(), "mobident " + (version == null ? "(development build)" : version)));
    }

    /**
     * Builds a library.
     *
     * @param runs      the processed standards runs (failed runs and runs without a mobility scale are
     *                  reported and left out)
     * @param mixByRun  run name → mix name (the run sheet's {@code sample} column)
     * @param sheet     the mixes and their analytes
     * @param settings  method settings
     * @param reference reference library used to name groups (may be null)
     * @param stamp     build date and tool version for the notes
     * @return the library with statistics, outliers, unexpected peaks and warnings
     */
    public static BuildResult build(List<RunResult> runs, Map<String, String> mixByRun, StandardsSheet sheet,
                                    BuildSettings settings, Library reference, BuildStamp stamp) {
        return new Build(mixByRun, sheet, settings, reference, Double.NaN, Double.NaN, stamp).run(runs);
    }

    /**
     * Builds a library from standards run in a buffer of known pH and ionic strength. The reference
     * library (limiting mobilities) is first turned into the effective mobilities predicted for that
     * buffer at the runs' temperature ({@link ReferenceIons#effectiveAt}), and groups are named against
     * those; entries that cannot be modelled are compared as stated, with the stricter rule of
     * {@link GroupNamer}. The pH and ionic strength are recorded on every entry
     * ({@link #withBufferChemistry}). With either unknown (NaN), reference values are compared as
     * stated and a {@link BuildWarning.Kind#REFERENCE_AS_STATED} warning says so.
     *
     * @param pH              buffer pH (NaN: not given)
     * @param ionicStrengthMm buffer ionic strength in mmol/L (NaN: not given)
     * @see #build(List, Map, StandardsSheet, BuildSettings, Library, BuildStamp)
     */
    public static BuildResult build(List<RunResult> runs, Map<String, String> mixByRun, StandardsSheet sheet,
                                    BuildSettings settings, Library reference, double pH, double ionicStrengthMm,
                                    BuildStamp stamp) {
        BuildResult b = new Build(mixByRun, sheet, settings, reference, pH, ionicStrengthMm, stamp).run(runs);
        return new BuildResult(withBufferChemistry(b.library(), pH, ionicStrengthMm), b.analytes(), b.outliers(),
                b.unexpectedPeaks(), b.warnings(), b.usedRuns(), b.settings(), b.stamp());
    }

    /** As {@link #build(List, Map, StandardsSheet, BuildSettings, Library, double, double, BuildStamp)}, stamped now. */
    public static BuildResult build(List<RunResult> runs, Map<String, String> mixByRun, StandardsSheet sheet,
                                    BuildSettings settings, Library reference, double pH, double ionicStrengthMm) {
        String version = LibraryBuilder.class.getPackage().getImplementationVersion();
        return build(runs, mixByRun, sheet, settings, reference, pH, ionicStrengthMm,
                new BuildStamp(Instant.now(), "mobident " + (version == null ? "(development build)" : version)));
    }

    /**
     * The library with the buffer's pH and ionic strength recorded on every entry that states
     * none, and a note saying so. The run sheet does not carry them, so the analyst gives them;
     * the recheck of a later buffer change needs them.
     *
     * @param pH              buffer pH (NaN: not given)
     * @param ionicStrengthMm buffer ionic strength in mmol/L (NaN: not given)
     */
    public static Library withBufferChemistry(Library library, double pH, double ionicStrengthMm) {
        if (Double.isNaN(pH) && Double.isNaN(ionicStrengthMm)) {
            return library;
        }
        java.util.List<org.mobident.library.LibraryEntry> entries = new java.util.ArrayList<>();
        for (org.mobident.library.LibraryEntry e : library.entries()) {
            entries.add(new org.mobident.library.LibraryEntry(e.name(), e.mobility(), e.mobilitySd(), e.n(),
                    e.charge(), e.tolerance(), e.pKa(), e.limitingMobilities(), e.buffer(),
                    Double.isNaN(e.pH()) ? pH : e.pH(),
                    Double.isNaN(e.ionicStrengthMm()) ? ionicStrengthMm : e.ionicStrengthMm(),
                    e.temperatureC(), e.source()));
        }
        java.util.List<String> notes = new java.util.ArrayList<>(library.notes());
        notes.add(String.format(java.util.Locale.ROOT, "Buffer chemistry (as stated by the analyst): pH %s, ionic strength %s mmol/L",
                Double.isNaN(pH) ? "not given" : Double.toString(pH),
                Double.isNaN(ionicStrengthMm) ? "not given" : Double.toString(ionicStrengthMm)));
        return new Library(entries, library.sourceFile(), notes);
    }

    /** The state of one build; not shared. */
    private static final class Build {
        private final Map<String, String> mixByRun;
        private final StandardsSheet sheet;
        private final BuildSettings settings;
        private final Library reference;
        private final double pH;
        private final double ionicStrengthMm;
        /** The reference as compared: predicted for the buffer where possible; null without reference. */
        private Library namingReference;
        /** Lower-case names of the entries of {@link #namingReference} predicted for the buffer. */
        private final Set<String> predicted = new java.util.HashSet<>();
        /** Why the reference could not be predicted for the buffer (null when it was). */
        private String notPredictedWhy;
        /** Analytes whose reference value was compared as stated, in first-seen order. */
        private final Set<String> comparedAsStated = new LinkedHashSet<>();
        private final BuildStamp stamp;
        private final List<BuildWarning> warnings = new ArrayList<>();
        private final List<UnexpectedPeak> unexpected = new ArrayList<>();
        private final List<Outlier> outliers = new ArrayList<>();
        private final List<RunResult> used = new ArrayList<>();
        /** Mix name (as in the sheet) → its usable runs. */
        private final Map<String, List<RunResult>> runsByMix = new LinkedHashMap<>();
        /** Analyte key (lower case) → the pooled data of that analyte. */
        private final Map<String, Pool> pools = new LinkedHashMap<>();
        /** Analyte name (lower case) → the pool that carries the sheet's pKa and limiting mobilities. */
        private final Map<String, Pool> modelData = new HashMap<>();

        /** Everything found for one analyte across mixes. */
        private static final class Pool {
            final String name;
            final List<String> mixes = new ArrayList<>();
            final List<Measurement> measurements = new ArrayList<>();
            NamingBasis basis;
            int chargeNumber;
            int chargeSign;
            /** The sheet's model data for the analyte (empty when none). */
            List<Double> pKa = List.of();
            List<Double> limitingMobilities = List.of();

            Pool(String name) {
                this.name = name;
            }
        }

        Build(Map<String, String> mixByRun, StandardsSheet sheet, BuildSettings settings, Library reference,
              double pH, double ionicStrengthMm, BuildStamp stamp) {
            this.mixByRun = mixByRun;
            this.sheet = sheet;
            this.settings = settings;
            this.reference = reference;
            this.pH = pH;
            this.ionicStrengthMm = ionicStrengthMm;
            this.stamp = stamp;
        }

        BuildResult run(List<RunResult> runs) {
            for (StandardsMix m : sheet.mixes()) {
                runsByMix.put(m.name(), new ArrayList<>());
            }
            for (RunResult r : runs) {
                admit(r);
            }
            // one pool per analyte and buffer: a standards sheet may hold the mixes of several methods
            for (StandardsMix m : sheet.mixes()) {
                for (StandardAnalyte a : m.analytes()) {
                    pools.computeIfAbsent(poolKey(a.name(), m), k -> new Pool(a.name()));
                }
            }
            prepareReference();
            Map<String, Integer> runOrder = new LinkedHashMap<>();
            for (RunResult r : used) {
                runOrder.put(r.spec().name(), runOrder.size());
            }
            for (StandardsMix m : sheet.mixes()) {
                buildMix(m, runsByMix.get(m.name()));
            }
            conditionWarnings();
            referenceWarning();
            List<AnalyteStats> stats = new ArrayList<>();
            List<LibraryEntry> entries = new ArrayList<>();
            for (Pool p : pools.values()) {
                if (p.measurements.isEmpty()) {
                    continue;
                }
                p.measurements.sort((a, b) -> Integer.compare(runOrder.get(a.run()), runOrder.get(b.run())));
                AnalyteStats s = statistics(p);
                stats.add(s);
                entries.add(entry(s));
            }
            double[] applied = LibraryCheck.windows(new Library(entries, "built", List.of()), MatchSettings.DEFAULT);
            for (int k = 0; k < stats.size(); k++) {
                stats.set(k, stats.get(k).withWindow(applied[k]));
            }
            warnings.addAll(WindowOverlaps.check(entries, applied));
            Library library = new Library(entries, SOURCE_LABEL + sheet.sourceFile(), notes());
            List<String> usedNames = used.stream().map(r -> r.spec().name()).toList();
            return new BuildResult(library, stats, outliers, unexpected, warnings, usedNames, settings, stamp);
        }

        /**
         * The reference as groups are compared with it: with pH and ionic strength known, each
         * modellable entry is replaced by its effective mobility predicted for the buffer at the runs'
         * (mean) temperature, 25 °C when the runs state none.
         */
        private void prepareReference() {
            namingReference = reference;
            if (reference == null) {
                return;
            }
            if (Double.isNaN(pH) || Double.isNaN(ionicStrengthMm)) {
                notPredictedWhy = "the buffer's " + (Double.isNaN(pH) && Double.isNaN(ionicStrengthMm)
                        ? "pH and ionic strength were" : Double.isNaN(pH) ? "pH was" : "ionic strength was")
                        + " not given (options --ph and --ionic-strength-mm)";
                return;
            }
            List<Double> temps = distinct(used.stream().map(r -> r.spec().conditions()).toList(),
                    RunConditions::temperatureC);
            double t = temps.isEmpty() ? BufferConditions.REFERENCE_TEMPERATURE_C
                    : temps.stream().mapToDouble(Double::doubleValue).average().orElseThrow();
            BufferConditions buffer;
            try {
                buffer = new BufferConditions(pH, ionicStrengthMm / 1000.0, t);
            } catch (IllegalArgumentException e) {
                notPredictedWhy = "the buffer is outside the range of the mobility model (" + e.getMessage() + ")";
                return;
            }
            namingReference = ReferenceIons.effectiveAt(reference, buffer);
            for (int i = 0; i < reference.size(); i++) {
                if (!namingReference.entries().get(i).equals(reference.entries().get(i))) {
                    predicted.add(key(reference.entries().get(i).name()));
                }
            }
            notPredictedWhy = "the mobility model cannot describe them (no charge, inconsistent pKa or mobility"
                    + " lists, or a value measured at a stated ionic strength)";
        }

        /** One warning listing the analytes whose reference value was compared as stated. */
        private void referenceWarning() {
            if (comparedAsStated.isEmpty()) {
                return;
            }
            warnings.add(new BuildWarning(BuildWarning.Kind.REFERENCE_AS_STATED, null,
                    String.join(", ", comparedAsStated), null, "The reference values of "
                    + String.join(", ", comparedAsStated) + " were compared as stated (limiting, infinite-dilution"
                    + " mobilities in a reference such as ions-25C.csv), not predicted for the standards' buffer,"
                    + " because " + notPredictedWhy + "; effective mobilities in a buffer are several units"
                    + " smaller, so only clear pairings were named (" + NumberText.plain(
                    settings.referenceWindow() / 2.0, "-") + " units of clearance). Give the buffer's pH and ionic"
                    + " strength, or approx_mobility or order in the standards sheet, to name the rest."));
        }

        private void admit(RunResult r) {
            String name = r.spec().name();
            if (r.failed()) {
                warnings.add(new BuildWarning(BuildWarning.Kind.RUN_FAILED, null, null, name,
                        "Run " + name + " was left out: it could not be processed (" + r.error().getMessage() + ")."));
                return;
            }
            String mixName = mixByRun.get(name);
            StandardsMix mix = sheet.mix(mixName).orElse(null);
            if (mix == null) {
                String why = mixName == null || mixName.isBlank() ? "it names no standard mix"
                        : "its mix '" + mixName.strip() + "' is not in the standards sheet " + sheet.sourceFile();
                warnings.add(new BuildWarning(BuildWarning.Kind.RUN_WITHOUT_MIX, mixName, null, name,
                        "Run " + name + " was left out: " + why + "."));
                return;
            }
            boolean anyAnalyte = false;
            boolean anyMobility = false;
            for (PeakResult p : r.peaks()) {
                if (p.role() == PeakRole.ANALYTE) {
                    anyAnalyte = true;
                    anyMobility |= Double.isFinite(p.mobility());
                }
            }
            if (!r.mobilityKnown() || (anyAnalyte && !anyMobility)) {
                warnings.add(new BuildWarning(BuildWarning.Kind.NO_MOBILITY_SCALE, mix.name(), null, name,
                        "Run " + name + " was left out: it has no mobility scale (" + r.scaleNote() + ")."));
                return;
            }
            used.add(r);
            runsByMix.get(mix.name()).add(r);
        }

        private void buildMix(StandardsMix mix, List<RunResult> runs) {
            if (runs.isEmpty()) {
                for (StandardAnalyte a : mix.analytes()) {
                    warnings.add(new BuildWarning(BuildWarning.Kind.ANALYTE_NOT_FOUND, mix.name(), a.name(), null,
                            "Analyte " + a.name() + " of mix " + mix.name() + " was not found: no usable run of"
                                    + " this mix."));
                }
                return;
            }
            List<List<Measurement>> perRun = new ArrayList<>();
            for (RunResult r : runs) {
                perRun.add(measurements(mix, r));
            }
            List<List<Measurement>> groups = PeakAligner.group(perRun, settings.groupingSdMultiple(),
                    settings.groupingFloor());
            int[] rank = migrationRanks(groups, runs);
            List<GroupNamer.GroupInfo> infos = new ArrayList<>();
            for (int g = 0; g < groups.size(); g++) {
                List<Measurement> ms = groups.get(g);
                double h = 0;
                for (Measurement m : ms) {
                    h += m.relativeHeight();
                }
                infos.add(new GroupNamer.GroupInfo(PeakAligner.meanOf(ms), ms.size(), h / ms.size(), rank[g]));
            }
            GroupNamer.Naming naming = GroupNamer.name(mix, infos, namingReference, predicted, settings);
            warnings.addAll(naming.warnings());
            comparedAsStated.addAll(naming.comparedAsStated());
            Set<StandardAnalyte> found = new LinkedHashSet<>();
            for (int g = 0; g < groups.size(); g++) {
                StandardAnalyte a = naming.analyteOfGroup()[g];
                if (a != null) {
                    found.add(a);
                    Pool p = pools.get(poolKey(a.name(), mix));
                    p.mixes.add(mix.name());
                    p.measurements.addAll(groups.get(g));
                    if (p.basis == null) {
                        p.basis = naming.basisOfGroup()[g];
                    }
                    if (p.chargeNumber == 0) {
                        p.chargeNumber = a.chargeNumber();
                    }
                    if (p.chargeSign == 0) {
                        p.chargeSign = a.chargeSign();
                    }
                    if (p.limitingMobilities.isEmpty() && a.hasModelData()) {
                        p.pKa = a.pKa();
                        p.limitingMobilities = a.limitingMobilities();
                        modelData.put(a.name().toLowerCase(Locale.ROOT), p);
                    }
                }
            }
            List<String> unnamedAnalytes = new ArrayList<>();
            for (StandardAnalyte a : mix.analytes()) {
                if (!found.contains(a)) {
                    unnamedAnalytes.add(a.name());
                }
            }
            for (int g = 0; g < groups.size(); g++) {
                if (naming.analyteOfGroup()[g] == null) {
                    unnamedGroup(mix, groups.get(g), infos.get(g), unnamedAnalytes);
                }
            }
            for (StandardAnalyte a : mix.analytes()) {
                if (!found.contains(a)) {
                    String why = naming.notFoundReasons().get(a);
                    warnings.add(new BuildWarning(BuildWarning.Kind.ANALYTE_NOT_FOUND, mix.name(), a.name(), null,
                            "Analyte " + a.name() + " of mix " + mix.name() + " was not found in its " + runs.size()
                                    + " run(s)" + (why == null ? "" : ": " + why) + "."));
                }
            }
        }

        /** The pool of an analyte of a mix: its name within the buffer the mix's runs were made in. */
        private String poolKey(String name, StandardsMix mix) {
            String buffer = null;
            for (RunResult r : runsByMix.getOrDefault(mix.name(), List.of())) {
                String b = r.spec().conditions().buffer();
                if (b != null && !b.isBlank()) {
                    buffer = b.strip().toLowerCase(Locale.ROOT);
                    break;
                }
            }
            return key(name) + "\u0000" + (buffer == null ? "" : buffer);
        }

        /** The run's analyte peaks with a mobility; small ones are set aside as unexpected. */
        private List<Measurement> measurements(StandardsMix mix, RunResult r) {
            String run = r.spec().name();
            double maxHeight = 0;
            for (PeakResult p : r.peaks()) {
                if (p.role() == PeakRole.ANALYTE && Double.isFinite(p.mobility())) {
                    maxHeight = Math.max(maxHeight, p.peak().height());
                }
            }
            List<Measurement> kept = new ArrayList<>();
            List<String> small = new ArrayList<>();
            for (PeakResult p : r.peaks()) {
                if (p.role() != PeakRole.ANALYTE || !Double.isFinite(p.mobility())) {
                    continue;
                }
                double rel = maxHeight > 0 ? p.peak().height() / maxHeight : 1.0;
                if (rel < settings.minRelativeHeight()) {
                    unexpected.add(new UnexpectedPeak(mix.name(), run, p.peak().apexTimeS(), p.mobility(),
                            "smaller than " + percent(settings.minRelativeHeight()) + " of the run's largest peak"));
                    small.add(String.format(Locale.ROOT, "%.2f s (%.3f)", p.peak().apexTimeS(), p.mobility()));
                    continue;
                }
                kept.add(new Measurement(run, p.mobility(), p.mobilitySd(), p.peak().apexTimeS(), p.peak().height(),
                        rel));
            }
            if (!small.isEmpty()) {
                warnings.add(new BuildWarning(BuildWarning.Kind.UNEXPECTED_PEAK, mix.name(), null, run,
                        "Run " + run + ": " + small.size() + " peak(s) smaller than "
                                + percent(settings.minRelativeHeight()) + " of the largest were not used: "
                                + String.join(", ", small) + "."));
            }
            return kept;
        }

        private void unnamedGroup(StandardsMix mix, List<Measurement> group, GroupNamer.GroupInfo info,
                                  List<String> unnamedAnalytes) {
            boolean analytesLeft = !unnamedAnalytes.isEmpty();
            List<String> runs = group.stream().map(Measurement::run).toList();
            String reason = analytesLeft ? "probably an analyte of the mix, but nothing tells which"
                    : "fits no expected analyte of the mix";
            for (Measurement m : group) {
                unexpected.add(new UnexpectedPeak(mix.name(), m.run(), m.apexTimeS(), m.mobility(), reason));
            }
            StringBuilder msg = new StringBuilder(String.format(Locale.ROOT,
                    "Mix %s: a peak at mobility %.3f (in %d run(s): %s) ", mix.name(), info.mean(), runs.size(),
                    String.join(", ", runs)));
            msg.append(analytesLeft ? "could not be named (the mix's analytes not yet named: "
                    + String.join(", ", unnamedAnalytes) + "): give approx_mobility or order in the standards sheet"
                    : "fits no expected analyte and was not entered");
            LibraryEntry near = analytesLeft ? null : nearestReference(info.mean());
            if (near != null) {
                msg.append(String.format(Locale.ROOT, "; nearest reference entry: %s (%.3f%s)", near.name(),
                        near.mobility(), predicted.contains(key(near.name())) ? ", predicted for the buffer" : ""));
            }
            msg.append('.');
            warnings.add(new BuildWarning(analytesLeft ? BuildWarning.Kind.UNNAMED_GROUP
                    : BuildWarning.Kind.UNEXPECTED_PEAK, mix.name(), null, null, msg.toString()));
        }

        /** The reference entry nearest to a mobility, of the same sign and within the window, or null. */
        private LibraryEntry nearestReference(double mobility) {
            if (namingReference == null) {
                return null;
            }
            LibraryEntry best = null;
            for (LibraryEntry e : namingReference.entries()) {
                double d = Math.abs(e.mobility() - mobility);
                double window = Math.max(settings.referenceWindow(), Double.isFinite(e.tolerance()) ? e.tolerance() : 0);
                if (Math.signum(e.mobility()) == Math.signum(mobility) && d <= window
                        && (best == null || d < Math.abs(best.mobility() - mobility))) {
                    best = e;
                }
            }
            return best;
        }

        /**
         * Rank of each group in migration order (0 = first at the detector). Within a run, migration
         * order is monotonic in mobility; its direction is read from the runs (time against mobility
         * of consecutive grouped peaks) and, without such pairs, from the voltage sign: with normal
         * polarity the zone of highest mobility arrives first.
         */
        private int[] migrationRanks(List<List<Measurement>> groups, List<RunResult> runs) {
            int vote = 0;
            Map<String, List<Measurement>> byRun = new LinkedHashMap<>();
            for (List<Measurement> g : groups) {
                for (Measurement m : g) {
                    byRun.computeIfAbsent(m.run(), k -> new ArrayList<>()).add(m);
                }
            }
            for (List<Measurement> ms : byRun.values()) {
                ms.sort((a, b) -> Double.compare(a.mobility(), b.mobility()));
                for (int i = 1; i < ms.size(); i++) {
                    vote += (int) Math.signum(ms.get(i).apexTimeS() - ms.get(i - 1).apexTimeS());
                }
            }
            boolean laterWithHigherMobility;
            if (vote != 0) {
                laterWithHigherMobility = vote > 0;
            } else {
                double v = runs.get(0).spec().conditions().voltageKv();
                laterWithHigherMobility = v < 0;
            }
            int[] rank = new int[groups.size()];
            for (int g = 0; g < groups.size(); g++) {
                rank[g] = laterWithHigherMobility ? g : groups.size() - 1 - g;
            }
            return rank;
        }

        private AnalyteStats statistics(Pool p) {
            List<Measurement> ms = p.measurements;
            double[] all = values(ms);
            Grubbs.Result g = Grubbs.test(all, settings.outlierAlpha(), settings.outlierAlternative());
            List<Outlier> found = new ArrayList<>();
            int skip = -1;
            if (g != null && g.outlier()) {
                Measurement m = ms.get(g.index());
                double ratio = ownUncertaintyRatio(ms, g.index());
                boolean poorlyMeasured = ratio > POORLY_MEASURED_RATIO;
                boolean exclude = settings.excludeOutliers() || poorlyMeasured;
                Outlier o = new Outlier(p.name, m.run(), m.mobility(), g.g(), g.gCritical(), exclude);
                found.add(o);
                outliers.add(o);
                if (exclude) {
                    skip = g.index();
                }
                String cause = poorlyMeasured ? String.format(Locale.ROOT,
                        " (its own uncertainty +/- %.3f is %.1f times the other replicates' median: a poorly measured"
                                + " peak, an assignable cause)", m.mobilitySd(), ratio) : "";
                warnings.add(new BuildWarning(BuildWarning.Kind.OUTLIER, String.join(", ", p.mixes), p.name, m.run(),
                        String.format(Locale.ROOT, "%s: the value %.3f of run %s is an outlier by the Grubbs test"
                                        + " (G = %.3f > %.3f, %s, alpha %s, n = %d); it was %s the statistics%s.",
                                p.name, m.mobility(), m.run(), g.g(), g.gCritical(), alternative(),
                                NumberText.plain(settings.outlierAlpha(), "-"), all.length,
                                exclude ? "left out of" : "kept in", cause)));
            }
            List<Double> kept = new ArrayList<>();
            List<String> runs = new ArrayList<>();
            for (int i = 0; i < ms.size(); i++) {
                if (i != skip) {
                    kept.add(ms.get(i).mobility());
                    if (!runs.contains(ms.get(i).run())) {
                        runs.add(ms.get(i).run());
                    }
                }
            }
            double[] v = kept.stream().mapToDouble(Double::doubleValue).toArray();
            ReplicateStatistics s = ReplicateStatistics.of(v);
            double min = Double.POSITIVE_INFINITY;
            double max = Double.NEGATIVE_INFINITY;
            for (double x : v) {
                min = Math.min(min, x);
                max = Math.max(max, x);
            }
            double tol = settings.toleranceFor(s.sd());
            double rsd = s.rsdPercent();
            String mixes = String.join(", ", p.mixes);
            if (s.n() < settings.minReplicates()) {
                warnings.add(new BuildWarning(BuildWarning.Kind.FEW_REPLICATES, mixes, p.name, null,
                        p.name + ": only " + s.n() + " replicate(s), fewer than " + settings.minReplicates()
                                + "; its spread and window are poorly known."));
            }
            if (rsd > settings.rsdLimitPercent()) {
                warnings.add(new BuildWarning(BuildWarning.Kind.HIGH_RSD, mixes, p.name, null,
                        String.format(Locale.ROOT, "%s: replicate RSD %.2f %% is above the limit of %s %%.", p.name,
                                rsd, NumberText.plain(settings.rsdLimitPercent(), "-"))));
            }
            // the sheet's charge number, or 0 (unknown): a sign alone is no charge number
            int charge = p.chargeNumber;
            if (p.chargeSign != 0 && Math.signum(s.mean()) != 0 && Math.signum(s.mean()) != p.chargeSign) {
                warnings.add(new BuildWarning(BuildWarning.Kind.NAMING_CONFLICT, mixes, p.name, null,
                        String.format(Locale.ROOT, "%s: the measured mobility %.3f has the opposite sign to its"
                                + " charge in the standards sheet.", p.name, s.mean())));
            }
            return new AnalyteStats(p.name, p.mixes, p.basis, ms, s.n(), s.mean(), s.sd(), min, max, rsd, tol,
                    charge, runs, found, Double.NaN);
        }

        /**
         * The stated uncertainty of replicate {@code index} over the median of the other replicates'
         * (NaN when either is unknown or zero).
         */
        private static double ownUncertaintyRatio(List<Measurement> ms, int index) {
            double[] others = new double[ms.size() - 1];
            int k = 0;
            for (int i = 0; i < ms.size(); i++) {
                if (i != index) {
                    others[k++] = ms.get(i).mobilitySd();
                }
            }
            double median = new Median().evaluate(others);
            double own = ms.get(index).mobilitySd();
            return median > 0 && Double.isFinite(median) && Double.isFinite(own) ? own / median : Double.NaN;
        }

        private LibraryEntry entry(AnalyteStats s) {
            List<RunConditions> cs = new ArrayList<>();
            for (String run : s.runs()) {
                for (RunResult r : used) {
                    if (r.spec().name().equals(run)) {
                        cs.add(r.spec().conditions());
                    }
                }
            }
            Set<String> buffers = new LinkedHashSet<>();
            for (RunConditions c : cs) {
                if (c.buffer() != null) {
                    buffers.add(c.buffer().strip());
                }
            }
            String buffer = buffers.isEmpty() ? null : buffers.size() == 1 ? buffers.iterator().next() : "mixed";
            List<Double> temps = distinct(cs, RunConditions::temperatureC);
            double temperature;
            if (temps.isEmpty()) {
                temperature = Double.NaN;
            } else if (temps.size() == 1) {
                temperature = temps.get(0);
            } else {
                double sum = 0;
                int n = 0;
                for (RunConditions c : cs) {
                    if (Double.isFinite(c.temperatureC())) {
                        sum += c.temperatureC();
                        n++;
                    }
                }
                temperature = sum / n;
            }
            Pool model = modelData.get(s.name().toLowerCase(Locale.ROOT));
            List<Double> pKa = model == null ? List.of() : model.pKa;
            List<Double> limiting = model == null ? List.of() : model.limitingMobilities;
            if (!limiting.isEmpty() && Double.isFinite(temperature)
                    && temperature != org.mobident.buffer.BufferConditions.REFERENCE_TEMPERATURE_C) {
                // the sheet states them at 25 °C; the library column holds them at the entry's temperature
                List<Double> atT = new ArrayList<>(limiting.size());
                for (double mu : limiting) {
                    atT.add(org.mobident.mobility.MobilityMath.atTemperature(mu,
                            org.mobident.buffer.BufferConditions.REFERENCE_TEMPERATURE_C, temperature));
                }
                limiting = atT;
            }
            return new LibraryEntry(s.name(), LibraryCsv.computedValue(s.mean()), LibraryCsv.computedValue(s.sd()), s.n(),
                    s.charge(), LibraryCsv.computedValue(s.tolerance()), pKa, limiting,
                    buffer, Double.NaN, Double.NaN, temperature, source(s.runs())
                            + (model == null ? "" : "; pka and limiting_mobility from the standards sheet"));
        }

        private String source(List<String> runs) {
            if (runs.size() <= settings.maxRunsInSource()) {
                return "standards: " + String.join(", ", runs);
            }
            return "standards: " + runs.size() + " runs, " + runs.get(0) + " ... " + runs.get(runs.size() - 1);
        }

        private void conditionWarnings() {
            List<RunConditions> cs = used.stream().map(r -> r.spec().conditions()).toList();
            List<String> differing = new ArrayList<>();
            Set<String> buffers = new LinkedHashSet<>();
            for (RunConditions c : cs) {
                buffers.add(c.buffer() == null ? "(none)" : c.buffer().strip());
            }
            if (buffers.size() > 1) {
                differing.add("buffer (" + String.join("; ", buffers) + ")");
            }
            addIfMixed(differing, "temperature", cs, RunConditions::temperatureC, " °C");
            addIfMixed(differing, "total length", cs, RunConditions::totalLengthCm, " cm");
            addIfMixed(differing, "detector length", cs, RunConditions::detectorLengthCm, " cm");
            addIfMixed(differing, "voltage", cs, RunConditions::voltageKv, " kV");
            if (!differing.isEmpty()) {
                warnings.add(new BuildWarning(BuildWarning.Kind.MIXED_CONDITIONS, null, null, null,
                        "The standards runs differ in " + String.join(", ", differing)
                                + "; mobilities from different conditions were pooled."));
            }
        }

        private static void addIfMixed(List<String> out, String what, List<RunConditions> cs,
                                       Function<RunConditions, Double> get, String unit) {
            List<Double> d = distinct(cs, get);
            if (d.size() > 1) {
                out.add(what + " (" + String.join("; ", d.stream().map(x -> NumberText.plain(x, "-") + unit).toList())
                        + ")");
            }
        }

        /** The distinct finite values of one condition, in first-seen order. */
        private static List<Double> distinct(List<RunConditions> cs, Function<RunConditions, Double> get) {
            List<Double> out = new ArrayList<>();
            for (RunConditions c : cs) {
                double v = get.apply(c);
                if (!Double.isFinite(v)) {
                    continue;
                }
                boolean seen = false;
                for (double o : out) {
                    seen |= Math.abs(o - v) <= SAME_CONDITION_RELATIVE * Math.max(Math.abs(o), Math.abs(v));
                }
                if (!seen) {
                    out.add(v);
                }
            }
            return out;
        }

        private List<String> notes() {
            List<String> notes = new ArrayList<>();
            notes.add("Mobility library built from standards runs by " + stamp.toolVersion() + " on "
                    + stamp.builtAt());
            notes.add("Mobility in 1e-9 m^2/(V s), signed (cations +, anions -); mobility_sd is the SD between"
                    + " replicate runs; " + (settings.writesTolerance() ? "fixed windows written as tolerance = max("
                    + NumberText.plain(settings.toleranceSdMultiple(), "-") + " x SD, "
                    + NumberText.plain(settings.toleranceFloor(), "-") + ")"
                    : "no fixed windows: identification applies its prediction interval (see 'mobident library check')"));
            notes.add("Standards sheet: " + sheet.sourceFile());
            List<RunConditions> cs = used.stream().map(r -> r.spec().conditions()).toList();
            Set<String> buffers = new LinkedHashSet<>();
            for (RunConditions c : cs) {
                if (c.buffer() != null) {
                    buffers.add(c.buffer().strip());
                }
            }
            notes.add("Buffer: " + (buffers.isEmpty() ? "not given" : buffers.size() == 1 ? buffers.iterator().next()
                    : "mixed (" + String.join("; ", buffers) + ")"));
            notes.add("Temperature: " + condition(cs, RunConditions::temperatureC, " °C"));
            notes.add("Total length: " + condition(cs, RunConditions::totalLengthCm, " cm")
                    + "; detector length: " + condition(cs, RunConditions::detectorLengthCm, " cm")
                    + "; voltage: " + condition(cs, RunConditions::voltageKv, " kV"));
            notes.add("Replicate outliers: Grubbs test (ASTM E178), " + alternative() + ", alpha "
                    + NumberText.plain(settings.outlierAlpha(), "-") + "; outliers are reported and "
                    + (settings.excludeOutliers() ? "left out of the statistics"
                            : "kept in the statistics unless their own uncertainty is over "
                                    + NumberText.plain(POORLY_MEASURED_RATIO, "-")
                                    + " times the other replicates' median"));
            notes.add("Peaks below " + percent(settings.minRelativeHeight()) + " of their run's largest were set"
                    + " aside; replicate peaks were grouped by optimal one-to-one alignment of each run to the"
                    + " group centres (join within max(" + NumberText.plain(settings.groupingSdMultiple(), "-")
                    + " x peak SD, "
                    + NumberText.plain(settings.groupingFloor(), "-") + "))");
            for (StandardsMix m : sheet.mixes()) {
                List<RunResult> rs = runsByMix.get(m.name());
                if (!rs.isEmpty()) {
                    notes.add("Mix " + m.name() + ": runs " + String.join(", ",
                            rs.stream().map(r -> r.spec().name()).toList()));
                }
            }
            for (RunResult r : used) {
                String hash;
                try {
                    hash = "sha256 " + TraceHash.sha256Hex(r.spec().traceFile());
                } catch (IOException | RuntimeException e) {
                    hash = "sha256 not available";
                    warnings.add(new BuildWarning(BuildWarning.Kind.TRACE_NOT_HASHED, null, null, r.spec().name(),
                            "The trace file of run " + r.spec().name() + " could not be read for its SHA-256 ("
                                    + (e instanceof NoSuchFileException ? "file not found: " + r.spec().traceFile()
                                    : e.getMessage()) + "); the provenance note lacks it."));
                }
                notes.add("Run " + r.spec().name() + ": file " + fileName(r) + ", " + hash);
            }
            return notes;
        }

        private static String fileName(RunResult r) {
            return r.spec().traceFile() == null || r.spec().traceFile().getFileName() == null ? "(none)"
                    : r.spec().traceFile().getFileName().toString();
        }

        private static String condition(List<RunConditions> cs, Function<RunConditions, Double> get, String unit) {
            List<Double> d = distinct(cs, get);
            if (d.isEmpty()) {
                return "not given";
            }
            if (d.size() == 1) {
                return NumberText.plain(d.get(0), "-") + unit;
            }
            return "mixed (" + String.join("; ", d.stream().map(x -> NumberText.plain(x, "-") + unit).toList()) + ")";
        }

        private String alternative() {
            return switch (settings.outlierAlternative()) {
                case TWO_SIDED -> "two-sided";
                case LARGEST -> "one-sided (largest value)";
                case SMALLEST -> "one-sided (smallest value)";
            };
        }
    }

    static String key(String name) {
        return name.strip().toLowerCase(Locale.ROOT);
    }

    static double[] values(List<Measurement> ms) {
        double[] v = new double[ms.size()];
        for (int i = 0; i < v.length; i++) {
            v[i] = ms.get(i).mobility();
        }
        return v;
    }

    /** A fraction as a percentage as short as it was given ("5 %", "2.5 %"). */
    private static String percent(double fraction) {
        return NumberText.plain(PERCENT * fraction, "-") + " %";
    }
}
