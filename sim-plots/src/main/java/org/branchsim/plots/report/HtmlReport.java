package org.branchsim.plots.report;

import java.util.ArrayList;
import java.util.Base64;
import java.util.List;

/**
 * One self-contained HTML5 page (W3C HTML Living Standard): headings, paragraphs, tables, preformatted text, an
 * inline SVG drawing and PNG figures embedded as base64 {@code data:} URIs (RFC 2397), styled by one
 * {@code <style>} element with print rules (A4 margins, figures kept whole on a page). No script, no link to
 * anything outside the file, so it opens offline and prints as it shows. Text is HTML-escaped; the SVG is put in
 * as given.
 */
public final class HtmlReport {

    private static final String STYLE = String.join("\n",
            "body{font-family:'DejaVu Sans',Arial,sans-serif;max-width:1120px;margin:1.5em auto;padding:0 1em;",
            "color:#111;line-height:1.4}",
            "h1{font-size:1.6em;margin-bottom:.2em}h2{font-size:1.25em;border-bottom:1px solid #999;margin-top:1.6em}",
            "table{border-collapse:collapse;margin:.6em 0;font-size:.92em}",
            "th,td{border:1px solid #bbb;padding:.25em .5em;text-align:left;vertical-align:top}",
            "td.n{text-align:right;font-variant-numeric:tabular-nums;white-space:nowrap}",
            "th{background:#eee}table.wide{font-size:.7em}div.wide{overflow-x:auto}",
            "figure{margin:1em 0;page-break-inside:avoid;break-inside:avoid}",
            "figure img,figure svg{max-width:100%;height:auto;border:1px solid #ddd}",
            "figcaption{font-size:.9em;color:#333}",
            "pre{background:#f6f6f6;padding:.6em;overflow-x:auto;font-size:.85em;white-space:pre-wrap}",
            ".caution{border:2px solid #a00;padding:.4em 1em;margin-top:1.5em}",
            ".caution h2{border:none;color:#a00;margin-top:.3em}",
            "@media print{body{max-width:none;margin:0;font-size:10pt}@page{size:A4;margin:15mm}",
            "h2{page-break-after:avoid;break-after:avoid}table,pre{page-break-inside:avoid;break-inside:avoid}",
            "table.wide{font-size:6pt}div.wide{overflow:visible}",
            "figure img,figure svg{border:none}a{color:inherit;text-decoration:none}}");

    /** Most columns set in the normal type. */
    public static final int WIDE = 8;

    private final String title;
    private final List<String> parts = new ArrayList<>();

    /** @param title page title and first heading */
    public HtmlReport(String title) {
        this.title = title;
    }

    /** Adds a second-level heading. @return this */
    public HtmlReport heading(String text) {
        parts.add("<h2>" + escape(text) + "</h2>");
        return this;
    }

    /** Adds a paragraph of plain text. @return this */
    public HtmlReport paragraph(String text) {
        parts.add("<p>" + escape(text) + "</p>");
        return this;
    }

    /** Adds text kept as written (console output), in a monospaced block. @return this */
    public HtmlReport preformatted(String text) {
        parts.add("<pre>" + escape(text) + "</pre>");
        return this;
    }

    /**
     * Adds a table; cells that read as numbers are right-aligned; a table of more than {@link #WIDE} columns is set
     * in a smaller type (and scrolls sideways on a narrow screen); headings may break after a dot (long parameter paths).
     *
     * @param caption what the table shows
     * @param header column headings (with units)
     * @param rows rows of cells, each as long as the header
     * @return this
     */
    public HtmlReport table(String caption, List<String> header, List<List<String>> rows) {
        boolean wide = header.size() > WIDE;
        StringBuilder sb = new StringBuilder(wide ? "<div class=\"wide\"><table class=\"wide\">" : "<table>");
        if (caption != null && !caption.isEmpty()) {
            sb.append("<caption>").append(escape(caption)).append("</caption>");
        }
        sb.append("<thead><tr>");
        for (String h : header) {
            // a long parameter path may break after its dots (<wbr>), never inside a word
            sb.append("<th>").append(escape(h).replace(".", ".<wbr>")).append("</th>");
        }
        sb.append("</tr></thead><tbody>");
        for (List<String> row : rows) {
            if (row.size() != header.size()) {
                throw new IllegalArgumentException("row of " + row.size() + " cells under " + header.size()
                        + " headings: " + row);
            }
            sb.append("<tr>");
            for (String cell : row) {
                sb.append(numeric(cell) ? "<td class=\"n\">" : "<td>").append(escape(cell)).append("</td>");
            }
            sb.append("</tr>");
        }
        parts.add(sb.append(wide ? "</tbody></table></div>" : "</tbody></table>").toString());
        return this;
    }

    /** Adds an SVG drawing inline, with a caption. @return this */
    public HtmlReport svg(String svgElement, String caption) {
        String svg = svgElement.replaceFirst("^<\\?xml[^>]*\\?>\\s*", "");
        if (!svg.startsWith("<svg")) {
            throw new IllegalArgumentException("not an <svg> element");
        }
        parts.add("<figure>" + svg + "<figcaption>" + escape(caption) + "</figcaption></figure>");
        return this;
    }

    /** Adds a PNG figure embedded as a data URI, with its file name as caption. @return this */
    public HtmlReport png(byte[] png, String alt, String caption) {
        parts.add("<figure><img alt=\"" + escape(alt) + "\" src=\"data:image/png;base64,"
                + Base64.getEncoder().encodeToString(png) + "\"><figcaption>" + escape(caption)
                + "</figcaption></figure>");
        return this;
    }

    /** Adds the caution box: a heading and one paragraph per line. @return this */
    public HtmlReport caution(String heading, List<String> lines) {
        StringBuilder sb = new StringBuilder("<section class=\"caution\"><h2>").append(escape(heading)).append("</h2>");
        for (String l : lines) {
            sb.append("<p>").append(escape(l)).append("</p>");
        }
        parts.add(sb.append("</section>").toString());
        return this;
    }

    /** @return the whole page */
    public String html() {
        StringBuilder sb = new StringBuilder("<!DOCTYPE html>\n<html lang=\"en\">\n<head>\n<meta charset=\"utf-8\">\n")
                .append("<meta name=\"viewport\" content=\"width=device-width, initial-scale=1\">\n")
                .append("<title>").append(escape(title)).append("</title>\n<style>\n").append(STYLE)
                .append("\n</style>\n</head>\n<body>\n<h1>").append(escape(title)).append("</h1>\n");
        for (String p : parts) {
            sb.append(p).append('\n');
        }
        return sb.append("</body>\n</html>\n").toString();
    }

    /** @return the text with &amp;, &lt;, &gt;, and quotes replaced by character references */
    public static String escape(String s) {
        return s.replace("&", "&amp;").replace("<", "&lt;").replace(">", "&gt;").replace("\"", "&quot;")
                .replace("'", "&#39;");
    }

    private static boolean numeric(String cell) {
        return cell.matches("[-+]?\\d[\\d.,]*([eE][-+]?\\d+)?( ?%)?");
    }
}
