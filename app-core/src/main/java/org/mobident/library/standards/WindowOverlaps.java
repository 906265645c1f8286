package org.mobident.library.standards;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.mobident.library.LibraryEntry;
import org.mobident.text.NumberText;

/**
 * Finds analytes that lie close together in mobility, in two degrees:
 * <ul>
 *   <li>{@link BuildWarning.Kind#INDISTINGUISHABLE}: |μ₁ − μ₂| &lt; max(2·√(s₁² + s₂²),
 *       {@value #INDISTINGUISHABLE_FLOOR} unit), s the entries' SDs (the floor alone when an SD is
 *       unknown). The difference of two single measurements of the pair has the SD √(s₁² + s₂²);
 *       closer than two of those (about a 95 % interval, JCGM 100:2008 (GUM) §6.3) a peak cannot be
 *       given to one rather than the other by mobility alone. The floor of 1 unit, twice the default
 *       window floor of 0.5, stands for day-to-day drift beyond the replicate SD (common practice).</li>
 *   <li>otherwise {@link BuildWarning.Kind#OVERLAPPING_WINDOWS}: |μ₁ − μ₂| &lt; w₁ + w₂ with w the
 *       match windows identification applies ({@link org.mobident.matching.MatchWindow}). Only a peak that falls between the two, in both windows, may be
 *       ambiguous; identification still tells apart peaks that lie near one of them.</li>
 * </ul>
 */
final class WindowOverlaps {

    /** Below this distance, mobility units, two analytes are never told apart (common practice). */
    static final double INDISTINGUISHABLE_FLOOR = 1.0;
    /** Multiple of the SD of the difference under which two analytes cannot be told apart. */
    static final double INDISTINGUISHABLE_SD_MULTIPLE = 2.0;

    private WindowOverlaps() {
    }

    /**
     * @param entries the entries
     * @param windows each entry's applied match half-width ({@link LibraryCheck#windows}), same order
     */
    static List<BuildWarning> check(List<LibraryEntry> entries, double[] windows) {
        List<BuildWarning> out = new ArrayList<>();
        for (int i = 0; i < entries.size(); i++) {
            for (int j = i + 1; j < entries.size(); j++) {
                LibraryEntry a = entries.get(i);
                LibraryEntry b = entries.get(j);
                if (a.buffer() != null && b.buffer() != null && !LibraryEntry.sameBuffer(a.buffer(), b.buffer())) {
                    continue; // entries of two buffers never meet in one run
                }
                double d = Math.abs(a.mobility() - b.mobility());
                double sdDiff = Math.sqrt(a.mobilitySd() * a.mobilitySd() + b.mobilitySd() * b.mobilitySd());
                double limit = Double.isFinite(sdDiff)
                        ? Math.max(INDISTINGUISHABLE_SD_MULTIPLE * sdDiff, INDISTINGUISHABLE_FLOOR)
                        : INDISTINGUISHABLE_FLOOR;
                String apart = Double.isFinite(sdDiff) && sdDiff > 0
                        ? String.format(Locale.ROOT, "they are %.3f units apart, %.1f combined SDs", d, d / sdDiff)
                        : String.format(Locale.ROOT, "they are %.3f units apart", d);
                if (d < limit) {
                    out.add(new BuildWarning(BuildWarning.Kind.INDISTINGUISHABLE, null, a.name() + ", " + b.name(),
                            null, String.format(Locale.ROOT, "%s (%.3f) and %s (%.3f) cannot be told apart by"
                                            + " mobility alone: %s, less than %.3f (the larger of %s combined SDs"
                                            + " and %s unit).", a.name(), a.mobility(), b.name(), b.mobility(), apart,
                                    limit, NumberText.plain(INDISTINGUISHABLE_SD_MULTIPLE, "-"),
                                    NumberText.plain(INDISTINGUISHABLE_FLOOR, "-"))));
                    continue;
                }
                double wa = windows[i];
                double wb = windows[j];
                if (Double.isFinite(wa) && Double.isFinite(wb) && d < wa + wb) {
                    out.add(new BuildWarning(BuildWarning.Kind.OVERLAPPING_WINDOWS, null, a.name() + ", " + b.name(),
                            null, String.format(Locale.ROOT, "The windows of %s (%.3f ± %.3f) and %s (%.3f ± %.3f)"
                                            + " overlap: a peak between them may be ambiguous; %s.",
                                    a.name(), a.mobility(), wa, b.name(), b.mobility(), wb, apart)));
                }
            }
        }
        return out;
    }
}
