package org.mobident.library.build;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.mobident.library.LibraryEntry;

/**
 * Finds analytes whose match windows overlap: |μ₁ − μ₂| &lt; w₁ + w₂ with w the entries'
 * tolerances. Such analytes cannot be told apart by mobility alone in that buffer.
 */
final class WindowOverlaps {

    private WindowOverlaps() {
    }

    static List<BuildWarning> check(List<LibraryEntry> entries) {
        List<BuildWarning> out = new ArrayList<>();
        for (int i = 0; i < entries.size(); i++) {
            for (int j = i + 1; j < entries.size(); j++) {
                LibraryEntry a = entries.get(i);
                LibraryEntry b = entries.get(j);
                if (!Double.isFinite(a.tolerance()) || !Double.isFinite(b.tolerance())) {
                    continue;
                }
                double d = Math.abs(a.mobility() - b.mobility());
                if (d < a.tolerance() + b.tolerance()) {
                    out.add(new BuildWarning(BuildWarning.Kind.OVERLAPPING_WINDOWS, null, a.name() + ", " + b.name(),
                            null, String.format(Locale.ROOT, "%s (%.3f ± %.3f) and %s (%.3f ± %.3f) have overlapping"
                                            + " windows: they cannot be told apart by mobility alone in this buffer.",
                                    a.name(), a.mobility(), a.tolerance(), b.name(), b.mobility(), b.tolerance())));
                }
            }
        }
        return out;
    }
}
