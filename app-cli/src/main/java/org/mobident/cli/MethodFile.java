package org.mobident.cli;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.mobident.InputException;
import org.mobident.io.TextFiles;

/**
 * A method file: the run conditions of a method, and how its instrument writes its traces, as
 * {@code name = value} lines, the names being the options without their dashes ({@code voltage-kv =
 * -20}, {@code time-unit = min}), so one trace can be identified without typing every condition.
 * Blank lines and text after {@code #} are ignored.
 */
final class MethodFile {

    /** The names a method file may set, as the options spell them without "--". */
    static final List<String> NAMES = List.of("total-length-cm", "detector-length-cm", "voltage-kv", "ramp-s",
            "temperature-c", "buffer", "marker-window", "detection", "ref-mobility", "ref-window", "time-unit",
            "time-column", "signal-column");

    private final Path file;
    private final Map<String, String> values;
    private final Map<String, Long> lines;

    private MethodFile(Path file, Map<String, String> values, Map<String, Long> lines) {
        this.file = file;
        this.values = values;
        this.lines = lines;
    }

    static MethodFile read(Path file) throws InputException {
        List<String> text;
        try {
            text = Files.readAllLines(file, StandardCharsets.UTF_8);
            if (!text.isEmpty()) {
                text.set(0, TextFiles.withoutBom(text.get(0))); // editors on some systems write one
            }
        } catch (IOException e) {
            throw new InputException(file.toString(), 0, "--method", "cannot read the method file: " + e.getMessage(), e);
        }
        Map<String, String> values = new LinkedHashMap<>();
        Map<String, Long> lines = new LinkedHashMap<>();
        for (int i = 0; i < text.size(); i++) {
            String line = text.get(i);
            int hash = line.indexOf('#');
            if (hash >= 0) {
                line = line.substring(0, hash);
            }
            line = line.strip();
            if (line.isEmpty()) {
                continue;
            }
            int eq = line.indexOf('=');
            if (eq <= 0) {
                throw new InputException(file.toString(), i + 1, null, "expected 'name = value', got '" + line + "'");
            }
            String name = line.substring(0, eq).strip().toLowerCase(Locale.ROOT);
            if (name.startsWith("--")) {
                name = name.substring(2);
            }
            if (!NAMES.contains(name)) {
                throw new InputException(file.toString(), i + 1, name, "not a setting a method file holds; the names are: "
                        + String.join(", ", NAMES));
            }
            if (values.containsKey(name)) {
                throw new InputException(file.toString(), i + 1, name, "given twice (first on line " + lines.get(name)
                        + ")");
            }
            values.put(name, line.substring(eq + 1).strip());
            lines.put(name, (long) (i + 1));
        }
        return new MethodFile(file, values, lines);
    }

    /** The text given for {@code name}, or null. */
    String text(String name) {
        String v = values.get(name);
        return v == null || v.isEmpty() ? null : v;
    }

    /** The number given for {@code name}, or null; a value that is no number names the file and line. */
    Double number(String name) throws InputException {
        String v = text(name);
        if (v == null) {
            return null;
        }
        try {
            double d = Double.parseDouble(v);
            if (!Double.isFinite(d)) {
                throw new NumberFormatException();
            }
            return d;
        } catch (NumberFormatException e) {
            throw new InputException(file.toString(), lines.get(name), name, "expected a number, got '" + v + "'");
        }
    }
}
