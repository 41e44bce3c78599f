package org.branchsim.cli;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.branchsim.core.analysis.OscillationFinding;
import org.branchsim.core.analysis.OscillationScan;
import org.branchsim.core.analysis.ReducingValveMetrics;
import org.branchsim.core.analysis.SignalStatistics;
import org.branchsim.core.model.Node;
import org.branchsim.core.results.SolverStatistics;
import org.branchsim.core.results.Trace;
import org.branchsim.core.scenario.Scenario;
import org.branchsim.core.study.Variant;
import org.branchsim.core.study.VariantOutcome;
import org.branchsim.core.units.Dimension;
import org.branchsim.core.units.Unit;
import org.branchsim.core.units.UnitSystem;

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
            String k = v.id() + ".";
            m.put(k + "peakOutlet [" + p.symbol() + "]", p.fromSi(v.peak()));
            m.put(k + "steadyOutlet [" + p.symbol() + "]", p.fromSi(v.steady()));
            m.put(k + "overshoot [%]", v.overshootPercent());
            m.put(k + "deviation [%]", v.deviationPercent());
            m.put(k + "settlingTime [s]", v.settlingTime());
            m.put(k + "drainFlow [" + q.symbol() + "]", q.fromSi(v.drainFlow()));
            m.put(k + "drainPower [" + w.symbol() + "]", w.fromSi(v.drainPower()));
            m.put(k + "meteringPower [" + w.symbol() + "]", w.fromSi(v.meteringPower()));
        }
        for (SignalStatistics.Summary sum : SignalStatistics.of(o.result().trace())) {
            if (sum.dimension() == Dimension.PRESSURE && isNode(o, sum.name())) {
                m.put(sum.name() + ".peak [" + p.symbol() + "]", p.fromSi(sum.peak()));
                m.put(sum.name() + ".final [" + p.symbol() + "]", p.fromSi(sum.last()));
            }
        }
        List<OscillationFinding> osc = OscillationScan.scan(o.result());
        m.put("oscillations", (double) osc.size());
        m.put("oscillation.frequency [Hz]", osc.isEmpty() ? 0.0 : osc.get(0).frequency());
        SolverStatistics st = o.result().statistics();
        m.put("solver.steps", (double) st.acceptedSteps());
        m.put("solver.evaluations", (double) st.evaluations());
        m.put("energy.residual [%]", 100 * o.result().energy().relativeResidual());
        return m;
    }

    private static boolean isNode(VariantOutcome o, String signal) {
        Node n = o.result().circuit().node(signal.substring(0, signal.length() - 2));
        return n != null && !n.isTank();
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
     * @param parameters varied parameter paths (columns after the variant number)
     * @param rows the rows
     * @param cols metric columns
     * @return the CSV text: variant, parameters, status, error, metrics
     */
    static String csv(List<String> parameters, List<Row> rows, List<String> cols) {
        StringBuilder sb = new StringBuilder("variant");
        for (String p : parameters) {
            sb.append(',').append(field(p));
        }
        sb.append(",status,error");
        for (String c : cols) {
            sb.append(',').append(field(c));
        }
        sb.append('\n');
        for (Row r : rows) {
            sb.append(r.variant().index());
            for (String p : parameters) {
                sb.append(',').append(field(String.valueOf(r.variant().values().get(p))));
            }
            sb.append(',').append(r.ok() ? "ok" : "failed").append(',').append(field(r.error()));
            for (String c : cols) {
                sb.append(',').append(field(r.metrics().get(c)));
            }
            sb.append('\n');
        }
        return sb.toString();
    }

    /** @return a CSV field: numbers with 7 significant digits, text quoted when needed */
    static String field(Object v) {
        if (v == null) {
            return "";
        }
        if (v instanceof Double d) {
            return Double.isFinite(d) ? String.format(Locale.ROOT, "%.7g", d) : "";
        }
        String s = String.valueOf(v);
        if (s.contains(",") || s.contains("\"") || s.contains("\n")) {
            return "\"" + s.replace("\"", "\"\"") + "\"";
        }
        return s;
    }
}
