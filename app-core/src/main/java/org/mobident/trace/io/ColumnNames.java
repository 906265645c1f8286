package org.mobident.trace.io;

import java.util.List;
import java.util.Locale;
import java.util.Set;

import org.mobident.trace.TimeScale;

/**
 * Reads meaning out of trace column names: {@code "Time (min)"} is a time column in minutes,
 * {@code "Absorbance [mAU]"} a signal column. Matching is case-insensitive.
 */
final class ColumnNames {

    private static final Set<String> SECOND_WORDS = Set.of("s", "sec", "secs", "second", "seconds");
    private static final Set<String> MINUTE_WORDS = Set.of("min", "mins", "minute", "minutes");
    private static final Set<String> MILLISECOND_WORDS = Set.of("ms", "msec", "millisecond", "milliseconds");
    private static final Set<String> TIME_BASES = Set.of("time", "times", "t", "zeit", "elapsed",
            "elapsed time", "time elapsed", "migration time", "retention time", "rt", "acquisition time");
    private static final List<String> SIGNAL_WORDS = List.of("signal", "absorbance", "abs", "mau", "au",
            "intensity", "detector", "response", "value");

    /**
     * A column name taken apart.
     *
     * @param original the name as written (trimmed, quotes removed)
     * @param base     lower-case name without its unit, separators {@code _ -} turned into spaces
     * @param unit     lower-case unit text, or {@code ""} when the name gives none
     */
    record Name(String original, String base, String unit) {
    }

    private ColumnNames() {
    }

    /**
     * Splits {@code "Time (min)"}, {@code "time [s]"}, {@code "time_s"}, {@code "t/min"}, {@code "time in min"},
     * {@code "minutes"} into name and unit.
     */
    static Name parse(String name) {
        String n = name.trim().toLowerCase(Locale.ROOT);
        String base = n;
        String unit = "";
        int close = n.length() - 1;
        if (close > 0 && (n.charAt(close) == ')' || n.charAt(close) == ']')) {
            char open = n.charAt(close) == ')' ? '(' : '[';
            int o = n.lastIndexOf(open);
            if (o >= 0) {
                base = n.substring(0, o).trim();
                unit = n.substring(o + 1, close).trim();
            }
        } else {
            int sep = Math.max(Math.max(n.lastIndexOf('_'), n.lastIndexOf(' ')),
                    Math.max(n.lastIndexOf('/'), n.lastIndexOf('-')));
            if (sep > 0 && isTimeUnitWord(n.substring(sep + 1))) {
                base = n.substring(0, sep).trim();
                unit = n.substring(sep + 1);
            } else if (isTimeUnitWord(n)) {
                base = "time";
                unit = n;
            }
        }
        base = base.replace('_', ' ').replace('-', ' ').trim();
        if (!unit.isEmpty() && base.endsWith(" in")) {
            base = base.substring(0, base.length() - " in".length()).trim();
        }
        return new Name(name.trim(), base, unit);
    }

    /** True for s, sec, seconds, min, minutes, ms and the like. */
    static boolean isTimeUnitWord(String w) {
        return SECOND_WORDS.contains(w) || MINUTE_WORDS.contains(w) || MILLISECOND_WORDS.contains(w);
    }

    /** The time scale a unit names, or {@code null} when it names none we know. */
    static TimeScale scaleOf(String unit) {
        if (SECOND_WORDS.contains(unit)) {
            return TimeScale.SECONDS;
        }
        if (MINUTE_WORDS.contains(unit)) {
            return TimeScale.MINUTES;
        }
        if (MILLISECOND_WORDS.contains(unit)) {
            return TimeScale.MILLISECONDS;
        }
        return null;
    }

    /** True when the name reads as a time axis. */
    static boolean isTime(Name n) {
        return TIME_BASES.contains(n.base());
    }

    /** True when a word of the name (unit included) is one of the usual signal names. */
    static boolean isSignal(Name n) {
        String all = n.base() + " " + n.unit();
        for (String token : all.split("[^\\p{L}\\p{N}]+")) {
            for (String w : SIGNAL_WORDS) {
                if (token.equals(w) || token.equals(w + "s")) {
                    return true;
                }
            }
        }
        return false;
    }

    /** True when {@code wanted} names the column: whole name, or name without its unit. */
    static boolean matches(String wanted, Name n) {
        String w = wanted.trim().toLowerCase(Locale.ROOT);
        return w.equals(n.original().toLowerCase(Locale.ROOT)) || w.equals(n.base());
    }
}
