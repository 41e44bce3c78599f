package org.branchsim.core.elements;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.branchsim.core.TestFluids;
import org.branchsim.core.fluid.Fluid;
import org.branchsim.core.model.CircuitBuilder;
import org.branchsim.core.model.CircuitModel;
import org.branchsim.core.model.Evaluation;
import org.branchsim.core.model.Member;
import org.branchsim.core.model.Node;
import org.branchsim.core.model.StateSlot;
import org.branchsim.core.results.SimulationResult;
import org.branchsim.core.settings.SolverSettings;
import org.branchsim.core.solve.Simulator;
import org.junit.jupiter.api.Test;

/**
 * The pressure-compensated pump against the defining behaviour of a pressure compensator (Manring, Hydraulic
 * Control Systems, Wiley 2005, the pressure-compensated pump): full displacement below the setting, and at part flow
 * an outlet pressure at the setting within the compensator's droop, the spring rate times the spool travel from its
 * null to the far stop over the spool area (force balance of the spool).
 */
class CompensatedPumpTest {

    private static final double RHO = 870.0;
    private static final double SPEED = 1500.0 * 2.0 * Math.PI / 60.0;
    private static final double DISPLACEMENT = 28e-6 / (2.0 * Math.PI);
    private static final double SETTING = 200e5;
    /** Steady values: the mean over the last tenth of the run. */
    private static final double END = 0.6;

    private static CompensatedPump pump(Node tank, Node out) {
        CompensatedPump.Compensator comp = new CompensatedPump.Compensator(SETTING, 6e-3, 50e3, 0.015, 30.0, 0.5e-3,
                0.8e-3, 2e-3, 0.61);
        return new CompensatedPump("pump", tank, out, DISPLACEMENT, SPEED, 1.0, null, comp,
                new CompensatedPump.ControlPiston(16e-3, 10e-3, 5e-6, 1.0, 2000.0, 10e5, 30e5, 0.6e-3));
    }

    private static SimulationResult run(double loadArea) {
        Node tank = Node.tank("tank", 0.0);
        Node out = Node.volume("out", 0.5e-3, Double.POSITIVE_INFINITY, 0.0);
        CircuitModel c = new CircuitBuilder("compensated", TestFluids.referenceOil()).add(tank).add(out)
                .add(pump(tank, out)).add(new Orifice("load", out, tank, loadArea, 0.61)).build();
        return Simulator.run(c, SolverSettings.defaults(END, 1e-4));
    }

    private static double steady(SimulationResult r, String signal) {
        double sum = 0.0;
        int n = 0;
        for (double t = 0.9 * END; t <= END + 1e-12; t += 1e-3) {
            sum += r.trace().valueAt(signal, Math.min(t, END));
            n++;
        }
        return sum / n;
    }

    @Test
    void deliversFullDisplacementBelowTheSetting() {
        double area = 1.07e-5;
        SimulationResult r = run(area);
        double q = DISPLACEMENT * SPEED;
        // full displacement: Q = D omega (Merritt, Hydraulic Control Systems, 1967, pump delivery)
        assertEquals(1.0, steady(r, "pump.displacement.fraction"), 1e-9);
        assertEquals(q, steady(r, "pump.q"), 1e-9 * q);
        // the outlet then sits where the orifice passes the full flow: dp = rho/2 (Q/(Cd A))^2 (Merritt 1967),
        // far below the setting
        double dp = 0.5 * RHO * Math.pow(q / (0.61 * area), 2);
        assertEquals(dp, steady(r, "out.p"), 0.01 * dp);
        assertTrue(dp < 0.5 * SETTING);
    }

    @Test
    void holdsTheSettingAtPartFlowWithinItsDroop() {
        double area = 2e-6;
        SimulationResult r = run(area);
        double p = steady(r, "out.p");
        double droop = 50e3 * (0.8e-3 - 0.5e-3) / (0.25 * Math.PI * 6e-3 * 6e-3);
        assertTrue(p >= SETTING - 0.01 * SETTING && p <= SETTING + droop,
                "outlet " + p / 1e5 + " bar, setting 200 bar, droop " + droop / 1e5 + " bar");
        // part flow: the pump delivers what the orifice passes at that pressure (orifice law, Merritt 1967) plus
        // the control oil its compensator feeds to the control chamber (continuity)
        double q = 0.61 * area * Math.sqrt(2.0 * p / RHO);
        assertEquals(q + steady(r, "pump.control.q"), steady(r, "pump.q"), 0.01 * q);
        double peak = 0.0;
        for (double t = 0.9 * END; t <= END; t += 1e-4) {
            peak = Math.max(peak, Math.abs(r.trace().valueAt("out.p", t) - p));
        }
        assertTrue(peak < 0.01 * SETTING, "steady, not oscillating: " + peak / 1e5 + " bar");
        double eps = steady(r, "pump.displacement.fraction");
        assertTrue(eps > 0.05 && eps < 0.95, "part displacement " + eps);
    }

    /**
     * Continuity (the volume balance of every control volume, Merritt, Hydraulic Control Systems, 1967, ch. 3):
     * in a closed loop of oil, the pump drawing from a volume and delivering into another, an orifice leading back,
     * no tank, the compressed volumes' rates sum to zero: sum over the nodes and the control chamber of
     * (V/beta) dp/dt = 0, whatever the states, since every flow leaves one volume and enters another (the spool's
     * and piston's displacement flows included). Checked with the compensator feeding the control chamber (spool
     * past its null), draining it (short of the null), and both members moving.
     */
    @Test
    void conservesOilInAClosedLoop() {
        Fluid oil = TestFluids.referenceOil();
        double inletVolume = 0.4e-3;
        double outletVolume = 0.5e-3;
        Node in = Node.volume("in", inletVolume, Double.POSITIVE_INFINITY, 5e5);
        Node out = Node.volume("out", outletVolume, Double.POSITIVE_INFINITY, 210e5);
        CompensatedPump pump = pump(in, out);
        CircuitModel c = new CircuitBuilder("closed", oil).add(in).add(out).add(pump)
                .add(new Orifice("load", out, in, 2e-6, 0.61)).build();
        Member.Mode[] free = new Member.Mode[c.members().size()];
        java.util.Arrays.fill(free, Member.Mode.FREE);
        Evaluation work = c.workspace(free, new double[c.accounts().size()]);
        List<String> names = c.states().stream().map(StateSlot::name).toList();
        for (double spool : new double[] {0.7e-3, 0.3e-3}) {
            double[] y = c.initialState();
            y[names.indexOf("pump.control.p")] = 25e5;
            y[names.indexOf("pump.compensator.x")] = spool;
            y[names.indexOf("pump.compensator.v")] = 0.02;
            y[names.indexOf("pump.yoke.x")] = 4e-3;
            y[names.indexOf("pump.yoke.v")] = -0.05;
            double[] rates = new double[y.length];
            c.evaluate(work, 0.0, y, rates, null, null);
            double pIn = y[names.indexOf("in.p")];
            double pOut = y[names.indexOf("out.p")];
            double pc = y[names.indexOf("pump.control.p")];
            double chamberVolume = 5e-6 + 0.25 * Math.PI * 16e-3 * 16e-3 * 4e-3;
            double balance = inletVolume / oil.effectiveBulkModulus(pIn, Double.POSITIVE_INFINITY)
                    * rates[names.indexOf("in.p")]
                    + outletVolume / oil.effectiveBulkModulus(pOut, Double.POSITIVE_INFINITY)
                    * rates[names.indexOf("out.p")]
                    + chamberVolume / oil.effectiveBulkModulus(pc, Double.POSITIVE_INFINITY)
                    * rates[names.indexOf("pump.control.p")];
            double delivery = DISPLACEMENT * SPEED;
            assertEquals(0.0, balance, 1e-12 * delivery, "spool at " + spool * 1e3 + " mm");
        }
    }
}
