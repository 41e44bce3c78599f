package org.branchsim.core.solve;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.branchsim.core.TestFluids;
import org.branchsim.core.elements.Pump;
import org.branchsim.core.model.CircuitBuilder;
import org.branchsim.core.model.CircuitModel;
import org.branchsim.core.model.Node;
import org.branchsim.core.results.SimulationResult;
import org.branchsim.core.settings.SolverSettings;
import org.junit.jupiter.api.Test;

/**
 * Pressure build-up in a dead-ended volume fed at constant flow: dp/dt = beta_e Q / V
 * (Merritt, Hydraulic Control Systems, Wiley 1967, ch. 2). Worked numbers from REFERENCES.md:
 * Q = 10 L/min, V = 1 L, beta = 1.6 GPa gives 2667 bar/s, 0 to 100 bar in 37.5 ms.
 */
class PressureBuildUpTest {

    private static final double RELATIVE_TOLERANCE = 0.005;

    @Test
    void deadEndedVolumeRisesAtBetaQOverV() {
        // Given a pump delivering 10 L/min into 1 L of air-free oil (beta 1.6 GPa)
        Node tank = Node.tank("tank", 0.0);
        Node line = Node.volume("line", 1e-3, Double.POSITIVE_INFINITY, 0.0);
        double flow = 10e-3 / 60.0;
        double omega = 1500 * 2 * Math.PI / 60;
        Pump pump = new Pump("pump", tank, line, flow / omega, omega, 1.0);
        CircuitModel c = new CircuitBuilder("buildup", TestFluids.referenceOil()).add(tank).add(line).add(pump).build();

        // When it runs for 37.5 ms
        SimulationResult r = Simulator.run(c, SolverSettings.defaults(0.0375, 0.0375 / 10));

        // Then the pressure reaches 100 bar (2667 bar/s) within 0.5 %
        double p = r.trace().series("line.p")[r.trace().size() - 1];
        assertEquals(100e5, p, 100e5 * RELATIVE_TOLERANCE);
        double rate = (r.trace().series("line.p")[5] - r.trace().series("line.p")[0]) / r.trace().time(5);
        assertEquals(2666.7e5, rate, 2666.7e5 * RELATIVE_TOLERANCE);
    }
}
