package org.mobident.report;

import java.math.BigDecimal;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * A strict little JSON (RFC 8259) reader for tests: objects become maps, arrays lists, numbers
 * BigDecimal, strings String, and literals Boolean or null. Anything not allowed by the grammar
 * throws IllegalArgumentException with the position.
 */
final class JsonCheck {
    private final String s;
    private int i;

    private JsonCheck(String s) {
        this.s = s;
    }

    static Object parse(String text) {
        JsonCheck p = new JsonCheck(text);
        p.ws();
        Object v = p.value();
        p.ws();
        if (p.i != text.length()) {
            throw p.fail("trailing text");
        }
        return v;
    }

    private IllegalArgumentException fail(String what) {
        return new IllegalArgumentException(what + " at " + i);
    }

    private void ws() {
        while (i < s.length() && " \t\n\r".indexOf(s.charAt(i)) >= 0) {
            i++;
        }
    }

    private Object value() {
        if (i >= s.length()) {
            throw fail("unexpected end");
        }
        char c = s.charAt(i);
        if (c == '{') {
            return object();
        }
        if (c == '[') {
            return array();
        }
        if (c == '"') {
            return string();
        }
        if (s.startsWith("true", i)) {
            i += 4;
            return Boolean.TRUE;
        }
        if (s.startsWith("false", i)) {
            i += 5;
            return Boolean.FALSE;
        }
        if (s.startsWith("null", i)) {
            i += 4;
            return null;
        }
        return number();
    }

    private Map<String, Object> object() {
        Map<String, Object> m = new LinkedHashMap<>();
        i++;
        ws();
        if (s.charAt(i) == '}') {
            i++;
            return m;
        }
        while (true) {
            ws();
            if (s.charAt(i) != '"') {
                throw fail("expected a name");
            }
            String k = string();
            ws();
            if (s.charAt(i++) != ':') {
                throw fail("expected ':'");
            }
            ws();
            if (m.containsKey(k)) {
                throw fail("duplicate name " + k);
            }
            m.put(k, value());
            ws();
            char c = s.charAt(i++);
            if (c == '}') {
                return m;
            }
            if (c != ',') {
                throw fail("expected ',' or '}'");
            }
        }
    }

    private List<Object> array() {
        List<Object> l = new ArrayList<>();
        i++;
        ws();
        if (s.charAt(i) == ']') {
            i++;
            return l;
        }
        while (true) {
            ws();
            l.add(value());
            ws();
            char c = s.charAt(i++);
            if (c == ']') {
                return l;
            }
            if (c != ',') {
                throw fail("expected ',' or ']'");
            }
        }
    }

    private String string() {
        StringBuilder sb = new StringBuilder();
        i++;
        while (true) {
            char c = s.charAt(i++);
            if (c == '"') {
                return sb.toString();
            }
            if (c < 0x20) {
                throw fail("raw control character");
            }
            if (c != '\\') {
                sb.append(c);
                continue;
            }
            char e = s.charAt(i++);
            switch (e) {
                case '"': sb.append('"'); break;
                case '\\': sb.append('\\'); break;
                case '/': sb.append('/'); break;
                case 'b': sb.append('\b'); break;
                case 'f': sb.append('\f'); break;
                case 'n': sb.append('\n'); break;
                case 'r': sb.append('\r'); break;
                case 't': sb.append('\t'); break;
                case 'u':
                    sb.append((char) Integer.parseInt(s.substring(i, i + 4), 16));
                    i += 4;
                    break;
                default:
                    throw fail("bad escape");
            }
        }
    }

    private BigDecimal number() {
        int start = i;
        if (s.charAt(i) == '-') {
            i++;
        }
        if (i < s.length() && s.charAt(i) == '0') {
            i++;
        } else {
            digits();
        }
        if (i < s.length() && s.charAt(i) == '.') {
            i++;
            digits();
        }
        if (i < s.length() && (s.charAt(i) == 'e' || s.charAt(i) == 'E')) {
            i++;
            if (s.charAt(i) == '+' || s.charAt(i) == '-') {
                i++;
            }
            digits();
        }
        return new BigDecimal(s.substring(start, i));
    }

    private void digits() {
        int start = i;
        while (i < s.length() && Character.isDigit(s.charAt(i))) {
            i++;
        }
        if (i == start) {
            throw fail("expected a digit");
        }
    }
}
