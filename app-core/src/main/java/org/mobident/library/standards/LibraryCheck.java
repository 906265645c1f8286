package org.mobident.library.standards;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.mobident.InputException;
import org.mobident.library.Library;
import org.mobident.library.LibraryEntry;
import org.mobident.matching.MatchWindow;
import org.mobident.mobility.PhysicalBounds;
import org.mobident.settings.MatchSettings;
import org.mobident.text.NumberText;

/**
 * Checks an existing library for what an analyst should know before trusting it: impossible
 * entries (a mobility whose sign contradicts the charge, or faster than any common ion but H⁺ and
 * OH⁻), entries measured too few times, entries without a spread, spreads above the RSD limit, and
 * analytes that lie close together (see {@link WindowOverlaps}: overlapping windows, or too close to
 * be told apart by mobility alone).
 */
public final class LibraryCheck {

    /** Largest plausible |mobility| of an entry, 1e-9 m²/(V·s) (see {@link PhysicalBounds#MAX_ION_MOBILITY}). */
    public static final double MAX_PLAUSIBLE_MOBILITY = PhysicalBounds.MAX_ION_MOBILITY;

    private LibraryCheck() {
    }

    /** The findings with the default match settings, in entry order, then the pairs that lie close together. */
    public static List<BuildWarning> check(Library library, BuildSettings settings) {
        return check(library, settings, MatchSettings.DEFAULT);
    }

    /** The findings, in entry order, then the pairs that lie close together under the windows of {@code match}. */
    public static List<BuildWarning> check(Library library, BuildSettings settings, MatchSettings match) {
        List<BuildWarning> out = new ArrayList<>();
        for (LibraryEntry e : library.entries()) {
            String impossible = impossible(e);
            if (impossible != null) {
                boolean sign = e.charge() != 0 && e.mobility() != 0
                        && Math.signum(e.mobility()) != Integer.signum(e.charge());
                out.add(new BuildWarning(sign ? BuildWarning.Kind.SIGN_CONTRADICTS_CHARGE
                        : BuildWarning.Kind.IMPLAUSIBLE_MOBILITY, null, e.name(), null, impossible));
            }
            if (Double.isNaN(e.mobilitySd())) {
                out.add(new BuildWarning(BuildWarning.Kind.FEW_REPLICATES, null, e.name(), null,
                        e.name() + ": no spread (mobility_sd) given; matching uses the spread pooled over the "
                                + "library's other analytes, or a default"));
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
        }
        out.addAll(WindowOverlaps.check(library.entries(), windows(library, match)));
        return out;
    }

    /**
     * What makes an entry physically impossible, or null: a mobility whose sign contradicts its
     * charge, or a mobility (or limiting mobility) beyond the plausible bounds of an ion in water,
     * with a hint at the unit it was probably written in.
     */
    public static String impossible(LibraryEntry e) {
        if (e.charge() != 0 && e.mobility() != 0 && Math.signum(e.mobility()) != Integer.signum(e.charge())) {
            return String.format(Locale.ROOT, "%s: mobility %s has the wrong sign for charge %+d (mobilities are "
                    + "signed: cations positive, anions negative)", e.name(), plain(e.mobility()), e.charge());
        }
        double m = Math.abs(e.mobility());
        boolean tiny = e.charge() != 0 && m > 0 && m < PhysicalBounds.MIN_CHARGED_MOBILITY;
        if (m > MAX_PLAUSIBLE_MOBILITY || tiny) {
            return String.format(Locale.ROOT, "%s: mobility %s is %s; %s", e.name(), plain(e.mobility()),
                    tiny ? "far slower than any ion" : "beyond ±" + NumberText.plain(MAX_PLAUSIBLE_MOBILITY, "-")
                            + ", faster than any common ion but H+ (about 362) and OH- (about 205)",
                    PhysicalBounds.unitHint(e.mobility()));
        }
        for (double mu : e.limitingMobilities()) {
            if (Math.abs(mu) > MAX_PLAUSIBLE_MOBILITY) {
                return String.format(Locale.ROOT, "%s: limiting mobility %s is beyond ±%s, faster than any common "
                                + "ion but H+ and OH-; %s", e.name(), plain(mu),
                        NumberText.plain(MAX_PLAUSIBLE_MOBILITY, "-"),
                        PhysicalBounds.unitHint(mu));
            }
        }
        return null;
    }

    /**
     * Refuses a library that holds a physically impossible entry (see {@link #impossible}): matching
     * peaks against it would give wrong names with confidence. The message names the file, the line
     * and the fix.
     *
     * @throws InputException for the first impossible entry
     */
    public static void requirePlausible(Library library) throws InputException {
        for (int j = 0; j < library.size(); j++) {
            String problem = impossible(library.entries().get(j));
            if (problem != null) {
                throw new InputException(library.sourceFile(), library.lineOf(j), "mobility",
                        problem + " (correct the library, e.g. with 'mobident library check')");
            }
        }
    }

    /**
     * The match window half-width identification applies to each entry for a peak measured without
     * uncertainty ({@link MatchWindow}, with the spreads pooled over the whole library); a peak's own
     * uncertainty and that of its run's scale widen it further.
     */
    public static double[] windows(Library library, MatchSettings match) {
        return MatchWindow.halfWidths(library, match);
    }

    private static String plain(double v) {
        return Math.abs(v) >= 1e-3 && Math.abs(v) < 1e6 ? NumberText.fixed(v, 3, "NaN")
                : NumberText.general(v, 3, Double.toString(v));
    }
}
