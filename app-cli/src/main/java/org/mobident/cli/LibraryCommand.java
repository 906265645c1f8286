package org.mobident.cli;

import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Spec;

/** {@code mobident library}: groups the commands that make and look after mobility libraries. */
@Command(name = "library",
        mixinStandardHelpOptions = true,
        versionProvider = VersionProvider.class,
        description = "Builds a mobility library from standards runs, adds new standards runs to one, and checks one.",
        subcommands = {LibraryBuildCommand.class, LibraryAddCommand.class, LibraryCheckCommand.class})
public final class LibraryCommand implements Runnable {
    @Spec
    CommandSpec spec;

    @Override
    public void run() {
        spec.commandLine().usage(spec.commandLine().getOut());
    }
}
