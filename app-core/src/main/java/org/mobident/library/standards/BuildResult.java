package org.mobident.library.standards;

import java.util.List;
import java.util.Optional;
import org.mobident.library.Library;

/**
 * The outcome of building a library from standards runs.
 *
 * @param library         the library: one entry per analyte found, notes with conditions and provenance
 * @param analytes        the statistics behind each entry, in library order
 * @param outliers        all replicate outliers found (kept or excluded as the settings say)
 * @param unexpectedPeaks peaks not used for any analyte
 * @param warnings        everything an analyst should read, in the order found
 * @param usedRuns        names of the runs that contributed, in input order
 * @param settings        the settings used
 * @param stamp           build date and tool version
 */
public record BuildResult(Library library, List<AnalyteStats> analytes, List<Outlier> outliers,
                          List<UnexpectedPeak> unexpectedPeaks, List<BuildWarning> warnings, List<String> usedRuns,
                          BuildSettings settings, BuildStamp stamp) {
    public BuildResult {
        analytes = List.copyOf(analytes);
        outliers = List.copyOf(outliers);
        unexpectedPeaks = List.copyOf(unexpectedPeaks);
        warnings = List.copyOf(warnings);
        usedRuns = List.copyOf(usedRuns);
    }

    /** The statistics of the analyte of that name, if it was found. */
    public Optional<AnalyteStats> analyte(String name) {
        return analytes.stream().filter(a -> a.name().equals(name)).findFirst();
    }

    /** The same result with {@code more} warnings after its own. */
    public BuildResult withWarnings(List<BuildWarning> more) {
        List<BuildWarning> all = new java.util.ArrayList<>(warnings);
        all.addAll(more);
        return new BuildResult(library, analytes, outliers, unexpectedPeaks, all, usedRuns, settings, stamp);
    }

    /** The warnings of one kind. */
    public List<BuildWarning> warnings(BuildWarning.Kind kind) {
        return warnings.stream().filter(w -> w.kind() == kind).toList();
    }
}
