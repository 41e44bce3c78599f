package org.branchsim.cli;

import java.io.PrintWriter;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Arrays;
import java.util.Locale;
import java.util.Map;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.branchsim.core.study.Variant;
import org.branchsim.core.units.Dimension;
import org.branchsim.core.units.Unit;
import org.branchsim.core.units.UnitSystem;
import org.branchsim.core.units.Units;
import org.branchsim.plots.HeatMap;
import org.branchsim.plots.SweepOverlay;
import org.branchsim.plots.TraceCharts;

/**
 * The results of a whole sweep, from its rows in variant order: the ranked table on the console,
 * summary.csv, one overlay figure per signal (coloured by the first varied value past six variants), for a reducing
 * valve's outlet pressure a second one zoomed on the landing of every variant and, for a
 * two-parameter grid, a heat map of the ranking metric. Both an unsharded sweep and a merge of its shards write
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
        ReportPage.study(study, "summary.csv", folder);
    }

    /**
     * Writes one overlay per signal: past {@link SweepOverlay#MAX_LEGEND} variants, coloured by the first varied
     * parameter's value with a colour bar; for a reducing valve's outlet pressure, the landing overlay
     * ({@code overlay-<signal>-landing.png}); and, for a two-parameter grid, a heat map of the ranking metric.
     */
    private static void writeOverlays(SweepDefinition study, List<StudyTable.Row> rows, OutputFolder folder) {
        List<StudyTable.Row> ok = rows.stream().filter(StudyTable.Row::ok).toList();
        if (ok.isEmpty()) {
            return;
        }
        SweepDefinition.Axis first = study.axes().get(0);
        Unit unit = unitOf(first.values());
        String varied = shortPath(first.path()) + (unit == null ? "" : " [" + unit.symbol() + "]");
        for (var column : study.overlay()) {
            String signal = column.name();
            List<SweepOverlay.Variant> runs = new ArrayList<>();
            for (StudyTable.Row r : ok) {
                runs.add(new SweepOverlay.Variant(new TraceCharts.Labelled(label(r.variant()), r.overlay()),
                        number(r.variant().values().get(first.path()), unit)));
            }
            String file = "overlay-" + FigureSet.slug(signal) + ".png";
            folder.write(file, p -> SweepOverlay.save(runs, signal, varied, study.scenario() + " sweep: " + signal,
                    study.units(), p));
            List<SweepOverlay.Landed> landed = landed(signal, ok, runs, study.units());
            if (!landed.isEmpty()) {
                folder.write(landingFile(signal), p -> SweepOverlay.saveLanding(landed, signal, varied,
                        study.scenario() + " sweep: landing of " + signal, study.units(), p));
            }
        }
        if (study.axes().size() == 2 && study.rankBy() != null) {
            SweepDefinition.Axis second = study.axes().get(1);
            double[][] metric = grid(rows, first, second, study.rankBy());
            Unit u2 = unitOf(second.values());
            folder.write("heatmap-" + FigureSet.slug(study.rankBy()) + ".png", p -> HeatMap.save(first.values(),
                    second.values(), metric, varied, shortPath(second.path()) + (u2 == null ? "" : " [" + u2.symbol()
                            + "]"), study.rankBy(), study.scenario() + " sweep: " + study.rankBy() + " over the grid",
                    p));
        }
    }

    /** @return the file name of the landing overlay of a signal, beside its full overlay */
    static String landingFile(String signal) {
        return "overlay-" + FigureSet.slug(signal) + "-landing.png";
    }

    /**
     * @param signal an overlay signal
     * @param ok the rows that ran, in the order of {@code runs}
     * @param runs their overlay variants
     * @param units the unit system the metrics are in
     * @return each variant with its setting and peak when the signal is a reducing valve's outlet pressure (its
     *         metrics have the valve's steady outlet pressure and deviation), else nothing. The setting is found
     *         from the variant's own metrics, steady / (1 + deviation / 100), since a variant may change it
     */
    static List<SweepOverlay.Landed> landed(String signal, List<StudyTable.Row> ok, List<SweepOverlay.Variant> runs,
                                            UnitSystem units) {
        String suffix = ".p.out";
        if (!signal.endsWith(suffix)) {
            return List.of();
        }
        String id = signal.substring(0, signal.length() - suffix.length());
        Unit pu = units.displayUnit(Dimension.PRESSURE);
        String steadyColumn = id + ".steadyOutlet [" + pu.symbol() + "]";
        String deviationColumn = id + ".deviation [%]";
        String peakColumn = id + ".peakOutlet [" + pu.symbol() + "]";
        List<SweepOverlay.Landed> out = new ArrayList<>();
        for (int k = 0; k < ok.size(); k++) {
            Map<String, Double> m = ok.get(k).metrics();
            Double steady = m.get(steadyColumn);
            Double deviation = m.get(deviationColumn);
            if (steady == null || deviation == null) {
                return List.of();
            }
            double setting = pu.toSi(steady / (1 + deviation / 100));
            if (!(setting > 0) || Double.isInfinite(setting)) {
                return List.of();
            }
            Double peak = m.get(peakColumn);
            out.add(new SweepOverlay.Landed(runs.get(k), setting, peak == null ? Double.NaN : pu.toSi(peak)));
        }
        return out;
    }

    /** @return the metric at each grid point [first axis index][second axis index], NaN where the run failed */
    static double[][] grid(List<StudyTable.Row> rows, SweepDefinition.Axis first, SweepDefinition.Axis second,
                           String metric) {
        double[][] z = new double[first.values().size()][second.values().size()];
        for (double[] col : z) {
            Arrays.fill(col, Double.NaN);
        }
        for (StudyTable.Row r : rows) {
            int i = first.values().indexOf(String.valueOf(r.variant().values().get(first.path())));
            int j = second.values().indexOf(String.valueOf(r.variant().values().get(second.path())));
            Double v = r.ok() ? r.metrics().get(metric) : null;
            if (i >= 0 && j >= 0 && v != null) {
                z[i][j] = v;
            }
        }
        return z;
    }

    private static final Pattern NUMBER_AND_UNIT =
            Pattern.compile("^\\s*([-+]?(?:\\d+\\.?\\d*|\\.\\d+)(?:[eE][-+]?\\d+)?)\\s*(.*?)\\s*$");

    /** @return the unit the first value is written in, null when it is a plain number or not a number */
    static Unit unitOf(List<String> values) {
        Matcher m = NUMBER_AND_UNIT.matcher(values.isEmpty() ? "" : values.get(0));
        return m.matches() && !m.group(2).isEmpty() ? Units.find(m.group(2)) : null;
    }

    /** @return a varied value as a number in the given unit (plain numbers as they are), NaN when it is not one */
    static double number(Object value, Unit unit) {
        if (value instanceof Number n) {
            return n.doubleValue();
        }
        Matcher m = NUMBER_AND_UNIT.matcher(String.valueOf(value));
        if (!m.matches()) {
            return Double.NaN;
        }
        double x = Double.parseDouble(m.group(1));
        if (m.group(2).isEmpty()) {
            return unit == null ? x : Double.NaN;
        }
        Unit u = Units.find(m.group(2));
        if (u == null || unit == null || u.dimension() != unit.dimension()) {
            return Double.NaN;
        }
        return unit.fromSi(u.toSi(x));
    }

    /** @return a parameter path shortened to its last two parts */
    static String shortPath(String path) {
        return path.substring(path.lastIndexOf('.', path.lastIndexOf('.') - 1) + 1);
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
