package org.branchsim.cli;

import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.util.List;
import java.util.Locale;
import org.branchsim.core.analysis.MotorMetrics;
import org.branchsim.core.units.Dimension;
import org.branchsim.core.units.Unit;
import org.branchsim.core.units.UnitSystem;

/**
 * The motors' block of metrics.json and summary.txt: speed, torque and power of each hydraulic motor over the
 * metrics window, each value in the scenario's display units, saying what it is measured from.
 */
final class MotorReport {

    /** What the values are measured from, written beside them. */
    static final String MEASURED_FROM = "speed: shaft speed, positive when port a is the inlet; torque: D (p_a - p_b) "
            + "at the shaft, before friction and load; power: that torque times the speed, negative while the load "
            + "drives the motor (it pumps)";

    private MotorReport() {
    }

    /**
     * @param list motor metrics
     * @param units the scenario's unit system
     * @return the "motors" array of metrics.json
     */
    static ArrayNode json(List<MotorMetrics> list, UnitSystem units) {
        Unit n = units.displayUnit(Dimension.ROTATIONAL_SPEED);
        Unit t = units.displayUnit(Dimension.TORQUE);
        Unit w = units.displayUnit(Dimension.POWER);
        ArrayNode arr = MetricsReport.mapper().createArrayNode();
        for (MotorMetrics m : list) {
            ObjectNode o = arr.addObject();
            o.put("id", m.id());
            o.put("measuredFrom", MEASURED_FROM);
            o.put("speedUnit", n.symbol());
            o.put("torqueUnit", t.symbol());
            o.put("powerUnit", w.symbol());
            o.put("windowFrom_s", MetricsReport.round(m.from()));
            o.put("windowTo_s", MetricsReport.round(m.to()));
            o.put("steadyOver", "last " + Math.round(100 * MotorMetrics.STEADY_FRACTION) + " % of the window");
            o.put("peakSpeed", MetricsReport.round(n.fromSi(m.peakSpeed())));
            o.put("peakSpeedTime_s", MetricsReport.round(m.peakSpeedTime()));
            o.put("lowestSpeed", MetricsReport.round(n.fromSi(m.lowestSpeed())));
            o.put("lowestSpeedTime_s", MetricsReport.round(m.lowestSpeedTime()));
            o.put("steadySpeed", MetricsReport.round(n.fromSi(m.steadySpeed())));
            o.put("peakTorque", MetricsReport.round(t.fromSi(m.peakTorque())));
            o.put("peakTorqueTime_s", MetricsReport.round(m.peakTorqueTime()));
            o.put("steadyTorque", MetricsReport.round(t.fromSi(m.steadyTorque())));
            o.put("peakPower", MetricsReport.round(w.fromSi(m.peakPower())));
            o.put("meanPower", MetricsReport.round(w.fromSi(m.meanPower())));
            o.put("drivenByLoad_s", MetricsReport.round(m.drivenTime()));
        }
        return arr;
    }

    /**
     * @param list motor metrics
     * @param units the scenario's unit system
     * @return one line per motor for summary.txt (empty when there is no motor)
     */
    static String text(List<MotorMetrics> list, UnitSystem units) {
        Unit n = units.displayUnit(Dimension.ROTATIONAL_SPEED);
        Unit t = units.displayUnit(Dimension.TORQUE);
        Unit w = units.displayUnit(Dimension.POWER);
        StringBuilder sb = new StringBuilder();
        for (MotorMetrics m : list) {
            sb.append(String.format(Locale.ROOT,
                    "motor %s (%.3g s to %.3g s): speed steady %.4g %s, peak %.4g at %.3f s, lowest %.4g at %.3f s; "
                            + "torque steady %.4g %s, peak %.4g at %.3f s; power peak %.4g %s, mean %.4g; driven by "
                            + "its load for %.3g s (%s)%n",
                    m.id(), m.from(), m.to(), n.fromSi(m.steadySpeed()), n.symbol(), n.fromSi(m.peakSpeed()),
                    m.peakSpeedTime(), n.fromSi(m.lowestSpeed()), m.lowestSpeedTime(), t.fromSi(m.steadyTorque()),
                    t.symbol(), t.fromSi(m.peakTorque()), m.peakTorqueTime(), w.fromSi(m.peakPower()), w.symbol(),
                    w.fromSi(m.meanPower()), m.drivenTime(), MEASURED_FROM));
        }
        return sb.toString();
    }
}
