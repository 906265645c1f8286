package org.mobident.settings;

import java.util.Objects;
import org.mobident.trace.io.TraceReadOptions;

/**
 * Everything that steers identification apart from the runs and the library.
 *
 * @param readOptions   how trace files are read
 * @param peakSettings  how peaks are detected
 * @param matchSettings how peaks are matched to library analytes
 * @param threads       number of runs processed at once (≥ 1)
 * @param lookWhereExpected whether a run's trace is looked at again where the library expects a zone
 *                      that no peak explains ({@link org.mobident.signal.ExpectedZoneProbe}); off
 *                      for standards runs, whose library is only a guide
 */
public record IdentifySettings(TraceReadOptions readOptions, PeakSettings peakSettings,
                               MatchSettings matchSettings, int threads, boolean lookWhereExpected) {

    public IdentifySettings(TraceReadOptions readOptions, PeakSettings peakSettings, MatchSettings matchSettings,
                            int threads) {
        this(readOptions, peakSettings, matchSettings, threads, true);
    }

    public static IdentifySettings defaults() {
        return new IdentifySettings(TraceReadOptions.DEFAULT, PeakSettings.DEFAULT, MatchSettings.DEFAULT,
                Runtime.getRuntime().availableProcessors());
    }

    public IdentifySettings {
        Objects.requireNonNull(readOptions, "readOptions");
        Objects.requireNonNull(peakSettings, "peakSettings");
        Objects.requireNonNull(matchSettings, "matchSettings");
        if (threads < 1) {
            throw new IllegalArgumentException("threads must be at least 1, got " + threads);
        }
    }

    public IdentifySettings withThreads(int n) {
        return new IdentifySettings(readOptions, peakSettings, matchSettings, n, lookWhereExpected);
    }

    public IdentifySettings withPeakSettings(PeakSettings p) {
        return new IdentifySettings(readOptions, p, matchSettings, threads, lookWhereExpected);
    }

    public IdentifySettings withMatchSettings(MatchSettings m) {
        return new IdentifySettings(readOptions, peakSettings, m, threads, lookWhereExpected);
    }

    public IdentifySettings withReadOptions(TraceReadOptions r) {
        return new IdentifySettings(r, peakSettings, matchSettings, threads, lookWhereExpected);
    }

    public IdentifySettings withLookWhereExpected(boolean look) {
        return new IdentifySettings(readOptions, peakSettings, matchSettings, threads, look);
    }
}
