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
            CommandLine c = commandOf(ex, cl);
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

    /**
     * The command a usage error belongs to. An option value refused after parsing is reported
     * through a helper {@link CommandLine} around an options mixin, which has no command name; the
     * innermost command the user typed is named instead.
     */
    private static CommandLine commandOf(CommandLine.ParameterException ex, CommandLine top) {
        CommandLine c = ex.getCommandLine();
        if (c.getCommandSpec().userObject().getClass().isAnnotationPresent(CommandLine.Command.class)) {
            return c;
        }
        CommandLine deepest = top;
        for (CommandLine.ParseResult p = top.getParseResult(); p != null; p = p.subcommand()) {
            deepest = p.commandSpec().commandLine();
        }
        deepest.setErr(top.getErr());
        return deepest;
    }
}
