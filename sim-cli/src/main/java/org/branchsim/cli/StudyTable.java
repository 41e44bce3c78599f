package org.branchsim.cli;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.branchsim.core.analysis.OscillationFinding;
import org.branchsim.core.analysis.OscillationScan;
import org.branchsim.core.analysis.ReducingValveMetrics;
import org.branchsim.core.analysis.SignalStatistics;
import org.branchsim.core.elements.ReducingValve;
import org.branchsim.core.error.BranchsimException;
import org.branchsim.core.error.ErrorKey;
import org.branchsim.core.model.CircuitModel;
import org.branchsim.core.model.Element;
import org.branchsim.core.model.Node;
import org.branchsim.core.model.SignalHandle;
import org.branchsim.core.results.SolverStatistics;
import org.branchsim.core.results.Trace;
import org.branchsim.core.scenario.Scenario;
import org.branchsim.core.study.Variant;
import org.branchsim.core.study.VariantOutcome;
import org.branchsim.core.units.Dimension;
import org.branchsim.core.units.Unit;
import org.branchsim.core.units.UnitSystem;
import org.branchsim.core.units.Units;

/**
 * Flattens the metrics of study variants into named numeric columns (units in the names) for summary.csv,
 * ranking and statistics. Columns are deterministic: no wall-clock times.
 */
final class StudyTable {

    /**
     * What a study keeps of one variant: its values, its error (null when it ran), its metrics and the
     * signals chosen for overlays (null when none).
     */
    record Row(Variant variant, String error, Map<String, Double> metrics, Trace overlay) {
        boolean ok() {
            return error == null;
        }

        /** Reduces an outcome to a row, on the worker thread. */
        static Row of(VariantOutcome o, UnitSystem units, List<String> overlaySignals) {
            if (!o.ok()) {
                return new Row(o.variant(), o.error(), Map.of(), null);
            }
            Trace overlay = overlaySignals.isEmpty() ? null : o.result().trace().select(overlaySignals);
            return new Row(o.variant(), null, StudyTable.metrics(o, units), overlay);
        }
    }

    private StudyTable() {
    }

    /** @return metric name to value (display units), in a fixed order, for one successful variant */
    static Map<String, Double> metrics(VariantOutcome o, UnitSystem units) {
        Map<String, Double> m = new LinkedHashMap<>();
        Scenario s = o.scenario();
        Unit p = units.displayUnit(Dimension.PRESSURE);
        Unit q = units.displayUnit(Dimension.VOLUME_FLOW);
        Unit w = units.displayUnit(Dimension.POWER);
        for (ReducingValveMetrics v : ReducingValveMetrics.of(o.result(), s.metricsFrom(), s.metricsTo())) {
            List<String> names = valveColumns(v.id(), units);
            double[] values = {p.fromSi(v.peak()), p.fromSi(v.steady()), v.overshootPercent(), v.deviationPercent(),
                v.settlingTime(), q.fromSi(v.drainFlow()), w.fromSi(v.drainPower()), w.fromSi(v.meteringPower())};
            for (int i = 0; i < values.length; i++) {
                m.put(names.get(i), values[i]);
            }
        }
        for (SignalStatistics.Summary sum : SignalStatistics.of(o.result().trace())) {
            if (sum.dimension() == Dimension.PRESSURE && isNode(o.result().model(), sum.name())) {
                List<String> names = nodeColumns(sum.name(), units);
                m.put(names.get(0), p.fromSi(sum.peak()));
                m.put(names.get(1), p.fromSi(sum.last()));
            }
        }
        List<OscillationFinding> osc = OscillationScan.scan(o.result());
        SolverStatistics st = o.result().statistics();
        double[] values = {osc.size(), osc.isEmpty() ? 0.0 : osc.get(0).frequency(), st.acceptedSteps(),
            st.evaluations(), 100 * o.result().energy().relativeResidual()};
        for (int i = 0; i < values.length; i++) {
            m.put(RUN_COLUMNS.get(i), values[i]);
        }
        return m;
    }

    /** Columns every successful variant has, after those of valves and nodes. */
    private static final List<String> RUN_COLUMNS = List.of("oscillations", "oscillation.frequency [Hz]",
            "solver.steps", "solver.evaluations", "energy.residual [%]");

    private static List<String> valveColumns(String id, UnitSystem units) {
        String p = units.displayUnit(Dimension.PRESSURE).symbol();
        String q = units.displayUnit(Dimension.VOLUME_FLOW).symbol();
        String w = units.displayUnit(Dimension.POWER).symbol();
        String k = id + ".";
        return List.of(k + "peakOutlet [" + p + "]", k + "steadyOutlet [" + p + "]", k + "overshoot [%]",
                k + "deviation [%]", k + "settlingTime [s]", k + "drainFlow [" + q + "]", k + "drainPower [" + w + "]",
                k + "meteringPower [" + w + "]");
    }

    private static List<String> nodeColumns(String signal, UnitSystem units) {
        String p = units.displayUnit(Dimension.PRESSURE).symbol();
        return List.of(signal + ".peak [" + p + "]", signal + ".final [" + p + "]");
    }

    private static boolean isNode(CircuitModel circuit, String signal) {
        if (!signal.endsWith(".p")) {
            return false;
        }
        Node n = circuit.node(signal.substring(0, signal.length() - 2));
        return n != null && !n.isTank();
    }

    /**
     * @param s a checked scenario (not run)
     * @return the metric columns a successful run of it has, in summary.csv order: known before any run, so
     *         that --rank-by and --histogram can be checked first
     */
    static List<String> columnsOf(Scenario s) {
        List<String> cols = new ArrayList<>();
        for (Element e : s.circuit().elements()) {
            if (e instanceof ReducingValve v) {
                cols.addAll(valveColumns(v.id(), s.units()));
            }
        }
        for (SignalHandle h : s.circuit().signals()) {
            if (h.dimension() == Dimension.PRESSURE && isNode(s.circuit(), h.name())) {
                cols.addAll(nodeColumns(h.name(), s.units()));
            }
        }
        cols.addAll(RUN_COLUMNS);
        return cols;
    }

    /** @throws BranchsimException STUDY_FAILED (exit code 1) when no variant ran */
    static void requireOneSuccess(List<StudyTable.Row> rows) {
        if (!rows.isEmpty() && rows.stream().noneMatch(StudyTable.Row::ok)) {
            StudyTable.Row first = rows.get(0);
            throw new BranchsimException(ErrorKey.STUDY_FAILED, String.valueOf(rows.size()),
                    String.valueOf(first.variant().index()), first.error());
        }
    }

    /**
     * Finds the metric a user names: the column name with or without its unit, in any case.
     *
     * @param option the option, for the message (e.g. "--rank-by")
     * @param asked what the user wrote
     * @param columns the columns
     * @return the column
     * @throws BranchsimException UNKNOWN_METRIC listing the valid names
     */
    static String resolve(String option, String asked, List<String> columns) {
        String key = withoutUnit(asked);
        List<String> hits = columns.stream()
                .filter(c -> c.equalsIgnoreCase(asked.trim()) || withoutUnit(c).equals(key)).toList();
        if (hits.size() == 1) {
            return hits.get(0);
        }
        throw new BranchsimException(ErrorKey.UNKNOWN_METRIC, option,
                String.join(", ", columns), asked);
    }

    private static String withoutUnit(String column) {
        return column.trim().replaceAll("\\s*\\[[^\\]]*\\]$", "").toLowerCase(Locale.ROOT);
    }

    /** @return every metric column name over all successful variants, in first-seen order */
    static List<String> columns(List<Row> rows) {
        List<String> cols = new ArrayList<>();
        for (Row r : rows) {
            for (String k : r.metrics().keySet()) {
                if (!cols.contains(k)) {
                    cols.add(k);
                }
            }
        }
        return cols;
    }

    /**
     * @param parameters varied parameter paths (columns after the variant id)
     * @param rows the rows
     * @param cols metric columns
     * @return the CSV text: variant id, parameters, status, error, metrics (no rank column)
     */
    static String csv(List<String> parameters, List<Row> rows, List<String> cols) {
        return csv(parameters, rows, cols, null);
    }

    /**
     * Writes the table a spreadsheet reads: the variant id (its 0-based position in the study), the rank when
     * {@code ranks} is given (1 = best, empty for a failed variant or one without the metric), each varied
     * parameter as a number in the unit written in its header ({@code elements.prv.dampingOrifice.diameter [mm]},
     * the unit of the first variant's value; text that is not a number with a unit stays text), status, error
     * and the metrics (integers as integers).
     *
     * @param parameters varied parameter paths
     * @param rows the rows, in variant order
     * @param cols metric columns
     * @param ranks rank of each row (same order as rows), or null for no rank column
     * @return the CSV text
     */
    static String csv(List<String> parameters, List<Row> rows, List<String> cols, int[] ranks) {
        StringBuilder sb = new StringBuilder("variant");
        if (ranks != null) {
            sb.append(",rank");
        }
        List<Unit> units = new ArrayList<>();
        for (String p : parameters) {
            Unit u = parameterUnit(p, rows);
            units.add(u);
            sb.append(',').append(field(u == null || u.symbol().equals("1") ? p : p + " [" + u.symbol() + "]"));
        }
        sb.append(",status,error");
        for (String c : cols) {
            sb.append(',').append(field(c));
        }
        sb.append('\n');
        for (int i = 0; i < rows.size(); i++) {
            Row r = rows.get(i);
            sb.append(r.variant().index());
            if (ranks != null) {
                sb.append(',').append(ranks[i] > 0 ? String.valueOf(ranks[i]) : "");
            }
            for (int k = 0; k < parameters.size(); k++) {
                sb.append(',').append(parameterField(r.variant().values().get(parameters.get(k)), units.get(k)));
            }
            sb.append(',').append(r.ok() ? "ok" : "failed").append(',').append(field(r.error()));
            for (String c : cols) {
                sb.append(',').append(field(r.metrics().get(c)));
            }
            sb.append('\n');
        }
        return sb.toString();
    }

    private static final Pattern NUMBER_AND_UNIT =
            Pattern.compile("^\\s*([-+]?(?:\\d+\\.?\\d*|\\.\\d+)(?:[eE][-+]?\\d+)?)\\s*(.*?)\\s*$");

    /** @return the unit of the first variant's value of a parameter written as a number with a known unit, or null */
    private static Unit parameterUnit(String parameter, List<Row> rows) {
        for (Row r : rows) {
            Object v = r.variant().values().get(parameter);
            if (v != null) {
                Matcher m = NUMBER_AND_UNIT.matcher(String.valueOf(v));
                return m.matches() && !m.group(2).isEmpty() ? Units.find(m.group(2)) : null;
            }
        }
        return null;
    }

    /** @return a parameter value as a number in the column's unit, or as text when it is not one */
    private static String parameterField(Object value, Unit column) {
        if (value instanceof Number n) {
            return field(n.doubleValue());
        }
        String text = String.valueOf(value);
        Matcher m = NUMBER_AND_UNIT.matcher(text);
        if (value != null && m.matches()) {
            double number = Double.parseDouble(m.group(1));
            if (m.group(2).isEmpty() && column == null) {
                return field(number);
            }
            Unit u = m.group(2).isEmpty() ? null : Units.find(m.group(2));
            if (column != null && u != null && u.dimension() == column.dimension()) {
                return field(u.symbol().equals(column.symbol()) ? number : column.fromSi(u.toSi(number)));
            }
        }
        return field(value == null ? null : text);
    }

    /**
     * Ranks rows by a metric: 1 for the best (smallest, or largest when descending), ties kept in variant order,
     * 0 for a failed row or one without a finite value of the metric.
     *
     * @param rows rows in variant order
     * @param metric the metric column, or null for no ranking (every rank 0)
     * @param descending true when larger is better
     * @return rank per row
     */
    static int[] ranks(List<Row> rows, String metric, boolean descending) {
        int[] rank = new int[rows.size()];
        if (metric == null) {
            return rank;
        }
        List<Integer> order = new ArrayList<>();
        for (int i = 0; i < rows.size(); i++) {
            Double v = rows.get(i).metrics().get(metric);
            if (rows.get(i).ok() && v != null && Double.isFinite(v)) {
                order.add(i);
            }
        }
        order.sort(Comparator.comparingDouble(i -> descending ? -rows.get(i).metrics().get(metric)
                : rows.get(i).metrics().get(metric)));
        for (int k = 0; k < order.size(); k++) {
            rank[order.get(k)] = k + 1;
        }
        return rank;
    }

    /** @return a number's text with the zeros that end its mantissa removed ("0.2000000" to "0.2") */
    private static String withoutTrailingZeros(String number) {
        int e = number.indexOf('e');
        String mantissa = e < 0 ? number : number.substring(0, e);
        String exponent = e < 0 ? "" : number.substring(e);
        if (mantissa.contains(".")) {
            mantissa = mantissa.replaceAll("0+$", "").replaceAll("\\.$", "");
        }
        return mantissa + exponent;
    }

    /** Largest magnitude written as an integer when a value is whole. */
    private static final double LARGEST_WHOLE = 1e15;

    /**
     * @return a CSV field: whole numbers as integers ("8049"), other numbers with at most 7 significant digits,
     *         text quoted when needed
     */
    static String field(Object v) {
        if (v == null) {
            return "";
        }
        if (v instanceof Double d) {
            if (!Double.isFinite(d)) {
                return "";
            }
            if (d == Math.rint(d) && Math.abs(d) < LARGEST_WHOLE) {
                return Long.toString((long) (double) d);
            }
            return withoutTrailingZeros(String.format(Locale.ROOT, "%.7g", d));
        }
        String s = String.valueOf(v);
        if (s.contains(",") || s.contains("\"") || s.contains("\n")) {
            return "\"" + s.replace("\"", "\"\"") + "\"";
        }
        return s;
    }
}
