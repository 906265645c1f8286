package org.mobident.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import org.mobident.assess.AcceptanceLimits;
import org.mobident.assess.Assessment;
import org.mobident.report.assess.AssessmentCsv;
import org.mobident.report.assess.AssessmentHtml;
import org.mobident.report.assess.AssessmentText;
import picocli.CommandLine;
import picocli.CommandLine.Option;

/** The score files and acceptance limits of {@code assess}, and their rendering. */
public final class AssessOutputs {

    @Option(names = "--csv", paramLabel = "FILE",
            description = "Write the scores as a long CSV table (section, subject, measure, value).")
    Path csvOut;

    @Option(names = "--peaks-csv", paramLabel = "FILE",
            description = "Write every reported peak of the scored runs with the known zone it belongs to and its "
                    + "verdict, then the known zones no peak was found for.")
    Path verdictsOut;

    @Option(names = "--html", paramLabel = "FILE",
            description = "Write the scores as a self-contained HTML page with a reliability diagram.")
    Path htmlOut;

    @Option(names = "--min-precision", paramLabel = "P",
            description = "Acceptance limit: least precision of the identified calls, a fraction, such as 0.95.")
    Double minPrecision;

    @Option(names = "--min-recall", paramLabel = "R",
            description = "Acceptance limit: least recall of the analytes present (identified with the right "
                    + "name), a fraction.")
    Double minRecall;

    @Option(names = "--max-ece", paramLabel = "E",
            description = "Acceptance limit: largest expected calibration error of the calls' confidences, a "
                    + "fraction, such as 0.05.")
    Double maxEce;

    @Option(names = "--overwrite", description = "Replace output files that already exist.")
    boolean overwrite;

    /** The limits given; a value outside [0, 1] is a usage error. */
    AcceptanceLimits limits(CommandLine commandLine) {
        double p = minPrecision == null ? Double.NaN : minPrecision;
        double r = minRecall == null ? Double.NaN : minRecall;
        double e = maxEce == null ? Double.NaN : maxEce;
        String[] names = {"--min-precision", "--min-recall", "--max-ece"};
        double[] values = {p, r, e};
        for (int i = 0; i < names.length; i++) {
            if (!Double.isNaN(values[i]) && !(values[i] >= 0 && values[i] <= 1)) {
                throw new CommandLine.ParameterException(commandLine, names[i]
                        + ": a limit is a fraction between 0 and 1, got " + values[i]);
            }
        }
        return new AcceptanceLimits(p, r, e);
    }

    /** Refuses, before any work is done, to replace existing files unless asked to. */
    void checkFree() throws OutputException {
        Outputs.checkFree(overwrite, csvOut, verdictsOut, htmlOut);
    }

    /** The scores on {@code out} (none when null) and every file asked for. */
    void write(Assessment assessment, AcceptanceLimits limits, PrintWriter out) throws OutputException {
        if (out != null) {
            AssessmentText.write(assessment, limits, out);
        }
        if (csvOut != null) {
            Outputs.write(csvOut, overwrite, w -> AssessmentCsv.writeScores(assessment, limits, w));
        }
        if (verdictsOut != null) {
            Outputs.write(verdictsOut, overwrite, w -> AssessmentCsv.writeVerdicts(assessment, w));
        }
        if (htmlOut != null) {
            String page = AssessmentHtml.page(assessment, limits, null, VersionProvider.version(), Outputs.timestamp());
            Outputs.write(htmlOut, overwrite, w -> w.write(page));
        }
    }
}
