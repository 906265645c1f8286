package org.mobident.viewer;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.Dimension;
import java.awt.image.BufferedImage;
import java.nio.file.FileAlreadyExistsException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import javax.imageio.ImageIO;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.mobident.report.plot.Axis;
import org.mobident.report.plot.PlotModel;

class ExporterTest {

    static {
        System.setProperty("java.awt.headless", "true");
    }

    private static PlotModel model() {
        return PlotScene.of(ViewerFixtures.data(), ViewState.initial(Axis.MOBILITY, List.of(0, 1))).model();
    }

    @Test
    void writesThePngAtTheGivenSizeAndTheSvg(@TempDir Path dir) throws Exception {
        Path png = dir.resolve("view.png");
        Exporter.write(model(), 640, 360, Exporter.Format.PNG, png, false);
        BufferedImage img = ImageIO.read(png.toFile());
        assertEquals(640, img.getWidth());
        assertEquals(360, img.getHeight());

        Path svg = dir.resolve("view.svg");
        Exporter.write(model(), 640, 360, Exporter.Format.SVG, svg, false);
        String text = Files.readString(svg);
        assertTrue(text.startsWith("<svg") && text.contains("width=\"640\"") && text.trim().endsWith("</svg>"));
    }

    @Test
    void anExistingFileIsReplacedOnlyWhenAllowed(@TempDir Path dir) throws Exception {
        Path svg = dir.resolve("keep.svg");
        Files.writeString(svg, "old");
        assertThrows(FileAlreadyExistsException.class,
                () -> Exporter.write(model(), 640, 360, Exporter.Format.SVG, svg, false));
        assertArrayEquals("old".getBytes(), Files.readAllBytes(svg));
        Exporter.write(model(), 640, 360, Exporter.Format.SVG, svg, true);
        assertTrue(Files.readString(svg).startsWith("<svg"));
    }

    @Test
    void extensionAndSizeRules() {
        assertEquals("a.png", Exporter.withExtension("a", Exporter.Format.PNG));
        assertEquals("a.PNG", Exporter.withExtension("a.PNG", Exporter.Format.PNG));
        assertEquals("a.png.svg", Exporter.withExtension("a.png", Exporter.Format.SVG));
        assertEquals(Exporter.FALLBACK_SIZE, Exporter.usable(new Dimension(0, 0)));
        assertEquals(new Dimension(Exporter.MIN_SIZE.width, 500), Exporter.usable(new Dimension(100, 500)));
        assertEquals(new Dimension(1000, 700), Exporter.usable(new Dimension(1000, 700)));
    }

    @Test
    void theSaveDialogProposesTheWorkingFolder() {
        java.io.File f = Exporter.initialFile("spring-01", Exporter.Format.SVG);
        assertEquals(Path.of("").toAbsolutePath().toFile(), f.getParentFile(), "not the home folder");
        assertEquals("spring-01.svg", f.getName());
    }
}
