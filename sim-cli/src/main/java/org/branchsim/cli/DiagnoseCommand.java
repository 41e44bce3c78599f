package org.branchsim.cli;

import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.Callable;
import org.branchsim.core.analysis.OscillationFinding;
import org.branchsim.core.analysis.ReducingValveMetrics;
import org.branchsim.core.elements.ReducingValve;
import org.branchsim.core.scenario.Scenario;
import org.branchsim.core.study.Diagnosis;
import org.branchsim.core.units.Unit;
import org.branchsim.core.units.UnitSystem;
import org.branchsim.plots.TraceCharts;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;

/**
 * {@code branchsim diagnose SCENARIO}: finds hunting or chatter, names the part that oscillates and its
 * mode, tries the usual remedies on the parts that take part and reports, in plain words, which cure it
 * and at what cost, with before/after figures.
 */
@Command(name = "diagnose", mixinStandardHelpOptions = true,
        description = "Find hunting or chatter, name the part that oscillates, try the usual remedies on it and "
                + "report which cure it and what each costs in overshoot and settling, with before/after figures.")
public final class DiagnoseCommand implements Callable<Integer> {

    @Mixin
    private ScenarioArgument scenario;

    @Option(names = "--threads", paramLabel = "N", description = "Threads for the remedy runs (default: all cores).")
    private Integer threads;

    @Option(names = "--out", paramLabel = "DIR", description = "Output folder (default: out/<scenario name>-diagnosis).")
    private Path out;

    @CommandLine.Spec
    private CommandLine.Model.CommandSpec spec;

    @Override
    public Integer call() {
        Scenario s = scenario.load();
        int n = threads == null ? Runtime.getRuntime().availableProcessors() : Math.max(1, threads);
        PrintWriter err = spec.commandLine().getErr();
        long start = System.nanoTime();
        Diagnosis.Report r = Diagnosis.run(s, n, done -> SweepCommand.progress(err, done, -1, start));
        err.println();
        String text = text(r);
        OutputFolder folder = new OutputFolder(out != null ? out : Path.of("out", s.name() + "-diagnosis"), scenario.file());
        folder.writeText("diagnosis.txt", text);
        folder.writeText("diagnosis.json", MetricsReport.toJson(json(r)));
        if (!r.findings().isEmpty()) {
            String signal = r.findings().get(0).dominant().signal();
            Diagnosis.Trial best = r.recommended();
            List<TraceCharts.Labelled> runs = best == null
                    ? List.of(new TraceCharts.Labelled("as is", r.baseline().trace()))
                    : List.of(new TraceCharts.Labelled("as is", r.baseline().trace()),
                            new TraceCharts.Labelled("with " + best.remedy().change(), best.outcome().result().trace()));
            folder.write("before-after-" + FigureSet.slug(signal) + ".png",
                    p -> TraceCharts.compare(runs, signal, s.name() + ": before and after", s.units(), p));
            for (String other : List.of(outletOf(r))) {
                if (other != null && !other.equals(signal)) {
                    folder.write("before-after-" + FigureSet.slug(other) + ".png",
                            p -> TraceCharts.compare(runs, other, s.name() + ": before and after", s.units(), p));
                }
            }
        }
        folder.commit();
        PrintWriter w = spec.commandLine().getOut();
        w.print(text);
        folder.report(w);
        return BranchsimMain.OK;
    }

    private static String outletOf(Diagnosis.Report r) {
        return ReducingValve.firstOutletSignal(r.baseline().circuit()).orElse(null);
    }

    static String describe(OscillationFinding f, UnitSystem units) {
        Unit u = units.displayUnit(f.dominantDimension());
        String what = f.kind() == OscillationFinding.Kind.CHATTER
                ? String.format(Locale.ROOT, "chatter: %s strikes its seat or stop %.0f times a second", f.impactingMember(),
                        f.impactsPerSecond())
                : "hunting (no seat impacts)";
        return String.format(Locale.ROOT, "%s at %.1f Hz, %s; strongest in %s (amplitude %.3g %s); parts: %s", what,
                f.frequency(), f.trend().label(), f.dominant().signal(), u.fromSi(f.dominant().endAmplitude()) - u.fromSi(0),
                u.symbol(), String.join(", ", f.elements()));
    }

    private static String cost(ReducingValveMetrics m) {
        if (m == null) {
            return "";
        }
        return String.format(Locale.ROOT, "overshoot %.1f %% of setting, %s", m.overshootPercent(),
                Double.isFinite(m.settlingTime()) ? String.format(Locale.ROOT, "settles in %.3f s", m.settlingTime())
                        : "does not settle into +-2 %");
    }

    static String text(Diagnosis.Report r) {
        StringBuilder sb = new StringBuilder();
        String nl = System.lineSeparator();
        Scenario s = r.scenario();
        sb.append("branchsim diagnose: ").append(s.name()).append(" (").append(s.file()).append(')').append(nl);
        if (r.findings().isEmpty()) {
            sb.append("No sustained oscillation after the transients: no hunting or chatter found.").append(nl);
            sb.append(Cautions.FULL).append(nl);
            return sb.toString();
        }
        sb.append("Found:").append(nl);
        for (OscillationFinding f : r.findings()) {
            sb.append("  - ").append(describe(f, s.units())).append(nl);
        }
        if (r.mode() != null) {
            sb.append(String.format(Locale.ROOT, "Nearest linearised mode (at the end of the run): %.1f Hz, damping ratio %.3f%s; "
                    + "it lives mostly in %s.%n", r.mode().naturalFrequency(), r.mode().dampingRatio(),
                    r.mode().dampingRatio() < 0 ? " (unstable)" : r.mode().lightlyDamped() ? " (lightly damped)" : "",
                    r.mode().elements().stream().map(e -> String.format(Locale.ROOT, "%s (%.0f %%)", e.name(), 100 * e.share()))
                            .reduce((a, b) -> a + ", " + b).orElse("-")));
        }
        if (r.baselineMetrics() != null) {
            sb.append("As it is: ").append(cost(r.baselineMetrics())).append('.').append(nl);
        }
        sb.append("Remedies tried on ").append(String.join(", ", r.parts())).append(':').append(nl);
        for (Diagnosis.Trial t : r.trials()) {
            String result;
            if (!t.outcome().ok()) {
                result = "the run failed: " + t.outcome().error();
            } else if (t.cures()) {
                result = "REMOVES the oscillation; " + cost(t.metrics());
            } else {
                OscillationFinding left = t.remaining().get(0);
                result = String.format(Locale.ROOT, "does not cure it (%s remains at %.1f Hz)", left.kind().label(), left.frequency());
            }
            sb.append(String.format(Locale.ROOT, "  - %s (%s): %s%n", t.remedy().change(), t.remedy().what(), result));
        }
        if (r.recommended() != null) {
            Diagnosis.Trial b = r.recommended();
            sb.append(String.format(Locale.ROOT, "Recommended: change %s from %s to %s (%s). With it: %s.%n",
                    b.remedy().path(), b.remedy().from(), b.remedy().to(), b.remedy().what(), cost(b.metrics())));
            sb.append("Check the change on the machine before relying on it.").append(nl);
        } else {
            sb.append("None of the single changes tried removes the oscillation; try combinations with 'branchsim sweep'.")
                    .append(nl);
        }
        sb.append(Cautions.FULL).append(nl);
        return sb.toString();
    }

    private static ObjectNode json(Diagnosis.Report r) {
        ObjectNode root = MetricsReport.mapper().createObjectNode();
        root.put("scenario", r.scenario().name());
        root.put("caution", Cautions.SHORT);
        ArrayNode found = root.putArray("oscillations");
        for (OscillationFinding f : r.findings()) {
            found.add(MetricsReport.finding(f, r.scenario().units()));
        }
        if (r.mode() != null) {
            ObjectNode m = root.putObject("nearestMode");
            m.put("naturalFrequency_Hz", r.mode().naturalFrequency());
            m.put("dampingRatio", r.mode().dampingRatio());
            ObjectNode e = m.putObject("elements");
            r.mode().elements().forEach(sh -> e.put(sh.name(), sh.share()));
        }
        ArrayNode trials = root.putArray("remedies");
        for (Diagnosis.Trial t : r.trials()) {
            ObjectNode o = trials.addObject();
            o.put("path", t.remedy().path());
            o.put("from", t.remedy().from());
            o.put("to", String.valueOf(t.remedy().to()));
            o.put("what", t.remedy().what());
            o.put("cures", t.cures());
            if (!t.outcome().ok()) {
                o.put("error", t.outcome().error());
            }
            if (t.metrics() != null) {
                o.put("overshootPercentOfSetting", MetricsReport.round(t.metrics().overshootPercent()));
                if (Double.isFinite(t.metrics().settlingTime())) {
                    o.put("settlingTime_s", MetricsReport.round(t.metrics().settlingTime()));
                } else {
                    o.putNull("settlingTime_s");
                }
            }
        }
        if (r.recommended() != null) {
            root.put("recommended", r.recommended().remedy().change());
        } else {
            root.putNull("recommended");
        }
        return root;
    }
}
