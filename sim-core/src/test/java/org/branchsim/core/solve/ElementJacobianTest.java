package org.branchsim.core.solve;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;

import java.nio.file.Path;
import org.branchsim.core.results.SimulationResult;
import org.branchsim.core.scenario.Scenario;
import org.branchsim.core.scenario.ScenarioLoader;
import org.junit.jupiter.api.Test;

/**
 * The integrator's Jacobian source takes the member modes from the state and its derivative alone: at the end
 * of a run where members are held at seats and stops (the relief poppet, the pilot, a cylinder at its end
 * stop), it must give exactly the Jacobian of the run's own modes, whose held rows are zero (DESIGN.md 3: a
 * member held at a stop keeps its position and velocity).
 */
class ElementJacobianTest {

    @Test
    void modesInferredFromTheStateAreTheRunsModes() {
        Scenario s = ScenarioLoader.load(Path.of("..", "scenarios", "feed-stall.json"));
        double t = s.solver().endTime();
        SimulationResult run = Simulator.run(s.circuit(), s.solver());
        assertFalse(run.description().finalModes().isEmpty(), "some member is held at the end");
        double[] y = run.finalState();
        int n = y.length;

        RunEngine engine = new RunEngine(s.circuit());
        engine.hold(run.description().finalModes());
        double[] f0 = new double[n];
        engine.derivatives(t, y, f0);
        double[][] runModes = new double[n][n];
        new ElementJacobian(engine).jacobian(t, y, f0, runModes);
        double[][] inferred = new double[n][n];
        new ElementJacobian(s.circuit()).jacobian(t, y, f0, inferred);

        for (int i = 0; i < n; i++) {
            assertArrayEquals(runModes[i], inferred[i], 0.0, s.circuit().states().get(i).name());
        }
    }
}
