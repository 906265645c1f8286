package org.mobident.testing;

import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.Collections;
import java.util.List;
import java.util.Random;

/**
 * One damaging edit of a file's bytes, for robustness tests.
 *
 * @param kind   what to do
 * @param where  position as a fraction of the current length, in [0, 1)
 * @param value  a byte value or seed, 0..255
 * @param length how many bytes or items, 1..20
 */
public record Mutation(Kind kind, double where, int value, int length) {

    public enum Kind {
        FLIP_BYTE, TRUNCATE, SHUFFLE_LINES, INJECT_JUNK, DELETE_DELIMITERS, DUPLICATE_LINE, DELETE_LINE, INSERT_BYTE
    }

    /** Text that often trips readers up. */
    private static final String[] JUNK = {
        "\u0000", "\"", "\"\"", ",", ";", "\t", "\r", "\n", "#", "NaN", "-Infinity", "1e999", "1e-999", "0x1p3",
        "\u00ef\u00bb\u00bf", "\u00ff\u00fe", ",,,,", ";;", "\n\n\n", "e", "-", ".", "1,5", "99999999999999999999999",
        "time", "file", "\u00b5", "\u20ac", "\ufffd", "1d", "   ", "\r\n",
    };

    /** Applies the edit to {@code in} (not modified). */
    public byte[] apply(byte[] in) {
        int n = in.length;
        int at = (int) (where * n);
        switch (kind) {
            case FLIP_BYTE: {
                if (n == 0) {
                    return in;
                }
                byte[] out = in.clone();
                out[at] = (byte) (out[at] ^ (1 << (value & 7)) ^ (value >> 3));
                return out;
            }
            case TRUNCATE:
                return Arrays.copyOf(in, at);
            case INSERT_BYTE:
                return splice(in, at, 0, new byte[] {(byte) value});
            case INJECT_JUNK:
                return splice(in, at, 0, JUNK[value % JUNK.length].getBytes(StandardCharsets.UTF_8));
            case DELETE_DELIMITERS: {
                byte[] out = new byte[n];
                int k = 0;
                int seen = 0;
                for (int i = 0; i < n; i++) {
                    boolean delimiter = in[i] == ',' || in[i] == ';' || in[i] == '\t';
                    if (delimiter && i >= at && seen < length) {
                        seen++;
                        continue;
                    }
                    out[k++] = in[i];
                }
                return Arrays.copyOf(out, k);
            }
            default:
                return editLines(in);
        }
    }

    private byte[] editLines(byte[] in) {
        List<String> lines = new ArrayList<>(List.of(new String(in, StandardCharsets.ISO_8859_1).split("\n", -1)));
        int i = Math.min((int) (where * lines.size()), lines.size() - 1);
        switch (kind) {
            case SHUFFLE_LINES:
                Collections.shuffle(lines, new Random(value));
                break;
            case DUPLICATE_LINE:
                lines.add(i, lines.get(i));
                break;
            default:
                lines.remove(i);
                break;
        }
        return String.join("\n", lines).getBytes(StandardCharsets.ISO_8859_1);
    }

    private static byte[] splice(byte[] in, int at, int remove, byte[] insert) {
        byte[] out = new byte[in.length - remove + insert.length];
        System.arraycopy(in, 0, out, 0, at);
        System.arraycopy(insert, 0, out, at, insert.length);
        System.arraycopy(in, at + remove, out, at + insert.length, in.length - at - remove);
        return out;
    }

    /** Applies the edits in order. */
    public static byte[] applyAll(byte[] in, List<Mutation> edits) {
        byte[] out = in;
        for (Mutation m : edits) {
            out = m.apply(out);
        }
        return out;
    }

    /** Between 1 and {@code maxEdits} random edits drawn from {@code random}. */
    public static List<Mutation> randomEdits(Random random, int maxEdits) {
        List<Mutation> edits = new ArrayList<>();
        int n = 1 + random.nextInt(maxEdits);
        for (int i = 0; i < n; i++) {
            edits.add(random(random));
        }
        return edits;
    }

    /** A random edit drawn from {@code random}. */
    public static Mutation random(Random random) {
        Kind[] kinds = Kind.values();
        return new Mutation(kinds[random.nextInt(kinds.length)], random.nextDouble(), random.nextInt(256),
                1 + random.nextInt(20));
    }
}
