package org.mobident.viewer;

import java.util.List;
import javax.swing.table.AbstractTableModel;
import org.mobident.report.plot.PeakStatus;
import org.mobident.report.plot.PlotModel;
import org.mobident.result.PeakResult;
import org.mobident.result.PeakRole;

/** The peaks of the ticked runs as table rows; refilled from the data, never edited. */
final class PeakTableModel extends AbstractTableModel {
    private static final long serialVersionUID = 1L;

    static final String[] COLUMNS = {"Run", "Time (s)", "Mobility", "± u", "Assigned", "Confidence", "Status"};

    private transient ViewerData data;
    private transient List<PeakRef> rows = List.of();

    /** Shows the peaks of {@code tickedRuns}. */
    void show(ViewerData newData, List<Integer> tickedRuns) {
        this.data = newData;
        this.rows = newData.peaksOf(tickedRuns);
        fireTableDataChanged();
    }

    /** The peak of a model row. */
    PeakRef refAt(int row) {
        return rows.get(row);
    }

    /** The model row of {@code ref}, -1 when it is not listed. */
    int rowOf(PeakRef ref) {
        return ref == null ? -1 : rows.indexOf(ref);
    }

    @Override
    public int getRowCount() {
        return rows.size();
    }

    @Override
    public int getColumnCount() {
        return COLUMNS.length;
    }

    @Override
    public String getColumnName(int column) {
        return COLUMNS[column];
    }

    @Override
    public Class<?> getColumnClass(int column) {
        return column == 1 || column == 2 || column == 3 ? Double.class : String.class;
    }

    @Override
    public Object getValueAt(int row, int column) {
        PeakRef ref = rows.get(row);
        PeakResult pr = data.peak(ref);
        switch (column) {
            case 0:
                return data.runs().get(ref.run()).name();
            case 1:
                return pr.peak() == null ? null : pr.peak().apexTimeS();
            case 2:
                // the value compared with the library (at its temperature, corrected for the run's scale)
                return finiteOrNull(Double.isFinite(pr.mobilityCorrected()) ? pr.mobilityCorrected() : pr.mobility());
            case 3:
                // the uncertainty that decided the match (times, scale correction, library spread), as in
                // the terminal and HTML reports; apex timing is in the details
                return finiteOrNull(data.runs().get(ref.run()).result().decidingSd(pr));
            case 4:
                return assigned(pr);
            case 5:
                if (pr.role() != PeakRole.ANALYTE || pr.match() == null || !Double.isFinite(pr.match().confidence())) {
                    return "";
                }
                // as in the terminal and HTML reports: an unassigned peak's confidence is that it is none
                return pr.match().assigned() != null && PeakStatus.of(pr) != PeakStatus.UNASSIGNED
                        ? PeakDetails.percent(pr.match().confidence())
                        : PeakDetails.percent(pr.match().confidence()) + " none";
            default:
                return PeakStatus.of(pr).label();
        }
    }

    static String assigned(PeakResult pr) {
        if (pr.role() != PeakRole.ANALYTE) {
            return PlotModel.markerWord(pr.role()); // the plot's label and legend word
        }
        if (pr.match() == null || pr.match().assigned() == null || PeakStatus.of(pr) == PeakStatus.UNASSIGNED) {
            return "?";
        }
        return pr.match().assigned();
    }

    private static Double finiteOrNull(double v) {
        return Double.isFinite(v) ? v : null;
    }
}
