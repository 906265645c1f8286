package org.mobident.cli;

import picocli.CommandLine;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Model.OptionSpec;

/**
 * The library option of the shared run options is required by the commands that always
 * identify; {@code assess} needs it only without {@code --table}, which {@link AssessCommand#call} checks.
 */
final class LibraryOnlyWhenIdentifying implements CommandLine.IModelTransformer {
    @Override
    public CommandSpec transform(CommandSpec commandSpec) {
        OptionSpec library = commandSpec.findOption("--library");
        if (library != null && library.required()) {
            commandSpec.remove(library);
            commandSpec.addOption(OptionSpec.builder(library).required(false)
                    .description("Mobility library (CSV), to identify the runs now (not with --table).").build());
        }
        return commandSpec;
    }
}
