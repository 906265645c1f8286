package org.mobident.report.plot;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertSame;

import org.junit.jupiter.api.Test;

/** Escaping per W3C XML 1.0 (fifth edition, 2008) §2.2 and §2.4. */
class MarkupTest {

    @Test
    void markupCharactersBecomeReferences() {
        assertEquals("&lt;script&gt;alert(&#39;x&#39;)&lt;/script&gt; &amp; &quot;q&quot;",
                Markup.escape("<script>alert('x')</script> & \"q\""));
        assertEquals("&amp;amp;", Markup.escape("&amp;"), "already-escaped text is escaped again");
    }

    @Test
    void plainTextIsReturnedAsItIs() {
        String s = "nitrate 97% – μ = −30.0";
        assertSame(s, Markup.escape(s));
        assertEquals("", Markup.escape(null));
        assertEquals("", Markup.escape(""));
    }

    @Test
    void charactersXmlForbidsAreReplaced() {
        assertEquals("a\uFFFDb", Markup.escape("a\u0001b"));
        assertEquals("a\uFFFDb", Markup.escape("a\u0000b"));
        assertEquals("\uFFFD", Markup.escape("\uFFFF"));
        assertEquals("tab\there\nline\r", Markup.escape("tab\there\nline\r"));
    }

    @Test
    void surrogatePairsStayAndLoneHalvesGo() {
        String pair = "\uD83E\uDDEA"; // a supplementary character (test tube)
        assertEquals("x" + pair + "&lt;", Markup.escape("x" + pair + "<"));
        assertEquals("x\uFFFDy", Markup.escape("x\uD83Ey"));
        assertEquals("x\uFFFD", Markup.escape("x\uD83E"));
        assertEquals("\uFFFDy", Markup.escape("\uDDEAy"));
    }
}
