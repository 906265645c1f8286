package org.mobident.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Map;
import java.util.concurrent.TimeUnit;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import picocli.CommandLine;
import picocli.CommandLine.Model.OptionSpec;

/** The completion script knows every command and option the parser takes, and is valid bash. */
class ShellCompletionTest {

    @Test
    void scriptNamesEveryCommandAndOption() {
        BadInputCatalogueTest.Run r = BadInputCatalogueTest.run("shell-completion");
        assertEquals(ExitCodes.OK, r.code(), r.err());
        String script = r.out();
        assertTrue(script.contains("complete -F"), "a bash completion function is registered");
        int options = 0;
        for (Map.Entry<String, CommandLine> sub : new CommandLine(new MobidentCommand()).getSubcommands().entrySet()) {
            if (sub.getValue().getCommandSpec().usageMessage().hidden()) {
                continue; // hidden commands (the developers' bench) are not offered
            }
            assertTrue(script.contains(sub.getKey()), "command " + sub.getKey());
            for (OptionSpec o : sub.getValue().getCommandSpec().options()) {
                if (o.hidden()) {
                    continue;
                }
                assertTrue(script.contains(o.longestName()), sub.getKey() + " " + o.longestName());
                options++;
            }
        }
        assertTrue(options > 50, "options walked: " + options);
    }

    @Test
    void scriptIsValidBash(@TempDir Path dir) throws IOException, InterruptedException {
        Path bash = Path.of("/bin/bash");
        org.junit.jupiter.api.Assumptions.assumeTrue(Files.isExecutable(bash), "bash is needed for the syntax check");
        Path script = Files.writeString(dir.resolve("mobident.bash"),
                BadInputCatalogueTest.run("shell-completion").out(), StandardCharsets.UTF_8);
        Process p = new ProcessBuilder(bash.toString(), "-n", script.toString()).redirectErrorStream(true).start();
        assertTrue(p.waitFor(30, TimeUnit.SECONDS));
        String errors = new String(p.getInputStream().readAllBytes(), StandardCharsets.UTF_8);
        assertEquals(0, p.exitValue(), errors);
    }
}
