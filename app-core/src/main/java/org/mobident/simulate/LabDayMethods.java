package org.mobident.simulate;

import java.util.List;
import org.mobident.trace.Detection;

/**
 * The built-in methods and panels of the lab-day bench. Every number here is invented for the
 * bench: the ion names are ordinary, but the mobilities are not taken from any table and belong to
 * no real buffer. Each panel holds at least two near pairs whose mobilities differ by 1–2 %.
 */
public final class LabDayMethods {

    private LabDayMethods() {
    }

    /**
     * Anion method A: reversed polarity with a reversed (coated-wall) EOF, indirect detection (dips),
     * a fast background co-ion. Near pairs: bromide/chloride 1.6 %, nitrite/nitrate 1.5 %,
     * fluoride/formate 1.6 %.
     */
    public static LabDayMethod anionA() {
        return new LabDayMethod("AN-A", "anions, reversed polarity, reversed EOF, indirect detection",
                80, 72, -20, -50, Detection.INDIRECT, -78, List.of(
                        new PanelAnalyte("bromide", -80.2),
                        new PanelAnalyte("chloride", -78.9),
                        new PanelAnalyte("sulfate", -76.1),
                        new PanelAnalyte("nitrite", -72.4),
                        new PanelAnalyte("nitrate", -71.3),
                        new PanelAnalyte("chlorate", -64.7),
                        new PanelAnalyte("fluoride", -55.9),
                        new PanelAnalyte("formate", -55.0),
                        new PanelAnalyte("phosphate", -46.8),
                        new PanelAnalyte("acetate", -40.6)));
    }

    /**
     * Anion method B: another buffer at another pH (the weak acids move differently), a shorter
     * capillary, reversed polarity and EOF, direct detection (peaks rise), a slow background co-ion.
     * Near pairs: bromide/iodide 1.8 %, nitrite/nitrate 1.7 %.
     */
    public static LabDayMethod anionB() {
        return new LabDayMethod("AN-B", "anions in a second buffer, reversed polarity, reversed EOF, direct detection",
                60, 50, -25, -40, Detection.DIRECT, -32, List.of(
                        new PanelAnalyte("bromide", -79.3),
                        new PanelAnalyte("iodide", -77.9),
                        new PanelAnalyte("nitrite", -72.2),
                        new PanelAnalyte("nitrate", -71.0),
                        new PanelAnalyte("chromate", -68.0),
                        new PanelAnalyte("thiocyanate", -64.1),
                        new PanelAnalyte("fumarate", -56.3),
                        new PanelAnalyte("phthalate", -49.6),
                        new PanelAnalyte("salicylate", -35.4),
                        new PanelAnalyte("benzoate", -33.2),
                        new PanelAnalyte("sorbate", -30.1)));
    }

    /**
     * Cation method C: normal polarity, EOF towards the detector, indirect detection (dips).
     * Near pairs: potassium/ammonium 1.6 %, calcium/strontium 1.8 %.
     */
    public static LabDayMethod cationC() {
        return new LabDayMethod("CAT-C", "cations, normal polarity, EOF towards the detector, indirect detection",
                60, 52, 25, 40, Detection.INDIRECT, 55, List.of(
                        new PanelAnalyte("cesium", 78.9),
                        new PanelAnalyte("potassium", 76.0),
                        new PanelAnalyte("ammonium", 74.8),
                        new PanelAnalyte("barium", 65.5),
                        new PanelAnalyte("calcium", 60.9),
                        new PanelAnalyte("strontium", 59.8),
                        new PanelAnalyte("magnesium", 54.3),
                        new PanelAnalyte("sodium", 51.2),
                        new PanelAnalyte("zinc", 48.7),
                        new PanelAnalyte("lithium", 39.4)));
    }

    /** The three methods in the order the bench uses them. */
    public static List<LabDayMethod> builtIn() {
        return List.of(anionA(), anionB(), cationC());
    }
}
