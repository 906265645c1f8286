package org.mobident.report.plot;

/**
 * The one escape function for text that goes into SVG or (X)HTML, as element content or as
 * a quoted attribute value.
 */
public final class Markup {

    /** Put in place of a character that XML 1.0 does not allow at all. */
    public static final char REPLACEMENT = '\uFFFD';

    private Markup() {
    }

    /**
     * {@code text} made safe for markup: {@code & < > " '} become character references, and
     * characters that XML 1.0 forbids (control characters other than tab, line feed and carriage
     * return, unpaired surrogates, U+FFFE and U+FFFF) become U+FFFD, so that no user text can
     * open a tag, end an attribute or make the document unreadable. {@code null} becomes "".
     * (W3C, Extensible Markup Language 1.0, fifth edition, 2008, §2.2 "Characters" and §2.4.)
     */
    public static String escape(String text) {
        if (text == null) {
            return "";
        }
        StringBuilder sb = null;
        int n = text.length();
        for (int i = 0; i < n; i++) {
            char c = text.charAt(i);
            String rep = replacement(text, i, c);
            if (rep == null) {
                if (sb != null) {
                    sb.append(c);
                }
                continue;
            }
            if (sb == null) {
                sb = new StringBuilder(n + 16);
                sb.append(text, 0, i);
            }
            if (rep.isEmpty()) {
                // a valid surrogate pair: copy both halves
                sb.append(c).append(text.charAt(i + 1));
                i++;
            } else {
                sb.append(rep);
            }
        }
        return sb == null ? text : sb.toString();
    }

    /** What to write for the character at {@code i}: null = itself, "" = a valid surrogate pair. */
    private static String replacement(String text, int i, char c) {
        switch (c) {
            case '&':
                return "&amp;";
            case '<':
                return "&lt;";
            case '>':
                return "&gt;";
            case '"':
                return "&quot;";
            case '\'':
                return "&#39;";
            case '\t':
            case '\n':
            case '\r':
                return null;
            default:
                break;
        }
        if (c < 0x20 || c == '\uFFFE' || c == '\uFFFF') {
            return String.valueOf(REPLACEMENT);
        }
        if (Character.isHighSurrogate(c)) {
            boolean paired = i + 1 < text.length() && Character.isLowSurrogate(text.charAt(i + 1));
            return paired ? "" : String.valueOf(REPLACEMENT);
        }
        if (Character.isLowSurrogate(c)) {
            return String.valueOf(REPLACEMENT); // a low half without its high half
        }
        return null;
    }
}
