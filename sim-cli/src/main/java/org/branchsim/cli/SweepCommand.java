package org.branchsim.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.ArrayList;
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
import org.branchsim.core.results.Trace;
import org.branchsim.core.scenario.Located;
import org.branchsim.core.scenario.Scenario;
import org.branchsim.core.scenario.ScenarioLoader;
import org.branchsim.core.study.ParameterPath;
import org.branchsim.core.study.StudyRunner;
import org.branchsim.core.study.ValueText;
import org.branchsim.core.study.Variant;
import org.branchsim.core.units.Dimension;
import org.branchsim.core.units.Quantity;
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

    private static final Pattern RANGE = Pattern.compile("^(.+?)\\s*\\.\\.\\s*(.+?)\\s*:\\s*(\\S+)$");
    private static final Pattern NUMBER_AND_UNIT =
            Pattern.compile("^([-+]?(?:\\d+\\.?\\d*|\\.\\d+)(?:[eE][-+]?\\d+)?)\\s*(.*?)$");


    @Mixin
    private ScenarioArgument scenario;

    @Option(names = "--vary", required = true, paramLabel = "PATH=VALUES",
            description = "A parameter and its values: a list \"0.5 mm,0.7 mm,0.9 mm\" or a range \"0.5 mm..1 mm:6\" "
                    + "(from..to:count). PATH as elements.reducer.dampingOrifice.diameter. Repeat for a grid.")
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

    @Option(names = "--shard", paramLabel = "K/N",
            description = "Run only shard K of N (variant i goes to shard (i mod N) + 1) and write a shard folder "
                    + "(default: out/<scenario name>-sweep-shard-K-of-N) for 'branchsim merge'.")
    private String shard;

    @CommandLine.Spec
    private CommandLine.Model.CommandSpec spec;

    @Override
    public Integer call() {
        Shard part = shard == null ? null : Shard.parse(shard);
        Scenario base = scenario.load();
        int n = OptionChecks.threads(threads);
        Path target = out != null ? out
                : Path.of("out", base.name() + "-sweep" + (part == null ? "" : part.folderSuffix()));
        try (OutputFolder folder = new OutputFolder(target, scenario.file())) {
            Map<String, List<Object>> axes = axes(base);
            List<Variant> variants = grid(axes);
            if (part != null) {
                part.requireAtMost(variants.size());
            }
            List<String> overlay = overlaySignals(base);
            List<String> predicted = StudyTable.columnsOf(base);
            String metric = rankBy != null ? StudyTable.resolve("--rank-by", rankBy, predicted)
                    : predicted.stream().filter(c -> c.contains("overshoot")).findFirst().orElse(predicted.get(0));
            SweepDefinition study = SweepDefinition.of(base.name(), StudyDefinition.sha256(scenario.file()),
                    base.units(), axes, metric, descending, overlay.stream()
                            .map(s -> new Trace.Column(s, base.circuit().signal(s).dimension())).toList());
            List<Variant> toRun = part == null ? variants : part.select(variants);
            PrintWriter err = spec.commandLine().getErr();
            List<StudyTable.Row> rows = StudyRunner.run(base.file(), base.document(), toRun, n,
                    new VariantProgress(err, toRun.size())::done, o -> StudyTable.Row.of(o, base.units(), overlay));
            err.println();
            ReportPage.circuit(base, folder);
            StudyOutput.finish(study, part, rows, folder, spec.commandLine().getOut(),
                    (r, out, pw) -> SweepReport.write(study, r, out, pw));
        }
        return BranchsimMain.OK;
    }

    /** @return the --vary options as parameter path to values, each checked against the scenario */
    private Map<String, List<Object>> axes(Scenario base) {
        Map<String, List<Object>> axes = new LinkedHashMap<>();
        long size = 1;
        for (String v : vary) {
            int eq = v.indexOf('=');
            if (eq <= 0) {
                throw OptionChecks.unreadable("--vary", "PATH=VALUES, e.g. \"elements.reducer.dampingOrifice.diameter="
                        + "0.5 mm..1 mm:6\"", "\"" + v + "\"");
            }
            String path = v.substring(0, eq).trim();
            if (axes.containsKey(path)) {
                throw OptionChecks.repeated("--vary", "parameter", path + " twice");
            }
            String valuesText = v.substring(eq + 1).trim();
            List<Object> values = values(valuesText, path, dimensionAt(base, path));
            checkValues(base, path, values, RANGE.matcher(valuesText).matches());
            axes.put(path, values);
            size *= values.size();
            if (size > OptionChecks.MAX_VARIANTS) {
                throw OptionChecks.outOfRange("--vary", "a grid of at most " + OptionChecks.MAX_VARIANTS + " variants",
                        "more (" + axes.values().stream().map(l -> Integer.toString(l.size()))
                        .collect(java.util.stream.Collectors.joining(" x ")) + " so far)");
            }
        }
        return axes;
    }

    /** @return the signals to overlay: those asked for (checked), else the first reducing valve's outlet or node */
    private List<String> overlaySignals(Scenario base) {
        if (signals != null && !signals.isEmpty()) {
            for (String signal : signals) {
                if (base.circuit().signal(signal) == null) {
                    throw new BranchsimException(ErrorKey.UNKNOWN_SIGNAL, "--signals",
                            base.circuit().signals().get(0).name(), signal);
                }
            }
            if (signals.stream().distinct().count() < signals.size()) {
                throw OptionChecks.repeated("--signals", "signal", String.join(",", signals));
            }
            return signals;
        }
        return List.of(ReducingValve.firstOutletSignal(base.circuit())
                .orElse(base.circuit().nodes().stream().filter(nd -> !nd.isTank())
                        .map(nd -> nd.id() + ".p").findFirst().orElse(base.circuit().signals().get(0).name())));
    }

    /** @return the dimension of the value at a path of the scenario (which must exist and be a number) */
    static Dimension dimensionAt(Scenario base, String path) {
        Located at;
        try {
            at = ParameterPath.parse(path).find(base.document());
        } catch (BranchsimException e) {
            throw e.within("--vary");
        }
        Dimension d = at instanceof Located.Scalar sc ? ValueText.dimensionOf(sc.value()) : null;
        if (d == null) {
            throw new BranchsimException(ErrorKey.PARAMETER_NOT_NUMERIC, "--vary " + path, at.describe());
        }
        return d;
    }

    /**
     * @param spec the values after '=': a list "a,b,c" or a range "from..to:count"
     * @param path the parameter path (for messages)
     * @param dimension the dimension of the field the path names
     * @return the values, as the scenario would write them
     */
    static List<Object> values(String spec, String path, Dimension dimension) {
        String option = "--vary " + path;
        List<Object> out = new ArrayList<>();
        Matcher m = RANGE.matcher(spec);
        if (m.matches()) {
            String countText = m.group(3);
            if (!countText.matches("\\d+")) {
                throw OptionChecks.unreadable(option, "a whole count after ':' (from..to:count)", "\"" + countText + "\"");
            }
            if (countText.length() > 9) {
                throw OptionChecks.outOfRange(option + " (count after ':')", "a whole number from 2 to "
                        + OptionChecks.MAX_VARIANTS, countText);
            }
            long count = OptionChecks.count(option + " (count after ':')", Long.parseLong(countText), 2,
                    OptionChecks.MAX_VARIANTS);
            Quantity.Parsed from = parseValue(m.group(1), option, dimension);
            Quantity.Parsed to = parseValue(m.group(2), option, dimension);
            String written = unitWritten(m.group(1));
            for (long i = 0; i < count; i++) {
                double si = from.si() + (to.si() - from.si()) * i / (count - 1);
                if (from.unit() == null || written.isEmpty()) {
                    out.add(si);
                } else {
                    out.add(ValueText.format(from.unit().fromSi(si)) + " " + written);
                }
            }
            return out;
        }
        if (spec.contains("..")) {
            throw OptionChecks.unreadable(option, "a range with a count, from..to:count such as \"0.5 mm..1 mm:6\"",
                    "\"" + spec + "\"");
        }
        for (String part : spec.split(",")) {
            if (!part.isBlank()) {
                Quantity.Parsed p = parseValue(part.trim(), option, dimension);
                out.add(p.unit() == null || unitWritten(part).isEmpty() ? (Object) p.si() : part.trim());
            }
        }
        if (out.isEmpty()) {
            throw OptionChecks.unreadable(option, "one or more values", "\"" + spec + "\"");
        }
        return out;
    }

    private static Quantity.Parsed parseValue(String text, String option, Dimension dimension) {
        Quantity.Parsed p = Quantity.parse(text.trim(), dimension);
        if (!p.ok()) {
            throw OptionChecks.unreadable(option, p.error() + " (the field is a " + dimension.humanName() + ")",
                    "\"" + text.trim() + "\"");
        }
        return p;
    }

    /** @return the unit as the user wrote it after the number (empty for a bare number) */
    private static String unitWritten(String text) {
        Matcher m = NUMBER_AND_UNIT.matcher(text.trim());
        return m.matches() ? m.group(2) : "";
    }

    /**
     * Builds the scenario with each value of one parameter (of a range, its two ends suffice: bounds are
     * intervals) so that a value the scenario refuses is named before any run.
     */
    private static void checkValues(Scenario base, String path, List<Object> values, boolean range) {
        List<Object> probe = range ? List.of(values.get(0), values.get(values.size() - 1)) : values;
        for (Object value : probe) {
            Located copy = base.document().copy();
            ParameterPath.parse(path).setOrAdd(copy, value);
            try {
                ScenarioLoader.build(base.file(), copy);
            } catch (BranchsimException e) {
                String why = e.problems().isEmpty() ? e.getMessage()
                        : e.problems().get(0).path() + ": expected " + e.problems().get(0).expected();
                throw new BranchsimException(ErrorKey.PARAMETER_VALUE_REFUSED, "--vary " + path, why, String.valueOf(value));
            }
        }
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

}
