package org.mobident.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.StringReader;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVRecord;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.mobident.cli.BadInputCatalogueTest.Run;

/**
 * Through the real command line: a run whose temperature is mis-stated by a kelvin keeps its names
 * and reports the scale factor; libraries with physically impossible entries are refused before any
 * run is matched; the correction can be switched off.
 */
class ScaleAndLibraryChecksTest {

    @TempDir
    Path dir;

    private static final Path DEMO = Path.of("..", "demo-data");

    private static String demo(String file) {
        return DEMO.resolve(file).toString();
    }

    private List<CSVRecord> identifySpring(String temperature, String... extra) throws IOException {
        Path out = dir.resolve("t" + temperature + extra.length + ".csv");
        List<String> args = new ArrayList<>(List.of("identify", demo("spring-01.csv"), "--library",
                demo("library.csv"), "--total-length-cm", "80", "--detector-length-cm", "72", "--voltage-kv", "-20",
                "--detection", "indirect", "--marker-window", "450:700", "--buffer", "CHR-8", "--temperature-c",
                temperature, "--csv", out.toString(), "--quiet"));
        args.addAll(List.of(extra));
        Run r = BadInputCatalogueTest.run(args.toArray(new String[0]));
        assertEquals(ExitCodes.OK, r.code(), r.err());
        return CSVFormat.DEFAULT.builder().setHeader().setSkipHeaderRecord(true).get()
                .parse(new StringReader(Files.readString(out))).getRecords();
    }

    @Test
    void aTemperatureMisstatedByOneKelvinKeepsEveryName() throws IOException {
        // demo-data/TRUTH.md: spring-01 ran at 25 °C (chloride, sulfate, nitrate, fluoride)
        List<CSVRecord> right = identifySpring("25");
        for (String wrong : List.of("26", "24")) {
            List<CSVRecord> rows = identifySpring(wrong);
            assertEquals(right.size(), rows.size());
            for (int i = 0; i < rows.size(); i++) {
                assertEquals(right.get(i).get("assigned"), rows.get(i).get("assigned"), wrong + " °C, row " + i);
                assertEquals(right.get(i).get("status"), rows.get(i).get("status"), wrong + " °C, row " + i);
            }
            // the run really was at 25 °C; stated 26 (24), its mobilities are "converted" to 25 °C by
            // η(26)/η(25) = 0.8705/0.8900 (η(24)/η(25) = 0.9111/0.8900) (IAPWS 2008, from memory), which the
            // fitted scale factor a then undoes
            double a = Double.parseDouble(rows.get(0).get("scale_factor"));
            double expected = wrong.equals("26") ? 0.8705 / 0.8900 : 0.9111 / 0.8900;
            assertEquals(expected, a, 0.008, wrong + " °C");
        }
        List<CSVRecord> fixed = identifySpring("26", "--fixed-scale");
        assertTrue(fixed.get(0).get("scale_factor").isEmpty(), "no correction when switched off");
        long identified = fixed.stream().filter(r -> r.get("status").equals("identified")
                && r.get("assigned").equals(right.get((int) r.getRecordNumber() - 1).get("assigned"))).count();
        assertTrue(identified < 4, "without the correction the 1 K error costs names: " + identified);
    }

    @Test
    void aLibraryInTheWrongUnitOrWithAWrongSignIsRefusedWithTheLine() throws IOException {
        Path lib = dir.resolve("lib.csv");
        Files.writeString(lib, "name,mobility,mobility_sd,n,charge,buffer\nchloride,-7.63e-8,0.4e-9,5,-1,CHR-8\n"
                + "nitrate,-69.5,0.4,5,-1,CHR-8\n");
        Run r = BadInputCatalogueTest.run("identify", "--runs", demo("runs.csv"), "--library", lib.toString());
        assertEquals(ExitCodes.BAD_INPUT, r.code(), r.err());
        assertTrue(r.err().contains("lib.csv, line 2, field 'mobility'"), r.err());
        assertTrue(r.err().contains("multiply by 1e9"), r.err());

        Files.writeString(lib, "name,mobility,charge\nnitrate,-69.5,-1\ncalcium,-54.7,2\n");
        Run sign = BadInputCatalogueTest.run("identify", "--runs", demo("runs.csv"), "--library", lib.toString());
        assertEquals(ExitCodes.BAD_INPUT, sign.code(), sign.err());
        assertTrue(sign.err().contains("line 3") && sign.err().contains("wrong sign for charge +2"), sign.err());
    }
}
