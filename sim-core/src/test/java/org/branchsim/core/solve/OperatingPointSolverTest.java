package org.branchsim.core.solve;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Map;
import org.branchsim.core.TestFluids;
import org.branchsim.core.elements.Cylinder;
import org.branchsim.core.elements.Orifice;
import org.branchsim.core.elements.PoppetGeometry;
import org.branchsim.core.elements.Pump;
import org.branchsim.core.elements.ReliefValve;
import org.branchsim.core.error.BranchsimException;
import org.branchsim.core.error.ErrorKey;
import org.branchsim.core.fluid.Fluid;
import org.branchsim.core.laws.OrificeLaw;
import org.branchsim.core.model.CircuitBuilder;
import org.branchsim.core.model.CircuitModel;
import org.branchsim.core.model.Member;
import org.branchsim.core.model.Node;
import org.branchsim.core.model.StateSlot;
import org.branchsim.core.results.SimulationResult;
import org.branchsim.core.settings.SolverSettings;
import org.junit.jupiter.api.Test;

/** Operating points against analytic equilibria; circuits with no operating point are refused. */
class OperatingPointSolverTest {

    /** Relative accuracy asked of an equilibrium pressure or lift. */
    private static final double EQUILIBRIUM_TOLERANCE = 1e-6;
    private static final Fluid OIL = TestFluids.referenceOil();
    private static final double FLOW = 10e-3 / 60.0;
    private static final double PUMP_SPEED = 150.0;
    private static final double RELIEF_SEAT = 6e-3;
    private static final double RELIEF_SETTING = 80e5;
    private static final double RELIEF_RATE = 50e3;
    private static final double CD = 0.61;

    /** Pump -> line -> orifice -> guarded node -> flat-seated relief valve -> tank. */
    private static CircuitModel orificeAndRelief(double orificeDiameter) {
        Node tank = Node.tank("tank", 0.0);
        Node line = Node.volume("line", 0.2e-3, Double.POSITIVE_INFINITY, 0.0);
        Node guarded = Node.volume("guarded", 0.1e-3, Double.POSITIVE_INFINITY, 0.0);
        double seatArea = Math.PI * RELIEF_SEAT * RELIEF_SEAT / 4;
        // flat seat (cone angle pi): the jet leaves at 90 deg to the axis, so no axial flow force
        PoppetGeometry g = new PoppetGeometry(RELIEF_SEAT, Math.PI, RELIEF_RATE, RELIEF_SETTING * seatArea, 0.02,
                200.0, 2e-3, CD);
        return new CircuitBuilder("orifice-relief", OIL).add(tank).add(line).add(guarded)
                .add(new Pump("pump", tank, line, FLOW / PUMP_SPEED, PUMP_SPEED, 1.0))
                .add(new Orifice("orifice", line, guarded, OrificeLaw.circleArea(orificeDiameter), CD))
                .add(new ReliefValve("relief", guarded, tank, g)).build();
    }

    /**
     * Steady force balance of a flat-seated relief poppet passing Q: p A_s = F0 + k x with Q = Cd pi d x
     * sqrt(2 p / rho) (orifice law, Merritt, Hydraulic Control Systems, 1967; Rabie, Fluid Power Engineering,
     * 2009, eqs 2.34-2.39; flat seat area pi d x, REFERENCES.md), solved for the lift x by bisection.
     */
    private static double reliefLift() {
        double seatArea = Math.PI * RELIEF_SEAT * RELIEF_SEAT / 4;
        double lo = 0.0;
        double hi = RELIEF_SEAT / 4;
        for (int i = 0; i < 200; i++) {
            double x = 0.5 * (lo + hi);
            double p = (RELIEF_SETTING * seatArea + RELIEF_RATE * x) / seatArea;
            double q = CD * Math.PI * RELIEF_SEAT * x * Math.sqrt(2 * p / OIL.density());
            if (q < FLOW) {
                lo = x;
            } else {
                hi = x;
            }
        }
        return 0.5 * (lo + hi);
    }

    private static int index(CircuitModel c, String state) {
        // the state vector is ordered as the model's states
        int i = c.states().stream().map(StateSlot::name).toList().indexOf(state);
        assertTrue(i >= 0, state);
        return i;
    }

    @Test
    void orificeInSeriesWithReliefValveReachesTheAnalyticEquilibrium() {
        // Given a rough start: both nodes at the setting, the poppet at a tenth of its lift, at rest
        CircuitModel c = orificeAndRelief(2.5e-3);
        double[] start = c.initialState();
        start[index(c, "line.p")] = RELIEF_SETTING;
        start[index(c, "guarded.p")] = RELIEF_SETTING;
        start[index(c, "relief.poppet.x")] = 0.2e-3;

        // When the operating point is solved (no time simulated)
        OperatingPoint op = OperatingPointSolver.solve(c, 0.0, start, Map.of());

        // Then the guarded node sits at the relief's steady force balance and the line above it by the orifice
        // drop dp = rho/2 (Q / (Cd A))^2 (Merritt 1967; Rabie 2009, eqs 2.34-2.39)
        double seatArea = Math.PI * RELIEF_SEAT * RELIEF_SEAT / 4;
        double x = reliefLift();
        double guarded = (RELIEF_SETTING * seatArea + RELIEF_RATE * x) / seatArea;
        double drop = 0.5 * OIL.density() * Math.pow(FLOW / (CD * OrificeLaw.circleArea(2.5e-3)), 2);
        double[] y = op.state();
        assertTrue(op.converged());
        assertEquals(Map.of(), op.held(), "the poppet floats");
        assertEquals(x, y[index(c, "relief.poppet.x")], x * EQUILIBRIUM_TOLERANCE);
        assertEquals(guarded, y[index(c, "guarded.p")], guarded * EQUILIBRIUM_TOLERANCE);
        assertEquals(guarded + drop, y[index(c, "line.p")], (guarded + drop) * EQUILIBRIUM_TOLERANCE);
        assertEquals(0.0, y[index(c, "relief.poppet.v")], 1e-12);
        // and every pressure rate is below 1 Pa/s (1e-5 of the 1 bar scale per second): at rest
        assertTrue(op.residual() < 1e-5, "scaled residual " + op.residual() + " 1/s in " + op.worstState());

        // And a freshly built variant with a larger orifice, started from that operating point, reaches its own
        // analytic equilibrium: the relief balance is unchanged, the orifice drop follows the new area
        CircuitModel variant = orificeAndRelief(3.5e-3);
        OperatingPoint op2 = OperatingPointSolver.solve(variant, 0.0, op.state(), op.held());
        double drop2 = 0.5 * OIL.density() * Math.pow(FLOW / (CD * OrificeLaw.circleArea(3.5e-3)), 2);
        assertEquals(guarded, op2.state()[index(variant, "guarded.p")], guarded * EQUILIBRIUM_TOLERANCE);
        assertEquals(guarded + drop2, op2.state()[index(variant, "line.p")], (guarded + drop2) * EQUILIBRIUM_TOLERANCE);
    }

    private static final double SOURCE = 50e5;
    private static final double LOAD = 1000.0;

    /** A 50 bar pressure source through an orifice into the cap end; rod end vented; 1 kN load. */
    private static CircuitModel sourceIntoCylinder() {
        Node supply = Node.tank("supply", SOURCE);
        Node tank = Node.tank("tank", 0.0);
        Node cap = Node.volume("cap", 20e-6, Double.POSITIVE_INFINITY, 0.0);
        Node rod = Node.volume("rod", 20e-6, Double.POSITIVE_INFINITY, 0.0);
        Cylinder.Parameters p = new Cylinder.Parameters(40e-3, 22e-3, 0.1, 10.0, 5e-6, 5e-6, 0.0, 500.0, 1e-3, 0.0);
        return new CircuitBuilder("held-cylinder", OIL).add(supply).add(tank).add(cap).add(rod)
                .add(new Orifice("in", supply, cap, OrificeLaw.circleArea(2e-3), CD))
                .add(new Orifice("out", rod, tank, OrificeLaw.circleArea(2e-3), CD))
                .add(new Cylinder("cyl", cap, rod, p, null, null, null, LOAD)).build();
    }

    @Test
    void cylinderPressedOnItsEndStopIsHeldThereAtSourcePressure() {
        // Given a run that drives the piston onto its extended end stop
        CircuitModel c = sourceIntoCylinder();
        SimulationResult r = Simulator.run(c, SolverSettings.defaults(1.5, 1e-3));

        // When the operating point is solved from the mean state over the last 0.1 s
        OperatingPoint op = OperatingPointSolver.solve(c, 1.5, OperatingPointSolver.startFrom(r, 1.4, 1.5));

        // Then the piston is held at its upper stop and, with no flow through the inlet orifice, the cap
        // pressure equals the source pressure and the vented rod end is at tank (continuity: no flow, no drop
        // across an orifice, Merritt 1967)
        assertEquals(Map.of("cyl.piston", Member.Mode.AT_UPPER_STOP), op.held());
        assertEquals(SOURCE, op.state()[index(c, "cap.p")], SOURCE * EQUILIBRIUM_TOLERANCE);
        assertEquals(0.0, op.state()[index(c, "rod.p")], 1.0);
        assertEquals(0.1, op.state()[index(c, "cyl.piston.x")], 0.0);

        // And from a start with the piston wrongly held at its retracted stop and no pressure anywhere, the
        // active set releases it (p_s A1 - load > 0 pulls it off, the release rule of the stop events) and holds
        // it at the extended stop the net force pushes it to
        CircuitModel fresh = sourceIntoCylinder();
        OperatingPoint op2 = OperatingPointSolver.solve(fresh, 0.0, fresh.initialState(),
                Map.of("cyl.piston", Member.Mode.AT_LOWER_STOP));
        assertEquals(Map.of("cyl.piston", Member.Mode.AT_UPPER_STOP), op2.held());
        assertTrue(op2.switches() >= 1, "at least one held-set change");
        assertEquals(SOURCE, op2.state()[index(fresh, "cap.p")], SOURCE * EQUILIBRIUM_TOLERANCE);
    }

    @Test
    void cylinderStillMovingHasNoOperatingPoint() {
        // Given a pump feeding a cylinder mid-stroke: the piston extends at v = Q / A1 (continuity, Merritt 1967)
        Node tank = Node.tank("tank", 0.0);
        Node cap = Node.volume("cap", 0.05e-3, Double.POSITIVE_INFINITY, 0.0);
        Node rod = Node.volume("rod", 0.05e-3, Double.POSITIVE_INFINITY, 0.0);
        Cylinder.Parameters p = new Cylinder.Parameters(50e-3, 28e-3, 0.3, 20.0, 10e-6, 10e-6, 0, 2000.0, 1e-3, 0.0);
        CircuitModel c = new CircuitBuilder("moving", OIL).add(tank).add(cap).add(rod)
                .add(new Pump("pump", tank, cap, FLOW / PUMP_SPEED, PUMP_SPEED, 1.0))
                .add(new Orifice("vent", rod, tank, OrificeLaw.circleArea(8e-3), CD))
                .add(new Cylinder("cyl", cap, rod, p, null, null, null, 1000.0)).build();
        SimulationResult r = Simulator.run(c, SolverSettings.defaults(0.5, 1e-3));

        // When an operating point is asked for at 0.5 s, from the run or from the simulated state
        BranchsimException fromRun = assertThrows(BranchsimException.class,
                () -> OperatingPointSolver.solve(c, 0.5, OperatingPointSolver.startFrom(r, 0.45, 0.5)));
        BranchsimException fromState = assertThrows(BranchsimException.class,
                () -> OperatingPointSolver.solve(c, 0.5, r.finalState(), r.description().finalModes()));

        // Then it is refused, naming the moving cylinder and pointing to the trajectory linearisation
        for (BranchsimException e : new BranchsimException[] {fromRun, fromState}) {
            assertEquals(ErrorKey.NO_OPERATING_POINT, e.key());
            assertTrue(e.getMessage().contains("cyl.piston is still moving at"), e.getMessage());
            assertTrue(e.getMessage().contains("--on-trajectory"), e.getMessage());
            assertTrue(e.getMessage().contains("t = 0.5 s"), e.getMessage());
        }
        // and the speed it names is Q / A1 within 1 % (continuity, Merritt 1967)
        java.util.regex.Matcher m = java.util.regex.Pattern.compile("cyl\\.piston is still moving at ([0-9.eE+-]+) m/s")
                .matcher(fromRun.getMessage());
        assertTrue(m.find(), fromRun.getMessage());
        double speed = FLOW / (Math.PI * 0.025 * 0.025);
        assertEquals(speed, Double.parseDouble(m.group(1)), 0.01 * speed);
    }

    /**
     * A pump with flow ripple never comes to rest (its shaft angle turns at the shaft speed), yet its circuit has
     * an operating point once the angle is held: the delivery frozen at Q f(theta) with the axial-piston ripple
     * factor f = (pi / z) sum_i max(0, sin(theta + 2 pi i / z)) (Ivantysyn and Ivantysynova, Hydrostatic Pumps and
     * Motors, 2001, kinematic flow pulsation; from memory, as in docs/theory.md 6.1), and the line upstream of an
     * orifice to tank at dp = (rho / 2) (Q f / (Cd A))^2 (turbulent orifice law, Merritt 1967).
     */
    @Test
    void aRipplingPumpsCircuitHasAnOperatingPointWithItsShaftAngleHeld() {
        int pistons = 9;
        double theta = 0.1;
        Node tank = Node.tank("tank", 0.0);
        Node line = Node.volume("line", 0.2e-3, Double.POSITIVE_INFINITY, 0.0);
        double orifice = 1.2e-3;
        CircuitModel c = new CircuitBuilder("rippling", OIL).add(tank).add(line)
                .add(new Pump("pump", tank, line, FLOW / PUMP_SPEED, PUMP_SPEED, 1.0,
                        new org.branchsim.core.laws.KinematicRipple(
                                org.branchsim.core.laws.KinematicRipple.Kind.AXIAL_PISTON, pistons, 0.0)))
                .add(new Orifice("orifice", line, tank, OrificeLaw.circleArea(orifice), CD)).build();
        double[] start = c.initialState();
        start[index(c, "pump.shaft.angle")] = theta;
        start[index(c, "line.p")] = 10e5;

        OperatingPoint op = OperatingPointSolver.solve(c, 0.0, start, Map.of());

        double f = 0.0;
        for (int i = 0; i < pistons; i++) {
            f += Math.max(0.0, Math.sin(theta + 2 * Math.PI * i / pistons));
        }
        f *= Math.PI / pistons;
        double q = FLOW * f;
        double area = Math.PI * orifice * orifice / 4;
        double dp = OIL.density() / 2 * Math.pow(q / (CD * area), 2);
        assertTrue(dp > 10e5, "turbulent: " + dp);
        assertEquals(theta, op.state()[index(c, "pump.shaft.angle")], 0.0, "the angle is held where it was");
        assertEquals(dp, op.state()[index(c, "line.p")], EQUILIBRIUM_TOLERANCE * dp * 100, "line pressure, Pa");
    }
}
