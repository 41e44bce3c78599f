package org.branchsim.cli;

import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.concurrent.Callable;
import org.branchsim.core.error.BranchsimException;
import org.branchsim.core.error.ErrorKey;
import org.branchsim.core.estimate.DesignEvaluation;
import org.branchsim.core.estimate.DesignSearch;
import org.branchsim.core.estimate.FreeParameter;
import org.branchsim.core.estimate.Spec;
import org.branchsim.core.estimate.SpecFile;
import org.branchsim.core.estimate.SpecObjective;
import org.branchsim.core.scenario.Located;
import org.branchsim.core.scenario.Scenario;
import org.branchsim.core.study.ParameterPath;
import org.branchsim.core.study.ToleranceStudy;
import org.branchsim.core.study.ValueText;
import org.branchsim.core.study.Variant;
import org.branchsim.core.units.Dimension;
import org.branchsim.core.units.Tolerance;
import org.branchsim.core.units.Unit;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;

/**
 * {@code branchsim tune SCENARIO --spec FILE}: searches the free parameters of the specification for the design
 * that meets every requirement with the largest worst weighted margin (see {@link DesignEvaluation}): a coarse
 * design of experiments in one parallel batch, then BOBYQA descents from its best points in parallel
 * ({@link DesignSearch}). Reports the best design, every spec's margin and the binding one, and a ranked table of
 * every design tried (designs.csv); writes the best design as a scenario (tuned.json). With tolerances in the
 * specification it runs a tolerance study of the best design and reports the share of builds that meet every spec.
 */
@Command(name = "tune", mixinStandardHelpOptions = true,
        description = {"Search free parameters for a design that meets a specification (metric limits with "
                + "weights): coarse design of experiments, then parallel BOBYQA descents; best design, margins, "
                + "binding spec, ranked designs, optional tolerance check."})
public final class TuneCommand implements Callable<Integer> {

    /** Largest specification file read, bytes. */
    static final long MAX_SPEC_BYTES = 1024 * 1024;

    @Mixin
    private ScenarioArgument scenario;

    @Option(names = "--spec", required = true, paramLabel = "FILE", description = "Specification file (docs/spec-format.md).")
    private Path specFile;

    @Option(names = "--design", paramLabel = "N", description = "Points of the design of experiments (default: "
            + "max(8, 2p + 1)).")
    private Integer design;

    @Option(names = "--descents", defaultValue = "2", paramLabel = "N",
            description = "BOBYQA descents from the best design points, run in parallel (default: ${DEFAULT-VALUE}).")
    private int descents;

    @Option(names = "--max-runs", defaultValue = "60", paramLabel = "N",
            description = "Most model runs of the search, design included (default: ${DEFAULT-VALUE}).")
    private int maxRuns;

    @Option(names = "--threads", paramLabel = "N", description = "Threads (default: the number of cores).")
    private Integer threads;

    @Option(names = "--out", paramLabel = "DIR", description = "Output folder (default: out/<scenario name>-tune).")
    private Path out;

    @CommandLine.Spec
    private CommandLine.Model.CommandSpec spec;

    @Override
    public Integer call() {
        OptionChecks.count("--descents", descents, 1, 64);
        OptionChecks.count("--max-runs", maxRuns, 1, OptionChecks.MAX_VARIANTS);
        int nThreads = OptionChecks.threads(threads);
        SpecFile sf = SpecFile.read(specFile.toString(), read(specFile));
        Scenario s = scenario.load();
        Located doc = s.document();
        for (FreeParameter f : sf.free()) {
            try {
                ParameterPath.parse(f.path()).target(doc);
            } catch (BranchsimException e) {
                throw e.within(specFile + " free");
            }
        }
        int p = sf.free().size();
        int nDesign = design == null ? Math.max(8, 2 * p + 1) : (int) OptionChecks.count("--design", design, 1, maxRuns);
        try (OutputFolder folder = new OutputFolder(out != null ? out : Path.of("out", s.name() + "-tune"),
                scenario.file(), specFile)) {
            SpecObjective objective = new SpecObjective(s.file(), doc, sf, nThreads);
            DesignSearch.Result result = DesignSearch.minimise(objective::objective, p, nDesign, descents, maxRuns,
                    nThreads);
            DesignEvaluation best = objective.evaluation(result.best().u());
            if (best == null || best.error() != null) {
                throw new BranchsimException(ErrorKey.ESTIMATION_FAILED, "tune", best == null ? "no design ran"
                        : best.error());
            }
            StringBuilder text = new StringBuilder();
            ObjectNode json = MetricsReport.mapper().createObjectNode();
            report(s, sf, objective, result, best, text, json);
            Located tuned = doc.copy();
            objective.values(result.best().u()).forEach((path, v) -> ParameterPath.parse(path).setOrAdd(tuned, v));
            if (sf.toleranceRuns() > 0 && !sf.tolerances().isEmpty()) {
                toleranceCheck(sf, objective, result.best().u(), text, json);
            }
            text.append("Caution: ").append(Cautions.SHORT).append(System.lineSeparator());
            json.put("caution", Cautions.SHORT);
            folder.writeText("designs.csv", table(sf, objective, result));
            folder.writeText("tuned.json", LocatedJson.text(tuned));
            folder.writeText("tune.json", MetricsReport.toJson(json));
            folder.writeText("tune.txt", text.toString());
            folder.commit();
            PrintWriter w = spec.commandLine().getOut();
            w.print(text);
            folder.report(w);
        }
        return BranchsimMain.OK;
    }

    private static String read(Path f) {
        try {
            if (!Files.isRegularFile(f) || Files.size(f) > MAX_SPEC_BYTES) {
                throw new BranchsimException(ErrorKey.SPEC_INVALID, f.toString(), "1", "1", "(whole file)",
                        "a specification file of at most " + MAX_SPEC_BYTES + " bytes",
                        Files.exists(f) ? "a folder or a larger file" : "no such file");
            }
            return Files.readString(f);
        } catch (IOException e) {
            throw new BranchsimException(ErrorKey.SPEC_INVALID, f.toString(), "1", "1", "(whole file)",
                    "a readable UTF-8 text file", e.getClass().getSimpleName() + " " + e.getMessage());
        }
    }

    /** @return a metric value in its display unit, with the unit */
    static String show(Scenario s, Spec spec, double v) {
        if (spec.metric().plainNumber()) {
            return Double.isNaN(v) ? "undefined (no operating point at the end of the metrics window)"
                    : String.format(Locale.ROOT, "%.4f", v);
        }
        if (!Double.isFinite(v)) {
            return v > 0 ? "undefined (never settled or failed)" : "-";
        }
        Dimension d = spec.metric().dimension();
        if (d == null) {
            return String.format(Locale.ROOT, "%.3g %%", v);
        }
        Unit u = s.units().displayUnit(d);
        return String.format(Locale.ROOT, "%.4g %s", u.fromSi(v), u.symbol());
    }

    private static String showMargin(Scenario s, Spec spec, double margin) {
        if (!Double.isFinite(margin)) {
            return "-";
        }
        if (spec.metric().plainNumber()) {
            return String.format(Locale.ROOT, "%+.4f", margin);
        }
        Dimension d = spec.metric().dimension();
        if (d == null) {
            return String.format(Locale.ROOT, "%+.3g %%", margin);
        }
        Unit u = s.units().displayUnit(d);
        return String.format(Locale.ROOT, "%+.4g %s", u.fromSi(margin) - u.fromSi(0), u.symbol());
    }

    private void report(Scenario s, SpecFile sf, SpecObjective objective, DesignSearch.Result result,
                        DesignEvaluation best, StringBuilder text, ObjectNode json) {
        long feasible = result.points().stream().filter(pt -> {
            DesignEvaluation e = objective.evaluation(pt.u());
            return e != null && e.feasible();
        }).count();
        int firstFeasible = result.points().stream().filter(pt -> {
            DesignEvaluation e = objective.evaluation(pt.u());
            return e != null && e.feasible();
        }).mapToInt(DesignSearch.Point::run).min().orElse(-1);
        text.append(String.format(Locale.ROOT, "tune %s against %s (valve %s): %d model runs, %d designs meet every "
                + "spec%s%n", s.name(), specFile, sf.valve(), result.points().size(), feasible,
                firstFeasible > 0 ? ", the first at run " + firstFeasible : ""));
        text.append(String.format(Locale.ROOT, "best design (run %d, %s): %s%n", result.best().run(),
                result.best().source(), best.feasible() ? "MEETS every spec" : "does NOT meet every spec"));
        json.put("scenario", s.name());
        json.put("valve", sf.valve());
        json.put("modelRuns", result.points().size());
        json.put("feasibleDesigns", feasible);
        json.put("firstFeasibleRun", firstFeasible);
        json.put("objectiveDefinition", "max over specs of weight x normalised violation; violation = (value - "
                + "limit)/|limit| for max, (limit - value)/|limit| for min; <= 0 meets every spec");
        ObjectNode b = json.putObject("best");
        b.put("run", result.best().run());
        b.put("objective", best.objective());
        b.put("meetsEverySpec", best.feasible());
        ObjectNode values = b.putObject("values");
        Map<String, Object> v = objective.values(result.best().u());
        for (FreeParameter f : sf.free()) {
            text.append(String.format(Locale.ROOT, "  %-46s %s   (bounds %s .. %s %s)%n", f.path(), v.get(f.path()),
                    ValueText.format(f.low()), ValueText.format(f.high()), f.unit()));
            values.put(f.path(), String.valueOf(v.get(f.path())));
        }
        text.append(String.format(Locale.ROOT, "  %-28s %22s %24s %8s%n", "spec", "value", "margin", "weight"));
        ArrayNode specs = b.putArray("specs");
        for (int i = 0; i < sf.specs().size(); i++) {
            Spec sp = sf.specs().get(i);
            double val = best.values()[i];
            text.append(String.format(Locale.ROOT, "  %-28s %22s %24s %8s%s%n", sp.describe(), show(s, sp, val),
                    showMargin(s, sp, sp.margin(val)), ValueText.format(sp.weight()),
                    i == best.binding() ? "  <- binds" : ""));
            ObjectNode j = specs.addObject();
            j.put("spec", sp.describe());
            MetricsReport.putFinite(j, "value_SI_or_percent", val);
            MetricsReport.putFinite(j, "margin_SI_or_percent", sp.margin(val));
            j.put("normalisedViolation", best.violations()[i]);
            j.put("binds", i == best.binding());
        }
        text.append("ranked designs: designs.csv; best design as a scenario: tuned.json").append(System.lineSeparator());
    }

    private static String table(SpecFile sf, SpecObjective objective, DesignSearch.Result result) {
        StringBuilder sb = new StringBuilder("rank,run,source");
        for (FreeParameter f : sf.free()) {
            sb.append(',').append(StudyTable.field(f.path() + (f.unit().isEmpty() ? "" : " [" + f.unit() + "]")));
        }
        for (Spec sp : sf.specs()) {
            String unit = sp.metric().plainNumber() ? " [-]" : sp.metric().dimension() == null ? " [%]"
                    : " [" + sp.metric().dimension().siSymbol() + "]";
            sb.append(',').append(StudyTable.field(sp.metric().key() + unit));
        }
        sb.append(",objective,meets_every_spec,binding_spec,error\n");
        int rank = 0;
        for (DesignSearch.Point pt : result.ranked()) {
            DesignEvaluation e = objective.evaluation(pt.u());
            sb.append(++rank).append(',').append(pt.run()).append(',').append(pt.source());
            for (int k = 0; k < sf.free().size(); k++) {
                sb.append(',').append(ValueText.format(sf.free().get(k).value(pt.u()[k])));
            }
            for (int i = 0; i < sf.specs().size(); i++) {
                sb.append(',').append(e == null ? "" : String.format(Locale.ROOT, "%.6g", e.values()[i]));
            }
            sb.append(',').append(String.format(Locale.ROOT, "%.6g", pt.value()));
            sb.append(',').append(e != null && e.feasible());
            sb.append(',').append(e == null || e.binding() < 0 ? "" : StudyTable.field(sf.specs().get(e.binding()).describe()));
            sb.append(',').append(e == null || e.error() == null ? "" : StudyTable.field(e.error()));
            sb.append('\n');
        }
        return sb.toString();
    }

    private static void toleranceCheck(SpecFile sf, SpecObjective objective, double[] best, StringBuilder text,
                                       ObjectNode json) {
        Map<String, Object> values = objective.values(best);
        List<ToleranceStudy.Parameter> params = new ArrayList<>();
        for (Map.Entry<String, String> t : sf.tolerances().entrySet()) {
            Object nominal = values.get(t.getKey());
            if (nominal == null) {
                throw new BranchsimException(ErrorKey.SPEC_INVALID, "tolerances", "1", "1", t.getKey(),
                        "a path among the free parameters", "\"" + t.getKey() + "\"");
            }
            Tolerance tol;
            try {
                tol = Tolerance.parse(nominal + " \u00b1 " + t.getValue());
            } catch (IllegalArgumentException e) {
                tol = null;
            }
            if (tol == null) {
                throw new BranchsimException(ErrorKey.SPEC_INVALID, "tolerances", "1", "1", t.getKey(),
                        "a tolerance in the parameter's unit or in %, e.g. \"0.02 mm\" or \"5 %\"",
                        "\"" + t.getValue() + "\"");
            }
            params.add(new ToleranceStudy.Parameter(t.getKey(), tol));
        }
        List<Variant> drawn = ToleranceStudy.draw(params, sf.toleranceRuns(), sf.toleranceSeed());
        List<Variant> variants = new ArrayList<>();
        for (Variant d : drawn) {
            Map<String, Object> v = new LinkedHashMap<>(values);
            v.putAll(d.values());
            variants.add(new Variant(d.index(), v));
        }
        List<DesignEvaluation> e = objective.evaluateVariants(variants);
        long ok = e.stream().filter(DesignEvaluation::feasible).count();
        long failed = e.stream().filter(x -> x.error() != null).count();
        text.append(String.format(Locale.ROOT, "tolerance check of the best design: %d of %d builds (%.1f %%) meet every "
                + "spec (%d runs failed); each toleranced value drawn uniformly within its limits, seed %d%n", ok,
                e.size(), 100.0 * ok / e.size(), failed, sf.toleranceSeed()));
        ObjectNode t = json.putObject("toleranceCheck");
        t.put("builds", e.size());
        t.put("meetEverySpec", ok);
        t.put("share", (double) ok / e.size());
        t.put("failedRuns", failed);
        t.put("seed", sf.toleranceSeed());
        for (int i = 0; i < sf.specs().size(); i++) {
            final int idx = i;
            long met = e.stream().filter(x -> x.error() == null && x.violations()[idx] <= 0).count();
            t.put(sf.specs().get(i).describe(), met);
        }
    }
}
