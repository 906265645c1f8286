package org.mobident.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.mobident.report.plot.Axis;
import picocli.CommandLine;
import picocli.CommandLine.Model.OptionSpec;

/** The same option means and reads the same in every command, and usage mistakes exit 2. */
class OneInterfaceTest {

    private static final Path DEMO = Path.of("..", "demo-data");

    @TempDir
    Path dir;

    private static BadInputCatalogueTest.Run run(String... args) {
        return BadInputCatalogueTest.run(args);
    }

    private static CommandLine sub(String name) {
        CommandLine cl = new CommandLine(new MobidentCommand());
        cl.setCaseInsensitiveEnumValuesAllowed(true);
        return cl.getSubcommands().get(name);
    }

    @Test
    void plotTakesACommaListOfRunsLikeView() throws IOException {
        Path svg = dir.resolve("two.svg");
        BadInputCatalogueTest.Run r = run("plot", "--runs", DEMO.resolve("runs.csv").toString(), "--library",
                DEMO.resolve("library.csv").toString(), "--show", "spring-01, well-01", "--out", svg.toString());
        assertEquals(ExitCodes.OK, r.code(), r.err());
        assertTrue(r.out().contains("plot of 2 run(s)"), r.out());
        Path again = dir.resolve("two-old-spelling.svg");
        BadInputCatalogueTest.Run old = run("plot", "--runs", DEMO.resolve("runs.csv").toString(), "--library",
                DEMO.resolve("library.csv").toString(), "--run", "spring-01,well-01", "--out", again.toString());
        assertEquals(ExitCodes.OK, old.code(), old.err());
        assertTrue(old.out().contains("plot of 2 run(s)"), old.out());
    }

    @Test
    void plotAndViewShareRunListAndAxisOptions() {
        for (String command : List.of("plot", "view")) {
            CommandLine c = sub(command);
            OptionSpec show = c.getCommandSpec().findOption("--show");
            assertEquals(List.of("--show", "--run"), List.of(show.names()), command);
            assertEquals(",", show.splitRegex(), command);
            OptionSpec axis = c.getCommandSpec().findOption("--axis");
            assertEquals(AxisWords.DESCRIPTION, axis.description()[0], command);
            for (String word : List.of("time", "TIME", "Time")) {
                CommandLine top = new CommandLine(new MobidentCommand());
                top.setCaseInsensitiveEnumValuesAllowed(true);
                List<String> args = new java.util.ArrayList<>(List.of(command, "--library", "lib.csv", "--runs",
                        "runs.csv", "--axis", word));
                if (command.equals("plot")) {
                    args.addAll(List.of("--out", "x.png"));
                }
                top.parseArgs(args.toArray(new String[0]));
                assertEquals(Axis.TIME, top.getSubcommands().get(command).getCommandSpec().findOption("--axis")
                        .getValue(), command + " " + word);
            }
        }
    }

    @Test
    void plotRefusesAnImageFormatItDoesNotWrite() {
        Path pdf = dir.resolve("plot.pdf");
        BadInputCatalogueTest.Run r = run("plot", "--runs", DEMO.resolve("runs.csv").toString(), "--library",
                DEMO.resolve("library.csv").toString(), "--out", pdf.toString());
        assertEquals(ExitCodes.USAGE, r.code(), r.err());
        assertTrue(r.err().contains("--out") && r.err().contains(".png or .svg"), r.err());
        assertFalse(Files.exists(pdf));
        assertEquals(ImageKind.PNG, ImageKind.of(Path.of("A.PNG")));
        assertEquals(ImageKind.SVG, ImageKind.of(Path.of("a.svg")));
        assertEquals(null, ImageKind.of(Path.of("a")));
    }

    @Test
    void plotDrawsAPanelPerBufferOfTheChosenSize() throws IOException {
        // The demo sheet holds anion runs in CHR-8 and a cation run in IMZ-4.5.
        Path png = dir.resolve("all.png");
        BadInputCatalogueTest.Run r = run("plot", "--runs", DEMO.resolve("runs.csv").toString(), "--library",
                DEMO.resolve("library.csv").toString(), "--size", "900x400", "--out", png.toString());
        assertEquals(ExitCodes.OK, r.code(), r.err());
        assertTrue(r.out().contains("2 panels, one per buffer"), r.out());
        java.awt.image.BufferedImage img = javax.imageio.ImageIO.read(png.toFile());
        assertEquals(900, img.getWidth());
        assertEquals(800, img.getHeight(), "two panels of 400 px");
        Path svg = dir.resolve("one.svg");
        BadInputCatalogueTest.Run one = run("plot", "--runs", DEMO.resolve("runs.csv").toString(), "--library",
                DEMO.resolve("library.csv").toString(), "--show", "spring-01,well-01", "--size", "900x400",
                "--out", svg.toString());
        assertEquals(ExitCodes.OK, one.code(), one.err());
        String text = Files.readString(svg);
        assertTrue(text.contains("height=\"400\""), "runs of one buffer: one panel");
        assertTrue(text.contains(">chloride</text>"), "the library bands are named");
    }

    @Test
    void aMissingPhIsAUsageMistakeInPredictAsInRecheck() throws IOException {
        BadInputCatalogueTest.Run predict = run("predict", "--library", DEMO.resolve("library.csv").toString(),
                "--ionic-strength-mm", "10");
        assertEquals(ExitCodes.USAGE, predict.code(), predict.err());
        assertTrue(predict.err().contains("--ph"), predict.err());
        Path table = Files.writeString(dir.resolve("peaks.csv"), "run,apex_time_s,mobility,mobility_sd,assigned,"
                + "confidence,status\n", StandardCharsets.UTF_8);
        BadInputCatalogueTest.Run recheck = run("recheck", "--table", table.toString(), "--library",
                DEMO.resolve("library.csv").toString(), "--ionic-strength-mm", "10");
        assertEquals(predict.code(), recheck.code(), recheck.err());
    }

    @Test
    void aRunGivenByOptionsIsToldWhichOptionIsMissing() {
        BadInputCatalogueTest.Run r = run("identify", DEMO.resolve("spring-01.csv").toString(), "--library",
                DEMO.resolve("library.csv").toString(), "--total-length-cm", "80", "--detector-length-cm", "72",
                "--detection", "indirect", "--quiet");
        assertEquals(ExitCodes.SOME_RUNS_FAILED, r.code(), r.err());
        assertTrue(r.err().contains("'--voltage-kv'"), r.err());
        assertFalse(r.err().contains("voltage_kv"), "no run-sheet column for a run without a sheet: " + r.err());
    }
}
