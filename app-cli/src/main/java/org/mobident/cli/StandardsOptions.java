package org.mobident.cli;

import java.nio.file.Path;
import org.mobident.InputException;
import org.mobident.library.Library;
import org.mobident.library.LibraryCsv;
import org.mobident.library.standards.BuildResult;
import org.mobident.library.standards.BuildSettings;
import org.mobident.library.standards.Grubbs;
import org.mobident.library.standards.StandardsSheet;
import org.mobident.library.standards.StandardsSheetReader;
import org.mobident.settings.MatchSettings;
import org.mobident.usecase.BuildLibrary;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;

/** Standards runs, the sheet saying what each mix holds, and the build settings. */
public final class StandardsOptions {

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
        return job().run(inputs.settings(MatchSettings.DEFAULT), buildSettings());
    }

    /** The standards runs, their sheet, the reference and the buffer, checked before any work. */
    BuildLibrary job() throws InputException {
        StandardsSheet sheet = StandardsSheetReader.read(mixesFile);
        Library reference = referenceFile == null ? null : LibraryCsv.read(referenceFile);
        return new BuildLibrary(sheet, reference, inputs.load(), ph == null ? Double.NaN : ph,
                ionicStrengthMm == null ? Double.NaN : ionicStrengthMm);
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
