package org.branchsim.core.elements;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Map;
import org.branchsim.core.TestFluids;
import org.branchsim.core.model.CircuitBuilder;
import org.branchsim.core.model.CircuitModel;
import org.branchsim.core.model.Node;
import org.branchsim.core.solve.JacobianAgreement;
import org.junit.jupiter.api.Test;

/**
 * The closed-form partials of the cylinder's faded work-piece contact and load table against position, and of a
 * node below the air-release pressure, agree with central differences of the equations (Dennis and Schnabel,
 * Numerical Methods for Unconstrained Optimization, 1983, ch. 5) at random states, as ElementPartialsTest does for
 * the demos.
 */
class ContactPartialsTest {

    private static Cylinder cylinder(Node cap, Node rod) {
        Cylinder.Parameters p = new Cylinder.Parameters(50e-3, 28e-3, 0.2, 20.0, 10e-6, 10e-6, 200.0, 500.0, 1e-3,
                0.05);
        // a wide damping fade (40 mm), so that random positions fall inside it as well as beyond it
        return new Cylinder("cyl", cap, rod, p, new Cylinder.Leakage(10e-6, 20e-3), null,
                new Cylinder.Contact(0.1, 2e6, 5e3, 0.04), 1000.0)
                .withPositionLoad(new double[] {0.02, 0.08, 0.15}, new double[] {0.0, 3e3, -1e3});
    }

    @Test
    void contactAndPositionLoadAgreeWithCentralDifferences() {
        Node tank = Node.tank("tank", 0.0);
        Node cap = Node.volume("cap", 0.1e-3, Double.POSITIVE_INFINITY, 0.0);
        Node rod = Node.volume("rod", 0.1e-3, Double.POSITIVE_INFINITY, 0.0);
        CircuitModel model = new CircuitBuilder("contact", TestFluids.referenceOil()).add(tank).add(cap).add(rod)
                .add(new Orifice("in", tank, cap, 3e-6, 0.61)).add(cylinder(cap, rod)).build();
        ElementPartialsTest.checkRandomStates(model, 12, true);
    }

    @Test
    void aNodeBelowTheAirReleasePressureAgreesWithCentralDifferences() {
        Node tank = Node.tank("tank", 0.0);
        Node cap = Node.volume("cap", 0.1e-3, Double.POSITIVE_INFINITY, 0.0);
        CircuitModel model = new CircuitBuilder("release", TestFluids.referenceOil()).add(tank).add(cap)
                .add(new Orifice("in", tank, cap, 3e-6, 0.61)).add(cylinder(cap, tank)).build();
        double worst = 0.0;
        for (double gauge : new double[] {-0.75e5, -0.9e5, -1.0e5, -1.01e5}) {
            double[] y = model.initialState();
            y[0] = gauge;
            y[1] = 0.12; // piston in the contact, past the fade's middle
            y[2] = -0.05;
            worst = Math.max(worst, JacobianAgreement.check(model, Map.of(), 0.0, y, "cap at " + gauge + " Pa"));
        }
        assertTrue(worst <= JacobianAgreement.TOLERANCE, "worst " + worst);
    }
}
