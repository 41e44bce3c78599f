package org.branchsim.cli;

import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.util.List;
import org.branchsim.core.analysis.CavitationFinding;
import org.branchsim.core.analysis.CylinderMetrics;
import org.branchsim.core.analysis.OscillationFinding;
import org.branchsim.core.analysis.ReducingValveMetrics;
import java.util.Map;
import org.branchsim.core.analysis.SignalStatistics;
import org.branchsim.core.model.EnergyAccount;
import org.branchsim.core.results.EnergyBalance;
import org.branchsim.core.results.SimulationResult;
import org.branchsim.core.results.SolverStatistics;
import org.branchsim.core.scenario.Scenario;
import org.branchsim.core.units.Dimension;
import org.branchsim.core.units.Unit;
import org.branchsim.core.units.UnitSystem;

/**
 * Builds metrics.json: per-signal peak, minimum and final values, the energy balance and the solver
 * statistics, each value with its unit, and the safety caution.
 */
public final class MetricsReport {

    private static final ObjectMapper MAPPER = new ObjectMapper().enable(SerializationFeature.INDENT_OUTPUT);

    private MetricsReport() {
    }

    /**
     * @param scenario the scenario
     * @param result its run
     * @param valves regulation metrics of its reducing valves
     * @param oscillations oscillations found after the transients
     * @return the metrics document
     */
    public static ObjectNode build(Scenario scenario, SimulationResult result, List<ReducingValveMetrics> valves,
                                   List<OscillationFinding> oscillations) {
        UnitSystem units = scenario.units();
        ObjectNode root = MAPPER.createObjectNode();
        root.put("scenario", scenario.name());
        root.put("file", scenario.file());
        root.put("unitSystem", units.scenarioName());
        root.put("caution", Cautions.SHORT);

        ObjectNode signals = root.putObject("signals");
        for (SignalStatistics.Summary s : SignalStatistics.of(result.trace())) {
            Unit u = units.displayUnit(s.dimension());
            ObjectNode o = signals.putObject(s.name());
            o.put("unit", u.symbol());
            o.put("peak", round(u.fromSi(s.peak())));
            o.put("peakTime_s", round(s.peakTime()));
            o.put("minimum", round(u.fromSi(s.minimum())));
            o.put("minimumTime_s", round(s.minimumTime()));
            o.put("final", round(u.fromSi(s.last())));
        }
        root.set("reducingValves", reducingValves(valves, units, scenario.metricsFrom(), scenario.metricsTo()));
        root.set("motors", MotorReport.json(
                org.branchsim.core.analysis.MotorMetrics.of(result, scenario.metricsFrom(), scenario.metricsTo()), units));
        ArrayNode osc = root.putArray("oscillations");
        for (OscillationFinding f : oscillations) {
            osc.add(DiagnosisJson.finding(f, units));
        }
        root.set("cylinders", cylinders(CylinderMetrics.of(result, scenario.metricsFrom(), scenario.metricsTo()),
                units, scenario.metricsFrom(), scenario.metricsTo()));
        root.set("cavitation", cavitation(CavitationFinding.of(result), result.model().fluid().releasePressure(),
                units));
        root.set("energy", energy(result.energy(), units));
        root.set("solver", solver(result.statistics()));
        return root;
    }

    /** The cylinders' forces: what each is measured from, its unit, peak, final value and mean over the window. */
    static ArrayNode cylinders(List<CylinderMetrics> list, UnitSystem units, double from, double to) {
        Unit f = units.displayUnit(Dimension.FORCE);
        ArrayNode arr = MAPPER.createArrayNode();
        for (CylinderMetrics m : list) {
            ObjectNode o = arr.addObject();
            o.put("id", m.id());
            o.put("forceUnit", f.symbol());
            o.put("windowFrom_s", from);
            o.put("windowTo_s", to);
            ObjectNode force = o.putObject("cylinderForce");
            force.put("measuredFrom", "chamber pressures on the piston areas, p_cap A_cap - p_rod A_rod, "
                    + "positive extending");
            forceFigures(force, m.force(), f);
            if (m.clamp() != null) {
                ObjectNode clamp = o.putObject("clampForce");
                clamp.put("measuredFrom", "contact force of the piston on the work-piece (stiffness times "
                        + "penetration plus faded damping, never pulling)");
                forceFigures(clamp, m.clamp(), f);
            }
        }
        return arr;
    }

    private static void forceFigures(ObjectNode o, CylinderMetrics.Figures g, Unit f) {
        o.put("peak", round(f.fromSi(g.peak())));
        o.put("peakTime_s", round(g.peakTime()));
        o.put("final", round(f.fromSi(g.last())));
        putFinite(o, "windowMean", round(f.fromSi(g.windowMean())));
    }

    /**
     * The cavitation report: the threshold (air-release pressure, gauge, in the display unit) and every node that
     * fell below it, with when, how long, and its lowest absolute pressure; the result there is uncertain.
     */
    static ObjectNode cavitation(List<CavitationFinding> list, double threshold, UnitSystem units) {
        Unit p = units.displayUnit(Dimension.PRESSURE);
        ObjectNode o = MAPPER.createObjectNode();
        o.put("pressureUnit", p.symbol());
        o.put("threshold", round(p.fromSi(threshold)));
        o.put("thresholdMeaning", "air-release pressure (gauge): below it dissolved air comes out of solution");
        o.put("measuredOn", "output samples");
        o.put("found", !list.isEmpty());
        ArrayNode nodes = o.putArray("nodes");
        for (CavitationFinding f : list) {
            ObjectNode n = nodes.addObject();
            n.put("node", f.node());
            n.put("firstBelow_s", round(f.firstTime()));
            n.put("durationBelow_s", round(f.duration()));
            n.put("minimumAbsolutePressure", round(p.fromSi(f.minimumAbsolute()) - p.fromSi(0.0)));
            n.put("minimumTime_s", round(f.minimumTime()));
            n.put("uncertain", "air release is modelled as instant and reversible; pressures and flows at this node "
                    + "are uncertain while it is below the threshold");
        }
        return o;
    }

    static ArrayNode reducingValves(List<ReducingValveMetrics> list, UnitSystem units, double from, double to) {
        Unit p = units.displayUnit(Dimension.PRESSURE);
        Unit q = units.displayUnit(Dimension.VOLUME_FLOW);
        Unit w = units.displayUnit(Dimension.POWER);
        ArrayNode arr = MAPPER.createArrayNode();
        for (ReducingValveMetrics m : list) {
            ObjectNode o = arr.addObject();
            o.put("id", m.id());
            o.put("pressureUnit", p.symbol());
            o.put("flowUnit", q.symbol());
            o.put("powerUnit", w.symbol());
            o.put("windowFrom_s", from);
            o.put("windowTo_s", to);
            o.put("setting", round(p.fromSi(m.setting())));
            o.put("peakOutlet", round(p.fromSi(m.peak())));
            o.put("peakTime_s", round(m.peakTime()));
            o.put("steadyOutlet", round(p.fromSi(m.steady())));
            o.put("overshoot", round(p.fromSi(m.overshoot()) - p.fromSi(0.0)));
            o.put("overshootPercentOfSetting", round(m.overshootPercent()));
            o.put("deviationFromSetting", round(p.fromSi(m.deviation()) - p.fromSi(0.0)));
            o.put("deviationPercentOfSetting", round(m.deviationPercent()));
            o.put("settlingBandPercentOfSetting", 100.0 * ReducingValveMetrics.BAND);
            o.put("settled", m.settled());
            o.put("settlingBandCentredOn", "setting");
            putNumber(o, "settlingMeasuredFrom_s", m.riseTime());
            putNumber(o, "settledAt_s", m.settledAt());
            putNumber(o, "settlingTime_s", m.settlingTime());
            putNumber(o, "persistingOscillation_Hz", m.oscillationFrequency());
            o.put("steadyDrainFlow", round(q.fromSi(m.drainFlow())));
            o.put("steadyDrainPower", round(w.fromSi(m.drainPower())));
            o.put("steadyMeteringPower", round(w.fromSi(m.meteringPower())));
        }
        return arr;
    }

    private static void putNumber(ObjectNode o, String key, double v) {
        putFinite(o, key, round(v));
    }

    /** Puts a number, or null when it is not finite (JSON has no NaN). */
    static void putFinite(ObjectNode o, String key, double v) {
        if (Double.isFinite(v)) {
            o.put(key, v);
        } else {
            o.putNull(key);
        }
    }

    static ObjectNode energy(EnergyBalance e, UnitSystem units) {
        Unit u = units.displayUnit(Dimension.ENERGY);
        ObjectNode o = MAPPER.createObjectNode();
        o.put("unit", u.symbol());
        o.put("supplied", round(u.fromSi(e.total(EnergyAccount.Kind.SUPPLY))));
        o.put("lost", round(u.fromSi(e.total(EnergyAccount.Kind.LOSS))));
        o.put("work", round(u.fromSi(e.total(EnergyAccount.Kind.WORK))));
        o.put("stored", round(u.fromSi(e.total(EnergyAccount.Kind.STORED))));
        o.put("flowForceWork", round(u.fromSi(e.total(EnergyAccount.Kind.FLOW_FORCE))));
        o.put("residual", round(u.fromSi(e.residual())));
        o.put("residualPercentOfSupplied", round(100.0 * e.relativeResidual()));
        ObjectNode accounts = o.putObject("accounts");
        for (Map.Entry<String, Double> a : e.accounts().entrySet()) {
            ObjectNode ao = accounts.putObject(a.getKey());
            ao.put("kind", e.kinds().get(a.getKey()).name().toLowerCase(java.util.Locale.ROOT));
            ao.put("energy", round(u.fromSi(a.getValue())));
        }
        return o;
    }

    static ObjectNode solver(SolverStatistics s) {
        ObjectNode o = MAPPER.createObjectNode();
        o.put("method", s.method());
        o.put("acceptedSteps", s.acceptedSteps());
        o.put("rejectedSteps", s.rejectedSteps());
        o.put("derivativeEvaluations", s.evaluations());
        o.put("jacobianEvaluations", s.jacobians());
        o.put("luFactorisations", s.factorisations());
        ObjectNode ev = o.putObject("events");
        s.events().forEach(ev::put);
        o.put("simulatedTime_s", s.simulatedSeconds());
        o.put("wallTime_s", round(s.wallSeconds()));
        return o;
    }

    /** @return v rounded to 7 significant digits (to keep files readable and stable) */
    static double round(double v) {
        if (v == 0.0 || !Double.isFinite(v)) {
            return v;
        }
        return Double.parseDouble(String.format(java.util.Locale.ROOT, "%.7g", v));
    }

    /** @return the shared JSON mapper (indented output) */
    static ObjectMapper mapper() {
        return MAPPER;
    }

    /** @return the document as indented JSON text */
    public static String toJson(ObjectNode node) {
        try {
            return MAPPER.writeValueAsString(node) + System.lineSeparator();
        } catch (JsonProcessingException e) {
            throw new IllegalStateException(e);
        }
    }
}
