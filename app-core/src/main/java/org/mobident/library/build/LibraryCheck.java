package org.mobident.library.build;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.mobident.library.Library;
import org.mobident.library.LibraryEntry;

/**
 * Checks an existing library for what an analyst should know before trusting it: entries
 * measured too few times, entries without a spread, spreads above the RSD limit, and analytes
 * whose match windows overlap (they cannot be told apart by mobility alone).
 */
public final class LibraryCheck {

    private LibraryCheck() {
    }

    /** The findings, in entry order, then the overlapping pairs. */
    public static List<BuildWarning> check(Library library, BuildSettings settings) {
        List<BuildWarning> out = new ArrayList<>();
        List<LibraryEntry> windowed = new ArrayList<>();
        for (LibraryEntry e : library.entries()) {
            if (Double.isNaN(e.mobilitySd())) {
                out.add(new BuildWarning(BuildWarning.Kind.FEW_REPLICATES, null, e.name(), null,
                        e.name() + ": no spread (mobility_sd) given; matching assumes a default spread"));
            } else if (e.n() > 0 && e.n() < settings.minReplicates()) {
                out.add(new BuildWarning(BuildWarning.Kind.FEW_REPLICATES, null, e.name(), null, String.format(
                        Locale.ROOT, "%s: only %d measurement(s) behind the value (at least %d advised)",
                        e.name(), e.n(), settings.minReplicates())));
            }
            double rsd = 100.0 * e.mobilitySd() / Math.abs(e.mobility());
            if (Double.isFinite(rsd) && rsd > settings.rsdLimitPercent()) {
                out.add(new BuildWarning(BuildWarning.Kind.HIGH_RSD, null, e.name(), null, String.format(Locale.ROOT,
                        "%s: RSD %.2f %% is above the limit of %.2f %%", e.name(), rsd, settings.rsdLimitPercent())));
            }
            windowed.add(withWindow(e, settings));
        }
        out.addAll(WindowOverlaps.check(windowed));
        return out;
    }

    /** The entry with its match window made explicit (its own tolerance, or the rule on its spread). */
    static LibraryEntry withWindow(LibraryEntry e, BuildSettings settings) {
        if (Double.isFinite(e.tolerance())) {
            return e;
        }
        double w = Double.isFinite(e.mobilitySd()) ? settings.toleranceFor(e.mobilitySd()) : Double.NaN;
        return new LibraryEntry(e.name(), e.mobility(), e.mobilitySd(), e.n(), e.charge(), w, e.pKa(),
                e.limitingMobilities(), e.buffer(), e.pH(), e.ionicStrengthMm(), e.temperatureC(), e.source());
    }
}
