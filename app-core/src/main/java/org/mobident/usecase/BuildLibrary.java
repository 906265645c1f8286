package org.mobident.usecase;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import org.mobident.InputException;
import org.mobident.buffer.BufferConditions;
import org.mobident.chem.ReferenceIons;
import org.mobident.library.Library;
import org.mobident.library.LibraryEntry;
import org.mobident.library.standards.BuildResult;
import org.mobident.library.standards.BuildSettings;
import org.mobident.library.standards.BuildWarning;
import org.mobident.library.standards.LibraryBuilder;
import org.mobident.library.standards.StandardsSheet;
import org.mobident.pipeline.Identifier;
import org.mobident.pipeline.SamplingCheck;
import org.mobident.result.BatchProgress;
import org.mobident.result.RunListener;
import org.mobident.result.RunResult;
import org.mobident.settings.IdentifySettings;

/**
 * A library from standards runs: each run is identified against a guide library made from the
 * standards sheet (and the reference, carried to the standards' buffer when its pH and ionic
 * strength are known), then each analyte's peaks are grouped over the runs, named, tested for
 * outliers and pooled ({@link LibraryBuilder}). The constructor checks the inputs before any work.
 */
public final class BuildLibrary {

    /** Spread given to a sheet's approximate mobility when it guides the marker choice, mobility units. */
    public static final double GUIDE_APPROX_SPREAD = 1.5;

    /** Relative spread given to a reference (limiting) mobility when it guides the marker choice. */
    public static final double GUIDE_REFERENCE_RELATIVE_SPREAD = 0.05;

    private final StandardsSheet sheet;
    private final Library reference;
    private final RunBatch runs;
    private final Map<String, String> mixByRun;
    private final double pH;
    private final double ionicStrengthMm;

    /**
     * Checks that every run has a mix of the sheet and that the buffer is physical.
     *
     * @param sheet           which analytes each mix holds
     * @param reference       a reference library that names peaks the sheet leaves unnamed, or null
     * @param runs            the standards runs
     * @param pH              pH of the standards' buffer, NaN when not given
     * @param ionicStrengthMm its ionic strength in mmol/L, NaN when not given
     * @throws InputException naming the run without a mix, or the field {@code --ph} / {@code --ionic-strength-mm}
     */
    public BuildLibrary(StandardsSheet sheet, Library reference, RunBatch runs, double pH, double ionicStrengthMm)
            throws InputException {
        this.sheet = Objects.requireNonNull(sheet, "sheet");
        this.reference = reference;
        this.runs = Objects.requireNonNull(runs, "runs");
        this.mixByRun = sheet.resolveMixes(runs.runs(), runs.mixByRun(), runs.sampleByRun());
        sheet.requireMixes(runs.runs(), mixByRun);
        boolean badPh = !Double.isNaN(pH) && !(pH >= 0 && pH <= 14);
        if (badPh || (!Double.isNaN(ionicStrengthMm) && !(ionicStrengthMm >= 0))) {
            throw new InputException("command line", 0, badPh ? "--ph" : "--ionic-strength-mm",
                    "pH must lie in 0–14 and the ionic strength must not be negative");
        }
        this.pH = pH;
        this.ionicStrengthMm = ionicStrengthMm;
    }

    /**
     * The library the runs' peaks are first matched against: the sheet's approximate mobilities,
     * or the reference's, carried to the standards' buffer (at the first run's temperature) when
     * its pH and ionic strength are known.
     */
    public Library guideLibrary() {
        Library guideReference = reference;
        if (reference != null && !Double.isNaN(pH) && !Double.isNaN(ionicStrengthMm)) {
            double t = runs.runs().isEmpty() || Double.isNaN(runs.runs().get(0).conditions().temperatureC())
                    ? LibraryEntry.DEFAULT_TEMPERATURE_C : runs.runs().get(0).conditions().temperatureC();
            guideReference = ReferenceIons.effectiveAt(reference, new BufferConditions(pH, ionicStrengthMm / 1000.0, t));
        }
        return sheet.guideLibrary(guideReference, GUIDE_APPROX_SPREAD, GUIDE_REFERENCE_RELATIVE_SPREAD);
    }

    /**
     * Identifies the standards runs and builds the library: mean, SD, n, conditions and provenance
     * of each analyte, with the outliers, unexpected peaks and warnings.
     */
    public BuildResult run(IdentifySettings settings, BuildSettings buildSettings) {
        // the guide library only guides: no zone is looked for where it expects one
        List<RunResult> results = new ArrayList<>(new Identifier(guideLibrary(), settings.withLookWhereExpected(false))
                .identifyAll(runs.runs(), BatchProgress.NONE, RunListener.NONE));
        results.addAll(runs.rejected());
        BuildResult built = LibraryBuilder.build(results, mixByRun, sheet, buildSettings, reference, pH,
                ionicStrengthMm);
        return built.withWarnings(samplingWarnings(results, mixByRun));
    }

    /**
     * A warning for each standards run whose earliest zones are narrower than two samples (the run's
     * note, {@link SamplingCheck}): its analytes there may have been taken for spikes, which is why an
     * analyte can be missing from every replicate.
     */
    public static List<BuildWarning> samplingWarnings(List<RunResult> results, Map<String, String> mixByRun) {
        List<BuildWarning> out = new ArrayList<>();
        for (RunResult r : results) {
            for (String note : r.notes()) {
                if (SamplingCheck.isNote(note)) {
                    String run = r.spec().name();
                    out.add(new BuildWarning(BuildWarning.Kind.SAMPLED_TOO_SLOWLY, mixByRun.get(run), null, run,
                            "Run " + run + " is " + note + "."));
                }
            }
        }
        return out;
    }
}
