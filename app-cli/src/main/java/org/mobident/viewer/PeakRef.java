package org.mobident.viewer;

/**
 * Names one peak of the loaded data.
 *
 * @param run  index of the run in {@link ViewerData#runs()}
 * @param peak index of the peak in that run's {@code RunResult.peaks()}
 */
public record PeakRef(int run, int peak) {
    public PeakRef {
        if (run < 0 || peak < 0) {
            throw new IllegalArgumentException("negative index: run " + run + ", peak " + peak);
        }
    }
}
