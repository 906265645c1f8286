package org.mobident.usecase;

import java.util.List;
import java.util.Objects;
import org.mobident.InputException;
import org.mobident.library.Library;
import org.mobident.recheck.BufferSpec;
import org.mobident.recheck.BufferTransfer;
import org.mobident.recheck.PeakTableRow;
import org.mobident.recheck.RecheckResult;
import org.mobident.recheck.RecheckSettings;
import org.mobident.recheck.Rechecker;

/**
 * After a buffer change: which assignments of an earlier peak table still hold, moved but stay
 * unique, became ambiguous, would now be taken for another analyte, or were lost, and which library
 * pairs can no longer be told apart ({@link Rechecker}). The new buffer's mobilities come from a
 * library measured in it, or are predicted from the old library.
 */
public final class RecheckAssignments {

    private final List<PeakTableRow> rows;
    private final String tableLabel;
    private final Library oldLibrary;
    private final BufferSpec oldBuffer;
    private final BufferTransfer predictor;

    /**
     * @param rows       the earlier peak table
     * @param tableLabel where it came from, named in the result
     * @param oldLibrary the library it was matched against
     * @param oldBuffer  that library's buffer where its entries do not say, or null
     * @param predictor  the model for predicting shifts, with its reference data
     */
    public RecheckAssignments(List<PeakTableRow> rows, String tableLabel, Library oldLibrary, BufferSpec oldBuffer,
                              BufferTransfer predictor) {
        this.rows = List.copyOf(rows);
        this.tableLabel = tableLabel;
        this.oldLibrary = Objects.requireNonNull(oldLibrary, "oldLibrary");
        this.oldBuffer = oldBuffer;
        this.predictor = Objects.requireNonNull(predictor, "predictor");
    }

    /**
     * Rechecks against a library measured in the new buffer.
     *
     * @param newBuffer the new buffer's conditions, to say how far the model's prediction was off; or null
     */
    public RecheckResult againstMeasured(Library newLibrary, BufferSpec newBuffer) throws InputException {
        return Rechecker.withMeasuredLibrary(rows, tableLabel, oldLibrary, oldBuffer, newLibrary, newBuffer, predictor,
                RecheckSettings.DEFAULT);
    }

    /** Rechecks against the old library's mobilities predicted for {@code newBuffer}. */
    public RecheckResult againstPredicted(BufferSpec newBuffer) throws InputException {
        return Rechecker.withPredictedLibrary(rows, tableLabel, oldLibrary, oldBuffer, newBuffer, predictor,
                RecheckSettings.DEFAULT);
    }
}
