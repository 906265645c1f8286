package org.mobident.report;

import java.util.Arrays;
import java.util.Locale;
import java.util.Optional;
import java.util.stream.Collectors;
import org.mobident.result.MatchStatus;

/**
 * The words of the peak table's {@code status} column, in one place for the writers and the
 * readers: {@code identified}, {@code ambiguous} and {@code unassigned} for analytes (the
 * matching's {@link MatchStatus}), {@code marker} for a marker peak, {@code failed} for the single
 * row of a run that could not be processed and {@code no_peaks} for the single row of a run that
 * found no peak.
 */
public enum PeakTableStatus {
    /** One library analyte clearly explains the peak. */
    IDENTIFIED(MatchStatus.IDENTIFIED.label()),
    /** An analyte is assigned, but another explanation is nearly as likely. */
    AMBIGUOUS(MatchStatus.AMBIGUOUS.label()),
    /** No library analyte explains the peak. */
    UNASSIGNED(MatchStatus.UNASSIGNED.label()),
    /** A marker peak (markers are not matched against the library). */
    MARKER("marker"),
    /** The run could not be processed (the reason is in {@code note}). */
    FAILED("failed"),
    /** The run was processed but no peak was found. */
    NO_PEAKS("no_peaks");

    private final String word;

    PeakTableStatus(String word) {
        this.word = word;
    }

    /** The word as written in the table. */
    public String word() {
        return word;
    }

    /** True for the statuses of an analyte with an assignment (identified or ambiguous). */
    public boolean assigned() {
        return this == IDENTIFIED || this == AMBIGUOUS;
    }

    /** The status of an analyte peak with the matching's verdict (null: unassigned). */
    public static PeakTableStatus of(MatchStatus status) {
        if (status == null) {
            return UNASSIGNED;
        }
        return switch (status) {
            case IDENTIFIED -> IDENTIFIED;
            case AMBIGUOUS -> AMBIGUOUS;
            case UNASSIGNED -> UNASSIGNED;
        };
    }

    /** The status a word names, in any case and with surrounding spaces; empty when none. */
    public static Optional<PeakTableStatus> fromWord(String word) {
        if (word == null) {
            return Optional.empty();
        }
        String w = word.strip().toLowerCase(Locale.ROOT);
        for (PeakTableStatus s : values()) {
            if (s.word.equals(w)) {
                return Optional.of(s);
            }
        }
        return Optional.empty();
    }

    /** All words, comma-separated, for messages: "identified, ambiguous, …, no_peaks". */
    public static String words() {
        return Arrays.stream(values()).map(PeakTableStatus::word).collect(Collectors.joining(", "));
    }
}
