package org.mobident.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import java.util.TreeSet;
import org.junit.jupiter.api.Test;
import picocli.CommandLine;
import picocli.CommandLine.Model.OptionSpec;

/**
 * Walks every command (and sub-command) and checks that a thing shared by several commands is
 * spelt one way: an option may keep an older spelling as a second name, but its first name, the
 * one the help shows first and the README's table lists, is the shared one.
 */
class SharedOptionSpellingTest {

    /** A second spelling seen in some command → the one spelling shared by all. */
    static final Map<String, String> SHARED = Map.of(
            "--run", "--show",
            "--buffer-label", "--buffer");

    private static void walk(CommandLine cl, String path, Map<String, List<OptionSpec>> out) {
        for (OptionSpec o : cl.getCommandSpec().options()) {
            out.computeIfAbsent(path, k -> new ArrayList<>()).add(o);
        }
        for (Map.Entry<String, CommandLine> e : cl.getSubcommands().entrySet()) {
            walk(e.getValue(), path + " " + e.getKey(), out);
        }
    }

    private static Map<String, List<OptionSpec>> allOptions() {
        Map<String, List<OptionSpec>> out = new TreeMap<>();
        walk(new CommandLine(new MobidentCommand()), "mobident", out);
        return out;
    }

    @Test
    void everySharedThingHasOneFirstSpelling() {
        int checked = 0;
        for (Map.Entry<String, List<OptionSpec>> e : allOptions().entrySet()) {
            for (OptionSpec o : e.getValue()) {
                for (String name : o.names()) {
                    String shared = SHARED.get(name);
                    if (shared != null) {
                        checked++;
                        assertTrue(List.of(o.names()).contains(shared),
                                e.getKey() + " spells " + name + " without " + shared);
                        assertEquals(shared, firstLong(o), e.getKey() + ": the help must show " + shared + " first");
                    }
                }
            }
        }
        assertTrue(checked >= 4, "plot, view, predict and recheck keep an older spelling; checked " + checked);
    }

    @Test
    void aSharedOptionNameTakesTheSameKindOfValueEverywhere() {
        // e.g. --axis is an AXIS everywhere, --show a RUN list, --library a FILE
        Map<String, TreeSet<String>> labels = new TreeMap<>();
        for (List<OptionSpec> options : allOptions().values()) {
            for (OptionSpec o : options) {
                if (o.arity().max() > 0) {
                    labels.computeIfAbsent(firstLong(o), k -> new TreeSet<>()).add(o.paramLabel());
                }
            }
        }
        for (String name : List.of("--show", "--axis", "--library", "--buffer", "--runs", "--csv", "--html")) {
            TreeSet<String> seen = labels.get(name);
            assertTrue(seen != null, name + " is used by some command");
            assertEquals(1, seen.size(), name + " takes " + seen);
        }
    }

    private static String firstLong(OptionSpec o) {
        for (String n : o.names()) {
            if (n.startsWith("--")) {
                return n;
            }
        }
        return o.names()[0];
    }
}
