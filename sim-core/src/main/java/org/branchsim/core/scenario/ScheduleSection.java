package org.branchsim.core.scenario;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.branchsim.core.model.ScheduledInput;
import org.branchsim.core.units.Dimension;
import org.branchsim.core.units.Units;

/**
 * The {@code schedule} section: timed changes of scheduled inputs (a valve opening, a pump speed, a load, a
 * tank pressure), each a ramp from the input's value at its start to a target. The ramps are given to the
 * inputs before the circuit is built, so a built circuit is never changed.
 */
final class ScheduleSection {

    static final BlockSpec ITEM = BlockSpec.of("change",
            FieldSpec.nonNegative("at", Dimension.TIME).meaning("when the change starts"),
            FieldSpec.nonNegative("over", Dimension.TIME).byDefault("0 s")
                    .meaning("how long the ramp lasts (0: a step)"),
            FieldSpec.text("set").meaning("the input to change, `<element>.<field>` (a schedulable field) or "
                    + "`<tank>.pressure`"),
            FieldSpec.special("to", FieldSpec.Kind.SCHEDULED_VALUE).required()
                    .meaning("the value to move to, with the input's unit: an opening is a number 0 to 1, a load "
                            + "\"5 kN\", a speed \"1200 rpm\""));

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
            double at = r.si("at");
            double over = r.si("over");
            String target = r.text("set");
            Located to = r.raw("to");
            if (to == null) {
                f.problem("to", "the value to move to, e.g. 1 for a valve opening or \"5 kN\" for a load", "none");
            }
            if (target != null && !inputs.isEmpty() && !inputs.containsKey(target)) {
                f.problem("set", "a scheduled input (" + String.join(", ", inputs.keySet()) + ")", "\"" + target + "\"");
            } else if (target != null && inputs.isEmpty() && wired && problems.isEmpty()) {
                f.problem("set", "a scheduled input, but no element in this circuit has one", "\"" + target + "\"");
            }
            ScheduledInput in = target == null ? null : inputs.get(target);
            if (in != null && to != null) {
                double value = Fields.parseQuantity(to, f.path("to"), in.dimension(), problems);
                if (in.dimension() == Dimension.DIMENSIONLESS && !Double.isNaN(value) && (value < 0 || value > 1)) {
                    f.problem("to", "an opening from 0 (closed) to 1 (fully open)", to.describe());
                    value = Double.NaN;
                }
                Double end = lastEnd.get(target);
                if (end != null && Geometry.ok(at) && at < end - 1e-15) {
                    f.problem("at", "a start at or after the end of the previous change of " + target + " ("
                            + Units.plain(end) + " s)", f.raw("at").describe());
                } else if (Geometry.ok(at, over, value)) {
                    in.addRamp(new ScheduledInput.Ramp(at, over, value));
                    lastEnd.put(target, at + over);
                }
            }
            f.finish();
        }
    }
}
