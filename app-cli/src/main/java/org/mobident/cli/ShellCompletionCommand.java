package org.mobident.cli;

import java.io.PrintWriter;
import picocli.AutoComplete;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Spec;

/**
 * Prints a bash/zsh completion script for every command and option, generated from the same
 * command model that parses the options (picocli's {@link AutoComplete}), so it can never list an
 * option the tool does not take.
 */
@Command(name = "shell-completion",
        description = {"Prints a completion script for bash (and zsh with bashcompinit) to standard output.",
            "Use it with a command named mobident, e.g.:",
            "  alias mobident='java -jar /path/to/mobident.jar'",
            "  source <(mobident shell-completion)",
            "or save it once: mobident shell-completion > ~/.local/share/bash-completion/completions/mobident"},
        mixinStandardHelpOptions = true)
public final class ShellCompletionCommand implements Runnable {

    /** The name the script completes: the alias or wrapper script that starts the tool. */
    static final String COMMAND_NAME = "mobident";

    @Spec
    CommandSpec spec;

    @Override
    public void run() {
        PrintWriter out = spec.commandLine().getOut();
        out.print(AutoComplete.bash(COMMAND_NAME, spec.root().commandLine()));
        out.flush();
    }
}
