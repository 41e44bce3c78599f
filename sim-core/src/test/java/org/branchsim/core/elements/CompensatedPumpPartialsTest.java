package org.branchsim.core.elements;

import org.branchsim.core.fluid.Fluid;
import org.branchsim.core.laws.KinematicRipple;
import org.branchsim.core.model.CircuitBuilder;
import org.branchsim.core.model.CircuitModel;
import org.branchsim.core.model.Node;
import org.junit.jupiter.api.Test;

/**
 * The pressure-compensated pump's closed-form partial derivatives against central differences of the whole
 * right-hand side (source and tolerance: {@link org.branchsim.core.solve.JacobianAgreement}, Dennis and Schnabel,
 * Numerical Methods for Unconstrained Optimization and Nonlinear Equations, 1983, ch. 5), at the random states of
 * {@link ElementPartialsTest#checkRandomStates} with {@code hard = true}: pressures spread or bunched across the
 * laminar-turbulent transitions of the feed and drain edges and the bleed, the spool on either side of its null
 * (feed open, drain open) and near or at its stops, the yoke anywhere in its stroke, near or at its stops, moving
 * either way. The oil holds air, so the control chamber's bulk modulus varies with its pressure. Pump and
 * compensator data are those of {@link CompensatedPumpTest}.
 */
class CompensatedPumpPartialsTest {

    /** Air-laden oil, as in ElementPartialsTest: 870 kg/m^3, 32 cSt, 1.6 GPa, 0.5 % air. */
    private static final Fluid AIRY_OIL = new Fluid(870.0, 32e-6, 1.6e9, 0.005, 1.4, 313.15);

    private static CompensatedPump pump(Node inlet, Node outlet, KinematicRipple ripple) {
        CompensatedPump.Compensator comp = new CompensatedPump.Compensator(200e5, 6e-3, 50e3, 0.015, 30.0, 0.5e-3,
                0.8e-3, 2e-3, 0.61);
        return new CompensatedPump("pump", inlet, outlet, 4e-6, 150.0, 0.95, ripple, comp,
                new CompensatedPump.ControlPiston(16e-3, 10e-3, 5e-6, 1.0, 2000.0, 10e5, 30e5, 0.6e-3));
    }

    /** Tank, a volume node, the pump drawing from the tank into the node, an orifice from the node to the tank. */
    private static CircuitModel onTank(KinematicRipple ripple) {
        Node tank = Node.tank("tank", 0.0);
        Node a = Node.volume("a", 0.2e-3, 1e9, 0.0);
        return new CircuitBuilder("compensated", AIRY_OIL).add(tank).add(a)
                .add(pump(tank, a, ripple))
                .add(new Orifice("orifice", a, tank, 3e-6, 0.61))
                .build();
    }

    @Test
    void steadyDeliveryAgreesWithCentralDifferences() {
        ElementPartialsTest.checkRandomStates(onTank(null), 31, true);
    }

    /** With the axial-piston ripple of ElementPartialsTest's pump (9 pistons): dQ/dtheta and dQ/ds times f(theta). */
    @Test
    void pistonRippleAgreesWithCentralDifferences() {
        ElementPartialsTest.checkRandomStates(onTank(new KinematicRipple(KinematicRipple.Kind.AXIAL_PISTON, 9, 0.0)),
                37, true);
    }

    /**
     * The inlet a volume node fed from the tank through an orifice, so that the partials the tank drops are checked
     * too: those of the drain, bleed and displacement flows into the inlet and of both members' forces with respect
     * to the inlet pressure.
     */
    @Test
    void inletVolumeAgreesWithCentralDifferences() {
        Node tank = Node.tank("tank", 0.0);
        Node suction = Node.volume("suction", 0.1e-3, 1e9, 0.0);
        Node a = Node.volume("a", 0.2e-3, 1e9, 0.0);
        CircuitModel model = new CircuitBuilder("compensated-suction", AIRY_OIL).add(tank).add(suction).add(a)
                .add(new Orifice("feed", tank, suction, 10e-6, 0.61))
                .add(pump(suction, a, new KinematicRipple(KinematicRipple.Kind.AXIAL_PISTON, 9, 0.0)))
                .add(new Orifice("orifice", a, tank, 3e-6, 0.61))
                .build();
        ElementPartialsTest.checkRandomStates(model, 41, true);
    }
}
