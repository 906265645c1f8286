package org.mobident.trace.io;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.mobident.InputException;
import org.mobident.trace.TimeScale;
import org.mobident.trace.Trace;

/** Choosing the trace reader by content (netCDF signature, Unidata classic format spec) or extension. */
class TraceFilesTest {

    private static final double EXACT = 0.0;
    private static final double TIME_TOLERANCE_S = 1e-9;

    @TempDir
    Path dir;

    private Path write(String name, byte[] content) throws Exception {
        Path p = dir.resolve(name);
        Files.write(p, content);
        return p;
    }

    private static byte[] interchange() {
        return AndiTraceReaderTest.layout(1, "seconds", 0.5, 0, new double[] {1, 2, 3}).write().bytes();
    }

    @Test
    void netcdfContentIsReadWhateverTheName() throws Exception {
        Trace t = TraceFiles.read(write("export.dat", interchange()), TraceReadOptions.DEFAULT);
        assertArrayEquals(new double[] {0, 0.5, 1.0}, t.timesS(), TIME_TOLERANCE_S);
        assertArrayEquals(new double[] {1, 2, 3}, t.signals(), EXACT);
        assertEquals("export", t.name());
    }

    @Test
    void delimitedTextGoesToTheTextReader() throws Exception {
        Path p = write("run.csv", "time_min,signal\n0,1\n0.5,2\n".getBytes(StandardCharsets.UTF_8));
        Trace t = TraceFiles.read(p, null);
        assertArrayEquals(new double[] {0, 30}, t.timesS(), EXACT);
        t = TraceFiles.read(p, TraceReadOptions.DEFAULT.withTimeScale(TimeScale.SECONDS));
        assertArrayEquals(new double[] {0, 0.5}, t.timesS(), EXACT);
    }

    @Test
    void netcdfExtensionWithOtherContentSaysSo() throws Exception {
        Path p = write("RUN.CDF", "time,signal\n0,1\n1,2\n".getBytes(StandardCharsets.UTF_8));
        InputException e = assertThrows(InputException.class, () -> TraceFiles.read(p, "RUN.CDF", null));
        assertEquals("RUN.CDF", e.file());
        assertTrue(e.problem().contains("not a netCDF classic file"), e::getMessage);
        assertTrue(e.getMessage().contains("at byte 0"), e::getMessage);
    }

    @Test
    void hdf5ContentIsRefusedClearly() throws Exception {
        byte[] b = {(byte) 0x89, 'H', 'D', 'F', '\r', '\n', 0x1A, '\n', 0, 0};
        InputException e = assertThrows(InputException.class,
                () -> TraceFiles.read(write("a.txt", b), TraceReadOptions.DEFAULT));
        assertTrue(e.problem().startsWith("netCDF-4/HDF5 files are not supported"), e::getMessage);
    }

    @Test
    void formatFromTheFirstBytes() {
        byte[] cdf1 = {'C', 'D', 'F', 1};
        byte[] cdfText = {'C', 'D', 'F', ','};
        assertEquals(TraceFiles.Format.NETCDF, TraceFiles.formatOf(cdf1, 4, "a.csv"));
        assertEquals(TraceFiles.Format.DELIMITED_TEXT, TraceFiles.formatOf(cdfText, 4, "a.csv"));
        assertEquals(TraceFiles.Format.NETCDF, TraceFiles.formatOf(cdfText, 4, "a.nc"));
        assertEquals(TraceFiles.Format.DELIMITED_TEXT, TraceFiles.formatOf(new byte[8], 0, "nc"));
        assertEquals(TraceFiles.Format.NETCDF, TraceFiles.formatOf(new byte[8], 0, "empty.netcdf"));
    }

    @Test
    void missingFile() {
        InputException e = assertThrows(InputException.class,
                () -> TraceFiles.read(dir.resolve("gone.cdf"), TraceReadOptions.DEFAULT));
        assertTrue(e.problem().contains("not found"), e::getMessage);
    }
}
