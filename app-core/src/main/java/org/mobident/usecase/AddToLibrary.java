package org.mobident.usecase;

import java.util.Objects;
import org.mobident.InputException;
import org.mobident.library.Library;
import org.mobident.library.standards.BuildResult;
import org.mobident.library.standards.BuildSettings;
import org.mobident.library.standards.BuildWarning;
import org.mobident.library.standards.LibraryMerger;
import org.mobident.library.standards.MergeResult;
import org.mobident.settings.IdentifySettings;

/**
 * New standards runs pooled into an existing library: the runs are processed as
 * {@link BuildLibrary} does, then merged ({@link LibraryMerger}): analytes in both get the mean and
 * SD of all measurements together, new analytes are added.
 */
public final class AddToLibrary {

    private final Library existing;
    private final BuildLibrary build;

    /** @param build the new standards runs, checked */
    public AddToLibrary(Library existing, BuildLibrary build) {
        this.existing = Objects.requireNonNull(existing, "existing");
        this.build = Objects.requireNonNull(build, "build");
    }

    /**
     * What the new runs gave and the library they make together with the existing one.
     *
     * @param fresh  the new runs' own build (their statistics, outliers and warnings)
     * @param merged the library to write, and which analytes were pooled, added or replaced
     */
    public record Result(BuildResult fresh, MergeResult merged) {
        public Result {
            Objects.requireNonNull(fresh, "fresh");
            Objects.requireNonNull(merged, "merged");
        }

        /** True when the build or the merge warned. */
        public boolean anyWarning() {
            return BuildWarning.anyWarning(fresh.warnings()) || BuildWarning.anyWarning(merged.warnings());
        }
    }

    /**
     * Builds and merges.
     *
     * @throws InputException when the library already holds some of the runs (same trace SHA-256 in
     *                        its notes): pooling them again would count them twice
     */
    public Result run(IdentifySettings settings, BuildSettings buildSettings) throws InputException {
        BuildResult fresh = build.run(settings, buildSettings);
        return new Result(fresh, LibraryMerger.merge(existing, fresh));
    }
}
