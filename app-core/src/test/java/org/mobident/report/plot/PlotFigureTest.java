package org.mobident.report.plot;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.image.BufferedImage;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.mobident.result.PeakResult;
import org.mobident.result.RunResult;

class PlotFigureTest {

    static {
        System.setProperty("java.awt.headless", "true");
    }

    /** The fixture run with another name and buffer label, its analytes' mobilities multiplied by {@code sign}. */
    private static RunResult relabelled(PlotFixtures.SyntheticRun run, String name, String buffer, double sign) {
        RunResult r = run.result();
        List<PeakResult> peaks = r.peaks().stream().map(p -> new PeakResult(p.peak(), p.role(), sign * p.mobility(),
                p.mobilitySd(), sign * p.mobilityAtLibraryTemp(), p.match())).toList();
        return new RunResult(PlotFixtures.spec(name, buffer), null, r.scaleNote(), r.eofMobility(), r.scale(), peaks,
                r.notes(), r.noiseSd());
    }

    @Test
    void runsAreGroupedByBufferAndBySignOfTheirMobilities() {
        PlotFixtures.SyntheticRun run = PlotFixtures.run("a", 200, 1.0);
        // the fixture has two anions and one cation: an anion run
        RunResult a1 = relabelled(run, "a1", "borate", 1);
        RunResult c1 = relabelled(run, "c1", "acetate", -1);
        RunResult a2 = relabelled(run, "a2", " borate ", 1);
        RunResult n1 = relabelled(run, "n1", null, 1);
        RunResult c2 = relabelled(run, "c2", "borate", -1);
        List<BufferGroups.Group> groups = BufferGroups.of(List.of(a1, c1, a2, n1, c2));
        assertEquals(4, groups.size());
        assertEquals(List.of("a1", "a2"), names(groups.get(0)));
        assertEquals(BufferGroups.Charge.ANIONS, groups.get(0).charge());
        assertEquals("Buffer borate, anions: 2 runs", groups.get(0).title());
        assertEquals(List.of("c1"), names(groups.get(1)));
        assertEquals("Buffer acetate, cations: 1 run", groups.get(1).title());
        assertEquals("No buffer given, anions: 1 run", groups.get(2).title());
        assertEquals(List.of("c2"), names(groups.get(3)), "same buffer, other ions: a panel of its own");
    }

    @Test
    void aRunWithoutMobilitiesGoesByItsBufferAlone() {
        RunResult failed = PlotFixtures.failed("f", "unreadable");
        assertEquals(BufferGroups.Charge.UNKNOWN, BufferGroups.chargeOf(failed));
        assertEquals("No buffer given: 1 run", BufferGroups.of(List.of(failed)).get(0).title());
    }

    private static List<String> names(BufferGroups.Group g) {
        return g.runs().stream().map(r -> r.spec().name()).toList();
    }

    @Test
    void panelsAreStackedInOnePicture() {
        PlotFixtures.SyntheticRun a = PlotFixtures.run("a", 200, 1.0);
        PlotFixtures.SyntheticRun b = PlotFixtures.run("b", 240, 0.5);
        PlotModel top = PlotModel.builder(Axis.MOBILITY).title("first").run(a.trace(), a.result()).build();
        PlotModel bottom = PlotModel.builder(Axis.MOBILITY).title("second").run(b.trace(), b.result()).build();
        PlotFigure figure = new PlotFigure(List.of(top, bottom));

        String svg = SvgPlot.render(figure, 800, 300);
        assertTrue(svg.contains("height=\"600\""), "two panels of 300 px");
        assertEquals(2, svg.split("class=\"panel\"", -1).length - 1);
        assertTrue(svg.contains("translate(0 300)"), "the second panel starts below the first");
        assertTrue(svg.indexOf(">first</text>") < svg.indexOf(">second</text>"), "titles in panel order");

        BufferedImage img = PngPlot.render(figure, 800, 300);
        assertEquals(800, img.getWidth());
        assertEquals(600, img.getHeight());
        // each half is exactly the panel drawn alone
        BufferedImage alone = PngPlot.render(bottom, 800, 300);
        int differing = 0;
        for (int y = 0; y < 300; y += 3) {
            for (int x = 0; x < 800; x += 3) {
                differing += img.getRGB(x, 300 + y) == alone.getRGB(x, y) ? 0 : 1;
            }
        }
        assertEquals(0, differing, "the lower panel is the second plot");
        assertEquals(SvgPlot.render(top, 800, 300), SvgPlot.render(PlotFigure.of(top), 800, 300), "one panel: the plain plot");
        assertThrows(IllegalArgumentException.class, () -> new PlotFigure(List.of()));
    }
}
