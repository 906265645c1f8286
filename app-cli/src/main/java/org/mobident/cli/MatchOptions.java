package org.mobident.cli;

import org.mobident.settings.MatchSettings;
import picocli.CommandLine.ArgGroup;
import picocli.CommandLine.Option;

/** How wide the match windows are and how likely unknown peaks are. */
public final class MatchOptions {

    @ArgGroup(exclusive = true, multiplicity = "0..1")
    Window window;

    static final class Window {
        @Option(names = "--window-units", paramLabel = "MOB",
                description = "Fixed match window: ± this many mobility units (1e-9 m²/(V s)).")
        Double units;

        @Option(names = "--window-percent", paramLabel = "PCT",
                description = "Match window: ± this percentage of the library mobility.")
        Double percent;

        @Option(names = "--window-k", paramLabel = "K",
                description = "Match window: ± K combined standard uncertainties (default 3).")
        Double k;
    }

    @Option(names = "--window-floor", paramLabel = "MOB",
            description = "Smallest half-width of a percentage or K window, mobility units (default 0.5).")
    Double floor;

    @Option(names = "--unknown-share", paramLabel = "P",
            description = "Prior share of peaks that are in no library entry, 0 < P < 1 (default 0.2).")
    Double unknownShare;

    @Option(names = "--fixed-scale",
            description = "Take each run's mobility scale as stated: no correction a·μ + b fitted from the peaks "
                    + "the library explains (by default a run whose capillary ran a little warm or cool, or whose "
                    + "marker is slightly off, is corrected and the correction reported).")
    boolean fixedScale;

    MatchSettings toSettings(MatchSettings base) {
        MatchSettings s = base;
        try {
            if (floor != null) {
                s = s.withMinimumWindow(floor);
            }
            if (window != null) {
                if (window.units != null) {
                    s = s.withAbsoluteWindow(window.units);
                } else if (window.percent != null) {
                    s = s.withRelativeWindow(window.percent / 100.0);
                } else if (window.k != null) {
                    s = s.withSpreadWindow(window.k, s.minimumWindow());
                }
            }
            if (unknownShare != null) {
                s = s.withNotInLibraryPrior(unknownShare);
            }
            if (fixedScale) {
                s = s.withScalePrior(null);
            }
        } catch (IllegalArgumentException e) {
            throw new picocli.CommandLine.ParameterException(new picocli.CommandLine(this), e.getMessage());
        }
        return s;
    }
}
