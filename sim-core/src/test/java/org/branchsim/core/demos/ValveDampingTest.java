package org.branchsim.core.demos;

import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.branchsim.core.analysis.OscillationFinding;
import org.branchsim.core.analysis.OscillationScan;
import org.branchsim.core.results.SimulationResult;
import org.branchsim.core.scenario.Scenario;
import org.branchsim.core.scenario.ScenarioLoader;
import org.branchsim.core.solve.Simulator;
import org.branchsim.core.study.ValveDamping;
import org.junit.jupiter.api.Test;

/**
 * The damping ratio a specification can ask of a valve, from the linearised circuit, against what the same run
 * shows in the time domain: a linear system is stable when every pole lies in the left half-plane (every damping
 * ratio positive) and a mode with a pole in the right half-plane grows until the nonlinearities bound it (Ogata,
 * Modern Control Engineering, 5th ed., 2010, ch. 5, stability and pole locations; from memory). The clamp demo's
 * valve settles and the scan finds no oscillation of it, so its damping ratio must be positive with margin; the
 * pilot-supply demo's valve hunts (a limit cycle the scan finds), so a mode of the valve must be unstable.
 */
class ValveDampingTest {

    @Test
    void aValveThatSettlesIsDampedWithMarginAndOneThatHuntsIsNot() {
        Scenario clamp = ScenarioLoader.load(DemoRuns.scenario("fixture-clamp"));
        SimulationResult settled = Simulator.run(clamp.circuit(), clamp.solver());
        List<OscillationFinding> calm = OscillationScan.scan(settled);
        assertFalse(calm.stream().anyMatch(f -> f.parts().stream().anyMatch(p -> p.startsWith("reducer"))), calm.toString());
        double zetaClamp = ValveDamping.of(clamp.circuit(), settled, clamp.metricsFrom(), clamp.metricsTo(), "reducer");
        assertTrue(zetaClamp > 0.05, "clamp valve damping ratio " + zetaClamp);

        Scenario pilot = ScenarioLoader.load(DemoRuns.scenario("pilot-supply-hunting"));
        SimulationResult hunting = Simulator.run(pilot.circuit(), pilot.solver());
        assertFalse(OscillationScan.scan(hunting).isEmpty(), "the scan finds the hunting");
        double zetaPilot = ValveDamping.of(pilot.circuit(), hunting, pilot.metricsFrom(), pilot.metricsTo(),
                "pilotReducer");
        assertTrue(zetaPilot < 0.0, "hunting valve damping ratio " + zetaPilot);
    }
}
