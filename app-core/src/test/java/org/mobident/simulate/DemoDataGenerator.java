package org.mobident.simulate;

import java.io.IOException;
import java.io.Writer;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.SplittableRandom;
import org.mobident.io.SafeFiles;
import org.mobident.trace.Detection;
import org.mobident.trace.RunConditions;
import org.mobident.trace.Trace;

/**
 * Writes the demo data set: an invented scenario (the "Harrowmere Valley water cooperative"
 * screening spring and well waters for common inorganic ions by CZE). Everything is simulated
 * with {@link TraceSimulator}; no real laboratory, sample or instrument is behind it.
 *
 * <p>Run from the repository root after {@code mvn -o -q -B -pl app-core test-compile}:
 * <pre>
 * mvn -o -q -pl app-core dependency:build-classpath -Dmdep.outputFile=/tmp/cp.txt
 * java -cp app-core/target/classes:app-core/target/test-classes:$(cat /tmp/cp.txt) \
 *      org.mobident.simulate.DemoDataGenerator demo-data
 * </pre>
 * The output is deterministic (fixed seeds): running it again gives the same bytes.
 */
public final class DemoDataGenerator {

    /** Water viscosity at 25 °C and 30 °C, mPa·s (IAPWS 2008 release, Huber et al. 2009; from memory). */
    static final double WATER_VISCOSITY_25C_MPAS = 0.89002;
    static final double WATER_VISCOSITY_30C_MPAS = 0.79735;

    /** Run-to-run scatter of a zone's true mobility around its nominal value, 1e-9 m²/(V s). */
    static final double RUN_SCATTER = 0.25;

    static final String ANION_BUFFER = "CHR-8";
    static final String CATION_BUFFER = "IMZ-4.5";
    static final String SOURCE = "demo scenario (invented)";

    /** Anion runs: wall-coated capillary, reversed polarity, reversed EOF. */
    static final double ANION_LT_CM = 80;
    static final double ANION_LD_CM = 72;
    static final double ANION_KV = -20;
    static final double ANION_MARKER_FROM_S = 450;
    static final double ANION_MARKER_TO_S = 700;
    /** Chromate-like background co-ion of the anion buffer (invented), for the dispersion shape. */
    static final double ANION_CO_ION = -72.0;

    /** Cation runs: bare fused silica, normal polarity, cathodic EOF. */
    static final double CATION_LT_CM = 60;
    static final double CATION_LD_CM = 52;
    static final double CATION_KV = 25;
    static final double CATION_MARKER_FROM_S = 240;
    static final double CATION_MARKER_TO_S = 400;
    /** Imidazolium-like background co-ion of the cation buffer (invented). */
    static final double CATION_CO_ION = 50.0;

    static final double DISPERSION_STRENGTH = 0.0015;
    static final double SAMPLING_HZ = 20;

    /**
     * One analyte of the scenario.
     *
     * @param trueMobility nominal effective mobility at 25 °C used to simulate
     * @param libMobility  the value in the demo library (as if from an earlier standards campaign)
     */
    record Analyte(String name, double trueMobility, double libMobility, double libSd, int n, int charge,
                   String pka, String limiting, String buffer, double ph, double ionicStrengthMm) {
    }

    static final List<Analyte> ANALYTES = List.of(
            anion("bromide", -77.80, -77.70, 0.45, 8, -1, "", "-80.9"),
            anion("chloride", -76.20, -76.30, 0.40, 12, -1, "", "-79.1"),
            anion("sulfate", -73.90, -73.80, 0.55, 12, -2, "", "-82.9"),
            anion("nitrite", -71.00, -71.10, 0.50, 8, -1, "3.15", "0 -74.7"),
            anion("nitrate", -69.60, -69.50, 0.40, 12, -1, "", "-74.1"),
            anion("chlorate", -63.40, -63.30, 0.50, 8, -1, "", "-67.2"),
            anion("fluoride", -55.80, -55.90, 0.60, 12, -1, "3.17", "0 -57.4"),
            anion("formate", -53.10, -53.20, 0.55, 8, -1, "3.75", "0 -56.6"),
            anion("phosphate", -47.50, -47.40, 0.80, 12, -3, "2.15 7.20 12.35", "0 -35.1 -59.3 -71.5"),
            anion("acetate", -41.20, -41.30, 0.50, 8, -1, "4.76", "0 -42.4"),
            cation("potassium", 70.10, 70.00, 0.45, 1, "", "76.2"),
            cation("ammonium", 68.90, 69.00, 0.50, 1, "9.25", "76.2 0"),
            cation("calcium", 54.80, 54.70, 0.60, 2, "", "61.7"),
            cation("magnesium", 50.20, 50.30, 0.60, 2, "", "55.0"),
            cation("sodium", 46.30, 46.40, 0.40, 1, "", "51.9"),
            cation("lithium", 36.40, 36.30, 0.35, 1, "", "40.1"));

    /** The analyte absent from the library, with its nominal mobility at 25 °C. */
    static final String UNKNOWN = "unknown-X";
    static final double UNKNOWN_MOBILITY = -59.60;

    private static Analyte anion(String name, double trueMu, double libMu, double sd, int n, int z,
                                 String pka, String lim) {
        return new Analyte(name, trueMu, libMu, sd, n, z, pka, lim, ANION_BUFFER, 8.0, 12.0);
    }

    private static Analyte cation(String name, double trueMu, double libMu, double sd, int z, String pka,
                                  String lim) {
        return new Analyte(name, trueMu, libMu, sd, 6, z, pka, lim, CATION_BUFFER, 4.5, 8.0);
    }

    /** One zone of a planned run: analyte name and height (signal units, magnitude). */
    record Component(String name, double height, double plates) {
    }

    /** A planned run. {@code eof25} is the EOF mobility the run would have at 25 °C. */
    record RunPlan(String file, String sample, boolean cation, double rampS, double temperatureC, double eof25,
                   Detection detection, double durationS, double noiseSd, double baseline, double drift,
                   double curvature, double markerHeight, long seed, TraceFileStyle style,
                   List<Component> components) {
    }

    /** What was put into a trace, for TRUTH.md. */
    record TruthRow(String run, String analyte, boolean inLibrary, double mobility, double timeS,
                    double height, double plates) {
    }

    private DemoDataGenerator() {
    }

    public static void main(String[] args) throws IOException {
        Path out = Path.of(args.length > 0 ? args[0] : "demo-data");
        List<Path> written = generate(out);
        for (Path p : written) {
            System.out.println(p);
        }
    }

    static List<Component> zones(Object... nameHeightPlates) {
        List<Component> list = new ArrayList<>();
        for (int i = 0; i < nameHeightPlates.length; i += 3) {
            list.add(new Component((String) nameHeightPlates[i], ((Number) nameHeightPlates[i + 1]).doubleValue(),
                    ((Number) nameHeightPlates[i + 2]).doubleValue()));
        }
        return list;
    }

    static List<RunPlan> samplePlans() {
        TraceFileStyle csv = TraceFileStyle.SECONDS_CSV;
        return List.of(
                new RunPlan("spring-01.csv", "Spring S1 (upper catchment), raw", false, 0, 25, -50.0,
                        Detection.INDIRECT, 720, 0.020, 0.80, 4e-4, -2e-7, 1.2, 101, csv,
                        zones("chloride", 4.0, 130e3, "sulfate", 3.0, 120e3, "nitrate", 2.2, 140e3,
                                "fluoride", 0.9, 110e3)),
                new RunPlan("spring-02.csv", "Spring S2 (mill pond outflow), raw", false, 6, 25, -44.6,
                        Detection.INDIRECT, 720, 0.025, 1.10, -3e-4, 4e-7, 1.0, 102, csv,
                        zones("bromide", 1.4, 125e3, "chloride", 3.5, 125e3, "sulfate", 2.6, 120e3,
                                "nitrate", 1.8, 135e3, "formate", 1.0, 100e3, "phosphate", 0.8, 90e3)),
                new RunPlan("well-01.csv", "Well W1 (farmyard borehole), diluted 1:5", false, 6, 25, -56.9,
                        Detection.INDIRECT, 720, 0.030, 0.50, 8e-4, -6e-7, 1.4, 103, csv,
                        zones("chloride", 6.0, 120e3, "sulfate", 4.5, 110e3, "nitrite", 0.9, 130e3,
                                "nitrate", 3.8, 130e3, "chlorate", 1.1, 120e3, UNKNOWN, 1.3, 115e3)),
                new RunPlan("well-02.csv", "Well W2 (village pump), diluted 1:5; cassette at 30 C", false, 10, 30,
                        -47.2, Detection.INDIRECT, 720, 0.022, 0.95, 2e-4, 0, 1.1, 104, csv,
                        zones("chloride", 3.2, 125e3, "sulfate", 2.8, 115e3, "nitrate", 2.5, 135e3,
                                "fluoride", 1.0, 110e3, "phosphate", 0.9, 95e3, "acetate", 0.7, 100e3)),
                new RunPlan("well-03.csv", "Well W3 (old dairy well), raw; exported in minutes", false, 0, 25, -53.8,
                        Detection.INDIRECT, 720, 0.028, 1.30, -5e-4, 3e-7, 1.2, 105,
                        TraceFileStyle.MINUTES_SEMICOLON_DECIMAL_COMMA,
                        zones("chloride", 5.1, 120e3, "sulfate", 3.6, 115e3, "nitrite", 1.2, 130e3,
                                "nitrate", 3.1, 130e3, "fluoride", 0.8, 105e3, "formate", 0.7, 100e3)),
                new RunPlan("spring-03-uv214.csv", "Spring S3 (north seep), raw; direct UV at 214 nm", false, 6, 25,
                        -48.5, Detection.DIRECT, 720, 0.018, 0.20, 3e-4, -1e-7, 1.5, 106, csv,
                        zones("bromide", 0.7, 125e3, "nitrite", 1.2, 130e3, "nitrate", 3.0, 140e3)),
                new RunPlan("well-04-cations.csv", "Well W1 (farmyard borehole), diluted 1:10; cations", true, 6, 25,
                        41.0, Detection.INDIRECT, 480, 0.020, 0.60, 5e-4, -4e-7, 1.0, 107, csv,
                        zones("potassium", 1.2, 150e3, "ammonium", 0.7, 150e3, "calcium", 4.0, 120e3,
                                "magnesium", 1.8, 120e3, "sodium", 3.2, 140e3)));
    }

    static final List<String> MIX_A = List.of("chloride", "sulfate", "nitrate", "fluoride", "phosphate");
    static final List<String> MIX_B = List.of("bromide", "nitrite", "chlorate", "formate", "acetate");
    static final double[] STANDARD_EOF = {-50.8, -49.6, -51.9, -48.7, -50.2, -52.3, -49.1, -51.0};

    static List<RunPlan> standardPlans() {
        List<RunPlan> plans = new ArrayList<>();
        int k = 0;
        for (String mix : List.of("A", "B")) {
            List<String> members = mix.equals("A") ? MIX_A : MIX_B;
            for (int rep = 1; rep <= 4; rep++) {
                List<Component> comps = new ArrayList<>();
                for (String m : members) {
                    comps.add(new Component(m, 2.0 + 0.3 * comps.size(), 120e3));
                }
                plans.add(new RunPlan(String.format(Locale.ROOT, "std-mix%s-%d.csv", mix, rep),
                        "standard mix " + mix + ", 0.1 mM each, replicate " + rep, false, 6, 25, STANDARD_EOF[k],
                        Detection.INDIRECT, 660, 0.020, 0.9 + 0.05 * rep, 3e-4 * (rep % 2 == 0 ? 1 : -1), 0,
                        1.2, 200 + k, TraceFileStyle.SECONDS_CSV, comps));
                k++;
            }
        }
        return plans;
    }

    /** Writes everything below {@code out} and returns the files written, in order. */
    public static List<Path> generate(Path out) throws IOException {
        Files.createDirectories(out.resolve("standards"));
        List<Path> written = new ArrayList<>();
        List<TruthRow> truth = new ArrayList<>();
        List<RunPlan> samples = samplePlans();
        List<RunPlan> standards = standardPlans();

        Path library = out.resolve("library.csv");
        SafeFiles.write(library, true, DemoDataGenerator::writeLibrary);
        written.add(library);

        for (RunPlan plan : samples) {
            written.add(simulateAndWrite(out, plan, truth));
        }
        Path runs = out.resolve("runs.csv");
        SafeFiles.write(runs, true, w -> writeRunSheet(w, samples));
        written.add(runs);

        Path stdDir = out.resolve("standards");
        for (RunPlan plan : standards) {
            written.add(simulateAndWrite(stdDir, plan, truth));
        }
        Path stdRuns = stdDir.resolve("standards-runs.csv");
        SafeFiles.write(stdRuns, true, w -> writeRunSheet(w, standards, true));
        written.add(stdRuns);
        Path mixes = stdDir.resolve("mixes.csv");
        SafeFiles.write(mixes, true, DemoDataGenerator::writeMixes);
        written.add(mixes);

        Path readme = out.resolve("README.md");
        SafeFiles.write(readme, true, w -> w.write(readme(samples)));
        written.add(readme);
        Path truthFile = out.resolve("TRUTH.md");
        SafeFiles.write(truthFile, true, w -> writeTruth(w, samples, standards, truth));
        written.add(truthFile);
        return written;
    }

    static Analyte analyte(String name) {
        for (Analyte a : ANALYTES) {
            if (a.name().equals(name)) {
                return a;
            }
        }
        return null;
    }

    /** Mobility scale factor from 25 °C to {@code temperatureC}: η(25)/η(T) (Walden-type rule). */
    static double viscosityFactor(double temperatureC) {
        if (temperatureC == 25) {
            return 1.0;
        }
        if (temperatureC == 30) {
            return WATER_VISCOSITY_25C_MPAS / WATER_VISCOSITY_30C_MPAS;
        }
        throw new IllegalArgumentException("the demo uses 25 and 30 C only");
    }

    static RunConditions conditions(RunPlan plan) {
        return new RunConditions(
                plan.cation() ? CATION_LT_CM : ANION_LT_CM,
                plan.cation() ? CATION_LD_CM : ANION_LD_CM,
                plan.cation() ? CATION_KV : ANION_KV,
                plan.rampS(), plan.temperatureC(), plan.cation() ? CATION_BUFFER : ANION_BUFFER,
                plan.cation() ? CATION_MARKER_FROM_S : ANION_MARKER_FROM_S,
                plan.cation() ? CATION_MARKER_TO_S : ANION_MARKER_TO_S,
                plan.detection(), Double.NaN, Double.NaN, Double.NaN);
    }

    private static Path simulateAndWrite(Path folder, RunPlan plan, List<TruthRow> truth) throws IOException {
        double factor = viscosityFactor(plan.temperatureC());
        SplittableRandom scatter = new SplittableRandom(plan.seed() * 7919L);
        SimulationSpec.Builder b = SimulationSpec.builder(conditions(plan))
                .eofMobility(plan.eof25() * factor)
                .neutralMarker(plan.markerHeight())
                .samplingHz(SAMPLING_HZ).durationS(plan.durationS()).noiseSd(plan.noiseSd())
                .baseline(plan.baseline()).drift(plan.drift(), plan.curvature()).seed(plan.seed());
        String run = plan.file().substring(0, plan.file().lastIndexOf('.'));
        for (Component c : plan.components()) {
            Analyte a = analyte(c.name());
            double nominal = a != null ? a.trueMobility() : UNKNOWN_MOBILITY;
            double mu = nominal * factor + RUN_SCATTER * gaussian(scatter);
            b.zone(c.name(), mu, c.height(), c.plates());
        }
        SimulationSpec spec = b.build();
        for (SimulatedZone z : spec.zones()) {
            truth.add(new TruthRow(run, z.label(), analyte(z.label()) != null, z.mobility(),
                    TraceSimulator.apexTimeS(spec, z.mobility()), z.height(), z.plates()));
        }
        truth.add(new TruthRow(run, "(neutral marker)", false, 0.0, TraceSimulator.apexTimeS(spec, 0.0),
                spec.neutralMarkerHeight(), TraceSimulator.MARKER_PLATES));
        Trace trace = TraceSimulator.simulate(run, spec,
                new ElectromigrationDispersion(plan.cation() ? CATION_CO_ION : ANION_CO_ION, DISPERSION_STRENGTH));
        Path target = folder.resolve(plan.file());
        TraceSimulator.write(trace, target, true, plan.style());
        return target;
    }

    /** A standard normal deviate (Box–Muller). */
    private static double gaussian(SplittableRandom r) {
        double u1 = 1.0 - r.nextDouble();
        double u2 = r.nextDouble();
        return Math.sqrt(-2.0 * Math.log(u1)) * Math.cos(2 * Math.PI * u2);
    }

    private static String num(double v) {
        String s = String.format(Locale.ROOT, "%.2f", v);
        return s.equals("-0.00") ? "0.00" : s;
    }

    private static void writeLibrary(Writer w) throws IOException {
        w.write("# Harrowmere Valley water cooperative - demo mobility library (INVENTED values for the demo)\n");
        w.write("# Effective mobilities in 1e-9 m^2/(V s) at 25 C, signed (anions negative, cations positive).\n");
        w.write("# " + ANION_BUFFER + ": 5 mM chromate, 0.5 mM cationic wall modifier, pH 8.0, I ~ 12 mM;"
                + " coated capillary, reversed polarity, indirect UV.\n");
        w.write("# " + CATION_BUFFER + ": 10 mM imidazole with acetic acid to pH 4.5, I ~ 8 mM;"
                + " bare fused silica, normal polarity, indirect UV.\n");
        w.write("# pka and limiting_mobility hold several space-separated values where an ion has several forms.\n");
        w.write("name,mobility,mobility_sd,n,charge,tolerance,pka,limiting_mobility,buffer,ph,ionic_strength_mm,"
                + "temperature_c,source\n");
        for (Analyte a : ANALYTES) {
            w.write(String.join(",", a.name(), num(a.libMobility()), num(a.libSd()), Integer.toString(a.n()),
                    Integer.toString(a.charge()), "", a.pka(), a.limiting(), a.buffer(),
                    String.format(Locale.ROOT, "%.1f", a.ph()), String.format(Locale.ROOT, "%.0f", a.ionicStrengthMm()),
                    "25", SOURCE));
            w.write('\n');
        }
    }

    private static void writeRunSheet(Writer w, List<RunPlan> plans) throws IOException {
        writeRunSheet(w, plans, false);
    }

    /** With {@code withMix}, a {@code mix} column names the standards mix of each run (from its file name). */
    private static void writeRunSheet(Writer w, List<RunPlan> plans, boolean withMix) throws IOException {
        w.write("file,total_length_cm,detector_length_cm,voltage_kv,ramp_s,temperature_c,buffer,marker_from_s,"
                + "marker_to_s,detection," + (withMix ? "mix," : "") + "sample\n");
        for (RunPlan p : plans) {
            RunConditions c = conditions(p);
            w.write(String.join(",", p.file(), fmt(c.totalLengthCm()), fmt(c.detectorLengthCm()),
                    fmt(c.voltageKv()), fmt(c.rampS()), fmt(c.temperatureC()), c.buffer(), fmt(c.markerFromS()),
                    fmt(c.markerToS()), c.detection().label()) + ","
                    + (withMix ? (p.file().contains("mixA") ? "mixA," : "mixB,") : "")
                    + quoteIfNeeded(p.sample()));
            w.write('\n');
        }
    }

    private static String fmt(double v) {
        return v == Math.rint(v) ? Long.toString((long) v) : Double.toString(v);
    }

    private static String quoteIfNeeded(String s) {
        return s.contains(",") || s.contains("\"") ? "\"" + s.replace("\"", "\"\"") + "\"" : s;
    }

    private static void writeMixes(Writer w) throws IOException {
        w.write("mix,analyte,approx_mobility\n");
        for (String mix : List.of("A", "B")) {
            for (String m : mix.equals("A") ? MIX_A : MIX_B) {
                w.write("mix" + mix + "," + m + "," + String.format(Locale.ROOT, "%.0f", analyte(m).libMobility()) + "\n");
            }
        }
    }

    private static void writeTruth(Writer w, List<RunPlan> samples, List<RunPlan> standards, List<TruthRow> truth)
            throws IOException {
        w.write("# Demo data: the truth behind the simulated traces\n\n");
        w.write("Everything here is invented and simulated (see README.md). This file lists what was put into\n"
                + "each trace, so results can be checked. Mobilities are effective mobilities in 1e-9 m^2/(V s)\n"
                + "**at the run temperature**; times are the predicted migration times in s (the apex of a\n"
                + "symmetric zone; zones carry a slight electromigration-dispersion asymmetry, so a measured\n"
                + "apex may sit a fraction of a second off). Each zone's mobility is its nominal value plus a\n"
                + "run-to-run scatter (standard deviation " + RUN_SCATTER + ").\n\n");
        w.write("## Nominal mobilities at 25 C and the library values\n\n");
        w.write("| analyte | simulated (nominal, 25 C) | library | library sd |\n|---|---:|---:|---:|\n");
        for (Analyte a : ANALYTES) {
            w.write("| " + a.name() + " | " + num(a.trueMobility()) + " | " + num(a.libMobility()) + " | "
                    + num(a.libSd()) + " |\n");
        }
        w.write("| " + UNKNOWN + " (not in the library) | " + num(UNKNOWN_MOBILITY) + " | - | - |\n\n");
        double f30 = viscosityFactor(30);
        w.write(String.format(Locale.ROOT, "Run at 30 C (well-02): mobilities and EOF were multiplied by "
                + "eta(25 C)/eta(30 C) = %.5f / %.5f = %.4f (water viscosity, IAPWS 2008).%n%n",
                WATER_VISCOSITY_25C_MPAS, WATER_VISCOSITY_30C_MPAS, f30));
        writeTruthRuns(w, "Sample runs (runs.csv)", samples, truth);
        writeTruthRuns(w, "Standard runs (standards/standards-runs.csv)", standards, truth);
        w.write("## Expected outcome\n\n"
                + "- spring-02: bromide and chloride nearly co-migrate (resolution about 1); the library values\n"
                + "  are about 3 sd apart, so either may be reported as ambiguous.\n"
                + "- well-01: unknown-X is not in the library and should stay unassigned; nitrite and nitrate are\n"
                + "  close (about 1.4 units).\n"
                + "- well-02 was run at 30 C: its raw mobilities are about 11.6 % larger in magnitude and only match\n"
                + "  the 25 C library after temperature conversion.\n"
                + "- well-03 has its time axis in minutes with semicolons and decimal commas.\n"
                + "- spring-03-uv214 uses direct detection (positive peaks); all other runs are indirect (dips).\n"
                + "- well-04-cations is a normal-polarity cation run; potassium and ammonium nearly co-migrate.\n");
    }

    private static void writeTruthRuns(Writer w, String title, List<RunPlan> plans, List<TruthRow> truth)
            throws IOException {
        w.write("## " + title + "\n\n");
        for (RunPlan p : plans) {
            String run = p.file().substring(0, p.file().lastIndexOf('.'));
            RunConditions c = conditions(p);
            double eof = p.eof25() * viscosityFactor(p.temperatureC());
            w.write(String.format(Locale.ROOT, "### %s%n%n%s. Lt %s cm, Ld %s cm, %s kV, ramp %s s, %s C, %s, "
                    + "%s detection, EOF mobility %.2f; noise sd %s, %s Hz, %s s.%n%n",
                    run, p.sample(), fmt(c.totalLengthCm()), fmt(c.detectorLengthCm()), fmt(c.voltageKv()),
                    fmt(c.rampS()), fmt(c.temperatureC()), c.buffer(), c.detection().label(), eof,
                    Double.toString(p.noiseSd()), fmt(SAMPLING_HZ), fmt(p.durationS())));
            w.write("| zone | in library | mobility | time / s | height | plates |\n|---|---|---:|---:|---:|---:|\n");
            for (TruthRow t : truth) {
                if (t.run().equals(run)) {
                    w.write(String.format(Locale.ROOT, "| %s | %s | %s | %.2f | %.2f | %.0f |%n", t.analyte(),
                            t.analyte().startsWith("(") ? "-" : (t.inLibrary() ? "yes" : "**no**"),
                            t.analyte().startsWith("(") ? "0 (EOF)" : num(t.mobility()), t.timeS(), t.height(),
                            t.plates()));
                }
            }
            w.write("\n");
        }
    }

    private static String readme(List<RunPlan> samples) {
        StringBuilder sb = new StringBuilder();
        sb.append("# Demo data: Harrowmere Valley water cooperative (an invented scenario)\n\n");
        sb.append("Nothing here is real. The cooperative, its springs and wells, the samples, the buffers' names\n"
                + "and every number were made up for demonstrating Mobident, and every trace was simulated\n"
                + "(generator: `app-core/src/test/java/org/mobident/simulate/DemoDataGenerator.java`). The ion names\n"
                + "are real and the mobilities are of a plausible size, but they are not measured values: do not use\n"
                + "this library for real samples.\n\n");
        sb.append("## The story\n\n"
                + "A small water cooperative screens its spring and well waters for common inorganic anions by\n"
                + "capillary zone electrophoresis with indirect UV detection (a chromate background, buffer label\n"
                + "`CHR-8`) in a wall-coated capillary: reversed polarity (-20 kV) with a reversed EOF, so the\n"
                + "anions migrate with the EOF and the neutral marker comes last. The EOF drifts by up to about\n"
                + "15 % between runs, so migration times move while effective mobilities stay put. One well water\n"
                + "is also checked for cations in a bare capillary (normal polarity, +25 kV, imidazole background\n"
                + "`IMZ-4.5`). Every run contains a neutral marker (seen as a dip at the EOF time in indirect\n"
                + "detection, as a positive peak in the direct-UV run).\n\n");
        sb.append("## Files\n\n"
                + "| file | what it is |\n|---|---|\n"
                + "| `library.csv` | the cooperative's mobility library (16 ions, 25 C), Mobident library format |\n"
                + "| `runs.csv` | run sheet of the sample runs (file, lengths, voltage, ramp, temperature, buffer, marker window, detection, sample) |\n");
        for (RunPlan p : samples) {
            sb.append("| `").append(p.file()).append("` | ").append(p.sample())
                    .append(p.style() == TraceFileStyle.SECONDS_CSV ? " (`time_s,signal`)" : " (`Time (min);Signal`, decimal comma)")
                    .append(" |\n");
        }
        sb.append("| `standards/std-mixA-1..4.csv` | four replicate runs of standard mix A |\n"
                + "| `standards/std-mixB-1..4.csv` | four replicate runs of standard mix B |\n"
                + "| `standards/standards-runs.csv` | run sheet of the standard runs |\n"
                + "| `standards/mixes.csv` | which analytes each mix contains (`mix,analyte,approx_mobility`) |\n"
                + "| `TRUTH.md` | the true identities, mobilities and migration times behind every trace |\n\n");
        sb.append("## Things to notice\n\n"
                + "- `well-02` ran at 30 C while the library is at 25 C.\n"
                + "- `spring-02` has a nearly co-migrating pair (bromide/chloride).\n"
                + "- `well-01` holds a peak of an ion that is not in the library.\n"
                + "- `well-03.csv` has its time in minutes, semicolon-separated with decimal commas.\n"
                + "- `spring-03-uv214.csv` uses direct detection (positive peaks); the others are dips.\n"
                + "- `well-04-cations.csv` is a normal-polarity cation run (potassium/ammonium nearly co-migrate).\n\n");
        sb.append("## Regenerating\n\n"
                + "The files are deterministic (fixed seeds). From the repository root:\n\n"
                + "```\n"
                + "mvn -o -q -B -pl app-core test-compile\n"
                + "mvn -o -q -pl app-core dependency:build-classpath -Dmdep.outputFile=/tmp/cp.txt\n"
                + "java -cp app-core/target/classes:app-core/target/test-classes:$(cat /tmp/cp.txt) \\\n"
                + "    org.mobident.simulate.DemoDataGenerator demo-data\n"
                + "```\n\n");
        sb.append("Identification by mobility is presumptive; a real laboratory confirms results that carry\n"
                + "legal, clinical or safety weight by an orthogonal method and follows its validated procedures.\n");
        return sb.toString();
    }
}
