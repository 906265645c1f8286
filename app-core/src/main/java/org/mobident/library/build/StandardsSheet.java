package org.mobident.library.build;

import java.util.HashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.stream.Collectors;
import org.mobident.InputException;
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
                throw new InputException(r.origin(), r.originLine(), SAMPLE_COLUMN, "run '" + r.name()
                        + "' names no standard mix; the standards sheet " + sourceFile + " defines: " + mixNames());
            }
            if (mix(mix).isEmpty()) {
                throw new InputException(r.origin(), r.originLine(), SAMPLE_COLUMN, "unknown mix '" + mix.strip()
                        + "' for run '" + r.name() + "'; the standards sheet " + sourceFile + " defines: "
                        + mixNames());
            }
        }
    }

    static String key(String name) {
        return name.strip().toLowerCase(Locale.ROOT);
    }
}
