package org.branchsim.core.elements;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.branchsim.core.TestFluids;
import org.branchsim.core.model.CircuitBuilder;
import org.branchsim.core.model.CircuitModel;
import org.branchsim.core.model.Node;
import org.branchsim.core.results.SimulationResult;
import org.branchsim.core.settings.SolverSettings;
import org.branchsim.core.solve.Simulator;
import org.junit.jupiter.api.Test;

/**
 * A motor's friction with breakaway and its overrunning load. Friction model: Coulomb + viscous + Stribeck
 * breakaway, T_f = [T_c + (T_s - T_c) exp(-(w/w_s)^2)] tanh(w/w_r) + B w (Armstrong-Helouvry, Dupont and Canudas de
 * Wit, "A survey of models, analysis tools and compensation methods for the control of machines with friction",
 * Automatica 30(7), 1994, the exponential Stribeck model; the tanh regularisation as the cylinder's, common
 * practice, no source).
 */
class MotorLoadsTest {

    private static final double D = 10e-6 / (2.0 * Math.PI);
    private static final Motor.Friction FRICTION = new Motor.Friction(20.0, 35.0, 0.5, 0.005);

    private static SimulationResult run(Motor motor, Node... nodes) {
        CircuitBuilder b = new CircuitBuilder("motor", TestFluids.referenceOil());
        for (Node n : nodes) {
            b.add(n);
        }
        CircuitModel c = b.add(motor).build();
        return Simulator.run(c, SolverSettings.defaults(3.0, 1e-3));
    }

    /**
     * Held by friction, a shaft under a load below breakaway stays at rest: the regularised model lets it creep at
     * the speed where T_s tanh(w/w_r) = T_load, w = w_r atanh(T_load/T_s) (the Stribeck term is 1 at that speed
     * within 2e-4), a thousandth of the Stribeck speed here; above breakaway it turns.
     */
    @Test
    void aBrakedMotorStaysAtRestBelowBreakaway() {
        Node tank = Node.tank("tank", 0.0);
        double load = 30.0;
        Motor held = new Motor("motor", tank, tank, D, 0.05, 0.0, 0.0, load, FRICTION, null);
        double w = run(held, tank).trace().valueAt("motor.speed", 3.0);
        double creep = -0.005 * atanh(load / 35.0);
        assertEquals(creep, w, 0.01 * Math.abs(creep));
        assertTrue(Math.abs(w) < 0.02 * 0.5, "at rest against the working speeds");

        Motor broken = new Motor("motor", tank, tank, D, 0.05, 0.0, 0.0, 36.0, FRICTION, null);
        double turning = run(broken, tank).trace().valueAt("motor.speed", 3.0);
        // above breakaway the load accelerates it: (36 - 20) N*m / 0.05 kg*m^2 = 320 rad/s^2 once it slips
        assertTrue(turning < -100.0, "breaks away and turns: " + turning + " rad/s");
    }

    /**
     * At steady speed the torque balance D dp = T_c + B w + T_load gives w = (D dp - T_c - T_load) / B (the
     * Stribeck term has died out at 200 Stribeck speeds; Merritt, Hydraulic Control Systems, 1967, motor torque
     * balance).
     */
    @Test
    void steadySpeedWithViscousFrictionMatchesTheClosedForm() {
        Node high = Node.tank("high", 100e5);
        Node low = Node.tank("low", 0.0);
        double b = 0.05;
        Motor motor = new Motor("motor", high, low, D, 0.01, b, 0.0, 5.0, new Motor.Friction(5.0, 8.0, 0.5, 0.005),
                null);
        SimulationResult r = run(motor, high, low);
        double expected = (D * 100e5 - 5.0 - 5.0) / b;
        assertEquals(expected, r.trace().valueAt("motor.speed", 3.0), 1e-4 * expected);
        // torque and power signals: D dp and D dp w
        assertEquals(D * 100e5, r.trace().valueAt("motor.torque", 3.0), 1e-9 * D * 100e5);
        assertEquals(D * 100e5 * expected, r.trace().valueAt("motor.power", 3.0), 1e-4 * D * 100e5 * expected);
    }

    /**
     * A weight on the shaft swings down and drives the motor backwards; free of friction and pressure it swings as a
     * pendulum. Reduced to the load (inertia J i^2, gravity torque T_max i) it is a compound pendulum of period
     * T = 2 pi sqrt(J i / T_max) (1 + phi_0^2/16) for an amplitude phi_0 (with the first finite-amplitude term; e.g.
     * Thornton and Marion, Classical Dynamics, 5th ed. 2004, sec. 4.4).
     */
    @Test
    void anOverrunningWeightDrivesTheMotorAndSwingsAsAPendulum() {
        Node tank = Node.tank("tank", 0.0);
        double j = 0.1;
        double ratio = 2.0;
        double tMax = 50.0;
        double phi0 = Math.toRadians(10.0);
        Motor motor = new Motor("motor", tank, tank, D, j, 0.0, 0.0, 0.0, null,
                new Motor.OverrunningLoad(tMax, phi0, ratio));
        SimulationResult r = run(motor, tank);
        assertTrue(r.trace().valueAt("motor.speed", 0.05) < 0.0, "the weight drives the motor backwards");
        double[] t = r.trace().times();
        double[] phi = r.trace().series("motor.load.angle");
        double first = Double.NaN;
        double last = Double.NaN;
        int crossings = 0;
        for (int k = 1; k < t.length; k++) {
            if (phi[k - 1] < 0.0 && phi[k] >= 0.0) {
                double tc = t[k - 1] + (t[k] - t[k - 1]) * (-phi[k - 1]) / (phi[k] - phi[k - 1]);
                if (crossings == 0) {
                    first = tc;
                }
                last = tc;
                crossings++;
            }
        }
        double period = (last - first) / (crossings - 1);
        double expected = 2.0 * Math.PI * Math.sqrt(j * ratio / tMax) * (1.0 + phi0 * phi0 / 16.0);
        assertTrue(crossings >= 4, "swings");
        assertEquals(expected, period, 1e-3 * expected);
    }

    private static double atanh(double x) {
        return 0.5 * Math.log((1.0 + x) / (1.0 - x));
    }
}
