package org.mobident.recheck;

import java.util.Collections;
import java.util.EnumMap;
import java.util.Map;
import org.mobident.report.PeakTableColumn;
import org.mobident.report.PeakTableStatus;

/**
 * One row of Mobident's peak table as read back: by name what a recheck or a scoring needs, and
 * every column's cell through {@link #text} and {@link #number} (the columns are
 * {@link PeakTableColumn}).
 *
 * @param line                  1-based line of the row in its file (0 when built in code)
 * @param run                   run name
 * @param peak                  peak number within the run (0 for a run's single failed/no-peaks row)
 * @param role                  role label as written ("analyte", "neutral marker", "mobility marker"; empty when none)
 * @param mobility              effective mobility at the run temperature, 1e-9 m²/(V s), NaN when empty
 * @param mobilitySd            its standard uncertainty, NaN when empty
 * @param mobilityAtLibraryTemp the mobility converted to library A's temperature, NaN when empty
 * @param assigned              assigned analyte, or null
 * @param confidence            confidence of the assignment, NaN when empty
 * @param status                identified, ambiguous, unassigned, marker, failed or no_peaks
 * @param apexTimeS             apex time, s; NaN when empty or the table has no such column
 * @param widthHalfS            full width at half height, s; NaN when empty or absent
 * @param signalToNoise         signal-to-noise ratio; NaN when empty or absent
 * @param mobilityCorrected     mobility after the run's scale correction, at the library temperature,
 *                              1e-9 m²/(V s); NaN when empty or absent (tables of earlier versions)
 * @param centreTimeS           the zone's centre time (the time its mobility comes from), s; NaN when empty
 *                              or absent
 * @param cells                 every known column's cell as read (text without the spreadsheet guard,
 *                              numbers as written; empty cells and absent columns left out), for
 *                              {@link #text} and {@link #number}
 */
public record PeakTableRow(long line, String run, int peak, String role, double mobility, double mobilitySd,
                           double mobilityAtLibraryTemp, String assigned, double confidence, String status,
                           double apexTimeS, double widthHalfS, double signalToNoise, double mobilityCorrected,
                           double centreTimeS, Map<PeakTableColumn, String> cells) {

    /** The canonical form: {@code cells} is copied (null: no cells). */
    public PeakTableRow {
        cells = cells == null || cells.isEmpty() ? Map.of() : Collections.unmodifiableMap(new EnumMap<>(cells));
    }

    /** A row with its peak measures but without the cells as read (as built in code). */
    public PeakTableRow(long line, String run, int peak, String role, double mobility, double mobilitySd,
                        double mobilityAtLibraryTemp, String assigned, double confidence, String status,
                        double apexTimeS, double widthHalfS, double signalToNoise, double mobilityCorrected,
                        double centreTimeS) {
        this(line, run, peak, role, mobility, mobilitySd, mobilityAtLibraryTemp, assigned, confidence, status,
                apexTimeS, widthHalfS, signalToNoise, mobilityCorrected, centreTimeS, Map.of());
    }

    /** A row without the peak measures and the corrected mobility (as a recheck needs it). */
    public PeakTableRow(long line, String run, int peak, String role, double mobility, double mobilitySd,
                        double mobilityAtLibraryTemp, String assigned, double confidence, String status) {
        this(line, run, peak, role, mobility, mobilitySd, mobilityAtLibraryTemp, assigned, confidence, status,
                Double.NaN, Double.NaN, Double.NaN, Double.NaN, Double.NaN);
    }

    /** Role label of an analyte peak. */
    public static final String ROLE_ANALYTE = "analyte";
    /** Status of an identified analyte. */
    public static final String STATUS_IDENTIFIED = PeakTableStatus.IDENTIFIED.word();
    /** Status of an ambiguous analyte. */
    public static final String STATUS_AMBIGUOUS = PeakTableStatus.AMBIGUOUS.word();

    /**
     * A text column as read (stripped, without the spreadsheet guard); null when the cell is empty
     * or the table has no such column.
     */
    public String text(PeakTableColumn column) {
        return cells.get(column);
    }

    /** A numeric column as read; NaN when the cell is empty or the table has no such column. */
    public double number(PeakTableColumn column) {
        return column.format().read(cells.get(column));
    }

    /** True for an analyte peak with an assignment (identified or ambiguous) and a known mobility. */
    public boolean isAssignment() {
        return ROLE_ANALYTE.equals(role) && assigned != null
                && (STATUS_IDENTIFIED.equals(status) || STATUS_AMBIGUOUS.equals(status))
                && Double.isFinite(comparedMobility());
    }

    /** The mobility that was compared with library A: at the library temperature when known, else as measured. */
    public double comparedMobility() {
        return Double.isFinite(mobilityAtLibraryTemp) ? mobilityAtLibraryTemp : mobility;
    }
}
