package org.mobident.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.StringReader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Collectors;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVRecord;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** An analyte left out of the library comes back as one recurring unknown with its runs. */
class RecurringUnknownsCommandTest {

    private static final Path DEMO = Path.of("..", "demo-data");

    @TempDir
    Path dir;

    @Test
    void nitrateMissingFromTheLibraryIsReportedOnceWithItsRuns() throws IOException {
        // demo-data/TRUTH.md: several CHR-8 runs hold nitrate (library value -69.50)
        String lib = Files.readString(DEMO.resolve("library.csv"), StandardCharsets.UTF_8)
                .replaceFirst("\nnitrate,[^\n]*", "");
        Path library = Files.writeString(dir.resolve("lib.csv"), lib);
        Path csv = dir.resolve("unknowns.csv");
        BadInputCatalogueTest.Run r = BadInputCatalogueTest.run("identify", "--runs", DEMO.resolve("runs.csv").toString(),
                "--library", library.toString(), "--unknowns-csv", csv.toString(), "--html",
                dir.resolve("report.html").toString());
        assertTrue(r.code() == ExitCodes.OK || r.code() == ExitCodes.SOME_RUNS_FAILED, r.err());
        List<CSVRecord> rows = CSVFormat.DEFAULT.builder().setHeader().setSkipHeaderRecord(true).get()
                .parse(new StringReader(Files.readString(csv, StandardCharsets.UTF_8))).getRecords();
        List<CSVRecord> first = rows.stream().filter(x -> x.get("unknown").equals("unknown-1")).toList();
        int runs = Integer.parseInt(first.get(0).get("runs_seen"));
        assertTrue(runs >= 2, "seen in " + runs + " runs");
        assertEquals(runs, first.stream().map(x -> x.get("run")).distinct().count());
        double mean = Double.parseDouble(first.get(0).get("mean_mobility"));
        assertEquals(-69.5, mean, 1.0, "the group sits where nitrate migrates");
        String listed = first.stream().map(x -> x.get("run")).collect(Collectors.joining(", "));
        assertTrue(r.out().contains("unknown-1 at "), r.out());
        assertTrue(r.out().contains(": " + listed), "the terminal names its runs: " + listed + "\n" + r.out());
        assertEquals(1, r.out().split("unknown-1 at ", -1).length - 1, "reported once");
        String page = Files.readString(dir.resolve("report.html"), StandardCharsets.UTF_8);
        int section = page.indexOf("<section id=\"recurring-unknowns\">");
        assertTrue(section > 0, "the HTML report has the section");
        String rest = page.substring(section, page.indexOf("</section>", section));
        assertTrue(rest.contains("<td>unknown-1</td>") && rest.contains(listed), rest);
    }

    @Test
    void theRecurringUnknownCanBeWrittenAsAProvisionalEntryAndMatchedNextTime() throws IOException {
        // demo-data/TRUTH.md: several CHR-8 runs hold nitrate (library value -69.50); left out of the
        // library, it comes back as unknown-1, and with that entry added the same runs name it
        String full = Files.readString(DEMO.resolve("library.csv"), StandardCharsets.UTF_8);
        String lib = full.replaceFirst("\nnitrate,[^\n]*", "");
        Path library = Files.writeString(dir.resolve("lib.csv"), lib);
        Path provisional = dir.resolve("provisional.csv");
        BadInputCatalogueTest.Run r = BadInputCatalogueTest.run("identify", "--runs", DEMO.resolve("runs.csv").toString(),
                "--library", library.toString(), "--unknowns-library", provisional.toString());
        assertTrue(r.code() == ExitCodes.OK || r.code() == ExitCodes.SOME_RUNS_FAILED, r.err());
        List<CSVRecord> entries = CSVFormat.DEFAULT.builder().setHeader().setSkipHeaderRecord(true)
                .setCommentMarker('#').get()
                .parse(new StringReader(Files.readString(provisional, StandardCharsets.UTF_8))).getRecords();
        CSVRecord first = entries.get(0);
        assertEquals("unknown-1", first.get("name"));
        assertEquals(-69.5, Double.parseDouble(first.get("mobility")), 1.0, "where nitrate migrates");
        // the lab adds the checked entry to its library (copying the row under the library's columns)
        String header = lib.lines().filter(l -> !l.startsWith("#")).findFirst().orElseThrow();
        String[] cols = header.split(",");
        StringBuilder added = new StringBuilder();
        for (int k = 0; k < cols.length; k++) {
            String v = switch (cols[k]) {
                case "name" -> "unknown-1";
                case "mobility" -> first.get("mobility");
                case "mobility_sd" -> first.get("mobility_sd");
                case "n" -> first.get("n");
                case "buffer" -> first.get("buffer");
                default -> "";
            };
            added.append(k == 0 ? "" : ",").append(v);
        }
        Path extended = Files.writeString(dir.resolve("extended.csv"), lib + (lib.endsWith("\n") ? "" : "\n") + added + "\n");
        BadInputCatalogueTest.Run again = BadInputCatalogueTest.run("identify", "--runs",
                DEMO.resolve("runs.csv").toString(), "--library", extended.toString());
        assertTrue(again.out().contains("unknown-1"), "the provisional entry names the zone: " + again.out());
    }
}
