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
        CommandLine cl = commandLineFor(args);
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
     * The command line for these arguments. Building the model of every subcommand by reflection
     * costs about a third of a second, most of a single run's start-up; when the first argument names
     * one subcommand, only it is built, under a top command of the same name and options
     * ({@link SingleCommandTop}), so what the user sees is the same. The whole tree is built for
     * the top command's own help and version, {@code help}, {@code shell-completion} (which walks the
     * tree) and anything not recognised (for picocli's suggestions).
     */
    static CommandLine commandLineFor(String[] args) {
        if (args.length > 0 && !args[0].startsWith("-")) {
            for (Class<?> sub : MobidentCommand.class.getAnnotation(CommandLine.Command.class).subcommands()) {
                CommandLine.Command c = sub.getAnnotation(CommandLine.Command.class);
                if (c != null && c.name().equals(args[0]) && !WHOLE_TREE.contains(c.name())) {
                    CommandLine top = new CommandLine(new SingleCommandTop());
                    top.addSubcommand(new CommandLine(newInstance(sub)));
                    return top;
                }
            }
        }
        return new CommandLine(new MobidentCommand());
    }

    /** Subcommands that need the whole command tree. */
    private static final java.util.Set<String> WHOLE_TREE = java.util.Set.of("help", "shell-completion");

    private static Object newInstance(Class<?> type) {
        try {
            var constructor = type.getDeclaredConstructor();
            constructor.setAccessible(true);
            return constructor.newInstance();
        } catch (ReflectiveOperationException e) {
            throw new IllegalStateException("cannot create " + type.getName(), e);
        }
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
