package org.mobident.trace.io;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.List;
import java.util.Random;

import org.junit.jupiter.api.Test;
import org.mobident.InputException;
import org.mobident.trace.Trace;

/**
 * The reader's one-pass row path (split and parse together) against {@link Double#parseDouble}, bit
 * for bit, on a large random corpus: plain decimals of every length (the one-pass path) mixed with
 * numbers it must leave to the general path (exponents, a '+' sign, more than 18 digits,
 * significands above 2^53, blanks around a field, quoted fields).
 */
class PlainRowParsingTest {

    /** Rows per corpus file: several hundred thousand numbers over the tests. */
    private static final int ROWS = 100_000;

    /** A random number as text, in one of the shapes a trace file may hold. */
    private static String number(Random random) {
        StringBuilder sb = new StringBuilder();
        int sign = random.nextInt(6);
        if (sign == 0) {
            sb.append('-');
        } else if (sign == 1 && random.nextInt(4) == 0) {
            sb.append('+');
        }
        int digits = 1 + random.nextInt(random.nextInt(5) == 0 ? 24 : 17);
        int point = random.nextInt(digits + 2) - 1; // -1: no point; digits: a trailing point
        for (int d = 0; d < digits; d++) {
            if (d == point) {
                sb.append('.');
            }
            sb.append((char) ('0' + (random.nextInt(8) == 0 ? 0 : random.nextInt(10))));
        }
        if (point == digits) {
            sb.append('.');
        }
        if (random.nextInt(10) == 0) {
            sb.append(random.nextBoolean() ? 'e' : 'E').append(random.nextInt(61) - 30);
        }
        return sb.toString();
    }

    private static void checkCorpus(long seed, char delimiter, boolean decimalComma) throws InputException {
        Random random = new Random(seed);
        List<String> signals = new ArrayList<>(ROWS);
        List<String> times = new ArrayList<>(ROWS);
        StringBuilder file = new StringBuilder("time_s").append(delimiter).append("signal\n");
        for (int r = 0; r < ROWS; r++) {
            // strictly increasing times with a random number of decimals
            String t = (r + 1) + "." + String.format("%0" + (1 + random.nextInt(6)) + "d", 0).substring(1)
                    + random.nextInt(10);
            String y = number(random);
            times.add(t);
            signals.add(y);
            String tText = decimalComma ? t.replace('.', ',') : t;
            String yText = decimalComma && random.nextBoolean() ? y.replace('.', ',') : y;
            int shape = random.nextInt(40);
            if (shape == 0) {
                yText = " " + yText;
            } else if (shape == 1) {
                yText = "\"" + yText + "\"";
            }
            file.append(tText).append(delimiter).append(yText).append(random.nextInt(30) == 0 ? "\r\n" : "\n");
        }
        byte[] bytes = file.toString().getBytes(StandardCharsets.UTF_8);
        Trace trace = DelimitedTraceReader.parse(bytes, "corpus", "corpus.csv", TraceReadOptions.DEFAULT);
        double[] t = trace.timesS();
        double[] y = trace.signals();
        assertEquals(ROWS, trace.size());
        for (int r = 0; r < ROWS; r++) {
            long expectedT = Double.doubleToRawLongBits(Double.parseDouble(times.get(r)));
            long expectedY = Double.doubleToRawLongBits(Double.parseDouble(signals.get(r)));
            int row = r;
            assertEquals(expectedT, Double.doubleToRawLongBits(t[r]), () -> "time of row " + row + ": " + times.get(row));
            assertEquals(expectedY, Double.doubleToRawLongBits(y[r]), () -> "signal of row " + row + ": "
                    + signals.get(row) + " read as " + y[row]);
        }
    }

    @Test
    void commaSeparatedCorpusMatchesTheJdkBitForBit() throws InputException {
        checkCorpus(11L, ',', false);
    }

    @Test
    void semicolonCorpusWithDecimalCommasMatchesTheJdkBitForBit() throws InputException {
        checkCorpus(12L, ';', true);
    }

    @Test
    void tabCorpusMatchesTheJdkBitForBit() throws InputException {
        checkCorpus(13L, '\t', false);
    }

    @Test
    void negativeZeroAndEdgesOfTheOnePassPath() throws InputException {
        String[] values = {"-0", "-0.000", "0.", ".5", "-.5", "9007199254740992", "9007199254740993",
            "900719925474099.3", "123456789012345678", "0.123456789012345678", "1234567890123456789",
            "0.1", "0.7", "1.1", "2.675", "100000000000000000"};
        StringBuilder file = new StringBuilder("time_s,signal\n");
        for (int i = 0; i < values.length; i++) {
            file.append(i + 1).append(',').append(values[i]).append('\n');
        }
        Trace trace = DelimitedTraceReader.parse(file.toString().getBytes(StandardCharsets.UTF_8), "edges",
                "edges.csv", TraceReadOptions.DEFAULT);
        for (int i = 0; i < values.length; i++) {
            assertEquals(Double.doubleToRawLongBits(Double.parseDouble(values[i])),
                    Double.doubleToRawLongBits(trace.signals()[i]), values[i]);
        }
    }
}
