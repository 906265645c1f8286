package org.mobident.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.io.PrintWriter;
import java.io.StringWriter;
import java.util.Map;
import org.junit.jupiter.api.Test;
import picocli.CommandLine;

/**
 * A run that names its subcommand builds only that one ({@link Main#commandLineFor}); what the user
 * sees must be what the whole command tree shows.
 */
class SingleCommandStartTest {

    @Test
    void everySubcommandShowsTheSameHelpWhenBuiltAlone() {
        CommandLine whole = new CommandLine(new MobidentCommand());
        for (Map.Entry<String, CommandLine> e : whole.getSubcommands().entrySet()) {
            String name = e.getKey();
            CommandLine alone = Main.commandLineFor(new String[] {name, "--help"});
            int expectedSubcommands = name.equals("help") || name.equals("shell-completion")
                    ? whole.getSubcommands().size() : 1;
            assertEquals(expectedSubcommands, alone.getSubcommands().size(), name);
            assertEquals(e.getValue().getUsageMessage(), alone.getSubcommands().get(name).getUsageMessage(), name);
            for (Map.Entry<String, CommandLine> nested : e.getValue().getSubcommands().entrySet()) {
                assertEquals(nested.getValue().getUsageMessage(),
                        alone.getSubcommands().get(name).getSubcommands().get(nested.getKey()).getUsageMessage(),
                        name + " " + nested.getKey());
            }
        }
    }

    @Test
    void theTopCommandAndMisspelledNamesGetTheWholeTree() {
        int all = new CommandLine(new MobidentCommand()).getSubcommands().size();
        assertEquals(all, Main.commandLineFor(new String[] {"--help"}).getSubcommands().size());
        assertEquals(all, Main.commandLineFor(new String[] {"idnetify"}).getSubcommands().size());
        assertEquals(all, Main.commandLineFor(new String[0]).getSubcommands().size());
        StringWriter err = new StringWriter();
        int code = Main.run(new String[] {"idnetify"}, new PrintWriter(new StringWriter()), new PrintWriter(err));
        assertEquals(ExitCodes.USAGE, code);
        assertEquals(true, err.toString().contains("Did you mean: mobident identify"), err.toString());
    }
}
