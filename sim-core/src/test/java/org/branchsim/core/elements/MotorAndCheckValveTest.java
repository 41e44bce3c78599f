package org.branchsim.core.elements;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.branchsim.core.TestFluids;
import org.branchsim.core.model.CircuitModel;
import org.branchsim.core.model.CircuitBuilder;
import org.branchsim.core.model.Node;
import org.branchsim.core.results.SimulationResult;
import org.branchsim.core.settings.SolverSettings;
import org.branchsim.core.solve.Simulator;
import org.junit.jupiter.api.Test;

/** Motor and check valve against continuity and their defining laws. */
class MotorAndCheckValveTest {

    /**
     * Continuity and torque balance of a fixed-displacement motor (Merritt, Hydraulic Control Systems, 1967):
     * at steady state Q = D omega + K_L dp and D dp = B omega + T_load.
     */
    @Test
    void motorRunsAtDeliveredFlowOverDisplacement() {
        Node tank = Node.tank("tank", 0.0);
        Node in = Node.volume("in", 0.1e-3, Double.POSITIVE_INFINITY, 0.0);
        double q = 20e-3 / 60.0;
        double d = 10e-6 / (2 * Math.PI);
        double leak = 0.5e-3 / 60.0 / 100e5;
        double load = 15.0;
        double b = 0.01;
        Pump pump = new Pump("pump", tank, in, q / 150.0, 150.0, 1.0);
        Motor motor = new Motor("motor", in, tank, d, 0.01, b, leak, load);
        CircuitModel c = new CircuitBuilder("motor", TestFluids.referenceOil()).add(tank).add(in).add(pump).add(motor).build();
        SimulationResult r = Simulator.run(c, SolverSettings.defaults(2.0, 1e-3));
        double omega = r.trace().valueAt("motor.speed", 2.0);
        double dp = r.trace().valueAt("in.p", 2.0);
        assertEquals(q, d * omega + leak * dp, q * 1e-3, "continuity");
        assertEquals(d * dp, b * omega + load, 1e-3 * d * dp, "torque balance");
        assertTrue(omega > 0.9 * q / d, "leakage takes a little of the flow");
    }

    /** A check valve passes flow above its cracking pressure and blocks reverse flow (tight seat). */
    @Test
    void checkValvePassesForwardAndBlocksReverse() {
        Node high = Node.tank("high", 20e5);
        Node low = Node.tank("low", 0.0);
        CheckValve forward = new CheckValve("forward", high, low, 0.5e5, 2e5, 20e-6, 0.61);
        CheckValve reverse = new CheckValve("reverse", low, high, 0.5e5, 2e5, 20e-6, 0.61);
        CircuitModel c = new CircuitBuilder("check", TestFluids.referenceOil()).add(high).add(low).add(forward).add(reverse).build();
        double[] signals = Simulator.signalsAt(c, 0.0, c.initialState());
        double qf = signals[c.signals().indexOf(c.signal("forward.q"))];
        double qr = signals[c.signals().indexOf(c.signal("reverse.q"))];
        // fully open (dp 20 bar > 0.5 + 2 bar): the orifice law at the full area (Merritt 1967)
        assertEquals(0.61 * 20e-6 * Math.sqrt(2 * 20e5 / 870.0), qf, 1e-3 * qf);
        assertEquals(0.0, qr, 0.0);
    }
}
