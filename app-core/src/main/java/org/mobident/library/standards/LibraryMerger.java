package org.mobident.library.standards;

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
import org.mobident.library.LibraryCsv;
import org.mobident.library.LibraryEntry;
import org.mobident.text.NumberText;

/**
 * Updates an existing library with a fresh build from standards.
 *
 * <ul>
 *   <li>An analyte in both, whose existing entry states n ≥ 1 (and an SD when n ≥ 2): mean and SD are
 *       combined exactly as if all measurements had been pooled, with the parallel formula of Chan,
 *       Golub &amp; LeVeque (1979), see {@link ReplicateStatistics#combine}; the tolerance is
 *       recomputed from the pooled SD when the fresh build asks for fixed windows (otherwise an existing
 *       tolerance is kept as the lab wrote it). A warning is given when
 *       |m₁ − m₂| &gt; k·√(s₁²/n₁ + s₂²/n₂) (the standard uncertainty of the difference of two means,
 *       k the settings' coverage factor): the conditions may have changed.</li>
 *   <li>An analyte in both whose existing entry has no n or no SD (a handbook value): replaced by the
 *       fresh value, with a warning; its pKa, limiting mobilities, pH and ionic strength are kept.</li>
 *   <li>An analyte only in the fresh build is added at the end; one only in the existing library is
 *       kept unchanged.</li>
 *   <li>Notes: the existing notes, a line marking the merge, then the fresh notes.</li>
 *   <li>Between-session spread ({@code session_sd}): the fresh build is another session. Its means
 *       are first related to the existing ones by a least-squares line m_f = a·m_e + b over the pooled
 *       analytes (three or more; a session-wide scale difference, such as another capillary
 *       temperature, is what identification corrects per run), and each analyte's residual r then
 *       estimates twice the between-session variance plus the sampling variance of the two means:
 *       σ_B² = max(0, (r²·G/(G − 2) − s_e²/n_e − s_f²/n_f) / 2) for G analytes (method of moments).
 *       An earlier session_sd is averaged in (mean of the variances). Identification pools these
 *       per-analyte values into one between-session RSD ({@link org.mobident.matching.SpreadModel}).</li>
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
            merged.put(Library.key(e), e);
        }
        List<String> pooledKeys = new ArrayList<>();
        List<LibraryEntry[]> pairs = new ArrayList<>();
        List<String> added = new ArrayList<>();
        List<String> pooled = new ArrayList<>();
        List<String> replaced = new ArrayList<>();
        List<BuildWarning> warnings = new ArrayList<>();
        for (LibraryEntry f : fresh.library().entries()) {
            String key = keyFor(merged, f);
            LibraryEntry e = key == null ? null : merged.get(key);
            if (e == null) {
                merged.put(Library.key(f), f);
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
                merged.put(key, replace(e, f));
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
                                e.mobility(), e.n(), delta, NumberText.plain(settings.mergeCoverageFactor(), "-"), u)));
            }
            merged.put(key, pool(e, f, all, settings));
            pooled.add(f.name());
            pooledKeys.add(key);
            pairs.add(new LibraryEntry[] {e, f});
        }
        double[] session = sessionSds(pairs);
        for (int k = 0; k < pooledKeys.size(); k++) {
            double sd = session[k];
            if (Double.isFinite(sd)) {
                merged.computeIfPresent(pooledKeys.get(k), (key, entry) -> entry.withSessionSd(sd));
            }
        }
        List<LibraryEntry> entries = new ArrayList<>(merged.values());
        warnings.addAll(WindowOverlaps.check(entries, LibraryCheck.windows(new Library(entries, "merged", List.of()),
                org.mobident.settings.MatchSettings.DEFAULT)));
        List<String> notes = new ArrayList<>(existing.notes());
        notes.add("Merged with a fresh build from standards on " + fresh.stamp().builtAt() + " ("
                + fresh.stamp().toolVersion() + "): added " + added.size() + ", pooled " + pooled.size()
                + ", replaced " + replaced.size());
        notes.addAll(fresh.library().notes());
        return new MergeResult(new Library(entries, existing.sourceFile(), notes), added, pooled, replaced, warnings);
    }

    /**
     * The key of the existing entry a fresh one updates: the same name in the same buffer; else an
     * existing entry of that name without a buffer label (it applies to every buffer); else, for a
     * fresh entry without a label, the only existing entry of that name. Null when none.
     */
    private static String keyFor(Map<String, LibraryEntry> merged, LibraryEntry f) {
        if (merged.containsKey(Library.key(f))) {
            return Library.key(f);
        }
        String unlabelled = f.name() + "\u0000";
        if (f.buffer() != null && merged.containsKey(unlabelled)) {
            return unlabelled;
        }
        if (f.buffer() == null) {
            List<String> same = new ArrayList<>();
            for (Map.Entry<String, LibraryEntry> en : merged.entrySet()) {
                if (en.getValue().name().equals(f.name())) {
                    same.add(en.getKey());
                }
            }
            return same.size() == 1 ? same.get(0) : null;
        }
        return null;
    }

    /** Fewest analytes pooled for a session-wide line a·m + b before the per-analyte residuals are used. */
    static final int MIN_FOR_SESSION_LINE = 3;

    /**
     * The between-session SD of each pooled pair {existing, fresh} (see the class description);
     * NaN for a pair whose existing entry has no earlier session SD and whose estimate cannot be formed.
     */
    static double[] sessionSds(List<LibraryEntry[]> pairs) {
        int g = pairs.size();
        double[] out = new double[g];
        java.util.Arrays.fill(out, Double.NaN);
        if (g == 0) {
            return out;
        }
        double a = 1.0;
        double b = 0.0;
        double inflation = 1.0;
        if (g >= MIN_FOR_SESSION_LINE) {
            double sx = 0, sy = 0, sxx = 0, sxy = 0;
            for (LibraryEntry[] p : pairs) {
                double x = p[0].mobility();
                double y = p[1].mobility();
                sx += x;
                sy += y;
                sxx += x * x;
                sxy += x * y;
            }
            double det = g * sxx - sx * sx;
            if (det > 0) {
                a = (g * sxy - sx * sy) / det;
                b = (sy - a * sx) / g;
                inflation = g > 2 ? (double) g / (g - 2) : 1.0;
            }
        }
        for (int k = 0; k < g; k++) {
            LibraryEntry e = pairs.get(k)[0];
            LibraryEntry f = pairs.get(k)[1];
            double r = f.mobility() - (a * e.mobility() + b);
            double v = Math.max(0.0, (r * r * inflation - varianceOfMean(e) - varianceOfMean(f)) / 2.0);
            double earlier = e.sessionSd();
            out[k] = Double.isFinite(earlier) ? Math.sqrt(0.5 * (v + earlier * earlier)) : Math.sqrt(v);
        }
        return out;
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
        return Double.isNaN(e.temperatureC()) ? "unstated" : NumberText.plain(e.temperatureC(), "-");
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
        double tolerance = settings.writesTolerance() ? settings.toleranceFor(sd) : e.tolerance();
        return new LibraryEntry(e.name(), LibraryCsv.computedValue(all.mean()), LibraryCsv.computedValue(sd), all.n(),
                e.charge() != 0 ? e.charge() : f.charge(), LibraryCsv.computedValue(tolerance), e.pKa(),
                e.limitingMobilities(), buffer, e.pH(), e.ionicStrengthMm(), LibraryCsv.computedValue(temperature), joinSources(e.source(), f.source()), e.internalStandard() || f.internalStandard(),
                e.sessionSd());
    }

    private static LibraryEntry replace(LibraryEntry e, LibraryEntry f) {
        return new LibraryEntry(e.name(), f.mobility(), f.mobilitySd(), f.n(), e.charge() != 0 ? e.charge() : f.charge(),
                f.tolerance(), e.pKa(), e.limitingMobilities(), f.buffer() != null ? f.buffer() : e.buffer(), e.pH(),
                e.ionicStrengthMm(), f.temperatureC(), f.source(), e.internalStandard() || f.internalStandard(),
                e.sessionSd());
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
