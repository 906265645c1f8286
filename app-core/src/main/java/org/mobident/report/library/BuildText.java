package org.mobident.report.library;

import java.io.PrintWriter;
import java.util.List;
import java.util.Locale;
import org.mobident.library.Library;
import org.mobident.library.LibraryEntry;
import org.mobident.library.standards.AnalyteStats;
import org.mobident.library.standards.BuildResult;
import org.mobident.library.standards.BuildSettings;
import org.mobident.library.standards.BuildWarning;
import org.mobident.library.standards.LibraryCheck;
import org.mobident.library.standards.Outlier;
import org.mobident.library.standards.UnexpectedPeak;
import org.mobident.text.NumberText;

/** Readable terminal output for built and checked libraries. */
public final class BuildText {
    /** Decimals of mobility SDs and windows, 1e-9 m²/(V s). */
    private static final int DECIMALS = 3;

    private BuildText() {
    }

    /** The analytes of a fresh build with their statistics, then outliers, unexpected peaks and warnings. */
    public static void write(BuildResult result, PrintWriter out) {
        out.println("Mobilities in 1e-9 m^2/(V s).");
        out.println(String.format(Locale.ROOT, "%-16s %9s %7s %3s %8s %8s %6s %7s  %s",
                "analyte", "mean", "sd", "n", "min", "max", "rsd%", "window", "named by"));
        for (AnalyteStats a : result.analytes()) {
            out.println(String.format(Locale.ROOT, "%-16s %9.3f %7.3f %3d %8.3f %8.3f %6.2f %7.3f  %s",
                    a.name(), a.mean(), a.sd(), a.n(), a.min(), a.max(), a.rsdPercent(), a.window(),
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
        out.println(result.settings().writesTolerance()
                ? "window: the fixed window written into the library (tolerance)."
                : "window: the half-width identification applies to a peak measured without uncertainty (a prediction"
                + " interval from the spreads pooled over the library and a between-session term); a peak's own"
                + " uncertainty and its run's scale correction widen it. No fixed window is written.");
        warnings(result.warnings(), out);
        out.flush();
    }

    /** A library, one entry per line, then the findings of a check (windows by the default rule). */
    public static void write(Library library, List<BuildWarning> findings, PrintWriter out) {
        write(library, findings, BuildSettings.defaults(), out);
    }

    /** A library, one entry per line, then the findings of a check, windows under the default match settings. */
    public static void write(Library library, List<BuildWarning> findings, BuildSettings settings, PrintWriter out) {
        write(library, findings, org.mobident.settings.MatchSettings.DEFAULT, out);
    }

    /**
     * A library, one entry per line, then the findings of a check. The window column is the one
     * identification applies ({@link LibraryCheck#windows}); an entry's own fixed window is marked '='.
     */
    public static void write(Library library, List<BuildWarning> findings, org.mobident.settings.MatchSettings match,
                             PrintWriter out) {
        out.println("Library " + library.sourceFile() + ": " + library.size() + " analytes. Mobilities in 1e-9 m^2/(V s).");
        for (String note : library.notes()) {
            out.println("  # " + note);
        }
        out.println(String.format(Locale.ROOT, "%-18s %9s %7s %3s %6s %8s %6s  %s",
                "analyte", "mobility", "sd", "n", "charge", "window", "temp", "source"));
        double[] windows = LibraryCheck.windows(library, match);
        boolean fixed = false;
        for (int j = 0; j < library.size(); j++) {
            LibraryEntry e = library.entries().get(j);
            boolean own = Double.isFinite(e.tolerance());
            fixed |= own;
            out.println(String.format(Locale.ROOT, "%-18s %9.3f %7s %3s %6s %8s %6.1f  %s",
                    e.name(), e.mobility(), NumberText.fixed(e.mobilitySd(), DECIMALS, "-"),
                    e.n() > 0 ? Integer.toString(e.n()) : "-",
                    e.charge() != 0 ? String.format(Locale.ROOT, "%+d", e.charge()) : "-",
                    NumberText.fixed(windows[j], DECIMALS, "-") + (own ? "=" : " "), e.temperatureOrDefaultC(),
                    e.source() == null ? "" : e.source()));
        }
        org.mobident.matching.SpreadModel spread = org.mobident.matching.SpreadModel.of(library, match);
        out.println("window: the half-width identification applies to a peak measured without uncertainty; a peak's"
                + " own uncertainty and its run's scale correction widen it." + (fixed
                ? " '=' marks an entry's own fixed window (column tolerance), which replaces the rule." : ""));
        if (spread.pooledCount() > 0) {
            out.println(String.format(Locale.ROOT, "spreads drawn towards the pooled RSD of %d analytes, %.2f %% "
                            + "(worth %s runs); between-session RSD %.2f %%", spread.pooledCount(),
                    100 * spread.pooledRsd(), spread.pooledDf() >= 1000 ? "many" : String.format(Locale.ROOT, "%.0f",
                            spread.pooledDf()), 100 * spread.sessionRsd()));
        }
        warnings(findings, out);
        out.flush();
    }

    private static void warnings(List<BuildWarning> findings, PrintWriter out) {
        List<BuildWarning> info = findings.stream().filter(w -> w.kind().informational()).toList();
        List<BuildWarning> warnings = findings.stream().filter(w -> !w.kind().informational()).toList();
        for (BuildWarning w : info) {
            out.println("note: " + w.message());
        }
        if (warnings.isEmpty()) {
            out.println("No warnings.");
            return;
        }
        out.println(warnings.size() + " warning(s):");
        for (BuildWarning w : warnings) {
            out.println("  - " + w.message());
        }
    }
}
