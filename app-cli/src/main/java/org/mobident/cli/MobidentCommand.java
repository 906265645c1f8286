package org.mobident.cli;

import picocli.CommandLine.Command;

/** The top command; it only groups the subcommands. */
@Command(name = "mobident",
        mixinStandardHelpOptions = true,
        versionProvider = VersionProvider.class,
        description = "Identifies capillary zone electrophoresis peaks by effective mobility. Identification by mobility is presumptive: confirm by an orthogonal method where results carry legal, clinical or safety weight, and follow your lab's validated procedures.",
        subcommands = {IdentifyCommand.class, ReportCommand.class, PlotCommand.class, LibraryCommand.class, PredictCommand.class, RecheckCommand.class,
            AssessCommand.class, BenchCommand.class,
            ViewCommand.class, SimulateCommand.class, ShellCompletionCommand.class,
            picocli.CommandLine.HelpCommand.class})
public final class MobidentCommand implements Runnable {
    @picocli.CommandLine.Spec
    picocli.CommandLine.Model.CommandSpec spec;

    @Override
    public void run() {
        spec.commandLine().usage(spec.commandLine().getOut());
    }
}
