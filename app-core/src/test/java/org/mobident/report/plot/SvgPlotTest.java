package org.mobident.report.plot;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.StringReader;
import java.util.HashSet;
import java.util.Set;
import javax.xml.parsers.DocumentBuilderFactory;
import org.junit.jupiter.api.Test;
import org.w3c.dom.Document;
import org.w3c.dom.Element;
import org.w3c.dom.NodeList;
import org.xml.sax.InputSource;

class SvgPlotTest {

    static Document parse(String xml) throws Exception {
        DocumentBuilderFactory f = DocumentBuilderFactory.newInstance();
        f.setNamespaceAware(true);
        f.setFeature("http://apache.org/xml/features/disallow-doctype-decl", true);
        return f.newDocumentBuilder().parse(new InputSource(new StringReader(xml)));
    }

    @Test
    void overlayIsWellFormedSvgWithOneCurvePerRun() throws Exception {
        PlotFixtures.SyntheticRun a = PlotFixtures.run("a", 200, 1.0);
        PlotFixtures.SyntheticRun b = PlotFixtures.run("b", 240, 0.6);
        PlotModel model = PlotModel.builder(Axis.MOBILITY).title("Runs <1> & \"2\"")
                .run(a.trace(), a.result()).run(b.trace(), b.result())
                .library(PlotFixtures.library()).bandLabels(true).peakLabels(false).build();
        String svg = SvgPlot.render(model, 960, 420);
        Document doc = parse(svg);
        Element root = doc.getDocumentElement();
        assertEquals("svg", root.getLocalName());
        assertEquals("http://www.w3.org/2000/svg", root.getNamespaceURI());
        assertEquals("Runs <1> & \"2\"", doc.getElementsByTagName("title").item(0).getTextContent());
        Element traces = group(doc, "traces");
        assertEquals(2, traces.getElementsByTagName("polyline").getLength());
        Element bands = group(doc, "bands");
        assertEquals(4, bands.getElementsByTagName("rect").getLength());
        assertTrue(svg.contains(">nitrate</text>"), "band labelled with its analyte");
    }

    @Test
    void eachStatusHasItsOwnShape() throws Exception {
        PlotFixtures.SyntheticRun a = PlotFixtures.run("a", 200, 1.0);
        String svg = SvgPlot.render(PlotModel.of(a.trace(), a.result(), null, Axis.MOBILITY), 900, 330);
        Element peaks = group(parse(svg), "peaks");
        // identified: one circle; ambiguous, unassigned, marker: three polygons of 4, 3, 4 corners
        assertEquals(1, peaks.getElementsByTagName("circle").getLength());
        NodeList polygons = peaks.getElementsByTagName("polygon");
        assertEquals(3, polygons.getLength());
        Set<String> looks = new HashSet<>();
        for (int i = 0; i < polygons.getLength(); i++) {
            Element p = (Element) polygons.item(i);
            looks.add(p.getAttribute("fill") + "/" + p.getAttribute("stroke") + "/"
                    + p.getAttribute("points").split(" ").length);
        }
        assertEquals(3, looks.size(), "shapes differ: " + looks);
        Set<String> icons = new HashSet<>();
        for (PeakStatus s : PeakStatus.values()) {
            String icon = SvgPlot.statusIcon(s, 12);
            parse(icon);
            icons.add(icon.replace(s.label(), ""));
        }
        assertEquals(PeakStatus.values().length, icons.size(), "every status icon differs");
        assertEquals(4, peaks.getElementsByTagName("text").getLength(), "four labels");
    }

    @Test
    void theSvgUsesTheSharedLayout() throws Exception {
        PlotFixtures.SyntheticRun a = PlotFixtures.run("a", 200, 1.0);
        PlotModel model = PlotModel.of(a.trace(), a.result(), null, Axis.TIME);
        String svg = SvgPlot.render(model, 800, 300);
        PlotLayout layout = PlotLayout.of(model, 800, 300);
        Element line = (Element) group(parse(svg), "traces").getElementsByTagName("polyline").item(0);
        String[] points = line.getAttribute("points").split(" ");
        PlotLayout.Polyline curve = layout.curves().get(0);
        assertEquals(curve.size(), points.length);
        int mid = points.length / 2;
        String[] xy = points[mid].split(",");
        assertEquals(curve.xs()[mid], Double.parseDouble(xy[0]), 0.05);
        assertEquals(curve.ys()[mid], Double.parseDouble(xy[1]), 0.05);
    }

    @Test
    void equalInputsGiveEqualBytes() {
        PlotFixtures.SyntheticRun a = PlotFixtures.run("a", 200, 1.0);
        PlotModel model = PlotModel.of(a.trace(), a.result(), PlotFixtures.library(), Axis.MOBILITY);
        assertEquals(SvgPlot.render(model, 700, 300), SvgPlot.render(model, 700, 300));
        assertNotEquals(SvgPlot.render(model, 700, 300), SvgPlot.render(model, 701, 300));
    }

    @Test
    void coordinatesAreWrittenWithoutLocaleOrNegativeZero() {
        assertEquals("12.3", SvgCanvas.num(12.34));
        assertEquals("0", SvgCanvas.num(-0.04));
        assertEquals("-1.5", SvgCanvas.num(-1.5));
        assertEquals("7", SvgCanvas.num(7.0));
        assertEquals("0.1", SvgCanvas.num(0.05), "half-way rounds up");
    }

    private static Element group(Document doc, String name) {
        NodeList gs = doc.getElementsByTagName("g");
        for (int i = 0; i < gs.getLength(); i++) {
            Element g = (Element) gs.item(i);
            if (name.equals(g.getAttribute("class"))) {
                return g;
            }
        }
        throw new AssertionError("no group " + name);
    }
}
