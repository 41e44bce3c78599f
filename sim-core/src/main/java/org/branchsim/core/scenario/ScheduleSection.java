package org.branchsim.core.scenario;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.branchsim.core.model.ScheduledInput;
import org.branchsim.core.units.Dimension;
import org.branchsim.core.units.Units;

/**
 * The {@code schedule} section: timed changes of scheduled inputs (a valve opening, a pump speed, a load, a
 * tank pressure), each either a ramp from the input's value at its start to a target (linear, or an S-curve:
 * cubic smoothstep) or a table of values against time, linearly interpolated between its rows. The ramps are
 * given to the inputs before the circuit is built, so a built circuit is never changed.
 */
final class ScheduleSection {

    /** One row of a table: a time and the input's value then. */
    static final BlockSpec ROW = BlockSpec.of("row",
            FieldSpec.nonNegative("t", Dimension.TIME).meaning("time of the row, after the previous row's"),
            FieldSpec.special("value", FieldSpec.Kind.SCHEDULED_VALUE).required()
                    .meaning("the input's value at that time, with the input's unit"));

    static final BlockSpec ITEM = BlockSpec.of("change",
            FieldSpec.nonNegative("at", Dimension.TIME).meaning("when the change starts"),
            FieldSpec.nonNegative("over", Dimension.TIME).byDefault("0 s")
                    .meaning("how long the ramp lasts (0: a step)"),
            FieldSpec.choice("shape", FieldSpec.word("linear", "at a constant rate"),
                            FieldSpec.word("s-curve", "cubic smoothstep 3f²−2f³: zero rate at both ends"))
                    .meaning("how the ramp moves: `linear`, or `s-curve` (cubic smoothstep, no jump in rate)"),
            FieldSpec.text("set").meaning("the input to change, `<element>.<field>` (a schedulable field) or "
                    + "`<tank>.pressure`"),
            FieldSpec.special("to", FieldSpec.Kind.SCHEDULED_VALUE).required()
                    .meaning("the value to move to, with the input's unit: an opening is a number 0 to 1, a load "
                            + "\"5 kN\", a speed \"1200 rpm\""),
            FieldSpec.blockList("table", ROW)
                    .meaning("instead of `at`/`over`/`to`: rows `{ \"t\": \"1 s\", \"value\": \"5 kN\" }` in rising time; "
                            + "the input steps to the first row's value at its time and follows straight lines "
                            + "between rows"))
            .with(Choice.exactlyOne("to", "either a ramp (\"at\" and \"to\") or a \"table\"",
                    List.of(List.of("at", "over", "shape", "to"), List.of("table"))));

    private ScheduleSection() {
    }

    /**
     * Reads the changes and gives each valid one to its input.
     *
     * @param root the document's top level
     * @param inputs the scheduled inputs by name; empty when the network had problems (targets are then not
     *        checked, as the inputs are not known)
     * @param wired true when the network was read without problem
     */
    static void read(Fields root, Map<String, ScheduledInput> inputs, boolean wired, Problems problems) {
        List<Located> list = root.list("schedule");
        Map<String, Double> lastEnd = new LinkedHashMap<>();
        for (int i = 0; i < list.size(); i++) {
            Fields f = Fields.of(list.get(i), "schedule[" + i + "]", problems);
            Reading r = BlockReader.read(f, ITEM);
            String target = r.text("set");
            if (target != null && !inputs.isEmpty() && !inputs.containsKey(target)) {
                f.problem("set", "a scheduled input (" + String.join(", ", inputs.keySet()) + ")", "\"" + target + "\"");
            } else if (target != null && inputs.isEmpty() && wired && problems.isEmpty()) {
                f.problem("set", "a scheduled input, but no element in this circuit has one", "\"" + target + "\"");
            }
            ScheduledInput in = target == null ? null : inputs.get(target);
            if (f.has("table") && !f.has("at") && !f.has("to")) {
                readTable(f, in, target, lastEnd, problems);
            } else if (r.raw("to") != null) {
                readRamp(f, r, in, target, lastEnd, problems);
            }
            f.finish();
        }
    }

    private static void readRamp(Fields f, Reading r, ScheduledInput in, String target, Map<String, Double> lastEnd,
                                 Problems problems) {
        double at = r.si("at");
        double over = r.si("over");
        Located to = r.raw("to");
        if (in == null) {
            return;
        }
        double value = valueOf(f, "to", to, in, problems);
        ScheduledInput.Shape shape = "s-curve".equals(r.text("shape")) ? ScheduledInput.Shape.S_CURVE
                : ScheduledInput.Shape.LINEAR;
        Double end = lastEnd.get(target);
        if (end != null && Geometry.ok(at) && at < end - 1e-15) {
            f.problem("at", "a start at or after the end of the previous change of " + target + " ("
                    + Units.plain(end) + " s)", f.raw("at").describe());
        } else if (Geometry.ok(at, over, value)) {
            in.addRamp(new ScheduledInput.Ramp(at, over, value, shape));
            lastEnd.put(target, at + over);
        }
    }

    /**
     * Reads a table: each row's time must follow the previous row's (and the end of the input's previous
     * change); the first row is a step to its value, each later row a linear ramp from the previous one.
     */
    private static void readTable(Fields f, ScheduledInput in, String target, Map<String, Double> lastEnd,
                                  Problems problems) {
        List<Located> rows = f.list("table");
        if (rows.isEmpty()) {
            f.problem("table", "at least one row { \"t\": ..., \"value\": ... }", "an empty list");
            return;
        }
        Double end = lastEnd.get(target);
        double previous = end == null ? Double.NEGATIVE_INFINITY : end;
        String after = end == null ? null : "the end of the previous change of " + target + " (" + Units.plain(end)
                + " s)";
        List<ScheduledInput.Ramp> ramps = new ArrayList<>();
        boolean ok = true;
        for (int k = 0; k < rows.size(); k++) {
            Fields row = Fields.of(rows.get(k), f.path("table") + "[" + k + "]", problems);
            Reading rr = BlockReader.read(row, ROW);
            double t = rr.si("t");
            Located raw = rr.raw("value");
            double value = in == null || raw == null ? Double.NaN : valueOf(row, "value", raw, in, problems);
            if (Geometry.ok(t) && after != null && t < previous - 1e-15) {
                row.problem("t", "a time at or after " + after, row.raw("t").describe());
                ok = false;
            } else if (Geometry.ok(t, value)) {
                double start = ramps.isEmpty() ? t : previous;
                ramps.add(new ScheduledInput.Ramp(start, t - start, value));
                previous = t;
                after = "the previous row's (" + Units.plain(t) + " s)";
            } else {
                ok = false;
            }
            row.finish();
        }
        if (ok && in != null) {
            ramps.forEach(in::addRamp);
            lastEnd.put(target, previous);
        }
    }

    private static double valueOf(Fields f, String key, Located raw, ScheduledInput in, Problems problems) {
        double value = Fields.parseQuantity(raw, f.path(key), in.dimension(), problems);
        if (in.dimension() == Dimension.DIMENSIONLESS && !Double.isNaN(value) && (value < 0 || value > 1)) {
            f.problem(key, "an opening from 0 (closed) to 1 (fully open)", raw.describe());
            return Double.NaN;
        }
        return value;
    }
}
