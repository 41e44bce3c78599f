package org.branchsim.cli;

import java.io.PrintWriter;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Locale;
import org.branchsim.core.study.ToleranceStudy;
import org.branchsim.core.study.ValueText;
import org.branchsim.plots.HistogramChart;

/**
 * The results of a whole tolerance study, from its rows in run order: runs.csv, statistics.csv (mean, P5,
 * P95, extremes of every metric), the histogram of one metric and the table on the console. Both an
 * unsharded study and a merge of its shards write through here, so that their folders are the same.
 */
final class ToleranceReport {

    private ToleranceReport() {
    }

    /**
     * Refuses a study in which every run failed, writes the files into the (uncommitted) folder and prints
     * the statistics.
     *
     * @param study the study's definition
     * @param rows every run's row, in index order
     * @param folder the output folder
     * @param w the console
     * @throws org.branchsim.core.error.BranchsimException STUDY_FAILED (exit code 1) when no run succeeded
     */
    static void write(ToleranceDefinition study, List<StudyTable.Row> rows, OutputFolder folder, PrintWriter w) {
        StudyTable.requireOneSuccess(rows);
        List<String> cols = StudyTable.columns(rows);
        List<ToleranceStudy.Statistics> stats = new ArrayList<>();
        for (String c : cols) {
            stats.add(ToleranceStudy.statistics(c, values(rows, c)));
        }
        folder.writeText("runs.csv", StudyTable.csv(study.parameters(), rows, cols));
        StringBuilder sum = new StringBuilder("metric,runs,mean,p5,p95,min,max\n");
        for (ToleranceStudy.Statistics s : stats) {
            sum.append(StudyTable.field(s.metric())).append(',').append(s.count()).append(',')
                    .append(StudyTable.field(s.mean())).append(',').append(StudyTable.field(s.p5())).append(',')
                    .append(StudyTable.field(s.p95())).append(',').append(StudyTable.field(s.min())).append(',')
                    .append(StudyTable.field(s.max())).append('\n');
        }
        folder.writeText("statistics.csv", sum.toString());
        String metric = study.histogram();
        double[] values = Arrays.stream(values(rows, metric)).filter(Double::isFinite).toArray();
        if (values.length > 0) {
            folder.write("histogram-" + FigureSet.slug(metric) + ".png", p -> HistogramChart.save(values,
                    Math.max(5, (int) Math.ceil(Math.sqrt(values.length))),
                    study.scenario() + ": " + metric + " over " + values.length + " runs", metric, p));
        }
        ReportPage.study(study, "statistics.csv", folder);
        w.printf("%s: %d runs, seed %d, %d failed; toleranced values:%n", study.scenario(), study.runs(), study.seed(),
                rows.stream().filter(r -> !r.ok()).count());
        for (ToleranceStudy.Parameter p : study.tolerances()) {
            w.printf(Locale.ROOT, "  %s: %s, drawn uniformly from %s to %s %s%n", p.path(), p.tolerance().nominal(),
                    ValueText.format(p.tolerance().low()), ValueText.format(p.tolerance().high()), p.tolerance().unit());
        }
        w.printf("%-44s %10s %10s %10s %10s %10s%n", "metric", "mean", "P5", "P95", "min", "max");
        for (ToleranceStudy.Statistics s : stats) {
            w.printf(Locale.ROOT, "%-44s %10.4g %10.4g %10.4g %10.4g %10.4g%n", s.metric(), s.mean(), s.p5(), s.p95(),
                    s.min(), s.max());
        }
    }

    private static double[] values(List<StudyTable.Row> rows, String metric) {
        return rows.stream().mapToDouble(r -> r.metrics().getOrDefault(metric, Double.NaN)).toArray();
    }
}
