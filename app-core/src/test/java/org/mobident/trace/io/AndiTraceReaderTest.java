package org.mobident.trace.io;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.mobident.InputException;
import org.mobident.trace.TimeScale;
import org.mobident.trace.Trace;

/**
 * Round trips through the chromatography interchange layout of ASTM E1947 / E1948 (raw data: dimension
 * {@code point_number}, float {@code ordinate_values(point_number)}, optional {@code raw_data_retention},
 * scalar float variables {@code actual_sampling_interval}, {@code actual_delay_time},
 * {@code actual_run_time_length}, global text attributes {@code retention_unit}, {@code detector_unit},
 * {@code dataset_completeness}, {@code aia_template_revision}, {@code uniform_sampling_flag}; names as
 * used by published readers of the format, the template itself from memory), written with
 * {@link NetcdfTestWriter} in netCDF classic form (Unidata classic format specification), and damaged files.
 */
class AndiTraceReaderTest {

    private static final String FILE = "run7.cdf";
    /** Times built as delay + i·interval in doubles; float rounding is undone by the reader. */
    private static final double TIME_TOLERANCE_S = 1e-9;
    private static final double EXACT = 0.0;
    private static final int POINTS = 2000;
    private static final String[] POINT = {"point_number"};

    @TempDir
    Path dir;

    /** A synthetic electropherogram: baseline, one positive peak and one indirect-detection dip, as floats. */
    static double[] electropherogram(int n, double intervalS) {
        double[] y = new double[n];
        for (int i = 0; i < n; i++) {
            double t = i * intervalS;
            double v = 1.0 + 50.0 * Math.exp(-0.5 * Math.pow((t - 30.0) / 0.4, 2))
                    - 20.0 * Math.exp(-0.5 * Math.pow((t - 55.0) / 0.6, 2)) + 0.01 * Math.sin(i);
            y[i] = (float) v;
        }
        return y;
    }

    /** The interchange layout with uniform sampling; {@code unit} {@code null} leaves retention_unit out. */
    static NetcdfTestWriter layout(int version, String unit, double interval, double delay, double[] y) {
        NetcdfTestWriter w = new NetcdfTestWriter(version).dim("point_number", y.length)
                .global(NetcdfTestWriter.text("dataset_completeness", "C1+C2"))
                .global(NetcdfTestWriter.text("aia_template_revision", "1.0"))
                .global(NetcdfTestWriter.text("detector_unit", "mAU"));
        if (unit != null) {
            w.global(NetcdfTestWriter.text("retention_unit", unit));
        }
        return w.global(NetcdfTestWriter.text("uniform_sampling_flag", "Y"))
                .scalar("actual_sampling_interval", NetcdfTestWriter.FLOAT, interval)
                .scalar("actual_delay_time", NetcdfTestWriter.FLOAT, delay)
                .scalar("actual_run_time_length", NetcdfTestWriter.FLOAT, delay + (y.length - 1) * interval)
                .var("ordinate_values", NetcdfTestWriter.FLOAT, POINT, y);
    }

    private static Trace parse(byte[] b) throws InputException {
        return AndiTraceReader.parse(b, "run7", FILE, TraceReadOptions.DEFAULT);
    }

    private static InputException fails(byte[] b) {
        return fails(b, TraceReadOptions.DEFAULT);
    }

    private static InputException fails(byte[] b, TraceReadOptions options) {
        InputException e = assertThrows(InputException.class, () -> AndiTraceReader.parse(b, "run7", FILE, options));
        assertEquals(FILE, e.file());
        assertEquals(0, e.line());
        return e;
    }

    private static void assertAt(InputException e, long offset, String field) {
        assertTrue(e.getMessage().contains("at byte " + offset), e::getMessage);
        assertEquals(field, e.field(), e::getMessage);
    }

    // ---------------------------------------------------------------- round trips

    @Test
    void electropherogramInSecondsFromAFile() throws Exception {
        double[] y = electropherogram(POINTS, 0.05);
        Path p = dir.resolve("run7.cdf");
        Files.write(p, layout(1, "seconds", 0.05, 0.0, y).write().bytes());
        Trace t = AndiTraceReader.read(p, "day1/run7.cdf");
        assertEquals("run7", t.name());
        assertEquals("day1/run7.cdf", t.sourceFile());
        assertEquals(POINTS, t.size());
        assertArrayEquals(y, t.signals(), EXACT);
        for (int i = 0; i < POINTS; i++) {
            assertEquals(i * 0.05, t.timeS(i), TIME_TOLERANCE_S);
        }
        assertEquals(50.0, t.timeS(1000), TIME_TOLERANCE_S);
        assertEquals(30.0, t.timeS(t.indexAtOrAfter(29.999)), TIME_TOLERANCE_S); // apex of the test peak
    }

    @Test
    void minutesWithADelay() throws Exception {
        double[] y = electropherogram(500, 0.06);
        Trace t = parse(layout(1, "Minutes", 0.001, 0.5, y).write().bytes());
        assertEquals(30.0, t.startTimeS(), TIME_TOLERANCE_S);
        assertEquals(30.06, t.timeS(1), TIME_TOLERANCE_S);
        assertEquals(30.0 + 499 * 0.06, t.endTimeS(), TIME_TOLERANCE_S);
        assertArrayEquals(y, t.signals(), EXACT);
    }

    @Test
    void noRetentionUnitMeansSeconds() throws Exception {
        Trace t = parse(layout(1, null, 0.25, 2.0, new double[] {1, 2, 3}).write().bytes());
        assertArrayEquals(new double[] {2.0, 2.25, 2.5}, t.timesS(), TIME_TOLERANCE_S);
    }

    @Test
    void rawDataRetentionGivesTheTimes() throws Exception {
        double[] y = {0.5, 1.5, 9.0, 1.0, 0.25};
        double[] times = {0.0, 0.1, 0.25, 0.5, 1.0};
        byte[] b = new NetcdfTestWriter(1).dim("point_number", 5)
                .global(NetcdfTestWriter.text("retention_unit", "minutes"))
                .global(NetcdfTestWriter.text("uniform_sampling_flag", "N"))
                .var("ordinate_values", NetcdfTestWriter.FLOAT, POINT, y)
                .var("raw_data_retention", NetcdfTestWriter.DOUBLE, POINT, times)
                .write().bytes();
        Trace t = parse(b);
        assertArrayEquals(new double[] {0.0, 6.0, 15.0, 30.0, 60.0}, t.timesS(), TIME_TOLERANCE_S);
        assertArrayEquals(y, t.signals(), EXACT);
    }

    @Test
    void rawDataRetentionWinsOverTheSamplingInterval() throws Exception {
        double[] y = {1, 2, 3};
        byte[] b = layout(1, "seconds", 0.05, 0, y)
                .var("raw_data_retention", NetcdfTestWriter.FLOAT, POINT, new double[] {10, 11, 13}).write().bytes();
        assertArrayEquals(new double[] {10, 11, 13}, parse(b).timesS(), EXACT);
    }

    @Test
    void sixtyFourBitOffsetFile() throws Exception {
        double[] y = electropherogram(300, 0.05);
        NetcdfTestWriter.Written w = layout(2, "seconds", 0.05, 0, y).write();
        assertEquals(2, w.bytes()[3]);
        Trace t = parse(w.bytes());
        assertArrayEquals(y, t.signals(), EXACT);
        assertEquals(299 * 0.05, t.endTimeS(), TIME_TOLERANCE_S);
    }

    @Test
    void pointsAlongTheRecordDimension() throws Exception {
        double[] y = {3, 4, 5, 6};
        byte[] b = new NetcdfTestWriter(1).dim("point_number", 0)
                .global(NetcdfTestWriter.text("retention_unit", "Seconds"))
                .var("ordinate_values", NetcdfTestWriter.FLOAT, POINT, y)
                .var("raw_data_retention", NetcdfTestWriter.FLOAT, POINT, new double[] {0.5, 1, 1.5, 2})
                .write().bytes();
        Trace t = parse(b);
        assertArrayEquals(y, t.signals(), EXACT);
        assertArrayEquals(new double[] {0.5, 1, 1.5, 2}, t.timesS(), EXACT);
    }

    @Test
    void samplingSettingsAsGlobalAttributes() throws Exception {
        byte[] b = new NetcdfTestWriter(1).dim("point_number", 3)
                .global(NetcdfTestWriter.number("actual_sampling_interval", NetcdfTestWriter.DOUBLE, 0.2))
                .global(NetcdfTestWriter.number("actual_delay_time", NetcdfTestWriter.FLOAT, 1.0))
                .var("ordinate_values", NetcdfTestWriter.SHORT, POINT, new double[] {-1, 0, 1})
                .write().bytes();
        Trace t = parse(b);
        assertArrayEquals(new double[] {1.0, 1.2, 1.4}, t.timesS(), TIME_TOLERANCE_S);
        assertArrayEquals(new double[] {-1, 0, 1}, t.signals(), EXACT);
    }

    @Test
    void optionsOverrideTheUnitAndChooseVariables() throws Exception {
        byte[] b = layout(1, "seconds", 0.5, 0, new double[] {1, 2, 3})
                .var("other_signal", NetcdfTestWriter.DOUBLE, POINT, new double[] {7, 8, 9}).write().bytes();
        TraceReadOptions o = TraceReadOptions.DEFAULT.withTimeScale(TimeScale.MINUTES).withColumns(null, "other_signal");
        Trace t = AndiTraceReader.parse(b, "x", FILE, o);
        assertArrayEquals(new double[] {0, 30, 60}, t.timesS(), TIME_TOLERANCE_S);
        assertArrayEquals(new double[] {7, 8, 9}, t.signals(), EXACT);
        InputException e = fails(b, TraceReadOptions.DEFAULT.withColumns("my_time", null));
        assertEquals("my_time", e.field());
    }

    // ---------------------------------------------------------------- damaged files

    private static NetcdfTestWriter.Written valid() {
        return layout(1, "seconds", 0.05, 0, electropherogram(100, 0.05)).write();
    }

    @Test
    void truncatedHeader() {
        NetcdfTestWriter.Written w = valid();
        long cut = w.at("var_list") + 10;
        InputException e = fails(w.truncated(cut));
        assertTrue(e.getMessage().contains("ends at byte " + cut), e::getMessage);
    }

    @Test
    void truncatedData() {
        NetcdfTestWriter.Written w = valid();
        InputException e = fails(w.truncated(w.at("data.ordinate_values") + 100));
        assertAt(e, w.at("data.ordinate_values"), "ordinate_values");
        assertTrue(e.problem().contains("truncated"), e::getMessage);
    }

    @Test
    void wrongMagic() {
        byte[] b = valid().bytes();
        b[0] = 'X';
        InputException e = fails(b);
        assertAt(e, 0, "magic");
        assertTrue(e.problem().contains("not a netCDF classic file"), e::getMessage);
    }

    @Test
    void absurdDimensionLength() {
        NetcdfTestWriter.Written w = valid();
        InputException e = fails(w.withInt("dim.point_number.length", 2_000_000_000));
        assertAt(e, w.at("data.ordinate_values"), "ordinate_values");
        assertTrue(e.problem().contains("ends at byte " + w.bytes().length), e::getMessage);
    }

    @Test
    void negativeSizes() {
        NetcdfTestWriter.Written w = valid();
        InputException e = fails(w.withInt("dim.point_number.length", -1));
        assertAt(e, w.at("dim.point_number.length"), "point_number");
        assertTrue(e.problem().contains("negative"), e::getMessage);
        assertAt(fails(w.withInt("gatt.retention_unit.nelems", -7)), w.at("gatt.retention_unit.nelems"),
                "retention_unit");
    }

    @Test
    void hdf5File() {
        byte[] b = {(byte) 0x89, 'H', 'D', 'F', '\r', '\n', 0x1A, '\n', 0, 0, 0, 0, 0, 0, 0, 0};
        InputException e = fails(b);
        assertAt(e, 0, "magic");
        assertTrue(e.problem().contains("netCDF-4/HDF5 files are not supported; export as netCDF classic"));
    }

    @Test
    void missingOrdinateValues() {
        NetcdfTestWriter.Written w = new NetcdfTestWriter(1).dim("point_number", 2)
                .scalar("actual_sampling_interval", NetcdfTestWriter.FLOAT, 0.05)
                .var("something_else", NetcdfTestWriter.FLOAT, POINT, new double[] {1, 2}).write();
        InputException e = fails(w.bytes());
        assertAt(e, w.at("var_list"), "ordinate_values");
        assertTrue(e.problem().contains("actual_sampling_interval, something_else"), e::getMessage);
    }

    @Test
    void massSpectrometryFileIsNamedAsSuch() {
        byte[] b = new NetcdfTestWriter(1).dim("point_number", 2)
                .var("intensity_values", NetcdfTestWriter.FLOAT, POINT, new double[] {1, 2}).write().bytes();
        assertTrue(fails(b).problem().contains("mass-spectrometry"));
    }

    @Test
    void fillValuesNaNAndInfinityArePointed() {
        double[] y = {1, 2, 3, 4};
        NetcdfTestWriter.Written w = layout(1, "s", 0.1, 0, y).write();
        long data = w.at("data.ordinate_values");
        double[] bad = {9.9692099683868690e+36, Double.NaN, Double.NEGATIVE_INFINITY};
        for (double v : bad) {
            y[2] = v;
            InputException e = fails(layout(1, "s", 0.1, 0, y).write().bytes());
            assertAt(e, data + 2 * 4, "ordinate_values");
            assertTrue(e.problem().startsWith("point 3 "), e::getMessage);
        }
        y[2] = -1;
        byte[] b = layout(1, "s", 0.1, 0, new double[] {1, 2})
                .var("short_signal", NetcdfTestWriter.SHORT, POINT, new double[] {5, -1},
                        NetcdfTestWriter.number("_FillValue", NetcdfTestWriter.SHORT, -1))
                .write().bytes();
        InputException e = fails(b, TraceReadOptions.DEFAULT.withColumns(null, "short_signal"));
        assertEquals("short_signal", e.field());
    }

    @Test
    void retentionTimesMustIncrease() {
        NetcdfTestWriter.Written w = new NetcdfTestWriter(1).dim("point_number", 3)
                .var("ordinate_values", NetcdfTestWriter.FLOAT, POINT, new double[] {1, 2, 3})
                .var("raw_data_retention", NetcdfTestWriter.FLOAT, POINT, new double[] {0, 2, 2}).write();
        InputException e = fails(w.bytes());
        assertAt(e, w.at("data.raw_data_retention") + 8, "raw_data_retention");
        assertTrue(e.problem().contains("repeats"), e::getMessage);
    }

    @Test
    void retentionTimesOfAnotherLength() {
        NetcdfTestWriter.Written w = new NetcdfTestWriter(1).dim("point_number", 3).dim("other", 2)
                .var("ordinate_values", NetcdfTestWriter.FLOAT, POINT, new double[] {1, 2, 3})
                .var("raw_data_retention", NetcdfTestWriter.FLOAT, new String[] {"other"}, new double[] {0, 1})
                .write();
        assertAt(fails(w.bytes()), w.at("var.raw_data_retention"), "raw_data_retention");
    }

    @Test
    void noTimeAxis() {
        NetcdfTestWriter.Written w = new NetcdfTestWriter(1).dim("point_number", 2)
                .global(NetcdfTestWriter.text("uniform_sampling_flag", "N"))
                .var("ordinate_values", NetcdfTestWriter.FLOAT, POINT, new double[] {1, 2}).write();
        InputException e = fails(w.bytes());
        assertAt(e, w.at("var_list"), "actual_sampling_interval");
        assertTrue(e.problem().contains("not uniform"), e::getMessage);
    }

    @Test
    void badSamplingInterval() {
        NetcdfTestWriter.Written w = layout(1, "seconds", 0.0, 0, new double[] {1, 2}).write();
        assertAt(fails(w.bytes()), w.at("data.actual_sampling_interval"), "actual_sampling_interval");
        w = layout(1, "seconds", -0.5, 0, new double[] {1, 2}).write();
        assertAt(fails(w.bytes()), w.at("data.actual_sampling_interval"), "actual_sampling_interval");
        w = layout(1, "seconds", 9.9692099683868690e+36, 0, new double[] {1, 2}).write(); // fill: never written
        assertAt(fails(w.bytes()), w.at("data.actual_sampling_interval"), "actual_sampling_interval");
    }

    @Test
    void unknownTimeUnit() {
        NetcdfTestWriter.Written w = layout(1, "furlongs", 0.1, 0, new double[] {1, 2}).write();
        InputException e = fails(w.bytes());
        assertAt(e, w.at("gatt.retention_unit"), "retention_unit");
        assertTrue(e.problem().contains("'furlongs'"), e::getMessage);
    }

    @Test
    void tooFewPointsOrWrongShape() {
        NetcdfTestWriter.Written w = layout(1, "s", 0.1, 0, new double[] {1}).write();
        assertAt(fails(w.bytes()), w.at("var.ordinate_values"), "ordinate_values");
        w = new NetcdfTestWriter(1).dim("point_number", 2).dim("k", 2)
                .var("ordinate_values", NetcdfTestWriter.FLOAT, new String[] {"point_number", "k"},
                        new double[] {1, 2, 3, 4}).write();
        InputException e = fails(w.bytes());
        assertAt(e, w.at("var.ordinate_values"), "ordinate_values");
        assertTrue(e.problem().contains("2 dimensions"), e::getMessage);
    }

    @Test
    void unitNames() {
        assertEquals(1.0, AndiTraceReader.secondsPer(" Seconds "), EXACT);
        assertEquals(60.0, AndiTraceReader.secondsPer("MIN."), EXACT);
        assertEquals(1e-3, AndiTraceReader.secondsPer("ms"), EXACT);
        assertEquals(3600.0, AndiTraceReader.secondsPer("hours"), EXACT);
        assertTrue(Double.isNaN(AndiTraceReader.secondsPer("days")));
    }

    @Test
    void missingFileAndFolder() {
        InputException e = assertThrows(InputException.class,
                () -> AndiTraceReader.read(dir.resolve("none.cdf"), "none.cdf"));
        assertEquals("none.cdf", e.file());
        assertTrue(e.problem().contains("not found"));
        e = assertThrows(InputException.class, () -> AndiTraceReader.read(dir, "folder"));
        assertEquals("folder", e.file());
    }
}
