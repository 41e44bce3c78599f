package org.branchsim.core.solve;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import org.branchsim.core.results.SimulationResult;
import org.branchsim.core.scenario.Scenario;
import org.branchsim.core.scenario.ScenarioLoader;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

/**
 * The whole-circuit Jacobian of every demo scenario's model, assembled from the elements' partials, against
 * central differences of the whole right-hand side at several states of a run (the states and member modes at
 * a twentieth and three twentieths of its end time, where the demos switch and regulate), and at the start. Sources and tolerance:
 * {@link JacobianAgreement}.
 */
class DemoJacobianTest {

    @ParameterizedTest
    @ValueSource(strings = {"fixture-clamp", "gripper-chatter", "pilot-supply-hunting", "press-two-branches",
        "regulation-characteristic", "feed-stall"})
    void closedFormAgreesWithCentralDifferencesAlongARun(String demo) {
        Scenario s = ScenarioLoader.load(Path.of("..", "scenarios", demo + ".json"));
        double end = s.solver().endTime();
        RunEngine start = new RunEngine(s.circuit());
        double[] y0 = s.circuit().initialState();
        start.initialiseModes(0.0, y0);
        // the modes a run starts with: held where a member starts on a stop pressed onto it
        JacobianAgreement.check(s.circuit(), start.heldMembers(), 0.0, y0, demo + " at t = 0");
        for (double fraction : new double[] {0.05, 0.15}) {
            double t = fraction * end;
            SimulationResult run = Simulator.run(s.circuit(), s.solver().withEndTime(t));
            double worst = JacobianAgreement.check(s.circuit(), run.description().finalModes(), t, run.finalState(),
                    demo + " at t = " + t + " s");
            assertTrue(worst <= JacobianAgreement.TOLERANCE, demo);
        }
    }
}
