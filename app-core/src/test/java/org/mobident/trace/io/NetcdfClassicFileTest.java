package org.mobident.trace.io;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Arrays;
import java.util.HexFormat;

import org.junit.jupiter.api.Test;
import org.mobident.InputException;

/**
 * The netCDF classic reader against Unidata, "The NetCDF Classic Format Specification" (netCDF-C
 * documentation, Appendix B "File Format Specifications"): its two worked examples, record layout,
 * the 64-bit offset variant, and damaged headers.
 */
class NetcdfClassicFileTest {

    private static final String FILE = "x.nc";
    private static final double EXACT = 0.0;

    /**
     * The 92-byte file of the spec's example {@code netcdf tiny { dimensions: dim = 5; variables:
     * short vx(dim); data: vx = 3, 1, 4, 1, 5 ; }}, typed in from the spec's edited {@code od} dump.
     */
    private static final String SPEC_TINY_HEX = ""
            + "43444601" + "00000000" + "0000000a" + "00000001"
            + "00000003" + "64696d00" + "00000005" + "00000000"
            + "00000000" + "0000000b" + "00000001" + "00000002"
            + "76780000" + "00000001" + "00000000" + "00000000"
            + "00000000" + "00000003" + "0000000c" + "00000050"
            + "0003" + "0001" + "0004" + "0001" + "0005" + "8001";

    private static NetcdfClassicFile parse(byte[] b) throws InputException {
        return NetcdfClassicFile.parse(b, FILE);
    }

    /** Parses and reads every numeric variable, as a reader of the whole file would. */
    private static InputException fails(byte[] b) {
        return assertThrows(InputException.class, () -> {
            NetcdfClassicFile nc = parse(b);
            for (NetcdfClassicFile.Variable v : nc.variables()) {
                if (v.type() != NetcdfClassicFile.NcType.CHAR) {
                    nc.readDoubles(v);
                }
            }
        });
    }

    private static void assertAt(InputException e, long offset, String field) {
        assertEquals(FILE, e.file());
        assertEquals(0, e.line());
        assertTrue(e.getMessage().contains("at byte " + offset), e::getMessage);
        if (field != null) {
            assertEquals(field, e.field(), e::getMessage);
        }
    }

    // ---------------------------------------------------------------- the spec's examples

    @Test
    void specTinyExampleReads() throws Exception {
        byte[] b = HexFormat.of().parseHex(SPEC_TINY_HEX);
        assertEquals(92, b.length); // "corresponds to a 92-byte netCDF file" (Unidata classic format spec)
        NetcdfClassicFile nc = parse(b);
        assertEquals(1, nc.version());
        assertEquals(1, nc.dimensions().size());
        assertEquals(new NetcdfClassicFile.Dimension("dim", 5, false), nc.dimension("dim"));
        NetcdfClassicFile.Variable vx = nc.variable("vx");
        assertEquals(NetcdfClassicFile.NcType.SHORT, vx.type());
        assertEquals(80, vx.begin()); // "[offset: 80]" in the spec's dump
        assertEquals(80, nc.headerEnd());
        assertArrayEquals(new double[] {3, 1, 4, 1, 5}, nc.readDoubles(vx), EXACT);
        assertTrue(nc.globalAttributes().isEmpty());
    }

    @Test
    void testWriterReproducesTheSpecTinyExampleByteForByte() {
        byte[] written = new NetcdfTestWriter(1).dim("dim", 5)
                .var("vx", NetcdfTestWriter.SHORT, new String[] {"dim"}, new double[] {3, 1, 4, 1, 5})
                .write().bytes();
        assertEquals(SPEC_TINY_HEX, HexFormat.of().formatHex(written));
    }

    @Test
    void specEmptyFileIs32Bytes() throws Exception {
        // "This empty netCDF file has 32 bytes": magic then seven 32-bit zeros (Unidata classic format spec)
        byte[] b = new byte[32];
        b[0] = 'C';
        b[1] = 'D';
        b[2] = 'F';
        b[3] = 1;
        NetcdfClassicFile nc = parse(b);
        assertTrue(nc.dimensions().isEmpty() && nc.variables().isEmpty() && nc.globalAttributes().isEmpty());
        assertEquals(0, nc.numRecords());
        assertArrayEquals(b, new NetcdfTestWriter(1).write().bytes());
    }

    // ---------------------------------------------------------------- layout

    @Test
    void recordVariablesAreInterleavedAndPadded() throws Exception {
        double[] a = {1.5, -2.5, 3.25};
        double[] s = {-7, 8, 32767};
        double[] c = {0.1, 0.2};
        NetcdfTestWriter.Written w = new NetcdfTestWriter(1).dim("time", 0).dim("x", 2)
                .var("a", NetcdfTestWriter.FLOAT, new String[] {"time"}, a)
                .var("c", NetcdfTestWriter.DOUBLE, new String[] {"x"}, c)
                .var("s", NetcdfTestWriter.SHORT, new String[] {"time"}, s)
                .write();
        NetcdfClassicFile nc = parse(w.bytes());
        assertEquals(3, nc.numRecords());
        assertEquals(3, nc.dimension("time").length());
        assertTrue(nc.dimension("time").record());
        // record size = 4 (float) + 2 shorts padded to 4 (spec, "Note on vsize": sum of padded vsizes)
        assertEquals(8, nc.recordSize());
        assertArrayEquals(a, nc.readDoubles(nc.variable("a")), EXACT);
        assertArrayEquals(s, nc.readDoubles(nc.variable("s")), EXACT);
        assertArrayEquals(c, nc.readDoubles(nc.variable("c")), EXACT);
        assertEquals(w.at("data.s") + 2 * 8, nc.offsetOf(nc.variable("s"), 2));
    }

    @Test
    void aSingleShortRecordVariableHasNoPadding() throws Exception {
        // spec, "Note on padding": one record variable of type byte, char or short is not padded per record
        double[] s = {1, 2, 3, 4, 5};
        NetcdfTestWriter.Written w = new NetcdfTestWriter(1).dim("n", 0)
                .var("s", NetcdfTestWriter.SHORT, new String[] {"n"}, s).write();
        assertEquals(w.at("header_end") + 10, w.bytes().length);
        NetcdfClassicFile nc = parse(w.bytes());
        assertEquals(2, nc.recordSize());
        assertArrayEquals(s, nc.readDoubles(nc.variable("s")), EXACT);
    }

    @Test
    void twoDimensionalRecordVariable() throws Exception {
        double[] v = {1, 2, 3, 4, 5, 6};
        NetcdfTestWriter.Written w = new NetcdfTestWriter(1).dim("t", 0).dim("k", 3)
                .var("v", NetcdfTestWriter.BYTE, new String[] {"t", "k"}, v)
                .var("w", NetcdfTestWriter.INT, new String[] {"t"}, new double[] {-9, 9})
                .write();
        NetcdfClassicFile nc = parse(w.bytes());
        assertEquals(2, nc.numRecords());
        assertEquals(4 + 4, nc.recordSize()); // 3 bytes padded to 4, plus one int
        assertArrayEquals(v, nc.readDoubles(nc.variable("v")), EXACT);
        assertArrayEquals(new double[] {-9, 9}, nc.readDoubles(nc.variable("w")), EXACT);
    }

    @Test
    void streamingRecordCountIsTakenFromTheFileLength() throws Exception {
        NetcdfTestWriter.Written w = new NetcdfTestWriter(1).dim("n", 0)
                .var("f", NetcdfTestWriter.FLOAT, new String[] {"n"}, new double[] {1, 2, 3, 4}).write();
        // spec: numrecs = STREAMING (\xFF\xFF\xFF\xFF) means "indeterminate record count"
        NetcdfClassicFile nc = parse(w.withInt("numrecs", -1));
        assertEquals(4, nc.numRecords());
        assertArrayEquals(new double[] {1, 2, 3, 4}, nc.readDoubles(nc.variable("f")), EXACT);
    }

    @Test
    void sixtyFourBitOffsetFormat() throws Exception {
        double[] v = {1e-3, 2e300, -0.0};
        NetcdfTestWriter.Written w = new NetcdfTestWriter(2).dim("n", 3)
                .global(NetcdfTestWriter.text("title", "cdf2"))
                .var("v", NetcdfTestWriter.DOUBLE, new String[] {"n"}, v).write();
        // spec, "The 64-bit Offset Format": version byte \x02 and 64-bit begin
        assertEquals(2, w.bytes()[3]);
        assertEquals(w.at("header_end"), w.at("var.v.begin") + 8);
        NetcdfClassicFile nc = parse(w.bytes());
        assertEquals(2, nc.version());
        assertArrayEquals(v, nc.readDoubles(nc.variable("v")), EXACT);
        assertEquals("cdf2", nc.globalAttribute("title").text());
    }

    @Test
    void attributesOfEveryType() throws Exception {
        NetcdfTestWriter.Written w = new NetcdfTestWriter(1).dim("n", 2)
                .global(NetcdfTestWriter.text("unit", "Seconds\0\0"))
                .global(NetcdfTestWriter.number("b", NetcdfTestWriter.BYTE, -5, 127))
                .global(NetcdfTestWriter.number("s", NetcdfTestWriter.SHORT, -300))
                .global(NetcdfTestWriter.number("i", NetcdfTestWriter.INT, 123456789))
                .global(NetcdfTestWriter.number("f", NetcdfTestWriter.FLOAT, 0.25))
                .global(NetcdfTestWriter.number("d", NetcdfTestWriter.DOUBLE, 1.0 / 3, 2))
                .var("v", NetcdfTestWriter.FLOAT, new String[] {"n"}, new double[] {1, 2},
                        NetcdfTestWriter.text("units", "mAU"))
                .write();
        NetcdfClassicFile nc = parse(w.bytes());
        assertEquals("Seconds", nc.globalAttribute("unit").text()); // trailing NULs dropped
        assertArrayEquals(new double[] {-5, 127}, nc.globalAttribute("b").values(), EXACT);
        assertArrayEquals(new double[] {-300}, nc.globalAttribute("s").values(), EXACT);
        assertArrayEquals(new double[] {123456789}, nc.globalAttribute("i").values(), EXACT);
        assertArrayEquals(new double[] {0.25}, nc.globalAttribute("f").values(), EXACT);
        assertArrayEquals(new double[] {1.0 / 3, 2}, nc.globalAttribute("d").values(), EXACT);
        assertEquals("mAU", nc.variable("v").attribute("units").text());
        assertEquals(w.at("gatt.b"), nc.globalAttribute("b").offset());
        assertNull(nc.globalAttribute("missing"));
        assertFalse(nc.globalAttribute("f").isText());
    }

    // ---------------------------------------------------------------- damaged headers

    private static NetcdfTestWriter.Written sample() {
        return new NetcdfTestWriter(1).dim("point_number", 4).dim("t", 0)
                .global(NetcdfTestWriter.text("retention_unit", "seconds"))
                .var("y", NetcdfTestWriter.FLOAT, new String[] {"point_number"}, new double[] {1, 2, 3, 4},
                        NetcdfTestWriter.number("scale", NetcdfTestWriter.DOUBLE, 2))
                .var("r", NetcdfTestWriter.INT, new String[] {"t"}, new double[] {5, 6})
                .write();
    }

    @Test
    void theSampleIsValid() throws Exception {
        NetcdfClassicFile nc = parse(sample().bytes());
        assertArrayEquals(new double[] {1, 2, 3, 4}, nc.readDoubles(nc.variable("y")), EXACT);
        assertArrayEquals(new double[] {5, 6}, nc.readDoubles(nc.variable("r")), EXACT);
    }

    @Test
    void everyTruncationInsideTheHeaderIsReported() {
        NetcdfTestWriter.Written w = sample();
        for (long n = 0; n < w.at("header_end"); n++) {
            InputException e = fails(w.truncated(n));
            assertEquals(FILE, e.file());
            assertTrue(e.getMessage().contains("at byte"), e::getMessage);
            if (n >= 4) {
                assertTrue(e.getMessage().contains("ends at byte " + n), e::getMessage);
            }
        }
    }

    @Test
    void unknownTypeCode() {
        NetcdfTestWriter.Written w = sample();
        InputException e = fails(w.withInt("gatt.retention_unit.type", 9));
        assertAt(e, w.at("gatt.retention_unit.type"), "retention_unit");
        assertTrue(e.problem().contains("nc_type 9"));
        assertAt(fails(w.withInt("var.y.type", 0)), w.at("var.y.type"), "y");
    }

    @Test
    void negativeCountsAndLengths() {
        NetcdfTestWriter.Written w = sample();
        assertAt(fails(w.withInt("dim.point_number.length", -5)), w.at("dim.point_number.length"), "point_number");
        assertAt(fails(w.withInt("gatt.retention_unit.nelems", -1)), w.at("gatt.retention_unit.nelems"),
                "retention_unit");
        assertAt(fails(w.withInt("numrecs", -2)), w.at("numrecs"), "numrecs");
        assertAt(fails(w.withInt("var.y.rank", -1)), w.at("var.y.rank"), "y");
        assertAt(fails(w.withInt("var.y.begin", -4)), w.at("var.y.begin"), "y");
    }

    @Test
    void absurdListCounts() {
        NetcdfTestWriter.Written w = sample();
        byte[] b = w.bytes().clone();
        long countAt = w.at("var_list") + 4;
        writeInt(b, countAt, Integer.MAX_VALUE);
        InputException e = fails(b);
        assertAt(e, countAt, "var_list");
        assertTrue(e.problem().contains("cannot fit"), e::getMessage);
        b = w.bytes().clone();
        writeInt(b, w.at("gatt_list") + 4, 1 << 30);
        assertAt(fails(b), w.at("gatt_list") + 4, "gatt_list");
        assertAt(fails(w.withInt("gatt.retention_unit.nelems", Integer.MAX_VALUE)),
                w.at("gatt.retention_unit.nelems"), "retention_unit");
        assertAt(fails(w.withInt("var.y.rank", 1 << 20)), w.at("var.y.rank"), "y");
        assertAt(fails(w.withInt("var.y", 1 << 20)), w.at("var.y"), "var_list"); // name length
        assertAt(fails(w.withInt("var.y", 0)), w.at("var.y"), "var_list");
    }

    @Test
    void absurdDimensionLengthIsCaughtWhenTheVariableIsRead() {
        NetcdfTestWriter.Written w = sample();
        InputException e = fails(w.withInt("dim.point_number.length", Integer.MAX_VALUE));
        assertAt(e, w.at("data.y"), "y");
        assertTrue(e.problem().contains("ends at byte " + w.bytes().length), e::getMessage);
        // the record count too
        e = fails(w.withInt("numrecs", 1 << 29));
        assertAt(e, w.at("data.r"), "r");
    }

    @Test
    void wrongTagsAndAbsentListsWithCounts() {
        NetcdfTestWriter.Written w = sample();
        InputException e = fails(w.withInt("dim_list", 0x0B));
        assertAt(e, w.at("dim_list"), "dim_list");
        byte[] b = new NetcdfTestWriter(1).write().bytes();
        writeInt(b, 20, 3); // ABSENT gatt_list (tag 0 at byte 16) with count 3 at byte 20
        assertAt(fails(b), 20, "gatt_list");
    }

    @Test
    void dimensionIdsAreChecked() {
        NetcdfTestWriter.Written w = sample();
        assertAt(fails(w.withInt("var.y.dimid0", 7)), w.at("var.y.dimid0"), "y");
        assertAt(fails(w.withInt("var.y.dimid0", -1)), w.at("var.y.dimid0"), "y");
    }

    @Test
    void theRecordDimensionMayOnlyComeFirst() {
        NetcdfTestWriter.Written w = new NetcdfTestWriter(1).dim("t", 0).dim("k", 2)
                .var("v", NetcdfTestWriter.INT, new String[] {"k", "k"}, new double[] {1, 2, 3, 4}).write();
        byte[] b = w.bytes().clone();
        writeInt(b, w.at("var.v.dimid0") + 4, 0); // second dimension := the record dimension
        assertAt(fails(b), w.at("var.v.dimid0") + 4, "v");
    }

    @Test
    void twoRecordDimensionsAreRefused() {
        NetcdfTestWriter.Written w = sample();
        assertAt(fails(w.withInt("dim.point_number.length", 0)), w.at("dim.t.length"), "t");
    }

    @Test
    void duplicateNamesAreRefused() {
        NetcdfTestWriter.Written w = new NetcdfTestWriter(1).dim("n", 1)
                .var("a", NetcdfTestWriter.INT, new String[] {"n"}, new double[] {1})
                .var("b", NetcdfTestWriter.INT, new String[] {"n"}, new double[] {2}).write();
        byte[] b = w.bytes().clone();
        b[(int) w.at("var.b") + 4] = 'a';
        assertAt(fails(b), w.at("var.b"), "a");
    }

    @Test
    void dataInsideTheHeaderIsRefused() {
        NetcdfTestWriter.Written w = sample();
        InputException e = fails(w.withInt("var.y.begin", 8));
        assertAt(e, w.at("var.y.begin"), "y");
        assertTrue(e.problem().contains("inside the header"), e::getMessage);
    }

    @Test
    void truncatedDataIsReportedWithTheVariableAndItsOffset() throws Exception {
        NetcdfTestWriter.Written w = sample();
        byte[] b = w.truncated(w.at("data.y") + 6);
        NetcdfClassicFile nc = parse(b);
        InputException e = assertThrows(InputException.class, () -> nc.readDoubles(nc.variable("y")));
        assertAt(e, w.at("data.y"), "y");
        assertTrue(e.problem().contains("ends at byte " + b.length), e::getMessage);
    }

    @Test
    void signaturesOtherThanClassic() {
        InputException e = fails("time,signal\n0,1\n".getBytes(java.nio.charset.StandardCharsets.US_ASCII));
        assertAt(e, 0, "magic");
        assertTrue(e.problem().contains("'time,sig'"), e::getMessage);
        byte[] hdf5 = {(byte) 0x89, 'H', 'D', 'F', '\r', '\n', 0x1A, '\n', 0, 0, 0, 0};
        e = fails(hdf5);
        assertAt(e, 0, "magic");
        assertTrue(e.problem().startsWith("netCDF-4/HDF5 files are not supported; export as netCDF classic"));
        byte[] userBlock = Arrays.copyOf(new byte[512], 600);
        System.arraycopy(hdf5, 0, userBlock, 512, 8);
        assertTrue(fails(userBlock).problem().contains("HDF5"));
        byte[] cdf5 = new NetcdfTestWriter(1).write().bytes();
        cdf5[3] = 5;
        assertTrue(fails(cdf5).problem().contains("CDF-5"));
        cdf5[3] = 3;
        assertAt(fails(cdf5), 3, "magic");
        assertTrue(fails(new byte[0]).problem().contains("empty"));
        assertAt(fails(new byte[] {'C', 'D'}), 2, "magic");
    }

    @Test
    void textVariablesAreNotReadAsNumbers() throws Exception {
        NetcdfTestWriter.Written w = new NetcdfTestWriter(1).dim("n", 3)
                .var("name", NetcdfTestWriter.CHAR, new String[] {"n"}, new double[] {'a', 'b', 'c'}).write();
        NetcdfClassicFile nc = parse(w.bytes());
        InputException e = assertThrows(InputException.class, () -> nc.readDoubles(nc.variable("name")));
        assertAt(e, w.at("var.name"), "name");
    }

    private static void writeInt(byte[] b, long at, int v) {
        int i = (int) at;
        b[i] = (byte) (v >>> 24);
        b[i + 1] = (byte) (v >>> 16);
        b[i + 2] = (byte) (v >>> 8);
        b[i + 3] = (byte) v;
    }
}
