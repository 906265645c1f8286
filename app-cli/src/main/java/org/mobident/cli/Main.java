package org.mobident.cli;

import java.io.PrintWriter;
import picocli.CommandLine;

/** Entry point: runs the command line and exits with its code. */
public final class Main {
    private Main() {
    }

    public static void main(String[] args) {
        System.exit(run(args, new PrintWriter(System.out, true), new PrintWriter(System.err, true)));
    }

    /** Runs the command line with the given writers and returns the exit code (for tests). */
    public static int run(String[] args, PrintWriter out, PrintWriter err) {
        CommandLine cl = new CommandLine(new MobidentCommand());
        cl.setOut(out);
        cl.setErr(err);
        cl.setCaseInsensitiveEnumValuesAllowed(true);
        cl.setExecutionExceptionHandler(new ErrorHandler());
        cl.setParameterExceptionHandler((ex, a) -> {
            CommandLine c = ex.getCommandLine();
            c.getErr().println("mobident: " + ex.getMessage());
            if (!CommandLine.UnmatchedArgumentException.printSuggestions(ex, c.getErr())) {
                c.getErr().println("Try '" + c.getCommandSpec().qualifiedName() + " --help' for the options.");
            }
            return ExitCodes.USAGE;
        });
        int code = cl.execute(args);
        out.flush();
        err.flush();
        return code;
    }
}
