package org.branchsim.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.Stream;
import org.branchsim.core.study.Variant;
import org.branchsim.core.units.Units;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * report.html of a run and of a sweep: one file that embeds every figure the command wrote (base64 data URIs, RFC
 * 2397), carries the circuit diagram inline, the scenario's description, the metrics with units and what they are
 * measured from, the solver statistics and the cautions (ISO 4413), and refers to nothing outside itself. The CSV
 * reader follows RFC 4180; varied values convert with the exact factors of NIST SP 811 (2008), Appendix B.
 */
class ReportPageTest {

    private static final String FEED = RunCommandTest.SCENARIOS.resolve("feed-stall.json").toString();

    private static List<String> pngs(Path dir) throws IOException {
        try (Stream<Path> s = Files.list(dir)) {
            return s.map(p -> p.getFileName().toString()).filter(n -> n.endsWith(".png")).sorted().toList();
        }
    }

    private static int dataUris(String html) {
        Matcher m = Pattern.compile("src=\"data:image/png;base64,").matcher(html);
        int n = 0;
        while (m.find()) {
            n++;
        }
        return n;
    }

    @Test
    void aRunsReportEmbedsEveryFigureAndTheDiagram(@TempDir Path dir) throws IOException {
        RunCommandTest.Outcome o = RunCommandTest.run("run", FEED, "--out", dir.toString());
        assertEquals(0, o.code(), o.err());
        String html = Files.readString(dir.resolve("report.html"), StandardCharsets.UTF_8);
        List<String> figures = pngs(dir);
        assertTrue(figures.contains("circuit.png") && Files.exists(dir.resolve("circuit.svg")), figures.toString());
        // every figure but the diagram's PNG (the diagram is inline SVG) is embedded, each once
        assertEquals(figures.size() - 1, dataUris(html), figures.toString());
        for (String f : figures) {
            if (!f.equals("circuit.png")) {
                assertTrue(html.contains("alt=\"" + f + "\""), f);
            }
        }
        assertEquals(1, html.split("<svg ", -1).length - 1, "one inline SVG");
        assertTrue(html.contains(">feedCap<") || html.contains(">pumpLine<"), "node names on the diagram");
        assertTrue(html.contains("Machining-fixture feed axis"), "the scenario's description");
        assertTrue(html.contains("peak [bar]"), "units in the headings");
        assertTrue(html.contains("steps accepted"), "solver statistics");
        assertTrue(html.contains("ISO 4413") && html.contains("Stored pressure and energy hurt people"), "cautions");
        assertFalse(Pattern.compile("(src|href)=\"(https?:)?//").matcher(html).find(), "nothing from the network");
        assertTrue(html.contains("@media print"));
        assertTrue(o.out().contains("report.html"), o.out());
    }

    @Test
    void aSweepsReportCarriesItsTableAndOverlay(@TempDir Path dir) throws IOException {
        RunCommandTest.Outcome o = RunCommandTest.run("sweep", FEED, "--vary", "elements.relief.seatDiameter=5 mm",
                "--threads", "1", "--out", dir.toString());
        assertEquals(0, o.code(), o.err());
        String html = Files.readString(dir.resolve("report.html"), StandardCharsets.UTF_8);
        String header = Files.readAllLines(dir.resolve("summary.csv")).get(0);
        for (String column : StudyCsv.parse(header).get(0)) {
            assertTrue(html.contains("<th>" + column.replace("&", "&amp;").replace(".", ".<wbr>") + "</th>"), column);
        }
        assertEquals(pngs(dir).size() - 1, dataUris(html));
        assertTrue(html.contains("branchsim sweep: feed-stall"));
        // the circuit and the scenario's description come from circuit.svg, which a merge copies from a shard
        assertTrue(html.contains("<svg ") && html.contains("Machining-fixture feed axis"), html);
        assertTrue(Files.readString(dir.resolve("circuit.svg")).contains("<desc>Machining-fixture feed axis"));
    }

    @Test
    void aDiagnosisReportCarriesItsText(@TempDir Path dir) throws IOException {
        RunCommandTest.Outcome o = RunCommandTest.run("diagnose", FEED, "--out", dir.toString());
        assertEquals(0, o.code(), o.err());
        String html = Files.readString(dir.resolve("report.html"), StandardCharsets.UTF_8);
        assertTrue(html.contains("<h2>Diagnosis</h2>") && html.contains("No oscillation found"), html);
        assertTrue(html.contains("<svg ") && html.contains("ISO 4413"));
    }

    @Test
    void csvFieldsAreReadAsRfc4180WritesThem() {
        // RFC 4180 section 2: quoted fields may hold commas, line breaks and doubled quotes
        List<List<String>> rows = StudyCsv.parse("a,\"b,c\",\"say \"\"hi\"\"\"\r\n1,,\"x\ny\"\n");
        assertEquals(List.of(List.of("a", "b,c", "say \"hi\""), List.of("1", "", "x\ny")), rows);
        assertEquals(List.of(List.of("last", "")), StudyCsv.parse("last,"));
    }

    @Test
    void variedValuesConvertToTheColourBarsUnit() {
        // NIST SP 811 (2008), Appendix B: 1 um = 1e-6 m, so 500 um = 0.5 mm; 1 L = 1000 cm^3
        assertEquals("mm", SweepReport.unitOf(List.of("0.3 mm", "0.6 mm")).symbol());
        assertEquals(0.5, SweepReport.number("500 um", Units.find("mm")), 1e-12);
        assertEquals(2000, SweepReport.number("2 L", Units.find("cm^3")), 1e-9);
        assertTrue(Double.isNaN(SweepReport.number("hot", Units.find("mm"))));
        assertTrue(Double.isNaN(SweepReport.number("2 bar", Units.find("mm"))), "another dimension is not a value");
        assertEquals(0.7, SweepReport.number(0.7, null), 0.0);
    }

    @Test
    void theHeatMapGridPutsEachRunsMetricAtItsValues() {
        SweepDefinition.Axis a = new SweepDefinition.Axis("x.d", List.of("1 mm", "2 mm"));
        SweepDefinition.Axis b = new SweepDefinition.Axis("x.v", List.of("4 cm^3", "8 cm^3", "12 cm^3"));
        List<StudyTable.Row> rows = List.of(
                new StudyTable.Row(new Variant(0, Map.of("x.d", "2 mm", "x.v", "8 cm^3")), null, Map.of("m", 28.0), null),
                new StudyTable.Row(new Variant(1, Map.of("x.d", "1 mm", "x.v", "12 cm^3")), null, Map.of("m", 13.0),
                        null),
                new StudyTable.Row(new Variant(2, Map.of("x.d", "1 mm", "x.v", "4 cm^3")), "failed", Map.of(), null));
        double[][] z = SweepReport.grid(rows, a, b, "m");
        assertEquals(28.0, z[1][1], 0.0);
        assertEquals(13.0, z[0][2], 0.0);
        assertTrue(Double.isNaN(z[0][0]), "a failed run leaves its cell empty");
        assertTrue(Double.isNaN(z[1][0]), "a point not run stays empty");
    }
}
