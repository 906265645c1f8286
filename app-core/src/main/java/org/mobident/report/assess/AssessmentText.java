package org.mobident.report.assess;

import java.io.PrintWriter;
import java.util.ArrayList;
import java.util.List;
import org.mobident.assess.AcceptanceLimits;
import org.mobident.assess.AnalyteScore;
import org.mobident.assess.Assessment;
import org.mobident.assess.Calibration;
import org.mobident.assess.Detection;
import org.mobident.assess.HeightStratum;
import org.mobident.assess.Identification;
import org.mobident.assess.MobilityError;
import org.mobident.assess.Ratio;
import org.mobident.assess.ReliabilityBin;
import org.mobident.assess.RunCheck;
import org.mobident.assess.StratumScore;
import org.mobident.text.NumberText;

/**
 * The scores as a readable terminal summary, in plain ASCII: identification, results by zone height,
 * per analyte, calibration, mobility error, detection, acceptance limits and notes.
 */
public final class AssessmentText {

    /** Shown where a value cannot be given. */
    static final String NONE = "-";
    private static final String INDENT = "  ";
    private static final String GAP = "  ";

    private AssessmentText() {
    }

    /**
     * Writes the summary (flushed, not closed).
     *
     * @param a      the scores
     * @param limits the acceptance limits to report (may be {@link AcceptanceLimits#NONE})
     */
    public static void write(Assessment a, AcceptanceLimits limits, PrintWriter out) {
        out.println("Scores against known identities");
        out.println(INDENT + "known identities: " + a.knownSource());
        out.println(INDENT + "reported peaks:   " + a.tableSource());
        out.println(INDENT + "runs scored: " + a.runs().size() + " (named in both); in the peak table only, ignored: "
                + a.notScored().size() + "; in the known table only, ignored: " + a.notInTable().size());
        if (!a.notInTable().isEmpty()) {
            out.println(INDENT + "known runs without peaks in the table: " + String.join(", ", a.notInTable()));
        }
        if (!a.anythingScored()) {
            out.println();
            out.println("Nothing to score: no run is named in both tables.");
            out.flush();
            return;
        }
        identification(a.identification(), out);
        strata(a.strata(), out);
        analytes(a.analytes(), out);
        calibration(a, out);
        mobility(a.mobilityError(), out);
        detection(a, out);
        if (limits.any()) {
            out.println();
            out.println("Acceptance limits");
            for (AcceptanceLimits.Check c : limits.check(a)) {
                out.println(INDENT + limitLine(c));
            }
        }
        if (!a.notes().isEmpty()) {
            out.println();
            out.println("Notes");
            for (String n : a.notes()) {
                out.println(INDENT + "- " + n);
            }
        }
        out.flush();
    }

    /** "precision >= 0.95: met (measured 1.0000)". */
    static String limitLine(AcceptanceLimits.Check c) {
        String value = Double.isNaN(c.value()) ? "cannot be measured (nothing to count)"
                : "measured " + NumberText.fixed(c.value(), Figures.FRACTION_DECIMALS, NONE);
        return c.name() + (c.atLeast() ? " >= " : " <= ") + NumberText.plain(c.limit(), "") + ": "
                + (c.met() ? "met" : "NOT MET") + " (" + value + ")";
    }

    private static void identification(Identification id, PrintWriter out) {
        out.println();
        out.println("Identification (a call is a peak reported identified or ambiguous)");
        List<String[]> rows = new ArrayList<>();
        rows.add(ratioRow("precision of identified calls", id.precision(), "right"));
        rows.add(ratioRow("precision of all calls", id.precisionWithAmbiguous(), "right"));
        rows.add(ratioRow("recall of the analytes present", id.recall(), "identified by name"));
        rows.add(ratioRow("recall counting ambiguous calls", id.recallWithAmbiguous(), "called by name"));
        rows.add(ratioRow("recall at height >= " + NumberText.fixed(HeightStratum.CLEAR_HEIGHT_SD, 0, NONE)
                + " noise SD", id.recallClear(), "identified by name"));
        table(new String[] {"", "", ""}, new boolean[] {false, true, false}, rows, out, false);
        out.println(INDENT + "wrong names " + id.wrongNames() + ", called but absent " + id.calledAbsent()
                + ", missed " + id.missed() + " (analytes present without a right call)");
    }

    private static String[] ratioRow(String what, Ratio r, String counted) {
        return new String[] {what, Figures.percent(r, NONE), Figures.counted(r) + " " + counted};
    }

    private static void strata(List<StratumScore> strata, PrintWriter out) {
        out.println();
        out.println("By zone height over noise SD (bands with known zones only)");
        List<String[]> rows = new ArrayList<>();
        for (StratumScore s : strata) {
            if (s.zones() == 0 && s.analyteRows() == 0) {
                continue;
            }
            rows.add(new String[] {s.stratum().label(), Integer.toString(s.analyteRows()),
                Integer.toString(s.identifiedRight()), Figures.percent(s.recall(), NONE),
                Figures.percent(s.recallWithAmbiguous(), NONE), Integer.toString(s.zones()),
                Integer.toString(s.detected()), Figures.percent(s.detectionRate(), NONE)});
        }
        table(new String[] {"height/SD", "analytes", "identified", "recall", "+ambiguous", "zones", "detected",
            "detection"}, new boolean[] {false, true, true, true, true, true, true, true}, rows, out, true);
    }

    private static void analytes(List<AnalyteScore> analytes, PrintWriter out) {
        out.println();
        out.println("Per analyte (mobility error in 1e-9 m^2/(V s), reported minus known)");
        List<String[]> rows = new ArrayList<>();
        for (AnalyteScore s : analytes) {
            rows.add(new String[] {s.name(), Integer.toString(s.present()), Integer.toString(s.identifiedRight()),
                Integer.toString(s.ambiguousRight()), Integer.toString(s.wrongCalls()), Integer.toString(s.missed()),
                Figures.percent(s.precision(), NONE), Figures.percent(s.recall(), NONE),
                NumberText.fixed(s.mobilityError().meanAbsoluteError(), Figures.MOBILITY_ERROR_DECIMALS, NONE),
                NumberText.signed(s.mobilityError().bias(), Figures.MOBILITY_ERROR_DECIMALS, NONE)});
        }
        table(new String[] {"analyte", "present", "identified", "ambiguous", "wrong", "missed", "precision", "recall",
            "MAE", "bias"}, new boolean[] {false, true, true, true, true, true, true, true, true, true}, rows, out,
                true);
    }

    private static void calibration(Assessment a, PrintWriter out) {
        out.println();
        out.println("Calibration of the calls (confidence = probability that the call is right)");
        Calibration c = a.calls();
        out.println(INDENT + overall(c, "call", "calls"));
        List<String[]> rows = new ArrayList<>();
        for (ReliabilityBin b : c.bins()) {
            if (b.count() > 0) {
                rows.add(new String[] {Figures.bin(b), Integer.toString(b.count()),
                    NumberText.fixed(b.meanConfidence(), Figures.CONFIDENCE_DECIMALS, NONE),
                    NumberText.fixed(b.accuracy(), Figures.CONFIDENCE_DECIMALS, NONE)});
            }
        }
        if (!rows.isEmpty()) {
            table(new String[] {"confidence", "calls", "mean confidence", "observed"},
                    new boolean[] {false, true, true, true}, rows, out, true);
        }
        out.println("Calibration of the unassigned peaks (confidence = probability that the peak is none of the");
        out.println("library analytes)");
        out.println(INDENT + overall(a.unassigned(), "peak", "peaks"));
    }

    /** "35 calls: mean confidence 0.968, observed 1.000; ECE 0.032, Brier score 0.0011". */
    private static String overall(Calibration c, String one, String many) {
        if (c.count() == 0) {
            return "no " + many + " with a verdict";
        }
        return c.count() + " " + (c.count() == 1 ? one : many) + ": mean confidence "
                + NumberText.fixed(c.meanConfidence(), Figures.CONFIDENCE_DECIMALS, NONE) + ", observed "
                + NumberText.fixed(c.accuracy(), Figures.CONFIDENCE_DECIMALS, NONE) + "; ECE "
                + NumberText.fixed(c.ece(), Figures.CONFIDENCE_DECIMALS, NONE) + ", Brier score "
                + NumberText.fixed(c.brier(), Figures.BRIER_DECIMALS, NONE);
    }

    private static void mobility(MobilityError e, PrintWriter out) {
        out.println();
        out.println("Mobility error (reported minus known, 1e-9 m^2/(V s); reported = scale-corrected when the");
        out.println("peak table has it, else converted to the library temperature)");
        if (e.count() == 0) {
            out.println(INDENT + "no analyte peak with a known mobility");
            return;
        }
        out.println(INDENT + e.count() + (e.count() == 1 ? " peak" : " peaks") + ": mean absolute error "
                + NumberText.fixed(e.meanAbsoluteError(), Figures.MOBILITY_ERROR_DECIMALS, NONE) + ", bias "
                + NumberText.signed(e.bias(), Figures.MOBILITY_ERROR_DECIMALS, NONE));
    }

    private static void detection(Assessment a, PrintWriter out) {
        Detection d = a.detection();
        out.println();
        out.println("Detection");
        List<String[]> rows = new ArrayList<>();
        rows.add(new String[] {"analyte peaks on a known zone", Figures.percent(d.precision(), NONE),
            Figures.counted(d.precision())});
        rows.add(new String[] {"known zones with a peak", Figures.percent(d.rate(), NONE), Figures.counted(d.rate())});
        rows.add(new String[] {"spikes reported as peaks", Integer.toString(d.spikesReported()), "should be 0"});
        rows.add(new String[] {"runs that failed", Integer.toString(d.runsFailed()), ""});
        rows.add(new String[] {"runs without a mobility scale", Integer.toString(d.runsWithoutScale()), ""});
        rows.add(new String[] {"runs with the neutral marker off", Integer.toString(d.runsMarkerOff()), ""});
        table(new String[] {"", "", ""}, new boolean[] {false, true, false}, rows, out, false);
        for (RunCheck r : a.runs()) {
            if (r.failed()) {
                out.println(INDENT + "- " + r.run() + ": not processed");
            } else if (!r.mobilityKnown()) {
                out.println(INDENT + "- " + r.run() + ": no mobility scale");
            }
            if (r.markerNote() != null) {
                out.println(INDENT + "- " + r.run() + ": " + r.markerNote());
            }
        }
    }

    /** An aligned table; the header line is printed only when {@code withHeader}. */
    private static void table(String[] header, boolean[] right, List<String[]> rows, PrintWriter out,
                              boolean withHeader) {
        int[] width = new int[header.length];
        List<String[]> all = new ArrayList<>();
        if (withHeader) {
            all.add(header);
        }
        all.addAll(rows);
        for (String[] r : all) {
            for (int i = 0; i < r.length; i++) {
                width[i] = Math.max(width[i], r[i].length());
            }
        }
        for (String[] r : all) {
            StringBuilder sb = new StringBuilder(INDENT);
            for (int i = 0; i < r.length; i++) {
                if (i > 0) {
                    sb.append(GAP);
                }
                String pad = " ".repeat(width[i] - r[i].length());
                sb.append(right[i] ? pad + r[i] : r[i] + pad);
            }
            out.println(sb.toString().stripTrailing());
        }
    }
}
