package org.mobident.library.standards;

import java.util.List;

/**
 * Replicate statistics of one analyte of a build.
 *
 * @param name         analyte name
 * @param mixes        the mixes it was found in
 * @param basis        how its peak group was named (in the first mix)
 * @param measurements every replicate peak, outliers included, in run order
 * @param n            number of values behind the statistics (outliers left out when so set)
 * @param mean         mean mobility, 1e-9 m²/(V·s)
 * @param sd           sample standard deviation (NaN when n &lt; 2)
 * @param min          smallest value used
 * @param max          largest value used
 * @param rsdPercent   100·SD/|mean|, % (NaN when SD is)
 * @param tolerance    fixed match window max(k·SD, floor) written into the library, NaN when none was asked for
 * @param charge       charge number written to the library: the standards sheet's, 0 when it gives none
 *                     or only a sign (LibraryEntry's "0 when unknown")
 * @param runs         the runs the values came from, in run order
 * @param outliers     replicates that failed the Grubbs test (empty when none, or when n &lt; 3)
 * @param window       the match window half-width identification applies to the entry (its fixed
 *                     window, or the prediction interval of {@link org.mobident.matching.MatchWindow}
 *                     with the spreads of the whole built library), NaN until known
 */
public record AnalyteStats(String name, List<String> mixes, NamingBasis basis, List<Measurement> measurements,
                           int n, double mean, double sd, double min, double max, double rsdPercent,
                           double tolerance, int charge, List<String> runs, List<Outlier> outliers, double window) {
    public AnalyteStats {
        mixes = List.copyOf(mixes);
        measurements = List.copyOf(measurements);
        runs = List.copyOf(runs);
        outliers = List.copyOf(outliers);
    }

    /** These statistics with the applied window known. */
    public AnalyteStats withWindow(double halfWidth) {
        return new AnalyteStats(name, mixes, basis, measurements, n, mean, sd, min, max, rsdPercent, tolerance, charge,
                runs, outliers, halfWidth);
    }
}
