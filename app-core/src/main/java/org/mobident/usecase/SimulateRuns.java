package org.mobident.usecase;

import java.io.IOException;
import java.nio.file.Path;
import java.util.Objects;
import org.mobident.library.Library;
import org.mobident.simulate.ArchiveGenerator;
import org.mobident.simulate.ElectromigrationDispersion;
import org.mobident.simulate.LabDayBench;
import org.mobident.simulate.LabDayMethods;
import org.mobident.simulate.LabDayPlan;
import org.mobident.simulate.LabDayPlanner;
import org.mobident.simulate.LabDaySummary;

/**
 * Invented runs for trials, speed measurements and honest benches: the archive scenario (anion
 * runs drawn from a library, with their run sheet; {@link ArchiveGenerator}) or the lab-day bench
 * (three invented methods with standards, samples and truth tables; {@link LabDayBench}).
 */
public final class SimulateRuns {

    public static final String ARCHIVE = "archive";
    public static final String LAB_DAY = "lab-day";
    public static final int DEFAULT_ARCHIVE_RUNS = 20;
    public static final int DEFAULT_LAB_DAY_SAMPLES = 160;
    public static final int DEFAULT_POINTS = 14_400;
    public static final int MAX_ARCHIVE_RUNS = 100_000;
    public static final int MAX_LAB_DAY_SAMPLES = 10_000;
    public static final int MIN_POINTS = 100;
    public static final int MAX_POINTS = 10_000_000;

    private SimulateRuns() {
    }

    /**
     * What to write.
     *
     * @param scenario      {@link #ARCHIVE} or {@link #LAB_DAY}
     * @param libraryGiven  whether a library was named (the archive needs one, the lab day takes none)
     * @param count         archive runs, or lab-day samples; null for the default
     * @param points        points per archive run; null for the default
     * @param seed          random seed: the same seed writes the same files
     * @param out           folder to write into
     * @param overwrite     whether files that exist may be replaced
     * @param overwriteHint what to tell the user when a file exists and may not be replaced
     */
    public record Request(String scenario, boolean libraryGiven, Integer count, Integer points, long seed, Path out,
                          boolean overwrite, String overwriteHint, ElectromigrationDispersion.Shape skewShape) {
        public Request {
            Objects.requireNonNull(scenario, "scenario");
            Objects.requireNonNull(out, "out");
            Objects.requireNonNull(skewShape, "skewShape");
        }

        /** A request whose skewed zones are exponentially modified Gaussians. */
        public Request(String scenario, boolean libraryGiven, Integer count, Integer points, long seed, Path out,
                       boolean overwrite, String overwriteHint) {
            this(scenario, libraryGiven, count, points, seed, out, overwrite, overwriteHint,
                    ElectromigrationDispersion.Shape.EXPONENTIAL);
        }

        /** Archive runs or lab-day samples to write. */
        public int runs() {
            return count != null ? count : ARCHIVE.equals(scenario) ? DEFAULT_ARCHIVE_RUNS : DEFAULT_LAB_DAY_SAMPLES;
        }

        /** Points per archive run. */
        public int pointsPerRun() {
            return points == null ? DEFAULT_POINTS : points;
        }

        /** What is wrong with the request, in the words of the command line, or null when nothing is. */
        public String problem() {
            if (ARCHIVE.equals(scenario)) {
                int n = pointsPerRun();
                if (runs() < 1 || runs() > MAX_ARCHIVE_RUNS || n < MIN_POINTS || n > MAX_POINTS) {
                    return "--count must be 1.." + MAX_ARCHIVE_RUNS + " and --points " + MIN_POINTS + ".." + MAX_POINTS;
                }
                if (skewShape != ElectromigrationDispersion.Shape.EXPONENTIAL) {
                    return "the archive scenario draws symmetric zones; --skew-shape is for lab-day";
                }
                return libraryGiven ? null : "the archive scenario draws its anions from a library: give --library FILE";
            }
            if (!LAB_DAY.equals(scenario)) {
                return "unknown --scenario '" + scenario + "'; choose " + ARCHIVE + " or " + LAB_DAY;
            }
            if (libraryGiven) {
                return "the lab-day scenario uses its own invented panels; leave out --library";
            }
            if (points != null) {
                return "the lab-day scenario chooses each run's sampling rate and length; leave out --points";
            }
            return runs() < 1 || runs() > MAX_LAB_DAY_SAMPLES ? "--count must be 1.." + MAX_LAB_DAY_SAMPLES
                    + " sample runs" : null;
        }
    }

    /**
     * Writes the archive's runs and run sheet.
     *
     * @return the run sheet written
     * @throws IllegalArgumentException when the library holds no anion to draw
     */
    public static Path archive(Request request, Library library) throws IOException {
        return ArchiveGenerator.write(library, request.runs(), request.pointsPerRun(), request.seed(), request.out(),
                request.overwrite());
    }

    /** Writes the lab-day bench; returns what it holds. */
    public static LabDaySummary labDay(Request request) throws IOException {
        LabDayPlan plan = LabDayPlanner.plan(LabDayMethods.builtIn(), request.runs(), request.seed())
                .withZoneShape(request.skewShape());
        return LabDayBench.write(plan, request.out(), request.overwrite(), request.overwriteHint());
    }
}
