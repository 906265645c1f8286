package org.mobident.report;

/**
 * Cell-level safety for CSV output that people open in spreadsheets.
 *
 * <p>A spreadsheet treats a cell that begins with {@code =}, {@code +}, {@code -} or {@code @}
 * (and, in some programs, a tab or carriage return before one of them) as a formula. A run name
 * or analyte name taken from a user's file could therefore execute as a formula when a peak
 * table is opened. Following the OWASP "CSV Injection" guidance, such text cells get a leading
 * apostrophe, which spreadsheets show as text and do not evaluate.
 *
 * <p>Apply {@link #inert} to <em>text</em> cells only. Numbers written by Mobident itself (such
 * as a mobility of {@code -12.5}) must stay numbers and are never passed through it. Quoting of
 * delimiters, quotes and line breaks is the CSV printer's job, not this class's.
 */
public final class CsvCells {

    /** The prefix that makes a spreadsheet read a cell as plain text. */
    public static final char TEXT_PREFIX = '\'';

    private CsvCells() {
    }

    /**
     * The text made safe to open in a spreadsheet: unchanged unless it starts with
     * {@code = + - @}, a tab or a carriage return, in which case an apostrophe is put in front.
     * {@code null} becomes the empty string.
     */
    public static String inert(String text) {
        if (text == null || text.isEmpty()) {
            return "";
        }
        return startsDangerously(text) ? TEXT_PREFIX + text : text;
    }

    /** True when a spreadsheet could read the text as the start of a formula. */
    public static boolean startsDangerously(String text) {
        if (text == null || text.isEmpty()) {
            return false;
        }
        switch (text.charAt(0)) {
            case '=':
            case '+':
            case '-':
            case '@':
            case '\t':
            case '\r':
                return true;
            default:
                return false;
        }
    }
}
