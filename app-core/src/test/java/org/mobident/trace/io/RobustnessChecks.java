package org.mobident.trace.io;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTimeoutPreemptively;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.util.List;

import org.mobident.InputException;
import org.mobident.trace.RunConditions;
import org.mobident.trace.RunSpec;
import org.mobident.trace.Trace;

/**
 * Shared body of the robustness tests: a damaged file must give a valid result or an
 * {@link InputException}, never another exception, and must not hang.
 */
final class RobustnessChecks {

    /** Guard against endless loops only; a healthy read of these small files takes microseconds. */
    static final Duration HANG_GUARD = Duration.ofSeconds(10);

    static final String COMMA_TRACE = "# exported by hand\ntime_s,temp_c,signal_mAU\n"
            + "0.0,25.0,1.25\n0.5,25.0,1.50\n1.0,25.1,-0.75\n1.25,25.1,3e-2\n2.0,25.0,4.0\n\n# end\n";
    static final String SEMICOLON_TRACE = "\u00ef\u00bb\u00bfTime (min);Absorbance (mAU)\r\n0,00;0,5\r\n"
            + "0,01;0,6\r\n0,02;-1,5E-1\r\n0,05;2\r\n0,10;2,5\r\n";
    static final String SHEET = "# day 1\nfile,total_length_cm,detector_length_cm,voltage_kv,ramp_s,temperature_c,"
            + "buffer,marker_from_s,marker_to_s,detection,ref_marker_mobility,ref_marker_from_s,ref_marker_to_s,"
            + "sample,note\n"
            + "a.csv,60,50,25,0.5,25,\"MES; pH 6\",100,200,direct,,,,s1,ok\n"
            + "b.csv,60,50,-25,,,,,,indirect,-40.5,300,400,s2,\n"
            + "c.csv,,,,,,,,,,,,,,\n";

    private RobustnessChecks() {
    }

    /** The base trace file, as bytes (ISO-8859-1 keeps the BOM bytes as written). */
    static byte[] trace(boolean semicolon) {
        return (semicolon ? SEMICOLON_TRACE : COMMA_TRACE).getBytes(StandardCharsets.ISO_8859_1);
    }

    /** Folder with the trace files the sheet names. */
    static Path sheetFolder(Path root) throws IOException {
        for (String n : new String[] {"a.csv", "b.csv", "c.csv"}) {
            Files.writeString(root.resolve(n), COMMA_TRACE);
        }
        return root;
    }

    static void traceReadsOrFailsCleanly(byte[] bytes) {
        assertTimeoutPreemptively(HANG_GUARD, () -> {
            Trace t;
            try {
                t = DelimitedTraceReader.parse(bytes, "fuzz", "fuzz.csv", TraceReadOptions.DEFAULT);
            } catch (InputException e) {
                assertEquals("fuzz.csv", e.file());
                assertTrue(e.line() >= 0);
                assertFalse(e.problem().isEmpty());
                return;
            }
            assertTrue(t.size() >= 2);
            for (int i = 0; i < t.size(); i++) {
                assertTrue(Double.isFinite(t.timeS(i)) && Double.isFinite(t.signal(i)));
                if (i > 0) {
                    assertTrue(t.timeS(i) > t.timeS(i - 1));
                }
            }
        });
    }

    static void sheetReadsOrFailsCleanly(Path folder, byte[] bytes) throws IOException {
        Path sheet = folder.resolve("runs.csv");
        Files.write(sheet, bytes);
        assertTimeoutPreemptively(HANG_GUARD, () -> {
            RunSheet s;
            try {
                s = RunSheetReader.read(sheet, RunConditions.EMPTY);
            } catch (InputException e) {
                assertEquals(sheet.toString(), e.file());
                return;
            }
            List<RunSpec> runs = s.runs();
            for (RunSpec r : runs) {
                assertNotNull(r.name());
                assertNull(r.conditions().geometryProblem());
                assertTrue(Files.isRegularFile(r.traceFile()));
                assertTrue(r.originLine() > 0);
            }
            for (InputException e : s.rowProblems()) {
                assertTrue(e.line() > 0, e::getMessage);
            }
        });
    }
}
