package org.mobident.library.build;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.mobident.library.Library;
import org.mobident.library.LibraryEntry;
import org.mobident.matching.MatchSettings;

/**
 * Checks an existing library for what an analyst should know before trusting it: impossible
 * entries (a mobility whose sign contradicts the charge, or faster than any common ion but H⁺ and
 * OH⁻), entries measured too few times, entries without a spread, spreads above the RSD limit, and
 * analytes that lie close together (see {@link WindowOverlaps}: overlapping windows, or too close to
 * be told apart by mobility alone).
 */
public final class LibraryCheck {

    /**
     * Largest plausible |mobility|, 1e-9 m²/(V·s). The fastest common ions apart from H⁺ (limiting
     * mobility ≈ 362) and OH⁻ (≈ 205) reach about 115 (¼[Fe(CN)₆]⁴⁻, λ ≈ 110 S cm²/mol per charge);
     * sulfate is 83 (limiting molar conductivities: CRC Handbook of Chemistry and Physics, table "Ionic
     * conductivity and diffusion at infinite dilution", from memory). Effective mobilities are smaller
     * still, so anything beyond this bound is almost surely a unit or typing error.
     */
    public static final double MAX_PLAUSIBLE_MOBILITY = 130.0;

    private LibraryCheck() {
    }

    /** The findings, in entry order, then the pairs that lie close together. */
    public static List<BuildWarning> check(Library library, BuildSettings settings) {
        List<BuildWarning> out = new ArrayList<>();
        List<LibraryEntry> windowed = new ArrayList<>();
        for (LibraryEntry e : library.entries()) {
            if (e.charge() != 0 && e.mobility() != 0 && Math.signum(e.mobility()) != Integer.signum(e.charge())) {
                out.add(new BuildWarning(BuildWarning.Kind.SIGN_CONTRADICTS_CHARGE, null, e.name(), null,
                        String.format(Locale.ROOT, "%s: mobility %.3f has the wrong sign for charge %+d (mobilities"
                                + " are signed: cations positive, anions negative)", e.name(), e.mobility(),
                                e.charge())));
            }
            if (Math.abs(e.mobility()) > MAX_PLAUSIBLE_MOBILITY) {
                out.add(new BuildWarning(BuildWarning.Kind.IMPLAUSIBLE_MOBILITY, null, e.name(), null,
                        String.format(Locale.ROOT, "%s: mobility %.3f is beyond ±%s, faster than any common ion but"
                                        + " H+ (about 362) and OH- (about 205); probably a unit or typing error"
                                        + " (mobilities are in 1e-9 m^2/(V s))", e.name(), e.mobility(),
                                LibraryBuilder.plain(MAX_PLAUSIBLE_MOBILITY))));
            } else {
                for (double mu : e.limitingMobilities()) {
                    if (Math.abs(mu) > MAX_PLAUSIBLE_MOBILITY) {
                        out.add(new BuildWarning(BuildWarning.Kind.IMPLAUSIBLE_MOBILITY, null, e.name(), null,
                                String.format(Locale.ROOT, "%s: limiting mobility %.3f is beyond ±%s, faster than"
                                                + " any common ion but H+ and OH-; probably a unit or typing error",
                                        e.name(), mu, LibraryBuilder.plain(MAX_PLAUSIBLE_MOBILITY))));
                        break;
                    }
                }
            }
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

    /**
     * The match window half-width identification would use for an entry: its own tolerance, or else
     * the rule max(k·SD, floor) of the settings on its SD, with the SD matching assumes when the entry
     * gives none ({@link MatchSettings#DEFAULT_ASSUMED_ENTRY_SD}). (Identification widens it further by
     * the peak's own uncertainty.)
     */
    public static double window(LibraryEntry e, BuildSettings settings) {
        if (Double.isFinite(e.tolerance())) {
            return e.tolerance();
        }
        return settings.toleranceFor(Double.isFinite(e.mobilitySd()) ? e.mobilitySd()
                : MatchSettings.DEFAULT_ASSUMED_ENTRY_SD);
    }

    /** The entry with its match window made explicit ({@link #window}). */
    static LibraryEntry withWindow(LibraryEntry e, BuildSettings settings) {
        if (Double.isFinite(e.tolerance())) {
            return e;
        }
        return new LibraryEntry(e.name(), e.mobility(), e.mobilitySd(), e.n(), e.charge(), window(e, settings),
                e.pKa(), e.limitingMobilities(), e.buffer(), e.pH(), e.ionicStrengthMm(), e.temperatureC(),
                e.source());
    }
}
