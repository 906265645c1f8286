package org.mobident.library.build;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Objects;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.mobident.InputException;
import org.mobident.library.Library;
import org.mobident.library.LibraryEntry;

/**
 * Updates an existing library with a fresh build from standards.
 *
 * <ul>
 *   <li>An analyte in both, whose existing entry states n ≥ 1 (and an SD when n ≥ 2): mean and SD are
 *       combined exactly as if all measurements had been pooled, with the parallel formula of Chan,
 *       Golub &amp; LeVeque (1979), see {@link ReplicateStatistics#combine}; the tolerance is
 *       recomputed from the pooled SD with the fresh build's settings. A warning is given when
 *       |m₁ − m₂| &gt; k·√(s₁²/n₁ + s₂²/n₂) (the standard uncertainty of the difference of two means,
 *       k the settings' coverage factor): the conditions may have changed.</li>
 *   <li>An analyte in both whose existing entry has no n or no SD (a handbook value): replaced by the
 *       fresh value, with a warning; its pKa, limiting mobilities, pH and ionic strength are kept.</li>
 *   <li>An analyte only in the fresh build is added at the end; one only in the existing library is
 *       kept unchanged.</li>
 *   <li>Notes: the existing notes, a line marking the merge, then the fresh notes.</li>
 * </ul>
 *
 * <p>Runs are pooled once only: a fresh run whose trace file has a SHA-256 that the existing
 * library's notes already record ("Run NAME: file FILE, sha256 HEX", as every build writes them)
 * is refused, since pooling it again would count the same measurement twice, raise n and shrink the
 * SD. There is deliberately no way round this; to redo a library, build it afresh.
 */
public final class LibraryMerger {

    private LibraryMerger() {
    }

    /** A run's provenance note as a build writes it: name, file, SHA-256. */
    private static final Pattern RUN_NOTE = Pattern.compile("^\\s*Run (.+): file (.+), sha256 ([0-9a-fA-F]{64})\\s*$");

    /**
     * The fresh runs already pooled into the existing library: those whose trace SHA-256 the
     * existing notes record. Each is described as "fresh run (file) = run NAME already in the library".
     */
    public static List<String> alreadyPooled(Library existing, BuildResult fresh) {
        Map<String, String> known = new LinkedHashMap<>();
        for (String note : existing.notes()) {
            Matcher m = RUN_NOTE.matcher(note);
            if (m.matches()) {
                known.putIfAbsent(m.group(3).toLowerCase(Locale.ROOT), m.group(1));
            }
        }
        List<String> out = new ArrayList<>();
        for (String note : fresh.library().notes()) {
            Matcher m = RUN_NOTE.matcher(note);
            if (m.matches()) {
                String earlier = known.get(m.group(3).toLowerCase(Locale.ROOT));
                if (earlier != null) {
                    out.add(m.group(1) + " (" + m.group(2) + ")" + (earlier.equals(m.group(1)) ? ""
                            : " = run " + earlier));
                }
            }
        }
        return out;
    }

    /**
     * @param existing the library to update
     * @param fresh    a fresh build
     * @return the merged library with what was added, pooled and replaced, and warnings
     * @throws InputException when a fresh run is already pooled in the library ({@link #alreadyPooled});
     *                        nothing is merged then
     */
    public static MergeResult merge(Library existing, BuildResult fresh) throws InputException {
        List<String> twice = alreadyPooled(existing, fresh);
        if (!twice.isEmpty()) {
            throw new InputException(existing.sourceFile(), 0, "sha256", twice.size() + " of the new run(s) are"
                    + " already pooled in this library (same trace SHA-256 in its notes): " + String.join(", ", twice)
                    + ". Pooling them again would count the same measurements twice; leave them out of the run"
                    + " sheet (the library was not changed).");
        }
        BuildSettings settings = fresh.settings();
        Map<String, LibraryEntry> merged = new LinkedHashMap<>();
        for (LibraryEntry e : existing.entries()) {
            merged.put(e.name(), e);
        }
        List<String> added = new ArrayList<>();
        List<String> pooled = new ArrayList<>();
        List<String> replaced = new ArrayList<>();
        List<BuildWarning> warnings = new ArrayList<>();
        for (LibraryEntry f : fresh.library().entries()) {
            LibraryEntry e = merged.get(f.name());
            if (e == null) {
                merged.put(f.name(), f);
                added.add(f.name());
                continue;
            }
            if (!conditionsAgree(e, f)) {
                warnings.add(new BuildWarning(BuildWarning.Kind.MIXED_CONDITIONS, null, f.name(), null,
                        String.format(Locale.ROOT, "%s: the existing entry (buffer %s, %s °C) and the fresh build"
                                        + " (buffer %s, %s °C) state different conditions.", f.name(), e.buffer(),
                                temperatureText(e), f.buffer(), temperatureText(f))));
            }
            boolean poolable = e.n() >= 1 && (e.n() == 1 || Double.isFinite(e.mobilitySd()));
            if (!poolable) {
                merged.put(f.name(), replace(e, f));
                replaced.add(f.name());
                warnings.add(new BuildWarning(BuildWarning.Kind.NOT_POOLED, null, f.name(), null,
                        String.format(Locale.ROOT, "%s: the existing value %.3f states no %s, so it was replaced by"
                                        + " the fresh value %.3f rather than pooled.", f.name(), e.mobility(),
                                e.n() < 1 ? "number of measurements" : "standard deviation", f.mobility())));
                continue;
            }
            ReplicateStatistics a = ReplicateStatistics.fromMeanSd(e.n(), e.mobility(), e.mobilitySd());
            ReplicateStatistics b = ReplicateStatistics.fromMeanSd(f.n(), f.mobility(), f.mobilitySd());
            ReplicateStatistics all = a.combine(b);
            double u = Math.sqrt(varianceOfMean(e) + varianceOfMean(f));
            double delta = Math.abs(f.mobility() - e.mobility());
            if (u > 0 && delta > settings.mergeCoverageFactor() * u) {
                warnings.add(new BuildWarning(BuildWarning.Kind.MEANS_DIFFER, null, f.name(), null,
                        String.format(Locale.ROOT, "%s: the fresh mean %.3f (n = %d) differs from the existing %.3f"
                                        + " (n = %d) by %.3f, more than %s times their combined standard uncertainty"
                                        + " %.3f; have the conditions changed?", f.name(), f.mobility(), f.n(),
                                e.mobility(), e.n(), delta, LibraryBuilder.plain(settings.mergeCoverageFactor()), u)));
            }
            merged.put(f.name(), pool(e, f, all, settings));
            pooled.add(f.name());
        }
        List<LibraryEntry> entries = new ArrayList<>(merged.values());
        warnings.addAll(WindowOverlaps.check(entries));
        List<String> notes = new ArrayList<>(existing.notes());
        notes.add("Merged with a fresh build from standards on " + fresh.stamp().builtAt() + " ("
                + fresh.stamp().toolVersion() + "): added " + added.size() + ", pooled " + pooled.size()
                + ", replaced " + replaced.size());
        notes.addAll(fresh.library().notes());
        return new MergeResult(new Library(entries, existing.sourceFile(), notes), added, pooled, replaced, warnings);
    }

    /** s²/n of an entry's mean; 0 when its SD is unknown. */
    private static double varianceOfMean(LibraryEntry e) {
        return Double.isFinite(e.mobilitySd()) && e.n() >= 1 ? e.mobilitySd() * e.mobilitySd() / e.n() : 0.0;
    }

    private static boolean conditionsAgree(LibraryEntry e, LibraryEntry f) {
        boolean buffer = e.buffer() == null || f.buffer() == null
                || e.buffer().strip().equalsIgnoreCase(f.buffer().strip());
        boolean temp = Double.isNaN(e.temperatureC()) || Double.isNaN(f.temperatureC())
                || e.temperatureC() == f.temperatureC();
        return buffer && temp;
    }

    private static String temperatureText(LibraryEntry e) {
        return Double.isNaN(e.temperatureC()) ? "unstated" : LibraryBuilder.plain(e.temperatureC());
    }

    private static LibraryEntry pool(LibraryEntry e, LibraryEntry f, ReplicateStatistics all, BuildSettings settings) {
        double sd = all.sd();
        String buffer = e.buffer() == null ? f.buffer() : f.buffer() == null
                || e.buffer().strip().equalsIgnoreCase(f.buffer().strip()) ? e.buffer() : "mixed";
        double temperature;
        if (Double.isNaN(e.temperatureC())) {
            temperature = f.temperatureC();
        } else if (Double.isNaN(f.temperatureC())) {
            temperature = e.temperatureC();
        } else {
            temperature = (e.n() * e.temperatureC() + f.n() * f.temperatureC()) / (e.n() + f.n());
        }
        return new LibraryEntry(e.name(), all.mean(), sd, all.n(), e.charge() != 0 ? e.charge() : f.charge(),
                settings.toleranceFor(sd), e.pKa(), e.limitingMobilities(), buffer, e.pH(), e.ionicStrengthMm(),
                temperature, joinSources(e.source(), f.source()));
    }

    private static LibraryEntry replace(LibraryEntry e, LibraryEntry f) {
        return new LibraryEntry(e.name(), f.mobility(), f.mobilitySd(), f.n(), e.charge() != 0 ? e.charge() : f.charge(),
                f.tolerance(), e.pKa(), e.limitingMobilities(), f.buffer() != null ? f.buffer() : e.buffer(), e.pH(),
                e.ionicStrengthMm(), f.temperatureC(), f.source());
    }

    private static String joinSources(String a, String b) {
        if (a == null || a.isBlank()) {
            return b;
        }
        if (b == null || b.isBlank() || Objects.equals(a, b)) {
            return a;
        }
        return a + "; " + b;
    }
}
