package org.mobident.report;

/**
 * The small part of JSON (RFC 8259) the reports need: string quoting and number/null literals.
 */
final class Json {

    private static final char[] HEX = "0123456789abcdef".toCharArray();

    private Json() {
    }

    /**
     * {@code text} as a JSON string literal, or {@code null} for null. Escapes the quotation mark,
     * the reverse solidus and every control character U+0000–U+001F as RFC 8259 §7 requires
     * (with the two-character forms where they exist); also escapes U+2028/U+2029 (so the output
     * is safe inside JavaScript) and any unpaired surrogate (which UTF-8 cannot encode).
     */
    static String quote(String text) {
        if (text == null) {
            return "null";
        }
        StringBuilder sb = new StringBuilder(text.length() + 2);
        sb.append('"');
        for (int i = 0; i < text.length(); i++) {
            char c = text.charAt(i);
            switch (c) {
                case '"':
                    sb.append("\\\"");
                    break;
                case '\\':
                    sb.append("\\\\");
                    break;
                case '\n':
                    sb.append("\\n");
                    break;
                case '\r':
                    sb.append("\\r");
                    break;
                case '\t':
                    sb.append("\\t");
                    break;
                case '\b':
                    sb.append("\\b");
                    break;
                case '\f':
                    sb.append("\\f");
                    break;
                default:
                    if (c < 0x20 || c == '\u2028' || c == '\u2029') {
                        unicodeEscape(sb, c);
                    } else if (Character.isHighSurrogate(c)) {
                        if (i + 1 < text.length() && Character.isLowSurrogate(text.charAt(i + 1))) {
                            sb.append(c).append(text.charAt(i + 1));
                            i++;
                        } else {
                            unicodeEscape(sb, c);
                        }
                    } else if (Character.isLowSurrogate(c)) {
                        unicodeEscape(sb, c);
                    } else {
                        sb.append(c);
                    }
                    break;
            }
        }
        return sb.append('"').toString();
    }

    /** An already formatted number, or the literal {@code null}. */
    static String number(String formatted) {
        return formatted == null ? "null" : formatted;
    }

    private static void unicodeEscape(StringBuilder sb, char c) {
        sb.append("\\u")
                .append(HEX[(c >> 12) & 0xF])
                .append(HEX[(c >> 8) & 0xF])
                .append(HEX[(c >> 4) & 0xF])
                .append(HEX[c & 0xF]);
    }
}
