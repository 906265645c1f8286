package org.mobident.simulate;

import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import java.util.stream.Collectors;
import org.mobident.text.NumberText;

/** The README.txt of a lab-day bench: what it holds, its troubles, its counts, how to use it. */
final class LabDayReadme {

    /** Width the summary paragraph is wrapped to. */
    private static final int WRAP_COLUMNS = 96;

    private LabDayReadme() {
    }

    static String text(LabDayPlan plan, LabDaySummary summary, Path dir) {
        String d = dir.toAbsolutePath().normalize().toString();
        StringBuilder sb = new StringBuilder();
        sb.append("LAB-DAY BENCH, seed ").append(plan.seed()).append("\n\n");
        sb.append("""
                Everything in this folder is invented: the methods, the "true" mobilities, the samples and
                the detector traces are made up by mobident simulate --scenario lab-day. No real sample,
                laboratory, instrument or person is behind any of it. Never mix these files with real records.

                PURPOSE
                A hard, honest test of identification by mobility. The runs carry the ordinary troubles of a
                working day, most of them not written in the run sheets, and the truth tables say exactly
                what every run holds, so identifications can be scored.

                FILES
                  truth.csv                  truth of every sample run (known-identities format)
                  hidden-conditions.csv      what the sheets leave out: actual temperature, EOF, noise, layout
                  standards/runs.csv         run sheet of all standards runs (column 'mix' names the mix)
                  standards/mixes.csv        standards sheet: mix, analyte, approx_mobility (whole units)
                  standards/BUF-runs.csv     the same per method, to build one library per method
                  standards/BUF-mixes.csv
                  standards/truth.csv        truth of the standards runs
                  standards/std-*            standards traces
                  samples/runs.csv           run sheet of all sample runs
                  samples/BUF-runs.csv       the same per method
                  samples/BUF-truth.csv      truth of one method's sample runs
                  samples/lab-s*             sample traces
                Traces ending in .csv are either 'time_s,signal' in seconds or 'Time (min);Signal' in minutes
                with a decimal comma; traces ending in .txt are tab-separated, seconds.

                TRUTH COLUMNS
                  run        run name (trace file name without extension)
                  kind       analyte | foreign | marker | spike
                  analyte    panel name for an analyte, foreign-N for a substance outside the panel
                  time_s     true migration time of the zone's centroid (the apex of a skewed zone lies
                             towards its sharp flank), or the time of a spike's first point
                  mobility   true effective mobility at 25 C, 1e-9 m^2/(V s), signed; 0 for the marker
                  height_sd  apex height of the undispersed zone divided by the run's noise SD

                """);
        sb.append("METHODS AND PANELS (true effective mobilities at 25 C, 1e-9 m^2/(V s); invented values)\n");
        for (LabDayMethod m : plan.methods()) {
            sb.append(String.format(Locale.ROOT, "  %s: %s%n    Lt %s cm, Ld %s cm, %s kV, nominal EOF %s, "
                            + "background co-ion %s, %d standards runs, %d sample runs%n",
                    m.buffer(), m.description(), NumberText.trimmed(m.totalLengthCm(), 1, ""),
                    NumberText.trimmed(m.detectorLengthCm(), 1, ""),
                    signed(m.voltageKv()), signed(m.nominalEofMobility()), signed(m.coIonMobility()),
                    plan.standards(m).size(), plan.samples(m).size()));
            sb.append("    ").append(m.panel().stream().map(a -> a.name() + " " + signed(a.mobility()))
                    .collect(Collectors.joining(", "))).append('\n');
            List<List<PanelAnalyte>> mixes = m.mixes();
            for (int k = 1; k <= mixes.size(); k++) {
                sb.append("    ").append(m.mixName(k)).append(": ").append(mixes.get(k - 1).stream()
                        .map(PanelAnalyte::name).collect(Collectors.joining(", "))).append('\n');
            }
        }
        sb.append(String.format(Locale.ROOT, """

                TROUBLES (drawn at random per run; the truth and hidden-conditions.csv record them)
                - Temperature: every sheet says 25 C, but a sample run's capillary was 25 C +/- up to %.1f K and
                  the standards session ran at one common offset (%+.2f K). Mobilities and the EOF follow the
                  viscosity of water (IAPWS), about 2 %% per K, so up to ~3.5 %% - more than the near pairs'
                  1-2 %% separation.
                - EOF drift up to +/-%.0f %% around each method's nominal EOF (standards too).
                - Electromigration dispersion: the standards are slightly skewed; sample zones range from %.1f to
                  %.0f times the standards' concentration, taller zones being both higher and more skewed;
                  skewed zones are drawn as %s.
                - Neutral marker: in about %.0f %% of sample runs it is only %.0f-%.0f %% of its usual height; in
                  about %.0f %% a foreign zone of small mobility (|mu| %.0f-%.0f) arrives beside it, %.1f-%.0f times
                  taller; about %.0f %% of sample rows give no marker window. Otherwise the window is the nominal
                  marker time +/- %.0f %%.
                - Zone heights from %.0f to %.0f noise SD (log-uniform); marker %.0f-%.0f SD when not weak.
                - Foreign zones: 0-%d per sample run inside the panel's mobility range, each at least %.0f %%
                  (relative) from every panel mobility. A substance closer than that cannot be told from the
                  panel analyte by mobility at all, so the bench leaves such cases out; real samples do not.
                - Spikes: 0-%d per run (standards too), 1-2 points, %.0f-%.0f noise SD, either sign.
                - Noise: white, or in about half the runs first-order autoregressive with lag-one correlation
                  %.2f-%.2f, scaled to the same marginal SD.
                - Baselines: offset, linear and quadratic drift, and a slow wander of two sinusoids (periods
                  %.0f-%.0f s, together up to %.0f noise SD).
                - Sampling at 4, 5, 10, 20, 25 or 50 Hz; voltage ramps of 0-%d s (stated in the sheet); plate
                  numbers %.0f-%.0f; three file layouts.
                - Each sample holds every panel analyte with probability %.1f (at least %d).

                """,
                LabDayPlanner.SAMPLE_TEMPERATURE_SPREAD_C, plan.standardsTemperatureOffsetC(),
                100 * LabDayPlanner.EOF_DRIFT, LabDayPlanner.MIN_CONCENTRATION_FACTOR,
                LabDayPlanner.MAX_CONCENTRATION_FACTOR, zoneForm(plan), 100 * LabDayPlanner.WEAK_MARKER_PROBABILITY,
                100 * LabDayPlanner.WEAK_MARKER_MIN_FRACTION, 100 * LabDayPlanner.WEAK_MARKER_MAX_FRACTION,
                100 * LabDayPlanner.TALL_FOREIGN_PROBABILITY, LabDayPlanner.TALL_FOREIGN_MIN_MOBILITY,
                LabDayPlanner.TALL_FOREIGN_MAX_MOBILITY, LabDayPlanner.TALL_FOREIGN_MIN_RATIO,
                LabDayPlanner.TALL_FOREIGN_MAX_RATIO, 100 * LabDayPlanner.NO_WINDOW_PROBABILITY,
                100 * LabDayPlanner.MARKER_WINDOW_HALF_WIDTH, LabDayPlanner.MIN_HEIGHT_SD,
                LabDayPlanner.MAX_HEIGHT_SD, LabDayPlanner.MARKER_MIN_HEIGHT_SD, LabDayPlanner.MARKER_MAX_HEIGHT_SD,
                LabDayPlanner.MAX_FOREIGN, 100 * LabDayPlanner.MIN_FOREIGN_SEPARATION, LabDayPlanner.MAX_SPIKES,
                LabDayPlanner.SPIKE_MIN_SD, LabDayPlanner.SPIKE_MAX_SD, LabDayPlanner.MIN_NOISE_CORRELATION,
                LabDayPlanner.MAX_NOISE_CORRELATION, LabDayPlanner.MIN_WAVE_PERIOD_S, LabDayPlanner.MAX_WAVE_PERIOD_S,
                LabDayPlanner.BASELINE_WAVES * LabDayPlanner.MAX_WAVE_AMPLITUDE_SD, LabDayPlanner.MAX_RAMP_S,
                LabDayPlanner.MIN_PLATES, LabDayPlanner.MAX_PLATES, LabDayPlanner.ANALYTE_PROBABILITY,
                LabDayPlanner.MIN_ANALYTES));
        sb.append("COUNTS FOR THIS SEED\n").append(wrap(summary.paragraph())).append("\n\n");
        sb.append("HOW TO USE IT\n");
        sb.append("1. Build one library per method from its standards:\n");
        for (LabDayMethod m : plan.methods()) {
            sb.append(String.format(Locale.ROOT, "   mobident library build --runs %1$s/standards/%2$s-runs.csv "
                    + "--mixes %1$s/standards/%2$s-mixes.csv --out %1$s/%2$s-library.csv%n", d, m.buffer()));
        }
        sb.append("2. Identify each method's samples with its library:\n");
        for (LabDayMethod m : plan.methods()) {
            sb.append(String.format(Locale.ROOT, "   mobident identify --runs %1$s/samples/%2$s-runs.csv "
                    + "--library %1$s/%2$s-library.csv --csv %1$s/peaks-%2$s.csv --quiet%n", d, m.buffer()));
        }
        sb.append("3. Score the calls against the truth, per method:\n");
        for (LabDayMethod m : plan.methods()) {
            sb.append(String.format(Locale.ROOT, "   mobident assess --known %1$s/samples/%2$s-truth.csv "
                    + "--table %1$s/peaks-%2$s.csv%n", d, m.buffer()));
        }
        sb.append("   or, with the three peak tables joined into one (a single header line), for the whole day:\n");
        sb.append("   mobident assess --known ").append(d).append("/truth.csv --table peaks.csv\n");
        sb.append("   The standards can be scored the same way against standards/truth.csv.\n");
        return sb.toString();
    }

    /** One decimal at most, with a plus sign when positive ("+45.2", "-20", "0"). */
    /** How the plan draws its skewed zones. */
    private static String zoneForm(LabDayPlan plan) {
        ElectromigrationDispersion.Shape shape = plan.samples().isEmpty() ? ElectromigrationDispersion.Shape.EXPONENTIAL
                : plan.samples().get(0).dispersion().shape();
        return switch (shape) {
            case TRIANGLE -> "triangles with a sharp front and a straight diffuse flank, smoothed by diffusion";
            case NONE -> "Gaussians after all (this bench was written without any skew)";
            case MIXED -> "exponentially modified Gaussians, and as triangles with a straight diffuse flank from "
                    + "three times the standards' dispersion on";
            case EXPONENTIAL -> "exponentially modified Gaussians";
        };
    }

    private static String signed(double v) {
        String s = NumberText.trimmed(v, 1, "");
        return s.startsWith("-") || s.equals("0") ? s : "+" + s;
    }

    private static String wrap(String text) {
        StringBuilder out = new StringBuilder();
        int column = 0;
        for (String word : text.split(" ")) {
            if (column > 0 && column + 1 + word.length() > WRAP_COLUMNS) {
                out.append('\n');
                column = 0;
            } else if (column > 0) {
                out.append(' ');
                column++;
            }
            out.append(word);
            column += word.length();
        }
        return out.toString();
    }
}
