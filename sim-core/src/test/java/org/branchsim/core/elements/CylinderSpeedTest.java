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

/**
 * Continuity: a cylinder fed a constant flow at light load extends at v = Q / A1 once the chamber pressure
 * is steady (mass conservation; Merritt, Hydraulic Control Systems, 1967, ch. 2 continuity equation).
 */
class CylinderSpeedTest {

    private static final double SPEED_TOLERANCE = 0.01;

    @Test
    void extendsAtDeliveredFlowOverPistonArea() {
        // Given 10 L/min into the cap end of a 50 mm bore cylinder, rod end vented through a large orifice
        Node tank = Node.tank("tank", 0.0);
        Node cap = Node.volume("cap", 0.05e-3, Double.POSITIVE_INFINITY, 0.0);
        Node rod = Node.volume("rod", 0.05e-3, Double.POSITIVE_INFINITY, 0.0);
        double q = 10e-3 / 60.0;
        double omega = 157.0;
        Pump pump = new Pump("pump", tank, cap, q / omega, omega, 1.0);
        Orifice vent = new Orifice("vent", rod, tank, Math.PI * 0.25 * 8e-3 * 8e-3, 0.61);
        Cylinder.Parameters p = new Cylinder.Parameters(50e-3, 28e-3, 0.3, 20.0, 10e-6, 10e-6, 0, 2000.0, 1e-3, 0.0);
        Cylinder cyl = new Cylinder("cyl", cap, rod, p, null, null, null, 1000.0);
        CircuitModel c = new CircuitBuilder("speed", TestFluids.referenceOil())
                .add(tank).add(cap).add(rod).add(pump).add(vent).add(cyl).build();

        // When it runs for 1 s
        SimulationResult r = Simulator.run(c, SolverSettings.defaults(1.0, 1e-3));

        // Then the mean piston speed from 0.5 s to 0.9 s, and the speed at 0.9 s, are Q / A1 within 1 %
        double expected = q / (0.25 * Math.PI * 50e-3 * 50e-3);
        double mean = (r.trace().valueAt("cyl.piston.x", 0.9) - r.trace().valueAt("cyl.piston.x", 0.5)) / 0.4;
        assertEquals(expected, mean, expected * SPEED_TOLERANCE);
        assertEquals(expected, r.trace().valueAt("cyl.piston.v", 0.9), expected * SPEED_TOLERANCE);
        assertTrue(r.trace().valueAt("cyl.piston.x", 1.0) < 0.3, "still inside the stroke");
    }
}
