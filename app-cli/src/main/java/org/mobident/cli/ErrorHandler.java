package org.mobident.cli;

import java.io.IOException;
import org.mobident.InputException;
import picocli.CommandLine;

/**
 * Turns an error escaping a command into a one-line message and an exit code. A stack trace
 * is shown only with {@code --debug}.
 */
final class ErrorHandler implements CommandLine.IExecutionExceptionHandler {
    @Override
    public int handleExecutionException(Exception ex, CommandLine cl, CommandLine.ParseResult parsed) {
        boolean debug = false;
        for (CommandLine.ParseResult p = parsed; p != null; p = p.subcommand()) {
            debug |= p.hasMatchedOption("--debug"); // at any depth, e.g. 'library build --debug'
        }
        var err = cl.getErr();
        int code;
        if (ex instanceof InputException) {
            err.println("mobident: " + ex.getMessage());
            code = ExitCodes.BAD_INPUT;
        } else if (ex instanceof OutputException || ex instanceof IOException) {
            err.println("mobident: cannot write output: " + ex.getMessage());
            code = ExitCodes.CANNOT_WRITE;
        } else {
            err.println("mobident: unexpected error: " + ex + " (run again with --debug and report it)");
            code = ExitCodes.INTERNAL;
        }
        if (debug) {
            ex.printStackTrace(err);
        }
        err.flush();
        return code;
    }
}
