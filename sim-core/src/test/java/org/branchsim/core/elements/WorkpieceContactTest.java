package org.branchsim.core.elements;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.branchsim.core.TestFluids;
import org.branchsim.core.model.CircuitBuilder;
import org.branchsim.core.model.CircuitModel;
import org.branchsim.core.model.Node;
import org.branchsim.core.model.ScheduledInput;
import org.branchsim.core.results.SimulationResult;
import org.branchsim.core.results.Trace;
import org.branchsim.core.settings.SolverSettings;
import org.branchsim.core.solve.Simulator;
import org.junit.jupiter.api.Test;

/**
 * A piston (1 kg, both ports on the tank) thrown at 5 m/s against a work-piece of stiffness k: a contact of a mass
 * on a spring. Without damping it lasts half a period, pi sqrt(m/k), and the piston leaves at its arrival speed
 * (undamped spring-mass oscillator; Den Hartog, Mechanical Vibrations, 1956, ch. 1). With damping the contact force
 * must start from zero at first touch and never pull (Hunt and Crossley, Coefficient of restitution interpreted as
 * damping in vibroimpact, J. Appl. Mech. 42, 1975: a plain spring-damper jumps at touch and turns tensile before
 * separation); the books close.
 */
class WorkpieceContactTest {

    private static final double MASS = 1.0;
    private static final double STIFFNESS = 1e6;
    private static final double PART = 0.15;
    private static final double PUSH = 100.0;
    private static final double PUSH_TIME = 0.05;

    private static SimulationResult throwAt(double damping) {
        Node tank = Node.tank("tank", 0.0);
        Cylinder.Parameters p = new Cylinder.Parameters(20e-3, 10e-3, 0.2, MASS, 0.0, 0.0, 0.0, 0.0, 1e-3, 0.0);
        Cylinder cyl = new Cylinder("cyl", tank, tank, p, null, null,
                new Cylinder.Contact(PART, STIFFNESS, damping), -PUSH);
        // pushed by 100 N for 50 ms (5 m/s, 0.125 m), then coasting onto the part at 0.15 m
        cyl.load().addRamp(new ScheduledInput.Ramp(PUSH_TIME, 0.0, 0.0));
        CircuitModel c = new CircuitBuilder("throw", TestFluids.referenceOil()).add(tank).add(cyl).build();
        // rtol 1e-8: the damping loss is a quadrature over the steps (one midpoint per step, docs/theory.md 9), whose
        // error at the default 1e-6 is about 2e-3 of the loss with the order-4 method's long steps
        return Simulator.run(c, SolverSettings.defaults(0.07, 1e-6).withRelativeTolerance(1e-8));
    }

    @Test
    void anUndampedContactLastsHalfAPeriodAndGivesBackTheSpeed() {
        Trace t = throwAt(0.0).trace();
        double[] f = t.series("cyl.contact");
        double first = Double.NaN;
        double last = Double.NaN;
        for (int k = 0; k < f.length; k++) {
            if (f[k] > 0.0) {
                last = t.time(k);
                if (Double.isNaN(first)) {
                    first = t.time(k);
                }
            }
        }
        double halfPeriod = Math.PI * Math.sqrt(MASS / STIFFNESS); // 3.14 ms (Den Hartog 1956)
        assertEquals(halfPeriod, last - first, 2e-3 * halfPeriod + 2e-6);
        double arrival = PUSH / MASS * PUSH_TIME;
        assertEquals(-arrival, t.value(t.size() - 1, t.indexOf("cyl.piston.v")), 1e-3 * arrival);
        // peak force k x_max with x_max = v sqrt(m/k) (energy: m v^2 / 2 = k x^2 / 2)
        double peak = STIFFNESS * arrival * Math.sqrt(MASS / STIFFNESS);
        double measured = 0;
        for (double v : f) {
            measured = Math.max(measured, v);
        }
        assertEquals(peak, measured, 2e-3 * peak);
    }

    @Test
    void aDampedContactStartsFromZeroNeverPullsAndKeepsItsBooks() {
        double damping = 1000.0; // zeta = c / (2 sqrt(k m)) = 0.5
        SimulationResult r = throwAt(damping);
        Trace t = r.trace();
        double[] f = t.series("cyl.contact");
        double[] x = t.series("cyl.piston.x");
        double[] v = t.series("cyl.piston.v");
        boolean clipped = false;
        for (int k = 0; k < f.length; k++) {
            assertTrue(f[k] >= 0.0, "a contact only pushes: " + f[k] + " N at " + t.time(k) + " s");
            double penetration = x[k] - PART;
            if (penetration > 0 && penetration < 1e-6) {
                // at first touch (a micrometre in, 5 m/s) a plain spring-damper would already push c v = 5 kN;
                // the faded damping keeps the force near k delta
                assertTrue(f[k] < 0.1 * damping * Math.abs(v[k]) + STIFFNESS * penetration + 1.0,
                        "force at first touch " + f[k] + " N");
            }
            if (penetration > 1e-5 && v[k] < 0 && STIFFNESS * penetration + damping * v[k] < 0) {
                clipped = true; // a plain Kelvin-Voigt contact would pull here
                assertEquals(0.0, f[k], 0.0);
            }
        }
        assertTrue(clipped, "the separation reached the part of the cycle where a spring-damper pulls");
        assertTrue(r.energy().relativeResidual() < 1e-9, "residual " + r.energy().relativeResidual());
        // the piston leaves slower than it came: the lost kinetic energy is in the contact's loss account
        double arrival = PUSH / MASS * PUSH_TIME;
        double leaving = t.value(t.size() - 1, t.indexOf("cyl.piston.v"));
        double lost = 0.5 * MASS * (arrival * arrival - leaving * leaving);
        assertEquals(lost, r.energy().accounts().get("cyl.contact.damping"), 1e-3 * lost);
    }
}
