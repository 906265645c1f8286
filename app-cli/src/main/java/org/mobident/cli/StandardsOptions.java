package org.mobident.cli;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.mobident.InputException;
import org.mobident.library.Library;
import org.mobident.library.LibraryCsv;
import org.mobident.library.standards.BuildResult;
import org.mobident.library.standards.BuildSettings;
import org.mobident.library.standards.Grubbs;
import org.mobident.library.standards.LibraryBuilder;
import org.mobident.library.standards.StandardsSheet;
import org.mobident.library.standards.StandardsSheetReader;
import org.mobident.matching.MatchSettings;
import org.mobident.pipeline.IdentifySettings;
import org.mobident.pipeline.Identifier;
import org.mobident.pipeline.RunResult;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;

/** Standards runs, the sheet saying what each mix holds, and the build settings. */
public final class StandardsOptions {

    /** Spread given to a sheet's approximate mobility when it guides the marker choice, mobility units. */
    static final double GUIDE_APPROX_SPREAD = 1.5;

    /** Relative spread given to a reference (limiting) mobility when it guides the marker choice. */
    static final double GUIDE_REFERENCE_RELATIVE_SPREAD = 0.05;

    @Mixin
    RunInputs inputs;

    @Option(names = {"-m", "--mixes"}, required = true, paramLabel = "FILE",
            description = "Standards sheet: which analytes each mix holds (columns mix, analyte, and optionally "
                    + "charge, approx_mobility, order). The run sheet's 'mix' column names each run's mix.")
    Path mixesFile;

    @Option(names = "--reference", paramLabel = "FILE",
            description = "A reference library used to name peaks when the sheet gives no approximate mobility "
                    + "or order (e.g. reference-libraries/ions-25C.csv). With --ph and --ionic-strength-mm its "
                    + "limiting mobilities are first predicted for the buffer; without them only clear pairings "
                    + "are named.")
    Path referenceFile;

    @Option(names = "--ph", paramLabel = "PH", description = "pH of the standards' buffer, recorded in the library and used to predict the reference's "
                    + "effective mobilities.")
    Double ph;

    @Option(names = "--ionic-strength-mm", paramLabel = "MM",
            description = "Ionic strength of the standards' buffer (mmol/L), recorded in the library and used to "
                    + "predict the reference's effective mobilities.")
    Double ionicStrengthMm;

    @Option(names = "--rsd-limit", paramLabel = "PCT", description = "Warn above this RSD in %% (default 2).")
    Double rsdLimitPercent;

    @Option(names = "--min-replicates", paramLabel = "N", description = "Warn below this many replicates (default 3).")
    Integer minReplicates;

    @Option(names = "--outlier-alpha", paramLabel = "A",
            description = "Significance of the Grubbs outlier test (ASTM E178), two-sided (default 0.05).")
    Double outlierAlpha;

    @Option(names = "--drop-outliers", description = "Leave Grubbs outliers out of the statistics (they are always reported).")
    boolean dropOutliers;

    @Option(names = "--fixed-window-k", paramLabel = "K",
            description = "Write a fixed match window into the library: ± K replicate standard deviations "
                    + "(with --fixed-window-floor, default 0.5). Without either, no window is written and "
                    + "identification applies its prediction interval, which a fixed window would replace.")
    Double windowK;

    @Option(names = "--fixed-window-floor", paramLabel = "MOB",
            description = "Smallest half-width of that fixed window, mobility units (with --fixed-window-k, default 3).")
    Double windowFloor;

    /** Processes the standards runs and builds a library from them. */
    BuildResult build() throws InputException {
        StandardsSheet sheet = StandardsSheetReader.read(mixesFile);
        Library reference = referenceFile == null ? null : LibraryCsv.read(referenceFile);
        RunInputs.Loaded loaded = inputs.load();
        var mixByRun = sheet.resolveMixes(loaded.runs(), loaded.mixByRun(), loaded.sampleByRun());
        sheet.requireMixes(loaded.runs(), mixByRun);
        if ((ph != null && !(ph >= 0 && ph <= 14)) || (ionicStrengthMm != null && !(ionicStrengthMm >= 0))) {
            throw new InputException("command line", 0, ph != null && !(ph >= 0 && ph <= 14) ? "--ph"
                    : "--ionic-strength-mm", "pH must lie in 0–14 and the ionic strength must not be negative");
        }
        IdentifySettings settings = inputs.settings(MatchSettings.DEFAULT);
        // without marker windows, the neutral marker is the peak under which the expected analytes fit best;
        // reference (limiting) mobilities are first carried to the buffer when its pH and ionic strength are known
        Library guideReference = reference;
        if (reference != null && ph != null && ionicStrengthMm != null) {
            double t = loaded.runs().isEmpty() || Double.isNaN(loaded.runs().get(0).conditions().temperatureC())
                    ? org.mobident.library.LibraryEntry.DEFAULT_TEMPERATURE_C
                    : loaded.runs().get(0).conditions().temperatureC();
            guideReference = org.mobident.chem.ReferenceIons.effectiveAt(reference,
                    new org.mobident.chem.BufferConditions(ph, ionicStrengthMm / 1000.0, t));
        }
        Library guide = sheet.guideLibrary(guideReference, GUIDE_APPROX_SPREAD, GUIDE_REFERENCE_RELATIVE_SPREAD);
        List<RunResult> results = new ArrayList<>(new Identifier(guide, settings).identifyAll(loaded.runs()));
        results.addAll(loaded.rejected());
        // with pH and ionic strength, the reference's limiting mobilities are first predicted for the buffer
        return LibraryBuilder.build(results, mixByRun, sheet, buildSettings(), reference,
                ph == null ? Double.NaN : ph, ionicStrengthMm == null ? Double.NaN : ionicStrengthMm);
    }

    BuildSettings buildSettings() {
        BuildSettings s = BuildSettings.defaults();
        try {
            if (rsdLimitPercent != null) {
                s = s.withRsdLimitPercent(rsdLimitPercent);
            }
            if (minReplicates != null) {
                s = s.withMinReplicates(minReplicates);
            }
            if (outlierAlpha != null || dropOutliers) {
                s = s.withOutlierTest(outlierAlpha != null ? outlierAlpha : s.outlierAlpha(),
                        Grubbs.Alternative.TWO_SIDED, dropOutliers);
            }
            if (windowK != null || windowFloor != null) {
                s = s.withTolerance(windowK != null ? windowK : BuildSettings.DEFAULT_FIXED_WINDOW_K,
                        windowFloor != null ? windowFloor : BuildSettings.DEFAULT_FIXED_WINDOW_FLOOR);
            }
        } catch (IllegalArgumentException e) {
            throw new picocli.CommandLine.ParameterException(new picocli.CommandLine(this), e.getMessage());
        }
        return s;
    }
}
