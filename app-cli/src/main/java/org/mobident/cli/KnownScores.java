package org.mobident.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.List;
import org.mobident.InputException;
import org.mobident.assess.AcceptanceLimits;
import org.mobident.assess.Assessment;
import org.mobident.report.assess.AssessmentHtml;
import org.mobident.report.assess.AssessmentText;
import org.mobident.assess.KnownIdentities;
import org.mobident.assess.KnownIdentitiesReader;
import org.mobident.report.html.HtmlSection;
import org.mobident.usecase.AssessIdentification;
import org.mobident.usecase.IdentifiedBatch;

/**
 * The scores that {@code identify --known} adds to its outputs: the known-identities table, read
 * before any work, and the scores of the identification against it.
 *
 * @param known  the known-identities table
 * @param scores the scores, or null before {@link #score}
 */
record KnownScores(KnownIdentities known, Assessment scores) {

    /** Reads the table; null when no file was given. */
    static KnownScores read(Path file) throws InputException {
        return file == null ? null : new KnownScores(KnownIdentitiesReader.read(file), null);
    }

    /** Scores an identification against the table. */
    KnownScores score(IdentifiedBatch batch) {
        return new KnownScores(known, AssessIdentification.ofBatch(known, batch, "this identification").assessment());
    }

    /** Prints the scores after a blank line. */
    void print(PrintWriter out) {
        out.println();
        AssessmentText.write(scores, AcceptanceLimits.NONE, out);
    }

    /** The HTML report's extra sections: the scores, or none when {@code scored} is null. */
    static List<HtmlSection> sections(KnownScores scored) {
        return scored == null || scored.scores() == null ? List.of()
                : List.of(AssessmentHtml.asSection(scored.scores(), AcceptanceLimits.NONE));
    }
}
