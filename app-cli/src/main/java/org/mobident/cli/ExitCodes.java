package org.mobident.cli;

/**
 * Exit codes of every command, documented in the README.
 *
 * <pre>
 *  0  everything was processed
 *  1  some runs could not be processed or got no mobility scale; the rest were written
 *  2  the command line itself was wrong (unknown option, missing value)
 *  3  an input the whole command depends on is unusable (library, run sheet, settings)
 *  4  an output could not be written (exists without --overwrite, disk, permissions)
 *  5  an unexpected internal error (please report it)
 * </pre>
 */
public final class ExitCodes {
    public static final int OK = 0;
    public static final int SOME_RUNS_FAILED = 1;
    public static final int USAGE = 2;
    public static final int BAD_INPUT = 3;
    public static final int CANNOT_WRITE = 4;
    public static final int INTERNAL = 5;

    private ExitCodes() {
    }
}
