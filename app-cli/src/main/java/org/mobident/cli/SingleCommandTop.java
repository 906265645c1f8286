package org.mobident.cli;

import picocli.CommandLine.Command;

/**
 * The top command when only one subcommand is built ({@link Main#commandLineFor}): the same name,
 * help and version options as {@link MobidentCommand}, without the list of every subcommand. It
 * never runs on its own: the first argument named its one subcommand.
 */
@Command(name = "mobident",
        mixinStandardHelpOptions = true,
        versionProvider = VersionProvider.class)
final class SingleCommandTop implements Runnable {
    @Override
    public void run() {
        // not reached: the arguments start with the subcommand's name
    }
}
