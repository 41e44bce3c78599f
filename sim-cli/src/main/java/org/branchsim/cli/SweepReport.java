package org.branchsim.cli;

import java.io.PrintWriter;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Locale;
import org.branchsim.core.study.Variant;
import org.branchsim.plots.TraceCharts;

/**
 * The results of a whole sweep, from its rows in variant order: the ranked table on the console,
 * summary.csv and one overlay figure per signal. Both an unsharded sweep and a merge of its shards write
 * through here, so that their folders are the same.
 */
final class SweepReport {

    private SweepReport() {
    }

    /**
     * Prints the ranking, refuses a study in which every variant failed, and writes summary.csv and the
     * overlays into the (uncommitted) folder.
     *
     * @param study the sweep's definition
     * @param rows every variant's row, in index order
     * @param folder the output folder
     * @param out the console
     * @throws org.branchsim.core.error.BranchsimException STUDY_FAILED (exit code 1) when no variant ran
     */
    static void write(SweepDefinition study, List<StudyTable.Row> rows, OutputFolder folder, PrintWriter out) {
        printRanked(rows, study.rankBy(), study.descending(), out);
        StudyTable.requireOneSuccess(rows);
        List<String> cols = StudyTable.columns(rows);
        folder.writeText("summary.csv", StudyTable.csv(study.parameters(), rows, cols,
                StudyTable.ranks(rows, study.rankBy(), study.descending())));
        writeOverlays(study, rows, folder);
    }

    private static void writeOverlays(SweepDefinition study, List<StudyTable.Row> rows, OutputFolder folder) {
        List<StudyTable.Row> ok = rows.stream().filter(StudyTable.Row::ok).toList();
        if (ok.isEmpty()) {
            return;
        }
        for (var column : study.overlay()) {
            String signal = column.name();
            List<TraceCharts.Labelled> runs = new ArrayList<>();
            for (StudyTable.Row r : ok) {
                runs.add(new TraceCharts.Labelled(label(r.variant()), r.overlay()));
            }
            String file = "overlay-" + FigureSet.slug(signal) + ".png";
            folder.write(file, p -> TraceCharts.compare(runs, signal, study.scenario() + " sweep: " + signal,
                    study.units(), p));
        }
    }

    /** @return a variant's values as "name=value, ..." with each path shortened to its last two parts */
    static String label(Variant v) {
        List<String> parts = new ArrayList<>();
        v.values().forEach((k, val) -> parts.add(k.substring(k.lastIndexOf('.', k.lastIndexOf('.') - 1) + 1) + "=" + val));
        return String.join(", ", parts);
    }

    private static void printRanked(List<StudyTable.Row> rows, String metric, boolean descending, PrintWriter w) {
        int[] rank = StudyTable.ranks(rows, metric, descending);
        List<Integer> order = new ArrayList<>();
        for (int i = 0; i < rows.size(); i++) {
            order.add(i);
        }
        // ranked rows first, best first; then those without a rank, in variant order
        order.sort(Comparator.comparingInt(i -> rank[i] > 0 ? rank[i] : Integer.MAX_VALUE));
        w.printf("%d variants, ranked by %s%s:%n", rows.size(), metric, descending ? " (largest first)" : "");
        for (int i : order) {
            StudyTable.Row r = rows.get(i);
            Double v = metric == null ? null : r.metrics().get(metric);
            w.printf(Locale.ROOT, "  %4s  variant %-3d %-50s %s%n", rank[i] > 0 ? rank[i] + "." : "-",
                    r.variant().index(), label(r.variant()),
                    r.ok() ? (v == null ? "-" : String.format(Locale.ROOT, "%.4g", v)) : "FAILED: " + r.error());
        }
    }
}
