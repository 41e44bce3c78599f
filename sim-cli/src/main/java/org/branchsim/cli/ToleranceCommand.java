package org.branchsim.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.Callable;
import org.branchsim.core.error.BranchsimException;
import org.branchsim.core.error.ErrorKey;
import org.branchsim.core.scenario.Scenario;
import org.branchsim.core.study.StudyRunner;
import org.branchsim.core.study.ToleranceStudy;
import org.branchsim.core.study.Variant;
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

    @Option(names = "--shard", paramLabel = "K/N",
            description = "Run only shard K of N (run i goes to shard (i mod N) + 1; every run's values are drawn "
                    + "as in the whole study) and write a shard folder (default: "
                    + "out/<scenario name>-tolerance-shard-K-of-N) for 'branchsim merge'.")
    private String shard;

    @CommandLine.Spec
    private CommandLine.Model.CommandSpec spec;

    @Override
    public Integer call() {
        OptionChecks.count("--runs", runs, 2, OptionChecks.MAX_VARIANTS);
        Shard part = shard == null ? null : Shard.parse(shard).requireAtMost(runs);
        int n = OptionChecks.threads(threads);
        Scenario base = scenario.load();
        Path target = out != null ? out
                : Path.of("out", base.name() + "-tolerance" + (part == null ? "" : part.folderSuffix()));
        try (OutputFolder folder = new OutputFolder(target, scenario.file())) {
            List<ToleranceStudy.Parameter> params = ToleranceStudy.parameters(base.document());
            if (params.isEmpty()) {
                throw new BranchsimException(ErrorKey.NO_TOLERANCED_VALUE, base.file() + ":" + base.document().line() + ":"
                        + base.document().column());
            }
            List<String> predicted = StudyTable.columnsOf(base);
            String metric = histogram != null ? StudyTable.resolve("--histogram", histogram, predicted)
                    : predicted.stream().filter(c -> c.contains("overshoot")).findFirst().orElse(predicted.get(0));
            ToleranceDefinition study = new ToleranceDefinition(base.name(), StudyDefinition.sha256(scenario.file()),
                    runs, seed, metric, params);
            // every run's values come from the one generator in run order; a shard keeps its own runs
            List<Variant> variants = ToleranceStudy.draw(params, runs, seed);
            List<Variant> toRun = part == null ? variants : part.select(variants);
            PrintWriter err = spec.commandLine().getErr();
            List<StudyTable.Row> rows = StudyRunner.run(base.file(), base.document(), toRun, n,
                    new VariantProgress(err, toRun.size())::done, o -> StudyTable.Row.of(o, base.units(), List.of()));
            err.println();
            ReportPage.circuit(base, folder);
            StudyOutput.finish(study, part, rows, folder, spec.commandLine().getOut(),
                    (r, out, pw) -> ToleranceReport.write(study, r, out, pw));
        }
        return BranchsimMain.OK;
    }
}
