package org.branchsim.plots.report;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Base64;
import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.junit.jupiter.api.Test;

/**
 * The page is self-contained: images as base64 data URIs (RFC 2397; base64 alphabet RFC 4648 section 4) that
 * decode to the bytes given, text escaped as HTML requires (the five characters of XML 1.0 section 2.4 plus the
 * apostrophe), no reference to the network, and print rules in an @media print block (CSS 2.1 section 7).
 */
class HtmlReportTest {

    @Test
    void imagesAreEmbeddedAsDataUrisThatDecodeToTheirBytes() {
        byte[] png = {(byte) 0x89, 'P', 'N', 'G', 13, 10, 26, 10, 0, 1, 2, (byte) 255};
        String html = new HtmlReport("t").png(png, "pressures.png", "pressures").html();
        Matcher m = Pattern.compile("src=\"data:image/png;base64,([A-Za-z0-9+/=]+)\"").matcher(html);
        assertTrue(m.find(), html);
        assertArrayEquals(png, Base64.getDecoder().decode(m.group(1)));
        assertFalse(html.contains("http:") || html.contains("https:"), "no network reference");
        assertTrue(html.contains("@media print"));
        assertTrue(html.startsWith("<!DOCTYPE html>"));
    }

    @Test
    void textIsEscapedAndTheSvgGoesInAsAnElement() {
        String html = new HtmlReport("a < b & \"c\"").paragraph("5 > 3 's'")
                .svg("<?xml version=\"1.0\"?>\n<svg xmlns=\"http://www.w3.org/2000/svg\"><title>x</title></svg>", "d")
                .html();
        assertTrue(html.contains("<title>a &lt; b &amp; &quot;c&quot;</title>"), html);
        assertTrue(html.contains("<p>5 &gt; 3 &#39;s&#39;</p>"), html);
        assertTrue(html.contains("<figure><svg xmlns"), "the XML declaration is dropped inside HTML");
        assertFalse(html.contains("<?xml"));
    }

    @Test
    void tablesRightAlignNumbersAndRefuseRaggedRows() {
        String html = new HtmlReport("t").table("c", List.of("q", "v [bar]"),
                List.of(List.of("setting", "45.01"), List.of("ratio", "-1.5e-3"))).html();
        assertTrue(html.contains("<td>setting</td><td class=\"n\">45.01</td>"), html);
        assertTrue(html.contains("<td class=\"n\">-1.5e-3</td>"), html);
        assertEquals(1, html.split("<caption>", -1).length - 1);
        assertTrue(html.contains("<th>v [bar]</th>"), html);
        assertTrue(new HtmlReport("t").table("", List.of("a.b.c [mm]"), List.of()).html()
                .contains("<th>a.<wbr>b.<wbr>c [mm]</th>"), "long paths may break after their dots");
        assertThrows(IllegalArgumentException.class, () -> new HtmlReport("t").table("", List.of("a", "b"),
                List.of(List.of("only one"))));
    }

    @Test
    void aWideTableIsSetSmallerToFitThePage() {
        List<String> header = List.of("a", "b", "c", "d", "e", "f", "g", "h", "i");
        String html = new HtmlReport("t").table("", header, List.of(header)).html();
        assertTrue(html.contains("<table class=\"wide\">"), html);
        assertFalse(new HtmlReport("t").table("", header.subList(0, HtmlReport.WIDE), List.of()).html()
                .contains("<table class=\"wide\">"));
    }

    @Test
    void theCautionBoxCarriesEveryLine() {
        String html = new HtmlReport("t").caution("Caution", List.of("one", "two")).html();
        assertTrue(html.contains("<section class=\"caution\"><h2>Caution</h2><p>one</p><p>two</p></section>"), html);
    }
}
