package org.mobident.cli;

/** The one wording of the --axis option, shared by the commands that draw runs. */
final class AxisWords {
    private AxisWords() {
    }

    /** Help text of --axis; the values are the {@link org.mobident.report.plot.Axis} names in any case. */
    static final String DESCRIPTION = "Horizontal axis: mobility (default) or time.";
}
