package org.mobident.library.build;

import java.io.PrintWriter;
import java.util.List;
import java.util.Locale;
import org.mobident.library.Library;
import org.mobident.library.LibraryEntry;

/** Readable terminal output for built and checked libraries. */
public final class BuildText {

    private BuildText() {
    }

    /** The analytes of a fresh build with their statistics, then outliers, unexpected peaks and warnings. */
    public static void write(BuildResult result, PrintWriter out) {
        out.println("Mobilities in 1e-9 m^2/(V s).");
        out.println(String.format(Locale.ROOT, "%-16s %9s %7s %3s %8s %8s %6s %7s  %s",
                "analyte", "mean", "sd", "n", "min", "max", "rsd%", "window", "named by"));
        for (AnalyteStats a : result.analytes()) {
            out.println(String.format(Locale.ROOT, "%-16s %9.3f %7.3f %3d %8.3f %8.3f %6.2f %7.3f  %s",
                    a.name(), a.mean(), a.sd(), a.n(), a.min(), a.max(), a.rsdPercent(), a.tolerance(),
                    a.basis().name().toLowerCase(Locale.ROOT).replace('_', ' ')));
        }
        for (Outlier o : result.outliers()) {
            out.println(String.format(Locale.ROOT, "outlier: %s in run %s, %.3f (G = %.3f > %.3f)%s",
                    o.analyte(), o.run(), o.mobility(), o.g(), o.gCritical(),
                    o.excluded() ? ", left out of the statistics" : ", kept in the statistics"));
        }
        for (UnexpectedPeak p : result.unexpectedPeaks()) {
            out.println(String.format(Locale.ROOT, "unexpected peak: run %s at %.2f s, mobility %.3f (%s)",
                    p.run(), p.apexTimeS(), p.mobility(), p.reason()));
        }
        warnings(result.warnings(), out);
        out.flush();
    }

    /** A library, one entry per line, then the findings of a check (windows by the default rule). */
    public static void write(Library library, List<BuildWarning> findings, PrintWriter out) {
        write(library, findings, BuildSettings.defaults(), out);
    }

    /**
     * A library, one entry per line, then the findings of a check. An entry without its own
     * tolerance shows the window matching would use ({@link LibraryCheck#window}), marked with '*'.
     */
    public static void write(Library library, List<BuildWarning> findings, BuildSettings settings, PrintWriter out) {
        out.println("Library " + library.sourceFile() + ": " + library.size() + " analytes. Mobilities in 1e-9 m^2/(V s).");
        for (String note : library.notes()) {
            out.println("  # " + note);
        }
        out.println(String.format(Locale.ROOT, "%-18s %9s %7s %3s %6s %8s %6s  %s",
                "analyte", "mobility", "sd", "n", "charge", "window", "temp", "source"));
        boolean computed = false;
        for (LibraryEntry e : library.entries()) {
            String window;
            if (Double.isFinite(e.tolerance())) {
                window = num(e.tolerance()) + " ";
            } else {
                window = num(LibraryCheck.window(e, settings)) + "*";
                computed = true;
            }
            out.println(String.format(Locale.ROOT, "%-18s %9.3f %7s %3s %6s %8s %6.1f  %s",
                    e.name(), e.mobility(), num(e.mobilitySd()), e.n() > 0 ? Integer.toString(e.n()) : "-",
                    e.charge() != 0 ? String.format(Locale.ROOT, "%+d", e.charge()) : "-",
                    window, e.temperatureOrDefaultC(), e.source() == null ? "" : e.source()));
        }
        if (computed) {
            out.println(String.format(Locale.ROOT, "* window computed, as matching does, by the rule max(%s x SD, %s)"
                            + " (SD %s assumed where none is given); identification widens it by the peak's own"
                            + " uncertainty.", LibraryBuilder.plain(settings.toleranceSdMultiple()),
                    LibraryBuilder.plain(settings.toleranceFloor()),
                    LibraryBuilder.plain(org.mobident.matching.MatchSettings.DEFAULT_ASSUMED_ENTRY_SD)));
        }
        warnings(findings, out);
        out.flush();
    }

    private static void warnings(List<BuildWarning> warnings, PrintWriter out) {
        if (warnings.isEmpty()) {
            out.println("No warnings.");
            return;
        }
        out.println(warnings.size() + " warning(s):");
        for (BuildWarning w : warnings) {
            out.println("  - " + w.message());
        }
    }

    private static String num(double v) {
        return Double.isFinite(v) ? String.format(Locale.ROOT, "%.3f", v) : "-";
    }
}
