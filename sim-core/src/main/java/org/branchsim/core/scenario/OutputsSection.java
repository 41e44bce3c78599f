package org.branchsim.core.scenario;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.branchsim.core.model.CircuitModel;
import org.branchsim.core.settings.SolverSettings;
import org.branchsim.core.units.Dimension;
import org.branchsim.core.units.UnitSystem;
import org.branchsim.core.units.Units;

/** The {@code outputs} section: the unit system of the results, the window of the metrics, extra figures. */
final class OutputsSection {

    static final BlockSpec PLOT = BlockSpec.of("plot",
            FieldSpec.text("title").meaning("figure title"),
            FieldSpec.textList("signals").required().minItems(1)
                    .meaning("signal names to draw, e.g. `[\"clampLine.p\", \"reducer.chamber.p\"]`"));

    static final BlockSpec SPEC = BlockSpec.of("outputs",
            FieldSpec.choice("units", FieldSpec.word("metric", "bar, L/min, mm"), FieldSpec.word("us", "psi, gal/min, in"))
                    .anyCase()
                    .oldWords(Map.of("SI", "metric"), " (bar, L/min and mm are metric units of the trade, not SI units)")
                    .meaning("\"metric\" (bar, L/min, mm, N, kW, kJ: the metric units of the trade) or \"us\" (psi, "
                            + "gal/min, in, lbf, hp, ft*lbf), in any case; the old spelling \"SI\" is still accepted, "
                            + "with a note, until the next release"),
            FieldSpec.nonNegative("metricsFrom", Dimension.TIME).byDefault("0 s")
                    .meaning("start of the window of the reducing-valve metrics (leave start-up out)"),
            FieldSpec.positive("metricsTo", Dimension.TIME).computedDefault(Double.NaN, "endTime")
                    .meaning("end of that window (leave later disturbances out)"),
            FieldSpec.blockList("plots", PLOT).meaning("extra figures, e.g. `[ { \"title\": \"Clamp\", \"signals\": "
                    + "[\"clampLine.p\"] } ]`; positions are drawn on stacked panels"));

    /**
     * The outputs read.
     *
     * @param units unit system of the results
     * @param plots extra figures
     * @param metricsFrom start of the metrics window, s
     * @param metricsTo end of the metrics window, s
     */
    record Outputs(UnitSystem units, List<Scenario.PlotGroup> plots, double metricsFrom, double metricsTo) {
    }

    private OutputsSection() {
    }

    /**
     * @return the unit system the document asks for, read without checking (so that hints about units can
     *         list its units first); the checked reading comes later
     */
    static UnitSystem declaredUnits(Located document) {
        if (document instanceof Located.Obj root && root.get("outputs") instanceof Located.Obj out
                && out.get("units") instanceof Located.Scalar s && s.value() instanceof String u
                && "us".equalsIgnoreCase(u.trim())) {
            return UnitSystem.US;
        }
        return UnitSystem.METRIC;
    }

    /**
     * @param root the document's top level
     * @param circuit the circuit when it was built (plot signals are checked against it), else null
     * @param solver the solver settings when they were read, else null
     * @return the outputs (defaults when the section is left out)
     */
    static Outputs read(Fields root, CircuitModel circuit, SolverSettings solver) {
        double end = solver == null ? Double.NaN : solver.endTime();
        Fields out = root.object("outputs");
        if (out == null) {
            return new Outputs(UnitSystem.METRIC, new ArrayList<>(), 0.0, end);
        }
        Reading r = BlockReader.read(out, SPEC);
        UnitSystem units = "us".equals(r.text("units")) ? UnitSystem.US : UnitSystem.METRIC;
        double from = r.si("metricsFrom");
        if (solver != null && Geometry.ok(from) && from >= end) {
            r.problem("metricsFrom", "a time before the end time (" + Units.plain(end) + " s)",
                    r.raw("metricsFrom").describe());
        }
        double to = r.has("metricsTo") ? r.si("metricsTo") : end;
        if (r.has("metricsTo") && Geometry.ok(from, to) && to <= from) {
            r.problem("metricsTo", "a time after metricsFrom (" + Units.plain(from) + " s)", r.raw("metricsTo").describe());
        }
        List<Scenario.PlotGroup> plots = readPlots(out, circuit);
        out.finish();
        return new Outputs(units, plots, from, to);
    }

    private static List<Scenario.PlotGroup> readPlots(Fields out, CircuitModel circuit) {
        List<Scenario.PlotGroup> plots = new ArrayList<>();
        List<Located> list = out.list("plots");
        for (int i = 0; i < list.size(); i++) {
            Fields p = Fields.of(list.get(i), out.path("plots") + "[" + i + "]", out.problems());
            String title = BlockReader.read(p, PLOT).text("title");
            List<String> signals = new ArrayList<>();
            Map<String, Integer> seen = new LinkedHashMap<>();
            List<Located> names = p.list("signals");
            if (names.isEmpty()) {
                p.problem("signals", "a list of signal names such as \"clampLine.p\"", "none");
            }
            for (int k = 0; k < names.size(); k++) {
                Located s = names.get(k);
                String path = p.path("signals") + "[" + k + "]";
                if (!(s instanceof Located.Scalar sc) || !sc.isText()) {
                    out.problems().add(s, path, "a signal name in quotes", s.describe());
                    continue;
                }
                String name = (String) sc.value();
                Integer first = seen.putIfAbsent(name, k);
                if (first != null) {
                    out.problems().add(s, path, "each signal once in a plot group (\"" + name + "\" is already "
                            + p.path("signals") + "[" + first + "])", "\"" + name + "\" again");
                    continue;
                }
                if (circuit != null && circuit.signal(name) == null) {
                    out.problems().add(s, path, "a signal of this circuit, such as "
                            + circuit.signals().get(0).name(), "\"" + name + "\"");
                    continue;
                }
                signals.add(name);
            }
            p.finish();
            if (title != null) {
                plots.add(new Scenario.PlotGroup(title, signals));
            }
        }
        return plots;
    }
}
