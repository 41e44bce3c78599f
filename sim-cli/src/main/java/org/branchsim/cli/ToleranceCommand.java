package org.branchsim.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.Callable;
import org.branchsim.core.error.BranchsimException;
import org.branchsim.core.error.ErrorKey;
import org.branchsim.core.scenario.Scenario;
import org.branchsim.core.study.StudyRunner;
import org.branchsim.core.study.ToleranceStudy;
import org.branchsim.core.study.ValueText;
import org.branchsim.core.study.Variant;
import org.branchsim.plots.HistogramChart;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;

/**
 * {@code branchsim tolerance SCENARIO --runs N --seed S}: Monte Carlo over the values the scenario writes
 * with a tolerance; reports mean, P5, P95 and extremes of every metric and a histogram of one.
 */
@Command(name = "tolerance", mixinStandardHelpOptions = true,
        description = "Monte Carlo over the values the scenario writes with a tolerance (\"0.8 mm ± 0.02 mm\", "
                + "\"15 N/mm ± 10 %%\", \"1.2 GPa .. 1.6 GPa\"); report mean, P5, P95 and worst cases of every metric.")
public final class ToleranceCommand implements Callable<Integer> {

    @Mixin
    private ScenarioArgument scenario;

    @Option(names = "--runs", paramLabel = "N", defaultValue = "100", description = "Number of runs (default ${DEFAULT-VALUE}).")
    private int runs;

    @Option(names = "--seed", paramLabel = "S", defaultValue = "1", description = "Random seed (default ${DEFAULT-VALUE}); same seed, same numbers.")
    private long seed;

    @Option(names = "--threads", paramLabel = "N", description = "Threads (default: all cores).")
    private Integer threads;

    @Option(names = "--histogram", paramLabel = "METRIC",
            description = "Metric to draw as a histogram (default: the first overshoot, else the first metric).")
    private String histogram;

    @Option(names = "--out", paramLabel = "DIR", description = "Output folder (default: out/<scenario name>-tolerance).")
    private Path out;

    @CommandLine.Spec
    private CommandLine.Model.CommandSpec spec;

    @Override
    public Integer call() {
        OptionChecks.count("--runs", runs, 2, OptionChecks.MAX_VARIANTS);
        int n = OptionChecks.threads(threads);
        Scenario base = scenario.load();
        try (OutputFolder folder = new OutputFolder(out != null ? out : Path.of("out", base.name() + "-tolerance"),
                scenario.file())) {
            List<ToleranceStudy.Parameter> params = ToleranceStudy.parameters(base.document());
            if (params.isEmpty()) {
                throw new BranchsimException(ErrorKey.NO_TOLERANCED_VALUE, base.file() + ":" + base.document().line() + ":"
                        + base.document().column());
            }
            List<String> predicted = StudyTable.columnsOf(base);
            String metric = histogram != null ? StudyTable.resolve("--histogram", histogram, predicted)
                    : predicted.stream().filter(c -> c.contains("overshoot")).findFirst().orElse(predicted.get(0));
            List<Variant> variants = ToleranceStudy.draw(params, runs, seed);
            PrintWriter err = spec.commandLine().getErr();
            List<StudyTable.Row> rows = StudyRunner.run(base.file(), base.document(), variants, n,
                    new VariantProgress(err, runs)::done, o -> StudyTable.Row.of(o, base.units(), List.of()));
            err.println();
            StudyTable.requireOneSuccess(rows);
            List<String> cols = StudyTable.columns(rows);
            List<ToleranceStudy.Statistics> stats = new ArrayList<>();
            for (String c : cols) {
                stats.add(ToleranceStudy.statistics(c, values(rows, c)));
            }
            folder.writeText("runs.csv", StudyTable.csv(params.stream().map(ToleranceStudy.Parameter::path).toList(),
                    rows, cols));
            StringBuilder sum = new StringBuilder("metric,runs,mean,p5,p95,min,max\n");
            for (ToleranceStudy.Statistics s : stats) {
                sum.append(StudyTable.field(s.metric())).append(',').append(s.count()).append(',')
                        .append(StudyTable.field(s.mean())).append(',').append(StudyTable.field(s.p5())).append(',')
                        .append(StudyTable.field(s.p95())).append(',').append(StudyTable.field(s.min())).append(',')
                        .append(StudyTable.field(s.max())).append('\n');
            }
            folder.writeText("statistics.csv", sum.toString());
            double[] values = java.util.Arrays.stream(values(rows, metric)).filter(Double::isFinite).toArray();
            if (values.length > 0) {
                folder.write("histogram-" + FigureSet.slug(metric) + ".png", p -> HistogramChart.save(values,
                        Math.max(5, (int) Math.ceil(Math.sqrt(values.length))),
                        base.name() + ": " + metric + " over " + values.length + " runs", metric, p));
            }
            folder.commit();
            PrintWriter w = spec.commandLine().getOut();
            w.printf("%s: %d runs, seed %d, %d failed; toleranced values:%n", base.name(), runs, seed,
                    rows.stream().filter(r -> !r.ok()).count());
            for (ToleranceStudy.Parameter p : params) {
                w.printf(Locale.ROOT, "  %s: %s, drawn uniformly from %s to %s %s%n", p.path(), p.tolerance().nominal(),
                        ValueText.format(p.tolerance().low()), ValueText.format(p.tolerance().high()), p.tolerance().unit());
            }
            w.printf("%-44s %10s %10s %10s %10s %10s%n", "metric", "mean", "P5", "P95", "min", "max");
            for (ToleranceStudy.Statistics s : stats) {
                w.printf(Locale.ROOT, "%-44s %10.4g %10.4g %10.4g %10.4g %10.4g%n", s.metric(), s.mean(), s.p5(), s.p95(),
                        s.min(), s.max());
            }
            folder.report(w);
            w.println("Caution: " + Cautions.SHORT);
        }
        return BranchsimMain.OK;
    }

    private static double[] values(List<StudyTable.Row> rows, String metric) {
        return rows.stream().mapToDouble(r -> r.metrics().getOrDefault(metric, Double.NaN)).toArray();
    }
}
