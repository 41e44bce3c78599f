package org.branchsim.core.elements;

import org.branchsim.core.fluid.Fluid;
import org.branchsim.core.model.CircuitBuilder;
import org.branchsim.core.model.CircuitModel;
import org.branchsim.core.model.Node;
import org.junit.jupiter.api.Test;

/**
 * The pilot-operated relief valve's closed-form partial derivatives against central differences of the whole
 * right-hand side ({@link org.branchsim.core.solve.JacobianAgreement}: Dennis and Schnabel 1983, ch. 5, sec. 5.6),
 * through {@link ElementPartialsTest#checkRandomStates} with {@code hard = true}: 40 states per circuit and seed,
 * pressures spread or bunched across the seats' and the damping orifice's laminar-turbulent transitions, both
 * poppets anywhere, just off their seats or stops, or held there, in an air-laden oil whose bulk modulus varies
 * with the chamber pressure. The circuits cover every way the valve can be built: drain tied to the outlet's
 * tank (internal drain) or to a tank of its own (external drain), outlet and drain as nodes with pressure states
 * of their own (their rows checked) or the drain tied to such an outlet, a flat main poppet (no axial flow force)
 * and conical poppets (flow forces depending on lift and pressure). The valve's geometry is that of
 * {@link PilotReliefValveTest}.
 */
class PilotReliefPartialsTest {

    /** Air-laden oil as in {@link ElementPartialsTest}: 870 kg/m^3, 32 cSt, 1.6 GPa, 0.5 % air. */
    private static final Fluid AIRY_OIL = new Fluid(870.0, 32e-6, 1.6e9, 0.005, 1.4, 313.15);
    private static final double SETTING = 100e5;
    private static final double PILOT_SEAT = 2e-3;
    private static final double CONE_90 = Math.toRadians(90);
    private static final double FLAT = Math.PI;

    /** @param coneAngle the pilot's full cone angle, rad (pi: flat) */
    private static PoppetGeometry pilot(double coneAngle) {
        return new PoppetGeometry(PILOT_SEAT, coneAngle, 20e3, SETTING * 0.25 * Math.PI * PILOT_SEAT * PILOT_SEAT,
                0.002, 5.0, 0.5e-3, 0.61);
    }

    /** @param coneAngle the main poppet's full cone angle, rad (pi: flat) */
    private static PoppetGeometry mainPoppet(double coneAngle) {
        return new PoppetGeometry(16e-3, coneAngle, 2e3, 10.0, 0.025, 150.0, 2e-3, 0.61);
    }

    private static PilotReliefValve valve(Node inlet, Node outlet, Node drain, double mainCone, double pilotCone) {
        return new PilotReliefValve("relief", inlet, outlet, drain, mainPoppet(mainCone), 2e-6, 0.5e-3, 0.61,
                pilot(pilotCone));
    }

    /**
     * Pump into a line with an elastic wall, the valve from it to the tank, draining into the same tank, an
     * orifice load; flat main poppet, conical pilot.
     */
    @Test
    void internallyDrainedValveAgreesWithCentralDifferences() {
        Node tank = Node.tank("tank", 0.0);
        Node line = Node.volume("line", 0.5e-3, 1e9, 0.0);
        CircuitModel model = new CircuitBuilder("relief-internal", AIRY_OIL).add(tank).add(line)
                .add(new Pump("pump", tank, line, 1e-5, 150.0, 0.95))
                .add(valve(line, tank, tank, FLAT, CONE_90))
                .add(new Orifice("load", line, tank, 3e-6, 0.61))
                .build();
        ElementPartialsTest.checkRandomStates(model, 31, true);
        ElementPartialsTest.checkRandomStates(model, 32, true);
    }

    /** As the internally drained valve, with a conical main poppet and the pilot draining into a tank of its own. */
    @Test
    void externallyDrainedConicalValveAgreesWithCentralDifferences() {
        Node tank = Node.tank("tank", 0.0);
        Node spill = Node.tank("spill", 0.0);
        Node line = Node.volume("line", 0.5e-3, 1e9, 0.0);
        CircuitModel model = new CircuitBuilder("relief-external", AIRY_OIL).add(tank).add(spill).add(line)
                .add(new Pump("pump", tank, line, 1e-5, 150.0, 0.95))
                .add(valve(line, tank, spill, CONE_90, Math.toRadians(60)))
                .add(new Orifice("load", line, tank, 3e-6, 0.61))
                .build();
        ElementPartialsTest.checkRandomStates(model, 33, true);
        ElementPartialsTest.checkRandomStates(model, 34, true);
    }

    /**
     * Inlet, outlet and drain are nodes with pressure states, so the outlet's and the drain's rows and columns
     * are checked too; the drain either has a node of its own or is tied to the outlet node, where both stages
     * spill. Nothing else is connected: a large flow to a tank in the same row would bury these entries in
     * its round-off. The poppets are flat: with the pressures on both sides of a seat bunched within 0.01 Pa to
     * 10 kPa, the flow force's corner at dp = 0 ({@link org.branchsim.core.laws.FlowForce}: proportional to |dp|)
     * lies inside the difference steps, where a central difference gives the mean of the two one-sided slopes;
     * the flow-force partials are checked by the circuits above, where each seat sees the full pressure.
     */
    @Test
    void outletAndDrainNodesAgreeWithCentralDifferences() {
        Node line = Node.volume("line", 0.5e-3, 1e9, 0.0);
        Node back = Node.volume("back", 0.2e-3, Double.POSITIVE_INFINITY, 0.0);
        Node drain = Node.volume("drain", 0.05e-3, Double.POSITIVE_INFINITY, 0.0);
        CircuitModel separate = new CircuitBuilder("relief-drain-node", AIRY_OIL).add(line).add(back).add(drain)
                .add(valve(line, back, drain, FLAT, FLAT))
                .build();
        ElementPartialsTest.checkRandomStates(separate, 35, true);
        ElementPartialsTest.checkRandomStates(separate, 36, true);
        CircuitModel shared = new CircuitBuilder("relief-drain-on-outlet", AIRY_OIL).add(line).add(back)
                .add(valve(line, back, back, FLAT, FLAT))
                .build();
        ElementPartialsTest.checkRandomStates(shared, 37, true);
        ElementPartialsTest.checkRandomStates(shared, 38, true);
    }
}
