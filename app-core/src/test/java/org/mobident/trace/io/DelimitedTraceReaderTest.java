package org.mobident.trace.io;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Random;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.mobident.InputException;
import org.mobident.trace.TimeScale;
import org.mobident.trace.Trace;

class DelimitedTraceReaderTest {

    private static final double EXACT = 0.0;

    @TempDir
    Path dir;

    private Path write(String name, String content) throws IOException {
        return writeBytes(name, content.getBytes(StandardCharsets.UTF_8));
    }

    private Path writeBytes(String name, byte[] content) throws IOException {
        Path p = dir.resolve(name);
        Files.write(p, content);
        return p;
    }

    private static Trace read(Path p) throws InputException {
        return DelimitedTraceReader.read(p, TraceReadOptions.DEFAULT);
    }

    private InputException fails(String content) throws IOException {
        Path p = write("bad.csv", content);
        InputException e = assertThrows(InputException.class, () -> read(p));
        assertEquals(p.toString(), e.file());
        return e;
    }

    private static void assertWhere(InputException e, long line, String field) {
        assertEquals(line, e.line(), e::getMessage);
        assertEquals(field, e.field(), e::getMessage);
    }

    // ---------------------------------------------------------------- good files

    @Test
    void commaSecondsWithCrlf() throws Exception {
        Path p = write("run01.csv", "time_s,signal\r\n0.0,1.5\r\n0.5,-2.25e-1\r\n1.0,3\r\n");
        Trace t = read(p);
        assertEquals("run01", t.name());
        assertEquals(p.toString(), t.sourceFile());
        assertArrayEquals(new double[] {0.0, 0.5, 1.0}, t.timesS(), EXACT);
        assertArrayEquals(new double[] {1.5, -0.225, 3.0}, t.signals(), EXACT);
    }

    @Test
    void semicolonDecimalCommaMinutesFromHeader() throws Exception {
        Path p = write("a.txt", "Time (min);Absorbance (mAU)\n0,5;1,25\n1,0;-0,5\n1,5;2\n");
        Trace t = read(p);
        assertArrayEquals(new double[] {30.0, 60.0, 90.0}, t.timesS(), EXACT);
        assertArrayEquals(new double[] {1.25, -0.5, 2.0}, t.signals(), EXACT);
    }

    @Test
    void millisecondsFromHeader() throws Exception {
        // 1 ms = 0.001 s (SI)
        Path p = write("ms.csv", "Time (ms),Signal\n500,1\n750,2\n1000,3\n");
        assertArrayEquals(new double[] {0.5, 0.75, 1.0}, read(p).timesS(), 1e-12);
    }

    @Test
    void tabDecimalCommaBracketUnit() throws Exception {
        Path p = write("b.tsv", "time [min]\tUV\n0,1\t5\n0,2\t6\n");
        assertArrayEquals(new double[] {6.0, 12.0}, read(p).timesS(), 1e-12);
    }

    @Test
    void unitWordsInHeader() throws Exception {
        String[][] headers = {
            {"time_min", "60"}, {"t/min", "60"}, {"minutes", "60"}, {"Time (s)", "1"}, {"sec", "1"},
            {"t", "1"}, {"Retention time [min]", "60"}, {"time_seconds", "1"}, {"Time", "1"},
            {"Time in min", "60"}, {"Zeit [min]", "60"}, {"TIME/S", "1"},
        };
        for (String[] h : headers) {
            Path p = write("u.csv", h[0] + ",signal\n100,0\n200,0\n");
            assertEquals(100 * Double.parseDouble(h[1]), read(p).timeS(0), EXACT, h[0]);
        }
    }

    @Test
    void unitlessShortTimeColumnIsRefusedAsProbablyMinutes() throws Exception {
        // common practice: no CZE run lasts under a minute, so 0…12.5 without a unit is read as minutes
        Path p = write("m.csv", "Time,Signal\n0,1\n6.25,2\n12.5,3\n");
        InputException e = assertThrows(InputException.class, () -> read(p));
        assertEquals(1, e.line());
        assertEquals("Time", e.field());
        assertTrue(e.problem().contains("minutes") && e.problem().contains("--time-unit"), e.problem());
        Trace t = DelimitedTraceReader.read(p, TraceReadOptions.DEFAULT.withTimeScale(TimeScale.MINUTES));
        assertEquals(750.0, t.endTimeS(), EXACT);
        Path longer = write("l.csv", "Time,Signal\n0,1\n300,2\n720,3\n");
        assertEquals(720.0, read(longer).endTimeS(), EXACT, "a long unitless column is read as seconds");
    }

    @Test
    void optionTimeScaleOverridesHeader() throws Exception {
        Path p = write("c.csv", "time (s),signal\n1,0\n2,0\n");
        Trace t = DelimitedTraceReader.read(p, TraceReadOptions.DEFAULT.withTimeScale(TimeScale.MINUTES));
        assertArrayEquals(new double[] {60.0, 120.0}, t.timesS(), EXACT);
        Path q = write("d.csv", "time (min),signal\n1,0\n2,0\n");
        Trace s = DelimitedTraceReader.read(q, TraceReadOptions.DEFAULT.withTimeScale(TimeScale.SECONDS));
        assertArrayEquals(new double[] {1.0, 2.0}, s.timesS(), EXACT);
    }

    @Test
    void bomCommentsBlankLinesAndIrregularSampling() throws Exception {
        byte[] body = ("# exported 2024-05-01\n\n  # indented comment\ntime_s,signal\n\n0.00,1\n# mid comment\n"
                + "0.10,2\n   \n0.35,3\n1.00,4\n\n# trailing\n").getBytes(StandardCharsets.UTF_8);
        byte[] withBom = new byte[body.length + 3];
        withBom[0] = (byte) 0xEF;
        withBom[1] = (byte) 0xBB;
        withBom[2] = (byte) 0xBF;
        System.arraycopy(body, 0, withBom, 3, body.length);
        Trace t = read(writeBytes("e.csv", withBom));
        assertArrayEquals(new double[] {0.0, 0.1, 0.35, 1.0}, t.timesS(), EXACT);
        assertArrayEquals(new double[] {1, 2, 3, 4}, t.signals(), EXACT);
    }

    @Test
    void carriageReturnOnlyLineEnds() throws Exception {
        Trace t = read(write("f.csv", "time_s,signal\r1,2\r3,4"));
        assertArrayEquals(new double[] {1, 3}, t.timesS(), EXACT);
    }

    @Test
    void columnOptionsAreCaseInsensitiveAndMayOmitTheUnit() throws Exception {
        Path p = write("g.csv", "X,Y1,Y2 (mAU)\n0,1,10\n1,2,20\n");
        Trace t = DelimitedTraceReader.read(p, TraceReadOptions.DEFAULT.withColumns("x", "y2")
                .withTimeScale(TimeScale.SECONDS));
        assertArrayEquals(new double[] {10, 20}, t.signals(), EXACT);
    }

    @Test
    void signalRecognisedByNameElseFirstOtherColumn() throws Exception {
        Path p = write("h.csv", "index,time_s,current_uA,Absorbance\n1,0,5,100\n2,1,5,200\n");
        assertArrayEquals(new double[] {100, 200}, read(p).signals(), EXACT);
        Path q = write("i.csv", "Time (s),UV214\n0,7\n1,8\n");
        assertArrayEquals(new double[] {7, 8}, read(q).signals(), EXACT);
    }

    @Test
    void latin1HeaderIsTolerated() throws Exception {
        byte[] b = "Zeit (min);Signal (\u00b5AU)\n0,5;1\n1,0;2\n".getBytes(StandardCharsets.ISO_8859_1);
        Trace t = read(writeBytes("latin.csv", b));
        assertArrayEquals(new double[] {30, 60}, t.timesS(), EXACT);
    }

    @Test
    void quotedFieldsAndTrailingDelimiters() throws Exception {
        Trace t = read(write("q.csv", "\"Time (s)\",\"Signal\",\n\"0.5\",\"1\",\n1.5 , 2 ,\n"));
        assertArrayEquals(new double[] {0.5, 1.5}, t.timesS(), EXACT);
        assertArrayEquals(new double[] {1, 2}, t.signals(), EXACT);
    }

    @Test
    void sixtyThousandPointsAreReadExactly() throws Exception {
        StringBuilder sb = new StringBuilder("time_s,signal_mAU\n");
        Random r = new Random(1);
        double[] y = new double[60_000];
        for (int i = 0; i < y.length; i++) {
            y[i] = Math.round(r.nextGaussian() * 1e6) / 1e4;
            sb.append(i * 0.05).append(',').append(y[i]).append('\n');
        }
        Trace t = read(write("big.csv", sb.toString()));
        assertEquals(60_000, t.size());
        assertArrayEquals(y, t.signals(), EXACT);
        assertEquals(59_999 * 0.05, t.endTimeS(), EXACT);
    }

    @Test
    void displayNameIsUsedForSourceAndMessages() throws Exception {
        Path p = write("named.csv", "time,signal\n0,1\n1,x\n");
        InputException e = assertThrows(InputException.class,
                () -> DelimitedTraceReader.read(p, "day1/named.csv", TraceReadOptions.DEFAULT));
        assertEquals("day1/named.csv", e.file());
        Path ok = write("ok.csv", "time_s,signal\n0,1\n1,2\n");
        assertEquals("shown", DelimitedTraceReader.read(ok, "shown", null).sourceFile());
    }

    // ---------------------------------------------------------------- bad files

    @Test
    void emptyFile() throws Exception {
        assertWhere(fails(""), 0, null);
        InputException e = fails("# only a comment\n\n");
        assertWhere(e, 0, null);
        assertTrue(e.problem().contains("no header"), e.getMessage());
    }

    @Test
    void headerOnly() throws Exception {
        InputException e = fails("time,signal\n\n");
        assertWhere(e, 0, null);
        assertTrue(e.problem().contains("no data"), e.getMessage());
    }

    @Test
    void singleDataPoint() throws Exception {
        InputException e = fails("time,signal\n# c\n0,1\n");
        assertWhere(e, 3, null);
        assertTrue(e.problem().contains("single data point"), e.getMessage());
    }

    @Test
    void namedColumnNotFoundListsColumns() throws Exception {
        Path p = write("n.csv", "time,UV\n0,1\n1,2\n");
        InputException e = assertThrows(InputException.class,
                () -> DelimitedTraceReader.read(p, TraceReadOptions.DEFAULT.withColumns(null, "absorbance")));
        assertWhere(e, 1, "absorbance");
        assertTrue(e.problem().contains("time, UV"), e.getMessage());
    }

    @Test
    void noTimeColumnListsColumns() throws Exception {
        InputException e = fails("# x\nwavelength,signal\n0,1\n1,2\n");
        assertWhere(e, 2, "time");
        assertTrue(e.problem().contains("wavelength, signal"), e.getMessage());
    }

    @Test
    void unsupportedTimeUnit() throws Exception {
        assertWhere(fails("time (h),signal\n0,1\n1,2\n"), 1, "time (h)");
    }

    @Test
    void fileWithoutHeaderIsReadByPosition() throws Exception {
        // no header line: time first, signal second, seconds assumed as for a header without a unit
        Trace t = read(write("nh.csv", "0,1.5\n120,2.5\n240,-3\n"));
        assertArrayEquals(new double[] {0, 120, 240}, t.timesS(), EXACT);
        assertArrayEquals(new double[] {1.5, 2.5, -3}, t.signals(), EXACT);
    }

    @Test
    void fileWithoutHeaderTakesSemicolonOverDecimalComma() throws Exception {
        // "0,5;1,25" has more commas than semicolons: beside a semicolon the comma is a decimal comma
        Trace t = read(write("nh2.csv", "# exported without a header\n0,5;1,25\n61,5;2,5\n"));
        assertArrayEquals(new double[] {0.5, 61.5}, t.timesS(), EXACT);
        assertArrayEquals(new double[] {1.25, 2.5}, t.signals(), EXACT);
        // rows keep their line numbers: the first data line is line 2 here
        InputException e = fails("# exported without a header\n0,5;1,25\n61,5;x\n");
        assertWhere(e, 3, "column 2");
    }

    @Test
    void fileWithoutHeaderAndThreeColumnsNeedsTheSignalColumn() throws Exception {
        Path p = write("nh3.txt", "0\t7\t10\n100\t7\t20\n");
        InputException e = assertThrows(InputException.class, () -> read(p));
        assertWhere(e, 1, "signal");
        assertTrue(e.problem().contains("3 columns"), e.getMessage());
        Trace t = DelimitedTraceReader.read(p, TraceReadOptions.DEFAULT.withColumns(null, "3"));
        assertArrayEquals(new double[] {10, 20}, t.signals(), EXACT);
        Trace swapped = DelimitedTraceReader.read(p, TraceReadOptions.DEFAULT.withColumns("3", "1")
                .withTimeScale(TimeScale.MINUTES));
        assertArrayEquals(new double[] {600, 1200}, swapped.timesS(), EXACT);
        assertArrayEquals(new double[] {0, 100}, swapped.signals(), EXACT);
    }

    @Test
    void fileWithoutHeaderAndShortTimesIsRefusedAsProbablyMinutes() throws Exception {
        InputException e = fails("0,1\n0.5,2\n12,3\n");
        assertWhere(e, 1, "column 1");
        assertTrue(e.problem().contains("minutes"), e.getMessage());
    }

    @Test
    void columnsByPositionInAFileWithAHeader() throws Exception {
        Path p = write("pos.csv", "X,Y1,Y2\n0,1,10\n100,2,20\n");
        Trace t = DelimitedTraceReader.read(p, TraceReadOptions.DEFAULT.withColumns("1", "3"));
        assertArrayEquals(new double[] {0, 100}, t.timesS(), EXACT);
        assertArrayEquals(new double[] {10, 20}, t.signals(), EXACT);
        InputException e = assertThrows(InputException.class,
                () -> DelimitedTraceReader.read(p, TraceReadOptions.DEFAULT.withColumns("1", "9")));
        assertWhere(e, 1, "9");
        assertTrue(e.problem().contains("3 in all"), e.getMessage());
    }

    @Test
    void columnsAlignedWithSpaces() throws Exception {
        Trace t = read(write("sp.txt", "time_s      signal\n   0     1.5  \n  120    2.5\n"));
        assertArrayEquals(new double[] {0, 120}, t.timesS(), EXACT);
        assertArrayEquals(new double[] {1.5, 2.5}, t.signals(), EXACT);
        // quoted names keep their spaces (and so their unit); with spaces between columns a comma is a decimal comma
        Trace q = read(write("sp2.txt", "\"Time (min)\"   \"Absorbance (mAU)\"\n1,5  0,25\n2  0,5\n"));
        assertArrayEquals(new double[] {90, 120}, q.timesS(), EXACT);
        assertArrayEquals(new double[] {0.25, 0.5}, q.signals(), EXACT);
    }

    @Test
    void columnsAlignedWithSpacesWithoutHeaderKeepLineNumbers() throws Exception {
        Trace t = read(write("sp3.txt", "# plain export\n    0   -1\n  100   -2\n"));
        assertArrayEquals(new double[] {0, 100}, t.timesS(), EXACT);
        assertArrayEquals(new double[] {-1, -2}, t.signals(), EXACT);
        InputException e = fails("# plain export\n    0   -1\n  100   -2\n  200   -3\n  300   x\n");
        assertWhere(e, 5, "column 2");
    }

    @Test
    void exportLinesBeforeTheHeaderAreSkipped() throws Exception {
        Trace t = read(write("pre.csv", "Sample Name;river-3\nOperator;A. Tester\n\nTime (min);Absorbance (mAU)\n"
                + "0,5;1\n1;2\n1,5;3\n2;4\n"));
        assertArrayEquals(new double[] {30, 60, 90, 120}, t.timesS(), EXACT);
        assertArrayEquals(new double[] {1, 2, 3, 4}, t.signals(), EXACT);
        // opening lines with spaces before a comma header whose names hold spaces
        Trace u = read(write("pre2.csv", "Sample: river 3\nTime (min),Absorbance (mAU)\n0.5,1\n1,2\n1.5,3\n"));
        assertArrayEquals(new double[] {30, 60, 90}, u.timesS(), EXACT);
        // a line holding a number is no header: the rows after it are read by position, lines kept
        Trace v = read(write("pre3.txt", "Sample: river 3\nPoints: 3\n0\t1\n100\t2\n200\t3\n"));
        assertArrayEquals(new double[] {0, 100, 200}, v.timesS(), EXACT);
        InputException e = fails("Sample: river 3\nPoints: 4\n0\t1\n100\t2\n200\t3\n300\tx\n");
        assertWhere(e, 6, "column 2");
    }

    @Test
    void exportLinesAfterTheDataEndIt() throws Exception {
        Trace t = read(write("foot.csv", "time_s,signal\n0,1\n1,2\n2,3\n3,4\n\nEnd of data\nPoints: 4\n"));
        assertArrayEquals(new double[] {0, 1, 2, 3}, t.timesS(), EXACT);
        // text with rows after it is a bad row, not the end of the data
        assertWhere(fails("time_s,signal\n0,1\n1,2\n2,3\nEnd of data\n4,5\n"), 5, "signal");
        // nor are a non-finite value, a damaged row, or text after fewer than three rows
        assertWhere(fails("time_s,signal\n0,1\n1,2\n2,3\nNaN,5\n"), 5, "time_s");
        assertWhere(fails("time_s,signal\n0,1\n1,2\n2,3\n3,4x\n"), 5, "signal");
        assertWhere(fails("time_s,signal\n0,1\n1,2\nEnd of data\n"), 4, "signal");
    }

    @Test
    void anOpeningLineThatLooksLikeNamesBeforeRowsWithoutHeader() throws Exception {
        // "Operator;A. Tester" has the rows' two fields and no number, but names no column: the rows
        // are read by position
        Trace t = read(write("op.csv", "Operator;A. Tester\n100,0;1,5\n100,5;2\n101;2,5\n"));
        assertArrayEquals(new double[] {100, 100.5, 101}, t.timesS(), EXACT);
        // a damaged first row after the opening lines is not skipped to reach clean rows further down
        // (the first line's problem is reported, as for any file whose data cannot be found)
        InputException e = fails("Sample: river 3\ntime_s;signal\n10x0;1\n100,5;2\n101;2,5\n101,5;3\n");
        assertWhere(e, 1, null);
        // nor is a header: rows under "time_s;signal" after a damaged row are not read by position
        InputException f = fails("Sample: river 3\ntime_s;signal\n100;1\n100,5x;2\n101;2,5\n101,5;3\n102;4\n");
        assertWhere(f, 1, null);
    }

    @Test
    void withoutADataBlockTheFirstProblemStands() throws Exception {
        // the header is the line before the block already: its problem is the one reported
        InputException e = fails("wavelength,signal\n0,1\n1,2\n2,3\n");
        assertWhere(e, 1, "time");
        // a usable header with a bad first row: that row is the problem, the rows after it are not read
        // without the header (its unit would be lost)
        InputException g = fails("Time (min),signal\n0,abc\n100,2\n200,3\n300,4\n");
        assertWhere(g, 2, "signal");
        // fewer than three rows of numbers after the opening lines: no block
        InputException f = fails("Sample;x\ntime_s;signal\n0;1\n1;2\n");
        assertWhere(f, 1, "time");
    }

    @Test
    void firstLineOfOneNumberIsNotAHeader() throws Exception {
        InputException e = fails("5\n6\n");
        assertWhere(e, 1, null);
        assertTrue(e.problem().contains("not column names"), e.getMessage());
    }

    @Test
    void singleColumnHeader() throws Exception {
        assertWhere(fails("time\n0\n1\n"), 1, null);
    }

    @Test
    void textInANumberField() throws Exception {
        InputException e = fails("time,signal\n0,1\n0.1,abc\n0.2,3\n");
        assertWhere(e, 3, "signal");
        assertTrue(e.problem().contains("'abc' is not a number"), e.getMessage());
        assertWhere(fails("Time (s),Signal\n0,1\n1 s,2\n"), 3, "Time (s)");
    }

    @Test
    void emptyValue() throws Exception {
        assertWhere(fails("time,signal\n0,1\n1,\n"), 3, "signal");
    }

    @Test
    void nanInfinityAndOverflow() throws Exception {
        assertWhere(fails("time,signal\n0,1\n1,NaN\n"), 3, "signal");
        assertWhere(fails("time,signal\n0,1\n1,-Infinity\n"), 3, "signal");
        InputException e = fails("time,signal\n0,1\n1,2\n2,1e999\n");
        assertWhere(e, 4, "signal");
        assertTrue(e.problem().contains("infinity"), e.getMessage());
        assertWhere(fails("time,signal\n0,1\n1e400,2\n"), 3, "time");
        Path p = write("m.csv", "time,signal\n1,1\n1e307,2\n");
        assertWhere(assertThrows(InputException.class,
                () -> DelimitedTraceReader.read(p, new TraceReadOptions(TimeScale.MINUTES, null, null))), 3, "time");
    }

    @Test
    void duplicatedTimeNamesThePreviousOne() throws Exception {
        InputException e = fails("time,signal\n0,1\n0.5,1\n\n0.5,2\n");
        assertWhere(e, 5, "time");
        assertTrue(e.problem().contains("repeats the previous time 0.5 (line 3)"), e.getMessage());
        assertTrue(e.problem().contains("too few decimals"), e.getMessage());
        // a time before the previous one is no rounding matter
        InputException before = fails("time,signal\n0,1\n0.5,1\n0.4,2\n");
        assertTrue(!before.problem().contains("decimals"), before.getMessage());
    }

    @Test
    void descendingTimeNamesThePreviousOne() throws Exception {
        InputException e = fails("time,signal\n0,1\n2,1\n1,2\n");
        assertWhere(e, 4, "time");
        assertTrue(e.problem().contains("before the previous time 2 (line 3)"), e.getMessage());
    }

    @Test
    void tooFewFields() throws Exception {
        InputException e = fails("time,temp,signal\n0,20,1\n1,20\n2,20,3\n");
        assertWhere(e, 3, "signal");
        assertTrue(e.problem().contains("2 fields but the header has 3"), e.getMessage());
    }

    @Test
    void tooManyFields() throws Exception {
        InputException e = fails("time\tsignal\n0\t1\n1\t2\t3\n");
        assertWhere(e, 3, null);
        assertTrue(e.problem().contains("3 fields but the header has 2"), e.getMessage());
    }

    @Test
    void mixedDelimiters() throws Exception {
        InputException e = fails("time;signal\n0;1\n1,5\n");
        assertWhere(e, 3, "signal");
        assertTrue(e.problem().contains("mixed delimiters"), e.getMessage());
        InputException f = fails("time,signal\n0,1\n1;5\n2,3\n");
        assertTrue(f.problem().contains("semicolon as delimiter"), f.getMessage());
    }

    @Test
    void decimalCommaInCommaFile() throws Exception {
        InputException e = fails("time,signal\n0,5,1,25\n1,0,2,0\n");
        assertWhere(e, 2, null);
        assertTrue(e.problem().contains("decimal comma"), e.getMessage());
    }

    @Test
    void truncatedLastLine() throws Exception {
        InputException e = fails("time,temp,signal\n0,20,1\n1,20,2\n2,2");
        assertWhere(e, 4, "signal");
        assertTrue(e.problem().contains("truncated"), e.getMessage());
    }

    @Test
    void utf16IsReadAndBinaryRefused() throws Exception {
        // "Unicode" text as Windows programs write it: with a byte order mark, or without one
        String text = "time_s,signal (\u00b5AU)\n0,1.5\n1,-2\n2.5,3\n";
        for (java.nio.charset.Charset cs : List.of(StandardCharsets.UTF_16, StandardCharsets.UTF_16LE,
                StandardCharsets.UTF_16BE)) {
            Trace t = read(writeBytes("u16-" + cs.name() + ".csv", text.getBytes(cs)));
            assertArrayEquals(new double[] {0, 1, 2.5}, t.timesS(), EXACT, cs::name);
            assertArrayEquals(new double[] {1.5, -2, 3}, t.signals(), EXACT, cs::name);
        }
        // and its rows keep their line numbers
        Path bad = writeBytes("u16bad.csv", "time_s,signal\n0,1\n1,x\n".getBytes(StandardCharsets.UTF_16LE));
        assertWhere(assertThrows(InputException.class, () -> read(bad)), 3, "signal");
        byte[] junk = new byte[4000];
        new Random(3).nextBytes(junk);
        Path bin = writeBytes("x.csv", junk);
        InputException b = assertThrows(InputException.class, () -> read(bin));
        assertWhere(b, 0, null);
        assertTrue(b.problem().contains("not a text file"), b.getMessage());
    }

    @Test
    void missingFileAndFolder() throws Exception {
        InputException e = assertThrows(InputException.class, () -> read(dir.resolve("absent.csv")));
        assertTrue(e.problem().contains("not found"), e.getMessage());
        assertNull(e.field());
        assertThrows(InputException.class, () -> read(dir));
    }
}
