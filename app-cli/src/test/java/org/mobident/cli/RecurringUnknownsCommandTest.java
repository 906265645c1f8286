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
}
