package org.mobident.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.Callable;
import org.mobident.InputException;
import org.mobident.library.Library;
import org.mobident.library.LibraryCsv;
import org.mobident.recheck.BufferTransfer;
import org.mobident.recheck.PhScan;
import org.mobident.report.prediction.PhScanCsv;
import org.mobident.report.prediction.PhScanText;
import org.mobident.report.prediction.PredictionText;
import org.mobident.usecase.ReferenceData;
import org.mobident.usecase.PredictMobilities;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;
import picocli.CommandLine.Model.CommandSpec;

/** {@code mobident predict}: effective mobilities of a library's analytes in another buffer. */
@Command(name = "predict",
        mixinStandardHelpOptions = true,
        versionProvider = VersionProvider.class,
        sortOptions = false,
        description = "Predicts each analyte's effective mobility in a new buffer (pH, ionic strength, temperature) "
                + "from its measured value and a physico-chemical model (ionic forms, Davies activities, an "
                + "Onsager-type ionic-strength correction, water viscosity), with an uncertainty. With --scan it "
                + "tabulates mobility against pH and lists the pH ranges where two analytes would co-migrate. "
                + "Predictions guide method changes; they do not replace measuring standards in the new buffer.",
        footer = {"", "Exit codes: 0 done; 2 bad command line; 3 unusable library or buffer; 4 output not written."})
public final class PredictCommand implements Callable<Integer> {

    @Spec
    CommandSpec spec;

    @Option(names = {"-l", "--library"}, required = true, paramLabel = "FILE", description = "The measured library.")
    Path libraryFile;

    @Option(names = "--reference", paramLabel = "FILE",
            description = "Reference library with pKa values and limiting mobilities for analytes whose entries lack "
                    + "them (e.g. reference-libraries/ions-25C.csv).")
    Path referenceFile;

    @Mixin
    BufferOptions buffers;

    @Option(names = "--scan", paramLabel = "FROM:TO:STEP",
            description = "Tabulate mobility against pH over this range instead (at the new ionic strength and temperature).")
    String scan;

    @Option(names = "--analytes", paramLabel = "NAMES", split = ",", description = "Analytes to include (default all).")
    List<String> analytes = new ArrayList<>();

    @Option(names = {"-o", "--out"}, paramLabel = "FILE",
            description = "Write the predicted library (or, with --scan, the pH table) as CSV.")
    Path out;

    @Option(names = "--overwrite", description = "Replace the output file if it exists.")
    boolean overwrite;

    @Override
    public Integer call() throws Exception {
        PrintWriter o = spec.commandLine().getOut();
        if (scan == null && !buffers.newGiven()) {
            // a usage mistake, exit 2 as in 'recheck'
            spec.commandLine().getErr().println("mobident predict: give the new buffer's --ph and "
                    + "--ionic-strength-mm (or --scan FROM:TO:STEP with --ionic-strength-mm).");
            return ExitCodes.USAGE;
        }
        Outputs.checkFree(overwrite, out);
        Library library = LibraryCsv.read(libraryFile);
        BufferTransfer predictor = ReferenceData.transfer(referenceFile);
        if (scan != null) {
            return scan(library, predictor, o);
        }
        var bufferB = BufferOptions.adjustedNewBuffer(buffers, referenceFile, o);
        var prediction = new PredictMobilities(library, predictor, buffers.oldBuffer(), analytes).inBuffer(bufferB);
        PredictionText.write(bufferB, prediction.shown(), o);
        if (out != null) {
            LibraryBuildCommand.writeLibrary(out, overwrite, prediction.asLibrary(buffers.newBufferForLibrary()));
            o.println("predicted library written to " + out);
        }
        return ExitCodes.OK;
    }

    private int scan(Library library, BufferTransfer predictor, PrintWriter o) throws InputException, OutputException {
        String[] p = scan.split(":");
        double from;
        double to;
        double step;
        try {
            from = Double.parseDouble(p[0]);
            to = Double.parseDouble(p[1]);
            step = p.length > 2 ? Double.parseDouble(p[2]) : 0.1;
        } catch (RuntimeException e) {
            throw new InputException("command line", 0, "--scan", "expected FROM:TO:STEP, e.g. 3:10:0.1, got '" + scan + "'");
        }
        if (buffers.ionicStrengthMm == null) {
            throw new InputException("command line", 0, "--ionic-strength-mm", "the scan needs the ionic strength");
        }
        PhScan.Result r = new PredictMobilities(library, predictor, buffers.oldBuffer(), analytes)
                .scan(from, to, step, buffers.ionicStrengthMm, buffers.temperatureC);
        if (out != null) {
            Outputs.write(out, overwrite, w -> PhScanCsv.write(r, w));
        }
        PhScanText.writeTable(r, buffers.ionicStrengthMm, buffers.temperatureC, o);
        if (out != null) {
            o.println("full mobility-vs-pH table (CSV, every step) written to " + out);
        }
        PhScanText.writeComigrations(r, from, to, o);
        return ExitCodes.OK;
    }
}
