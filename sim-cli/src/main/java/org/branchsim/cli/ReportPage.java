package org.branchsim.cli;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.branchsim.core.analysis.OscillationFinding;
import org.branchsim.core.analysis.ReducingValveMetrics;
import org.branchsim.core.analysis.SignalStatistics;
import org.branchsim.core.model.EnergyAccount;
import org.branchsim.core.results.SimulationResult;
import org.branchsim.core.results.SolverStatistics;
import org.branchsim.core.scenario.Scenario;
import org.branchsim.core.units.Dimension;
import org.branchsim.core.units.Unit;
import org.branchsim.plots.diagram.CircuitDiagram;
import org.branchsim.plots.report.HtmlReport;

/**
 * Writes report.html (and the circuit diagram as circuit.svg and circuit.png) into a command's output folder: one
 * self-contained page with the scenario's description, its circuit diagram, the key results as tables (each value
 * with its unit and what it is measured from), every PNG figure the command wrote (in the order written), the
 * solver statistics or the study's table, the oscillation findings or diagnosis, and the cautions. Called last,
 * before the folder is committed, so that the figures it embeds are already in the folder.
 */
final class ReportPage {

    /** File name of the page. */
    static final String FILE = "report.html";
    /** File name of the circuit diagram as SVG. */
    static final String CIRCUIT_SVG = "circuit.svg";
    /** File name of the circuit diagram as PNG. */
    static final String CIRCUIT_PNG = "circuit.png";
    /** Most rows of a study's table shown on the page (the CSV beside it has them all). */
    static final int MAX_ROWS = 200;

    private ReportPage() {
    }

    /** The page of a run: metrics of each reducing valve and node, energy, findings, figures, solver statistics. */
    static void run(Scenario s, SimulationResult r, List<ReducingValveMetrics> valves,
                    List<OscillationFinding> oscillations, OutputFolder folder) {
        CircuitDiagram diagram = circuit(s, folder);
        HtmlReport page = new HtmlReport("branchsim run: " + s.name());
        page.paragraph("Scenario file: " + s.file());
        describe(page, s.description(), diagram.inlineSvg());
        Unit pu = s.units().displayUnit(Dimension.PRESSURE);
        Unit qu = s.units().displayUnit(Dimension.VOLUME_FLOW);
        Unit wu = s.units().displayUnit(Dimension.POWER);
        page.heading("Key metrics");
        if (!valves.isEmpty()) {
            String window = String.format(Locale.ROOT, "%.3g s to %.3g s", s.metricsFrom(), s.metricsTo());
            String steadyFrom = String.format(Locale.ROOT, "mean over the last %.0f %% of the window %s",
                    100 * ReducingValveMetrics.STEADY_FRACTION, window);
            List<List<String>> rows = new ArrayList<>();
            for (ReducingValveMetrics m : valves) {
                String out = m.id() + ".p.out";
                rows.add(List.of(m.id(), "setting", num(pu.fromSi(m.setting())), pu.symbol(),
                        "scenario (gauge reading at the outlet at low flow)"));
                rows.add(List.of(m.id(), "steady outlet pressure", num(pu.fromSi(m.steady())), pu.symbol(),
                        out + ", " + steadyFrom));
                rows.add(List.of(m.id(), "deviation from the setting", num(m.deviationPercent()), "%",
                        "steady minus setting, over the setting"));
                rows.add(List.of(m.id(), "peak outlet pressure", num(pu.fromSi(m.peak())), pu.symbol(),
                        String.format(Locale.ROOT, "%s, highest sample in the window %s, at %.4g s", out, window,
                                m.peakTime())));
                rows.add(List.of(m.id(), "overshoot", num(pu.fromSi(m.overshoot()) - pu.fromSi(0)), pu.symbol(),
                        String.format(Locale.ROOT, "peak minus steady; %.2f %% of the setting",
                                m.overshootPercent())));
                rows.add(List.of(m.id(), "settling", settlingValue(m), Double.isNaN(m.settlingTime()) ? "" : "s",
                        RunCommand.settling(m)));
                rows.add(List.of(m.id(), "pilot drain flow", num(qu.fromSi(m.drainFlow())), qu.symbol(),
                        "drain port, " + steadyFrom));
                rows.add(List.of(m.id(), "pilot-stage power loss", num(wu.fromSi(m.drainPower())), wu.symbol(),
                        "damping orifice and pilot seat, " + steadyFrom));
                rows.add(List.of(m.id(), "metering-edge power loss", num(wu.fromSi(m.meteringPower())), wu.symbol(),
                        "flow times pressure drop across the main spool's edge, " + steadyFrom));
            }
            page.table("Reducing valves (settling band +-" + Math.round(100 * ReducingValveMetrics.BAND)
                    + " % of the setting, centred on the setting)", List.of("valve", "quantity", "value", "unit",
                    "measured from"), rows);
        }
        List<List<String>> nodes = new ArrayList<>();
        for (SignalStatistics.Summary m : SignalStatistics.of(r.trace())) {
            if (m.dimension() == Dimension.PRESSURE && r.model().node(m.name().replace(".p", "")) != null) {
                nodes.add(List.of(m.name(), num(pu.fromSi(m.peak())), num(m.peakTime()), num(pu.fromSi(m.last()))));
            }
        }
        page.table("Node pressures over the whole run (gauge)", List.of("signal", "peak [" + pu.symbol() + "]",
                "peak at [s]", "final [" + pu.symbol() + "]"), nodes);
        Unit eu = s.units().displayUnit(Dimension.ENERGY);
        page.paragraph(String.format(Locale.ROOT, "Energy: %.4g %s supplied by the pumps; the balance of supplied, "
                + "stored, lost and delivered energy closes to %.3g %% of the supplied energy.",
                eu.fromSi(r.energy().total(EnergyAccount.Kind.SUPPLY)), eu.symbol(),
                100 * r.energy().relativeResidual()));
        page.heading("Oscillation findings");
        if (oscillations.isEmpty()) {
            page.paragraph("None in the later half of any interval between schedule changes.");
        }
        for (OscillationFinding f : oscillations) {
            page.paragraph(DiagnosisText.describe(f, s.units())
                    + (f.drivenBy() == null ? " (branchsim diagnose names a remedy)." : "."));
        }
        write(page, folder, (pg, report) -> {
            figures(pg, folder.written(), report);
            pg.heading("Solver statistics");
            pg.table("", List.of("quantity", "value"), solverRows(r.statistics()));
        });
    }

    /**
     * The page of a sweep or tolerance study, from what an unsharded study and a merge of its shards both have (so
     * that their folders stay equal byte for byte): the study's definition, its table (a CSV it wrote), its figures
     * (a landing overlay right after the full overlay of its signal, with a sentence on how its window is chosen),
     * and the circuit diagram with the scenario's description as circuit.svg holds them.
     */
    static void study(StudyDefinition study, String tableFile, OutputFolder folder) {
        HtmlReport page = new HtmlReport("branchsim " + study.study() + ": " + study.scenario());
        page.paragraph("Scenario " + study.scenario() + " (file SHA-256 " + study.scenarioSha256() + "); "
                + study.variants() + " variants; parameters: " + String.join(", ", study.parameters()) + ".");
        write(page, folder, (pg, report) -> {
            Path svgFile = report.resolveSibling(CIRCUIT_SVG);
            if (Files.isRegularFile(svgFile)) {
                String svg = Files.readString(svgFile, StandardCharsets.UTF_8);
                Matcher m = DESC.matcher(svg);
                describe(pg, m.find() ? unescape(m.group(1)) : "", svg);
            }
            List<List<String>> rows = StudyCsv.parse(Files.readString(report.resolveSibling(tableFile),
                    StandardCharsets.UTF_8));
            pg.heading("Results (" + tableFile + ", units in the column headings)");
            if (!rows.isEmpty()) {
                int shown = Math.min(rows.size() - 1, MAX_ROWS);
                pg.table("", rows.get(0), rows.subList(1, 1 + shown));
                if (shown < rows.size() - 1) {
                    pg.paragraph("The first " + shown + " of " + (rows.size() - 1) + " rows; all are in " + tableFile
                            + ".");
                }
            }
            if (folder.written().stream().map(f -> f.getFileName().toString())
                    .anyMatch(n -> n.startsWith("overlay-") && n.endsWith("-landing.png"))) {
                pg.paragraph(String.format(Locale.ROOT, "Each overlay-<signal>-landing.png follows its full "
                        + "overlay: the same curves zoomed on the landing, from before the earliest variant's rise "
                        + "through %.0f %% of its setting to after the latest one settles into +-%.0f %% of it, each "
                        + "variant's peak marked by a triangle in its colour.",
                        100 * ReducingValveMetrics.RISE_FRACTION, 100 * ReducingValveMetrics.BAND));
            }
            figures(pg, folder.written(), report);
        });
    }

    /** The page of a diagnosis: its text, its before/after figures. */
    static void diagnose(Scenario s, String diagnosisText, OutputFolder folder) {
        CircuitDiagram diagram = circuit(s, folder);
        HtmlReport page = new HtmlReport("branchsim diagnose: " + s.name());
        page.paragraph("Scenario file: " + s.file());
        describe(page, s.description(), diagram.inlineSvg());
        page.heading("Diagnosis");
        page.preformatted(diagnosisText);
        write(page, folder, (pg, report) -> figures(pg, folder.written(), report));
    }

    /**
     * Writes the scenario's circuit diagram, with its description in the SVG's {@code <desc>}, as circuit.svg and
     * circuit.png (a study writes them into each shard's folder too, for the merge to carry over).
     *
     * @return the diagram
     */
    static CircuitDiagram circuit(Scenario s, OutputFolder folder) {
        CircuitDiagram d = CircuitDiagram.of(s.circuit(), s.name() + ": circuit").describedAs(s.description());
        folder.writeAll(List.of(new OutputFolder.Pending(CIRCUIT_SVG, d::writeSvg),
                new OutputFolder.Pending(CIRCUIT_PNG, d::writePng)));
        return d;
    }

    /** Copies the circuit diagram of a study from one of its shard folders, when it has one. */
    static void copyCircuit(Path shardFolder, OutputFolder folder) {
        for (String name : List.of(CIRCUIT_SVG, CIRCUIT_PNG)) {
            Path from = shardFolder.resolve(name);
            if (Files.isRegularFile(from)) {
                folder.write(name, p -> Files.copy(from, p));
            }
        }
    }

    /** Adds the scenario's description (when it has one) and its circuit diagram. */
    private static void describe(HtmlReport page, String description, String svg) {
        if (description != null && !description.isBlank()) {
            page.heading("Scenario");
            page.paragraph(description);
        }
        page.heading("Circuit");
        page.svg(svg, "Circuit diagram drawn from the scenario's elements and nodes with ISO 1219-1 symbols (pilot "
                + "and drain lines dashed; node names in grey italics on their lines; a tank symbol at every port on a "
                + "tank). Also circuit.svg and circuit.png.");
    }

    private static final Pattern DESC = Pattern.compile("<desc>(.*?)</desc>", Pattern.DOTALL);

    /** @return XML text with the five predefined entities (XML 1.0, section 4.6) replaced by their characters */
    static String unescape(String xml) {
        return xml.replace("&lt;", "<").replace("&gt;", ">").replace("&quot;", "\"").replace("&apos;", "'")
                .replace("&amp;", "&");
    }

    /** What a page adds once the folder holds everything else (the figures it embeds, the tables it reads). */
    @FunctionalInterface
    private interface Rest {
        void add(HtmlReport page, Path report) throws IOException;
    }

    /** Writes the page: the rest added when its file is written, then the cautions. */
    private static void write(HtmlReport page, OutputFolder folder, Rest rest) {
        folder.write(FILE, p -> {
            rest.add(page, p);
            closing(page);
            Files.writeString(p, page.html(), StandardCharsets.UTF_8);
        });
    }

    /** Adds every PNG written so far into the folder (found beside the page being written), circuit.png aside. */
    private static void figures(HtmlReport page, List<Path> written, Path report) throws IOException {
        page.heading("Figures");
        for (Path f : written) {
            String name = f.getFileName().toString();
            if (name.endsWith(".png") && !name.equals("circuit.png")) {
                page.png(Files.readAllBytes(report.resolveSibling(name)), name, name);
            }
        }
    }

    private static void closing(HtmlReport page) {
        List<String> lines = new ArrayList<>();
        String heading = "Caution";
        for (String l : Cautions.FULL.split("\\R")) {
            if (l.startsWith("- ")) {
                lines.add(l.substring(2));
            } else if (l.startsWith("  ") && !lines.isEmpty()) {
                lines.set(lines.size() - 1, lines.get(lines.size() - 1) + " " + l.trim());
            }
        }
        page.caution(heading, lines);
    }

    private static List<List<String>> solverRows(SolverStatistics st) {
        List<List<String>> rows = new ArrayList<>();
        rows.add(List.of("method", st.method()));
        rows.add(List.of("simulated time [s]", num(st.simulatedSeconds())));
        rows.add(List.of("wall-clock time of the integration [s]", num(st.wallSeconds())));
        rows.add(List.of("steps accepted", Long.toString(st.acceptedSteps())));
        rows.add(List.of("steps rejected by the error control", Long.toString(st.rejectedSteps())));
        rows.add(List.of("evaluations of the circuit equations", Long.toString(st.evaluations())));
        rows.add(List.of("Jacobians", Long.toString(st.jacobians())));
        rows.add(List.of("LU factorisations", Long.toString(st.factorisations())));
        st.events().forEach((k, v) -> rows.add(List.of("events: " + k, Integer.toString(v))));
        return rows;
    }

    private static String settlingValue(ReducingValveMetrics m) {
        return Double.isNaN(m.settlingTime()) ? (m.oscillating() ? "oscillates" : "-") : num(m.settlingTime());
    }

    /** @return a value with four significant digits, plain notation where that stays short */
    static String num(double v) {
        if (!Double.isFinite(v)) {
            return "-";
        }
        String s = String.format(Locale.ROOT, "%.4g", v);
        return s.contains("e") ? s : s.replaceFirst("(\\.\\d*?)0+$", "$1").replaceFirst("\\.$", "");
    }
}
