package org.mobident.trace.io;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assertions.fail;

import java.nio.charset.StandardCharsets;
import java.util.Arrays;
import java.util.Random;
import org.junit.jupiter.api.Test;
import org.mobident.InputException;
import org.mobident.trace.Trace;

/**
 * Random exports in every variant the reader accepts (opening lines, a header or none, comma,
 * semicolon with decimal commas, tab or aligned spaces, closing lines, UTF-8 or UTF-16): a clean
 * file is read to exactly its numbers, and a file with one character damaged anywhere is either
 * refused or read to exactly the same numbers (the damage fell outside the data), never to other
 * numbers. This is the rule "nothing lost, nothing invented" the fallbacks must keep.
 */
class ExportVariantsPropertyTest {

    private static final String[] OPENING = {"Sample: river 3", "Operator;A. Tester", "Date,2026-01-02",
        "Instrument CE-7", "Points: 12"};
    private static final String[] CLOSING = {"End of data", "Points: 12", "Total area: 12.5"};

    @Test
    void cleanExportsAreReadExactlyAndDamagedOnesNeverMisread() {
        Random random = new Random(20261205L);
        int clean = 0;
        int damagedRefused = 0;
        for (int k = 0; k < 4000; k++) {
            int style = random.nextInt(4); // comma, semicolon, tab, spaces
            String sep = style == 0 ? "," : style == 1 ? ";" : style == 2 ? "\t" : "   ";
            boolean decimalComma = style == 1 || (style >= 2 && random.nextBoolean());
            StringBuilder text = new StringBuilder();
            int opening = random.nextInt(3);
            for (int i = 0; i < opening; i++) {
                text.append(OPENING[random.nextInt(OPENING.length)]).append('\n');
            }
            if (random.nextInt(3) != 0) {
                text.append("time_s").append(sep).append("signal").append('\n');
            }
            int rows = 3 + random.nextInt(10);
            double[] t = new double[rows];
            double[] y = new double[rows];
            for (int i = 0; i < rows; i++) {
                t[i] = 100 + 0.5 * i;
                y[i] = Math.round((random.nextDouble() - 0.5) * 1000) / 100.0;
                String ts = Double.toString(t[i]);
                String ys = Double.toString(y[i]);
                if (decimalComma) {
                    ts = ts.replace('.', ',');
                    ys = ys.replace('.', ',');
                }
                text.append(style == 3 && random.nextBoolean() ? "  " : "").append(ts).append(sep).append(ys).append('\n');
            }
            int closing = random.nextInt(3);
            for (int i = 0; i < closing; i++) {
                text.append(CLOSING[random.nextInt(CLOSING.length)]).append('\n');
            }
            String content = text.toString();
            boolean damaged = random.nextInt(3) == 0;
            if (damaged) {
                int at = random.nextInt(content.length());
                content = content.substring(0, at) + "x" + content.substring(at);
            }
            byte[] bytes = random.nextInt(8) == 0 ? content.getBytes(StandardCharsets.UTF_16)
                    : content.getBytes(StandardCharsets.UTF_8);
            Trace read;
            try {
                read = DelimitedTraceReader.parse(bytes, "x", "x.csv", null);
            } catch (InputException e) {
                if (!damaged) {
                    fail("a clean export was refused: " + e.getMessage() + "\n" + content);
                }
                damagedRefused++;
                continue;
            }
            String context = "\n" + content + "-> " + Arrays.toString(read.timesS()) + Arrays.toString(read.signals());
            assertArrayEquals(t, read.timesS(), 0.0, context);
            assertArrayEquals(y, read.signals(), 0.0, context);
            clean += damaged ? 0 : 1;
        }
        assertTrue(clean > 2000, "most files are clean: " + clean);
        assertTrue(damagedRefused > 500, "damage inside the data is refused: " + damagedRefused);
    }
}
