package org.mobident.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.StringWriter;
import java.math.BigDecimal;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.mobident.result.RunResult;
import org.mobident.trace.RunSpec;

class PeakTableJsonTest {

    private static String json(List<RunResult> runs) throws IOException {
        StringWriter out = new StringWriter();
        PeakTableJson.write(runs, out);
        return out.toString();
    }

    @SuppressWarnings("unchecked")
    private static Map<String, Object> obj(Object o) {
        return (Map<String, Object>) o;
    }

    @SuppressWarnings("unchecked")
    private static List<Object> arr(Object o) {
        return (List<Object>) o;
    }

    @Test
    void emptyListIsExactText() throws IOException {
        assertEquals("{\n  \"runs\": []\n}\n", json(List.of()));
    }

    @Test
    void failedRunIsExactText() throws IOException {
        String expected = "{\n"
                + "  \"runs\": [\n"
                + "    {\n"
                + "      \"run\": \"well-09\",\n"
                + "      \"sample\": null,\n"
                + "      \"file\": \"" + Path.of("samples", "well-09.csv").toString().replace("\\", "\\\\") + "\",\n"
                + "      \"status\": \"failed\",\n"
                + "      \"error\": \"samples/well-09.csv, line 3, field 'signal': not a number: 'abc'\",\n"
                + "      \"scale\": \"run not processed\",\n"
                + "      \"eof_mobility\": null,\n"
                + "      \"mobility_known\": false,\n"
                + "      \"noise_sd\": null,\n"
                + "      \"scale_factor\": null,\n"
                + "      \"scale_factor_sd\": null,\n"
                + "      \"scale_offset\": null,\n"
                + "      \"scale_offset_sd\": null,\n"
                + "      \"notes\": [],\n"
                + "      \"peaks\": []\n"
                + "    }\n"
                + "  ]\n"
                + "}\n";
        assertEquals(expected, json(List.of(ReportFixtures.failedRun())));
    }

    @Test
    void parsesAndCarriesValues() throws IOException {
        String text = json(List.of(ReportFixtures.okRun(), ReportFixtures.failedRun(), ReportFixtures.noMarkerRun()));
        Map<String, Object> root = obj(JsonCheck.parse(text));
        List<Object> runs = arr(root.get("runs"));
        assertEquals(3, runs.size());
        Map<String, Object> ok = obj(runs.get(0));
        assertEquals("ok", ok.get("status"));
        assertNull(ok.get("error"));
        assertEquals(new BigDecimal("-50.000"), ok.get("eof_mobility"));
        assertEquals("neutral marker at 576.0 s", ok.get("scale"));
        assertEquals(1, arr(ok.get("notes")).size());
        List<Object> peaks = arr(ok.get("peaks"));
        assertEquals(4, peaks.size());
        Map<String, Object> p = obj(peaks.get(0));
        assertFalse(p.containsKey("run"));
        assertEquals(new BigDecimal("223.4568"), p.get("apex_time_s"));
        assertEquals(new BigDecimal("-71.520"), p.get("mobility"));
        assertEquals("chloride", p.get("assigned"));
        assertEquals(new BigDecimal("0.973"), p.get("confidence"));
        assertEquals("dip", p.get("direction"));
        List<Object> cands = arr(p.get("candidates"));
        assertEquals(2, cands.size());
        assertEquals("bromide", obj(cands.get(1)).get("name"));
        assertEquals(new BigDecimal("-73.000"), obj(cands.get(1)).get("library_mobility"));
        Map<String, Object> marker = obj(peaks.get(3));
        assertNull(marker.get("plates"), "NaN becomes null");
        assertEquals("marker", marker.get("status"));
        assertEquals(List.of(), marker.get("candidates"));
        Map<String, Object> noMarker = obj(runs.get(2));
        assertEquals(Boolean.FALSE, noMarker.get("mobility_known"));
        assertEquals("no neutral marker found", obj(arr(noMarker.get("peaks")).get(0)).get("note"));
    }

    @Test
    void escapesQuotesNewlinesAndControlCharacters() throws IOException {
        String nasty = "say \"hi\"\\ now\nnext\tline\r\u0001\u001f\b\f\u2028end";
        RunResult base = ReportFixtures.okRun();
        RunResult run = new RunResult(new RunSpec(nasty, Path.of("x.csv"), base.spec().conditions(), "cli", 0),
                null, nasty, base.eofMobility(), base.scale(), base.peaks(), List.of(nasty), base.noiseSd());
        String text = json(List.of(run));
        assertTrue(text.contains("\"say \\\"hi\\\"\\\\ now\\nnext\\tline\\r\\u0001\\u001f\\b\\f\\u2028end\""), text);
        for (char c = 0; c < 0x20; c++) {
            if (c != '\n') {
                assertFalse(text.indexOf(c) >= 0, "raw control character " + (int) c);
            }
        }
        Map<String, Object> r = obj(arr(obj(JsonCheck.parse(text)).get("runs")).get(0));
        assertEquals(nasty, r.get("run"), "round-trips");
        assertEquals(nasty, arr(r.get("notes")).get(0));
    }

    @Test
    void unpairedSurrogateIsEscapedPairedIsKept() {
        assertEquals("\"a\\ud800b\"", Json.quote("a\ud800b"));
        assertEquals("\"\ud83d\ude00\"", Json.quote("\ud83d\ude00"));
        assertEquals("null", Json.quote(null));
    }

    @Test
    void checkerRejectsBrokenJson() {
        assertThrows(IllegalArgumentException.class, () -> JsonCheck.parse("{\"a\": \"x\ny\"}"));
        assertThrows(IllegalArgumentException.class, () -> JsonCheck.parse("{\"a\": NaN}"));
        assertThrows(RuntimeException.class, () -> JsonCheck.parse("{\"a\": 1,}"));
    }

    @Test
    void deterministic() throws IOException {
        List<RunResult> runs = List.of(ReportFixtures.okRun(), ReportFixtures.noMarkerRun());
        assertEquals(json(runs), json(runs));
    }
}
