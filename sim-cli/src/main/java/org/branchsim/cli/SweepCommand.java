package org.branchsim.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.concurrent.Callable;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.branchsim.core.elements.ReducingValve;
import org.branchsim.core.error.BranchsimException;
import org.branchsim.core.error.ErrorKey;
import org.branchsim.core.scenario.Scenario;
import org.branchsim.core.study.ParameterPath;
import org.branchsim.core.study.StudyRunner;
import org.branchsim.core.study.ValueText;
import org.branchsim.core.study.Variant;
import org.branchsim.plots.TraceCharts;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;

/**
 * {@code branchsim sweep}: varies scenario parameters over lists or ranges (several form a grid), runs the
 * variants in parallel, and writes summary.csv (one row per variant), overlay figures and a ranked table.
 */
@Command(name = "sweep", mixinStandardHelpOptions = true,
        description = "Vary parameters (a list or a range each; several form a grid), run the variants in parallel, "
                + "write summary.csv and overlay figures, print them ranked by a metric.")
public final class SweepCommand implements Callable<Integer> {

    private static final Pattern RANGE = Pattern.compile("^(.+?)\\s*\\.\\.\\s*(.+?)\\s*:\\s*(\\d+)$");

    @Mixin
    private ScenarioArgument scenario;

    @Option(names = "--vary", required = true, paramLabel = "PATH=VALUES",
            description = "A parameter and its values: a list \"0.5 mm,0.7 mm,0.9 mm\" or a range \"0.5 mm..1 mm:6\" "
                    + "(from..to:count). PATH as elements.prv.dampingOrifice.diameter. Repeat for a grid.")
    private List<String> vary;

    @Option(names = "--threads", paramLabel = "N", description = "Threads (default: all cores).")
    private Integer threads;

    @Option(names = "--rank-by", paramLabel = "METRIC", description = "summary.csv column to rank by (default: the "
            + "first overshoot column, else the first metric).")
    private String rankBy;

    @Option(names = "--descending", description = "Rank largest first.")
    private boolean descending;

    @Option(names = "--signals", split = ",", paramLabel = "SIGNAL",
            description = "Signals to overlay (default: the outlet of the first reducing valve, else the first node pressure).")
    private List<String> signals;

    @Option(names = "--out", paramLabel = "DIR", description = "Output folder (default: out/<scenario name>-sweep).")
    private Path out;

    @CommandLine.Spec
    private CommandLine.Model.CommandSpec spec;

    @Override
    public Integer call() {
        Scenario base = scenario.load();
        Map<String, List<Object>> axes = new LinkedHashMap<>();
        for (String v : vary) {
            int eq = v.indexOf('=');
            if (eq <= 0) {
                throw new BranchsimException(ErrorKey.BAD_ARGUMENT, "--vary: expected PATH=VALUES, found \"" + v + "\"");
            }
            String path = v.substring(0, eq).trim();
            ParameterPath.parse(path).find(base.document());
            axes.put(path, values(v.substring(eq + 1).trim(), path));
        }
        List<Variant> variants = grid(axes);
        List<String> overlay = overlaySignals(base);
        int n = threads == null ? Runtime.getRuntime().availableProcessors() : Math.max(1, threads);
        PrintWriter err = spec.commandLine().getErr();
        long start = System.nanoTime();
        List<StudyTable.Row> rows = StudyRunner.run(base.file(), base.document(), variants, n,
                done -> progress(err, done, variants.size(), start), o -> StudyTable.Row.of(o, base.units(), overlay));
        err.println();
        OutputFolder folder = new OutputFolder(out != null ? out : Path.of("out", base.name() + "-sweep"));
        List<String> cols = StudyTable.columns(rows);
        String metric = rankBy != null ? rankBy : cols.stream().filter(c -> c.contains("overshoot")).findFirst()
                .orElse(cols.isEmpty() ? null : cols.get(0));
        if (metric != null && !cols.contains(metric)) {
            throw new BranchsimException(ErrorKey.BAD_ARGUMENT, "--rank-by: expected a summary.csv column ("
                    + String.join(", ", cols) + "), found \"" + metric + "\"");
        }
        folder.writeText("summary.csv", StudyTable.csv(new ArrayList<>(axes.keySet()), rows, cols));
        writeOverlays(base, rows, overlay, folder);
        printRanked(rows, metric);
        PrintWriter w = spec.commandLine().getOut();
        folder.report(w);
        w.println("Caution: " + Cautions.SHORT);
        return BranchsimMain.OK;
    }

    /** @return the signals to overlay: those asked for (checked), else the first reducing valve's outlet or node */
    private List<String> overlaySignals(Scenario base) {
        if (signals != null && !signals.isEmpty()) {
            for (String signal : signals) {
                if (base.circuit().signal(signal) == null) {
                    throw new BranchsimException(ErrorKey.BAD_ARGUMENT, "--signals: no signal \"" + signal
                            + "\" in this circuit");
                }
            }
            return signals;
        }
        return List.of(ReducingValve.firstOutletSignal(base.circuit())
                .orElse(base.circuit().nodes().stream().filter(nd -> !nd.isTank())
                        .map(nd -> nd.id() + ".p").findFirst().orElse(base.circuit().signals().get(0).name())));
    }

    static List<Object> values(String spec, String path) {
        List<Object> out = new ArrayList<>();
        Matcher m = RANGE.matcher(spec);
        if (m.matches()) {
            int count = Integer.parseInt(m.group(3));
            Object from = parseValue(m.group(1), path);
            Object to = parseValue(m.group(2), path);
            String unitFrom = unitOf(from);
            String unitTo = unitOf(to);
            if (count < 2 || !unitFrom.equals(unitTo)) {
                throw new BranchsimException(ErrorKey.BAD_ARGUMENT, "--vary " + path
                        + ": a range needs the same unit at both ends and a count of at least 2, found \"" + spec + "\"");
            }
            double a = numberOf(from);
            double b = numberOf(to);
            for (int i = 0; i < count; i++) {
                double x = a + (b - a) * i / (count - 1);
                out.add(unitFrom.isEmpty() ? (Object) x : ValueText.format(x) + " " + unitFrom);
            }
            return out;
        }
        for (String part : spec.split(",")) {
            if (!part.isBlank()) {
                out.add(parseValue(part.trim(), path));
            }
        }
        if (out.isEmpty()) {
            throw new BranchsimException(ErrorKey.BAD_ARGUMENT, "--vary " + path + ": no values in \"" + spec + "\"");
        }
        return out;
    }

    private static Object parseValue(String text, String path) {
        try {
            Object scaled = ValueText.scale(text, 1.0);
            return scaled instanceof Double ? scaled : text;
        } catch (IllegalArgumentException e) {
            throw new BranchsimException(ErrorKey.BAD_ARGUMENT, "--vary " + path
                    + ": expected a number with its unit such as \"0.8 mm\", found \"" + text + "\"");
        }
    }

    private static String unitOf(Object v) {
        if (v instanceof Double) {
            return "";
        }
        String s = String.valueOf(v).trim();
        int sp = s.indexOf(' ');
        return sp < 0 ? s.replaceAll("^[-+0-9.eE]+", "") : s.substring(sp + 1).trim();
    }

    private static double numberOf(Object v) {
        if (v instanceof Double d) {
            return d;
        }
        String s = String.valueOf(v).trim();
        return Double.parseDouble(s.replaceAll("^([-+]?[0-9.]+(?:[eE][-+]?\\d+)?).*$", "$1"));
    }

    /** Cartesian product, the first parameter varying slowest. */
    static List<Variant> grid(Map<String, List<Object>> axes) {
        List<Map<String, Object>> combos = new ArrayList<>();
        combos.add(new LinkedHashMap<>());
        for (Map.Entry<String, List<Object>> axis : axes.entrySet()) {
            List<Map<String, Object>> next = new ArrayList<>();
            for (Map<String, Object> c : combos) {
                for (Object value : axis.getValue()) {
                    Map<String, Object> m = new LinkedHashMap<>(c);
                    m.put(axis.getKey(), value);
                    next.add(m);
                }
            }
            combos = next;
        }
        List<Variant> out = new ArrayList<>();
        for (int i = 0; i < combos.size(); i++) {
            out.add(new Variant(i, combos.get(i)));
        }
        return out;
    }

    static void progress(PrintWriter err, int done, int total, long start) {
        double elapsed = (System.nanoTime() - start) * 1e-9;
        double left = done == 0 ? Double.NaN : elapsed / done * (total - done);
        boolean console = System.console() != null;
        int step = Math.max(1, total / 10);
        if (!console && total > 0 && done % step != 0 && done != total) {
            return; // a log file gets a line every tenth of the work, a terminal a live line
        }
        synchronized (err) {
            if (!console) {
                err.printf(Locale.ROOT, total > 0 ? "variants %d/%d done, about %.0f s left%n" : "variants %d done%n",
                        done, total, left);
                err.flush();
                return;
            }
            if (total > 0) {
                err.printf(Locale.ROOT, "\rvariants %d/%d done, about %.0f s left   ", done, total, left);
            } else {
                err.printf(Locale.ROOT, "\rvariants %d done, %.0f s so far   ", done, elapsed);
            }
            err.flush();
        }
    }

    private void writeOverlays(Scenario base, List<StudyTable.Row> rows, List<String> overlay, OutputFolder folder) {
        List<StudyTable.Row> ok = rows.stream().filter(StudyTable.Row::ok).toList();
        if (ok.isEmpty()) {
            return;
        }
        for (String signal : overlay) {
            List<TraceCharts.Labelled> runs = new ArrayList<>();
            for (StudyTable.Row r : ok) {
                runs.add(new TraceCharts.Labelled(label(r.variant()), r.overlay()));
            }
            String file = "overlay-" + FigureSet.slug(signal) + ".png";
            folder.write(file, p -> TraceCharts.compare(runs, signal, base.name() + " sweep: " + signal, base.units(), p));
        }
    }

    static String label(Variant v) {
        List<String> parts = new ArrayList<>();
        v.values().forEach((k, val) -> parts.add(k.substring(k.lastIndexOf('.', k.lastIndexOf('.') - 1) + 1) + "=" + val));
        return String.join(", ", parts);
    }

    private void printRanked(List<StudyTable.Row> rows, String metric) {
        PrintWriter w = spec.commandLine().getOut();
        List<Integer> order = new ArrayList<>();
        for (int i = 0; i < rows.size(); i++) {
            order.add(i);
        }
        if (metric != null) {
            order.sort(Comparator.comparingDouble(i -> {
                Double v = rows.get(i).metrics().get(metric);
                return v == null || !Double.isFinite(v) ? Double.MAX_VALUE : (descending ? -v : v);
            }));
        }
        w.printf("%d variants, ranked by %s%s:%n", rows.size(), metric, descending ? " (largest first)" : "");
        for (int i : order) {
            StudyTable.Row r = rows.get(i);
            Double v = metric == null ? null : r.metrics().get(metric);
            w.printf(Locale.ROOT, "  #%-3d %-50s %s%n", r.variant().index(), label(r.variant()),
                    r.ok() ? (v == null ? "-" : String.format(Locale.ROOT, "%.4g", v)) : "FAILED: " + r.error());
        }
    }
}
