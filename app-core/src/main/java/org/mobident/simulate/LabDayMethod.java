package org.mobident.simulate;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.HashSet;
import java.util.List;
import java.util.Objects;
import java.util.Set;
import org.mobident.trace.Detection;
import org.mobident.trace.RunConditions;

/**
 * An invented CZE method of the lab-day bench: capillary, voltage, nominal EOF, detection, the
 * background co-ion that sets the electromigration dispersion, and the panel of analytes it is
 * used for. All values are invented.
 *
 * @param buffer             buffer label written to the run sheets; also names the method's files
 * @param description        one line saying what kind of method it is
 * @param totalLengthCm      capillary total length Lt, cm
 * @param detectorLengthCm   inlet-to-detector length Ld, cm
 * @param voltageKv          signed separation voltage, kV
 * @param nominalEofMobility EOF mobility at 25 °C before any drift, 1e-9 m²/(V s), signed
 * @param detection          direct (peaks rise) or indirect (dips)
 * @param coIonMobility      effective mobility of the background co-ion at 25 °C, 1e-9 m²/(V s),
 *                           signed; sets the direction and size of the dispersion
 * @param panel              the analytes, all of one sign, names unique
 */
public record LabDayMethod(String buffer, String description, double totalLengthCm, double detectorLengthCm,
                           double voltageKv, double nominalEofMobility, Detection detection,
                           double coIonMobility, List<PanelAnalyte> panel) {

    /** Number of standard mixes a panel is split into. */
    public static final int MIXES = 2;

    public LabDayMethod {
        Objects.requireNonNull(buffer, "buffer");
        Objects.requireNonNull(description, "description");
        Objects.requireNonNull(detection, "detection");
        panel = List.copyOf(panel);
        if (panel.size() < MIXES) {
            throw new IllegalArgumentException(buffer + ": a panel needs at least " + MIXES + " analytes");
        }
        Set<String> names = new HashSet<>();
        double sign = Math.signum(panel.get(0).mobility());
        for (PanelAnalyte a : panel) {
            if (!names.add(a.name())) {
                throw new IllegalArgumentException(buffer + ": analyte " + a.name() + " appears twice");
            }
            if (Math.signum(a.mobility()) != sign) {
                throw new IllegalArgumentException(buffer + ": the panel mixes anions and cations");
            }
        }
        RunConditions check = conditions(totalLengthCm, detectorLengthCm, voltageKv, buffer, detection);
        String problem = check.geometryProblem();
        if (problem != null) {
            throw new IllegalArgumentException(buffer + ": " + problem);
        }
    }

    private static RunConditions conditions(double lt, double ld, double kv, String buffer, Detection d) {
        return new RunConditions(lt, ld, kv, Double.NaN, Double.NaN, buffer, Double.NaN, Double.NaN, d,
                Double.NaN, Double.NaN, Double.NaN);
    }

    /** Sign of the panel's mobilities: −1 for an anion panel, +1 for a cation panel. */
    public double panelSign() {
        return Math.signum(panel.get(0).mobility());
    }

    /** Smallest |mobility| of the panel. */
    public double minAbsMobility() {
        return panel.stream().mapToDouble(a -> Math.abs(a.mobility())).min().orElseThrow();
    }

    /** Largest |mobility| of the panel. */
    public double maxAbsMobility() {
        return panel.stream().mapToDouble(a -> Math.abs(a.mobility())).max().orElseThrow();
    }

    /** Name of standard mix {@code k} (1-based), unique across methods: {@code <buffer>-mix<k>}. */
    public String mixName(int k) {
        return buffer + "-mix" + k;
    }

    /**
     * The panel split into {@value #MIXES} standard mixes: the analytes in order of |mobility| are dealt
     * out in turn, so neighbours on the mobility axis (the near pairs among them) never share a mix,
     * as analysts prepare standards.
     */
    public List<List<PanelAnalyte>> mixes() {
        List<PanelAnalyte> sorted = new ArrayList<>(panel);
        sorted.sort(Comparator.comparingDouble((PanelAnalyte a) -> Math.abs(a.mobility())).reversed());
        List<List<PanelAnalyte>> mixes = new ArrayList<>();
        for (int k = 0; k < MIXES; k++) {
            mixes.add(new ArrayList<>());
        }
        for (int i = 0; i < sorted.size(); i++) {
            mixes.get(i % MIXES).add(sorted.get(i));
        }
        return mixes.stream().map(List::copyOf).toList();
    }
}
