package org.mobident.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.LinkedHashMap;
import java.util.Map;
import java.util.function.Predicate;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVRecord;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** 'library build / add / check' as a user runs them, on the demo standards. */
class LibraryCommandsTest {

    private static final Path DEMO = Path.of("..", "demo-data");

    @TempDir
    Path dir;

    record Run(int code, String out, String err) {
    }

    private static Run run(String... args) {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        int code = Main.run(args, new PrintWriter(out, true), new PrintWriter(err, true));
        return new Run(code, out.toString(), err.toString());
    }

    private static String demo(String file) {
        return DEMO.resolve(file).toString();
    }

    /** name → {mobility, charge} of a library file. */
    private static Map<String, String[]> rows(Path library) throws IOException {
        Map<String, String[]> out = new LinkedHashMap<>();
        for (CSVRecord r : CSVFormat.DEFAULT.builder().setHeader().setSkipHeaderRecord(true).setCommentMarker('#')
                .get().parse(Files.newBufferedReader(library)).getRecords()) {
            out.put(r.get("name"), new String[] {r.get("mobility"), r.isMapped("charge") ? r.get("charge") : ""});
        }
        return out;
    }

    private Path mixesWithoutApprox() throws IOException {
        Path p = dir.resolve("mixes-names.csv");
        Files.writeString(p, "mix,analyte\nmixA,chloride\nmixA,sulfate\nmixA,nitrate\nmixA,fluoride\nmixA,phosphate\n"
                + "mixB,bromide\nmixB,nitrite\nmixB,chlorate\nmixB,formate\nmixB,acetate\n");
        return p;
    }

    @Test
    void namesFromTheReferenceAreNeverWrongWithOrWithoutBufferChemistry() throws IOException {
        // The demo's true assignment, from its standards sheet's approximate mobilities.
        Path truth = dir.resolve("truth.csv");
        assertEquals(ExitCodes.OK, run("library", "build", "--runs", demo("standards/standards-runs.csv"),
                "--mixes", demo("standards/mixes.csv"), "--out", truth.toString()).code());
        Map<String, String[]> right = rows(truth);
        for (String[] args : new String[][] {{"--ph", "8.0", "--ionic-strength-mm", "12"}, {}}) {
            Path out = dir.resolve("named" + args.length + ".csv");
            String[] base = {"library", "build", "--runs", demo("standards/standards-runs.csv"), "--mixes",
                mixesWithoutApprox().toString(), "--reference", "../reference-libraries/ions-25C.csv", "--out",
                out.toString()};
            String[] all = new String[base.length + args.length];
            System.arraycopy(base, 0, all, 0, base.length);
            System.arraycopy(args, 0, all, base.length, args.length);
            Run r = run(all);
            assertEquals(ExitCodes.SOME_RUNS_FAILED, r.code(), r.out() + r.err());
            Map<String, String[]> named = rows(out);
            for (Map.Entry<String, String[]> e : named.entrySet()) {
                // every name written carries that analyte's own peak (the sulfate peak is not 'nitrate')
                assertEquals(Double.parseDouble(right.get(e.getKey())[0]), Double.parseDouble(e.getValue()[0]), 1e-6,
                        e.getKey() + " with " + String.join(" ", args) + ":\n" + r.out());
            }
            if (args.length > 0) {
                // predicted for pH 8 / 12 mM, nitrate, phosphate and the mix B anions are named
                assertTrue(named.containsKey("nitrate") && named.containsKey("phosphate")
                        && named.containsKey("acetate"), named.keySet() + "\n" + r.out());
            } else {
                assertTrue(r.out().contains("limiting") && r.out().contains("--ph"), r.out());
            }
        }
    }

    @Test
    void noChargeColumnMeansChargeUnknownAndWindowOptionsMatchIdentify() throws IOException {
        Path lib = dir.resolve("lib.csv");
        Run r = run("library", "build", "--runs", demo("standards/standards-runs.csv"), "--mixes",
                demo("standards/mixes.csv"), "--out", lib.toString(), "--fixed-window-k", "4", "--fixed-window-floor", "0.7");
        assertTrue(r.code() <= ExitCodes.SOME_RUNS_FAILED, r.out() + r.err());
        for (Map.Entry<String, String[]> e : rows(lib).entrySet()) {
            assertTrue(e.getValue()[1].isEmpty() || e.getValue()[1].equals("0"), e.getKey() + " charge "
                    + e.getValue()[1]);
        }
        assertTrue(Files.readString(lib).contains("tolerance = max(4 x SD, 0.7)"), Files.readString(lib));
        Run old = run("library", "build", "--runs", demo("standards/standards-runs.csv"), "--mixes",
                demo("standards/mixes.csv"), "--out", dir.resolve("old.csv").toString(), "--window-sd", "4");
        assertEquals(ExitCodes.USAGE, old.code(), old.err());
    }

    @Test
    void addingTheSameRunsAgainIsRefusedAndTheLibraryKept() throws IOException {
        Path lib = dir.resolve("lib.csv");
        assertEquals(ExitCodes.OK, run("library", "build", "--runs", demo("standards/standards-runs.csv"), "--mixes",
                demo("standards/mixes.csv"), "--out", lib.toString()).code());
        String before = Files.readString(lib);
        Run again = run("library", "add", "--library", lib.toString(), "--runs",
                demo("standards/standards-runs.csv"), "--mixes", demo("standards/mixes.csv"));
        assertEquals(ExitCodes.BAD_INPUT, again.code(), again.out() + again.err());
        assertTrue(again.err().contains("already pooled") && again.err().contains("std-mixA-1"), again.err());
        assertEquals(before, Files.readString(lib));
        assertFalse(Files.exists(dir.resolve("lib.csv.prev")));
    }

    @Test
    void addPrintsThePooledEntryItWrites() throws IOException {
        // mix A's runs 1-2 make the library, runs 3-4 are pooled into it: chloride ends with n = 4, not 2
        Path first = dir.resolve("runs-1.csv");
        Path second = dir.resolve("runs-2.csv");
        splitStandardsSheet(first, l -> l.contains("std-mixA-1") || l.contains("std-mixA-2"),
                second, l -> l.contains("std-mixA-3") || l.contains("std-mixA-4"));
        Path lib = dir.resolve("lib.csv");
        Run built = run("library", "build", "--runs", first.toString(), "--mixes", demo("standards/mixes.csv"),
                "--out", lib.toString());
        assertTrue(built.code() <= ExitCodes.SOME_RUNS_FAILED, built.out() + built.err());
        Run add = run("library", "add", "--library", lib.toString(), "--runs", second.toString(), "--mixes",
                demo("standards/mixes.csv"));
        assertTrue(add.code() <= ExitCodes.SOME_RUNS_FAILED, add.out() + add.err());
        String written = add.out().substring(add.out().indexOf("Entries as written"));
        String chloride = written.lines().filter(l -> l.strip().startsWith("chloride ")).findFirst().orElseThrow();
        assertTrue(chloride.endsWith("n = 4"), chloride);
    }

    @Test
    void addPrintsOnlyNonEmptyLists() throws IOException {
        // a library holding only mix A's runs; mix B's are then added: nothing pooled, five added
        Path sheetA = dir.resolve("runs-a.csv");
        Path sheetB = dir.resolve("runs-b.csv");
        splitStandardsSheet(sheetA, l -> l.contains(",mixA,"), sheetB, l -> !l.contains(",mixA,"));
        Path lib = dir.resolve("lib.csv");
        Run built = run("library", "build", "--runs", sheetA.toString(), "--mixes", demo("standards/mixes.csv"),
                "--out", lib.toString());
        assertTrue(built.code() <= ExitCodes.SOME_RUNS_FAILED, built.out() + built.err());
        Run add = run("library", "add", "--library", lib.toString(), "--runs", sheetB.toString(), "--mixes",
                demo("standards/mixes.csv"));
        assertTrue(add.code() <= ExitCodes.SOME_RUNS_FAILED, add.out() + add.err());
        assertTrue(add.out().contains("added: bromide"), add.out());
        assertFalse(add.out().contains("pooled:"), add.out());
        assertFalse(add.out().lines().anyMatch(l -> l.strip().equals("added:") || l.strip().equals("pooled:")),
                add.out());
    }

    @Test
    void checkFlagsImpossibleEntriesAndWordsOverlapsTruthfully() throws Exception {
        Path lib = dir.resolve("bad.csv");
        Files.writeString(lib, "name,mobility,mobility_sd,n,charge\nsodium,-46.4,0.2,5,1\nsulfate,-73.8,0.5,5,2\n"
                + "chloride,-7630,0.2,5,-1\nchloride2,-76.3,0.5,5,-1\nnitrate,-70.0,,,-1\n");
        Run r = run("library", "check", lib.toString());
        assertEquals(ExitCodes.SOME_RUNS_FAILED, r.code(), r.out() + r.err());
        assertTrue(r.out().contains("sodium: mobility -46.400 has the wrong sign for charge +1"), r.out());
        assertTrue(r.out().contains("sulfate: mobility -73.800 has the wrong sign for charge +2"), r.out());
        assertTrue(r.out().contains("chloride: mobility -7630.000 is beyond"), r.out());
        // 2.5 apart with SD 0.5: windows overlap (a note, not a warning), yet they can be told apart
        double[] w = org.mobident.library.standards.LibraryCheck.windows(org.mobident.library.LibraryCsv.read(lib),
                org.mobident.settings.MatchSettings.DEFAULT);
        assertTrue(r.out().contains(String.format(java.util.Locale.ROOT, "note: The windows of sulfate (-73.800 ± %.3f) "
                + "and chloride2 (-76.300 ± %.3f) overlap", w[1], w[3])), r.out());
        assertFalse(r.out().contains("sulfate (-73.800) and chloride2 (-76.300) cannot be told apart"), r.out());
        // an entry without SD or tolerance shows the window identification applies (spread pooled from the others)
        assertTrue(r.out().lines().anyMatch(l -> l.startsWith("nitrate")
                && l.contains(String.format(java.util.Locale.ROOT, "%.3f ", w[4]))), r.out());
        assertTrue(r.out().contains("4 warning(s)"), r.out());
    }

    /** {@code library check} ends by saying, once per analyte, which cannot be predicted and how to fix that. */
    @Test
    void checkSaysWhichAnalytesCannotBePredictedAndHow() throws IOException {
        Path lib = dir.resolve("own.csv");
        Files.writeString(lib, """
                name,mobility,mobility_sd,n,charge,pka,limiting_mobility
                drug acid,-25.0,0.2,5,-1,4.5,0 -30.0
                chloride,-75.0,0.2,5,,,
                mystery,-20.0,0.2,5,,,
                strong one,-40.0,0.2,5,-1,,
                """);
        Run r = run("library", "check", lib.toString(), "--reference", "../reference-libraries/ions-25C.csv");
        assertTrue(r.out().contains("1 with their own pKa data, 1 with reference data, 1 as strong ions"), r.out());
        String cannot = r.out().lines().filter(l -> l.contains("Cannot be predicted")).findFirst().orElseThrow();
        assertTrue(cannot.contains("mystery") && !cannot.contains("chloride") && !cannot.contains("drug acid"), cannot);
        assertEquals(1, r.out().lines().filter(l -> l.contains("To fix")).count(), r.out());
        assertTrue(r.out().contains("strong one"), r.out());
        assertFalse(r.out().contains("NaN"), r.out());
        // predict says it once, below the table, not in every row
        Run p = run("predict", "--library", lib.toString(), "--old-ph", "6", "--old-ionic-strength-mm", "10",
                "--ph", "4", "--ionic-strength-mm", "10", "--reference", "../reference-libraries/ions-25C.csv");
        assertEquals(0, p.code(), p.err());
        assertFalse(p.out().contains("no model data (no pka"), p.out());
        assertEquals(1, p.out().lines().filter(l -> l.contains("To fix")).count(), p.out());
        assertFalse(p.out().contains("NaN"), p.out());
    }

    /**
     * Writes two run sheets from the demo standards sheet: its header, then the rows each predicate
     * takes, with the trace paths made absolute.
     */
    private static void splitStandardsSheet(Path a, Predicate<String> toA, Path b, Predicate<String> toB)
            throws IOException {
        StringBuilder first = new StringBuilder();
        StringBuilder second = new StringBuilder();
        for (String line : Files.readAllLines(DEMO.resolve("standards/standards-runs.csv"))) {
            String fixed = line.replace("std-mix", DEMO.resolve("standards").toAbsolutePath() + "/std-mix");
            if (line.startsWith("file,")) {
                first.append(line).append('\n');
                second.append(line).append('\n');
            } else if (toA.test(line)) {
                first.append(fixed).append('\n');
            } else if (toB.test(line)) {
                second.append(fixed).append('\n');
            }
        }
        Files.writeString(a, first.toString());
        Files.writeString(b, second.toString());
    }
}
