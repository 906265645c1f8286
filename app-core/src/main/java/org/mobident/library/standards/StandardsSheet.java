package org.mobident.library.standards;

import java.util.HashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.stream.Collectors;
import org.mobident.InputException;
import org.mobident.library.Library;
import org.mobident.library.LibraryEntry;
import org.mobident.trace.RunSpec;

/**
 * The standard mixtures used to build a library: which analytes each mix holds.
 * Mix names are looked up without regard to case or surrounding spaces.
 *
 * @param sourceFile where the sheet was read from (for messages), or a label
 * @param mixes      the mixes in sheet order; names unique (case-insensitive)
 */
public record StandardsSheet(String sourceFile, List<StandardsMix> mixes) {

    /** Name of the run sheet column that names a run's mix. */
    public static final String MIX_COLUMN = "mix";

    /** Name of the run sheet's free-text column, searched for a mix name when there is no mix column. */
    public static final String SAMPLE_COLUMN = "sample";

    public StandardsSheet {
        mixes = List.copyOf(mixes);
        Map<String, String> seen = new HashMap<>();
        for (StandardsMix m : mixes) {
            if (seen.put(key(m.name()), m.name()) != null) {
                throw new IllegalArgumentException("mix " + m.name() + " appears twice");
            }
        }
    }

    /** The mix of that name (case-insensitive, trimmed), if the sheet has one. */
    public Optional<StandardsMix> mix(String name) {
        if (name == null) {
            return Optional.empty();
        }
        String k = key(name);
        return mixes.stream().filter(m -> key(m.name()).equals(k)).findFirst();
    }

    /** The mix names, comma-separated, for messages. */
    public String mixNames() {
        return mixes.stream().map(StandardsMix::name).collect(Collectors.joining(", "));
    }

    /**
     * Checks that every run names a mix of this sheet, so that a misspelt {@code sample} is reported
     * where it was written rather than dropped during the build.
     *
     * @param runs      the standards runs as declared (their origin and line locate the problem)
     * @param mixByRun  run name → mix name, from the run sheet's {@code sample} column
     * @throws InputException naming the run sheet, line and the {@code sample} field for the first run
     *                        without a mix or with a mix the sheet does not define
     */
    public void requireMixes(List<RunSpec> runs, Map<String, String> mixByRun) throws InputException {
        for (RunSpec r : runs) {
            String mix = mixByRun.get(r.name());
            if (mix == null || mix.isBlank()) {
                throw new InputException(r.origin(), r.originLine(), MIX_COLUMN, "run '" + r.name()
                        + "' names no standard mix (give it in a 'mix' column); the standards sheet " + sourceFile
                        + " defines: " + mixNames());
            }
            if (mix(mix).isEmpty()) {
                throw new InputException(r.origin(), r.originLine(), MIX_COLUMN, "unknown mix '" + mix.strip()
                        + "' for run '" + r.name() + "'; the standards sheet " + sourceFile + " defines: "
                        + mixNames());
            }
        }
    }

    /**
     * Which mix each run holds: the run sheet's {@code mix} cell; else its {@code sample} cell when
     * that is, or contains as a separate word, exactly one mix name (e.g. "standard mix B, replicate
     * 2" for mix "B"); else the run name when it contains exactly one mix name as a word (e.g.
     * {@code std-mixA-1} for mix "mixA"); else the only mix when the sheet has one. A run left
     * without a mix is reported by {@link #requireMixes}.
     *
     * @param runs         the standards runs
     * @param mixColumn    run name → {@code mix} cell
     * @param sampleColumn run name → {@code sample} cell
     * @return run name → mix name (the sheet's spelling where recognised)
     */
    public Map<String, String> resolveMixes(List<RunSpec> runs, Map<String, String> mixColumn,
                                            Map<String, String> sampleColumn) {
        Map<String, String> out = new java.util.LinkedHashMap<>();
        for (RunSpec r : runs) {
            String given = mixColumn.get(r.name());
            String m = given != null && !given.isBlank() ? given : null;
            if (m == null) {
                m = named(sampleColumn.get(r.name()));
            }
            if (m == null) {
                m = named(r.name());
            }
            if (m == null && mixes.size() == 1) {
                m = mixes.get(0).name();
            }
            if (m != null) {
                out.put(r.name(), m);
            }
        }
        return out;
    }

    /**
     * A rough library of the analytes the mixes should show, to choose each standards run's
     * neutral marker when the run sheet gives no marker window (the marker is then the peak under
     * which the expected analytes are explained best). An analyte's approximate mobility from the
     * sheet is used with a spread of {@code approxSpread}; otherwise a reference entry of the same
     * name with a spread of {@code referenceRelativeSpread} × |μ| (reference values are limiting
     * mobilities, higher than those in a real buffer); analytes with neither are left out.
     *
     * @param reference reference library (may be null)
     */
    public Library guideLibrary(Library reference, double approxSpread, double referenceRelativeSpread) {
        Map<String, LibraryEntry> entries = new java.util.LinkedHashMap<>();
        for (StandardsMix m : mixes) {
            for (StandardAnalyte a : m.analytes()) {
                if (entries.containsKey(a.name())) {
                    continue;
                }
                if (a.hasApproxMobility()) {
                    entries.put(a.name(), LibraryEntry.of(a.name(), a.approxMobility(), approxSpread));
                } else if (reference != null) {
                    reference.find(a.name()).ifPresent(e -> entries.put(a.name(), LibraryEntry.of(a.name(),
                            e.mobility(), referenceRelativeSpread * Math.abs(e.mobility()))));
                }
            }
        }
        return new Library(List.copyOf(entries.values()), "expected analytes of " + sourceFile, List.of());
    }

    /** The single mix that the text names or contains as a word, else null. */
    private String named(String text) {
        if (text == null || text.isBlank()) {
            return null;
        }
        Optional<StandardsMix> exact = mix(text);
        if (exact.isPresent()) {
            return exact.get().name();
        }
        String lower = key(text);
        String found = null;
        for (StandardsMix m : mixes) {
            if (containsWord(lower, key(m.name()))) {
                if (found != null) {
                    return null;
                }
                found = m.name();
            }
        }
        return found;
    }

    private static boolean containsWord(String text, String word) {
        if (word.isEmpty()) {
            return false;
        }
        for (int from = text.indexOf(word); from >= 0; from = text.indexOf(word, from + 1)) {
            int end = from + word.length();
            boolean before = from == 0 || !Character.isLetterOrDigit(text.charAt(from - 1));
            boolean after = end == text.length() || !Character.isLetterOrDigit(text.charAt(end));
            if (before && after) {
                return true;
            }
        }
        return false;
    }

    static String key(String name) {
        return name.strip().toLowerCase(Locale.ROOT);
    }
}
