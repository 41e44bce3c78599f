package org.branchsim.core.demos;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.branchsim.core.analysis.Mode;
import org.branchsim.core.analysis.ModeAnalysis;
import org.branchsim.core.model.CircuitModel;
import org.branchsim.core.results.SimulationResult;
import org.branchsim.core.scenario.Scenario;
import org.branchsim.core.scenario.ScenarioLoader;
import org.branchsim.core.solve.OperatingPoint;
import org.branchsim.core.solve.OperatingPointSolver;
import org.branchsim.core.solve.Simulator;
import org.junit.jupiter.api.Test;

/**
 * The chattering gripper demo linearised about its operating point at 0.55 s (gripper closed on its part,
 * bleed still shut, the pilot poppet chattering in the run): the operating point exists and the least-damped
 * oscillatory mode is the pilot stage's.
 */
class GripperChatterModesTest {

    private static final double AT = 0.55;
    /** Scaled residual bound, 1/s: 1e-3 of a 1 bar scale per second is 1 mbar/s, at rest for any purpose here. */
    private static final double RESIDUAL_BOUND = 1e-3;
    private static final double SETTING = 35e5;

    @Test
    void operatingPointExistsAndTheLeastDampedModeIsThePilotStage() {
        Scenario s = ScenarioLoader.load(DemoRuns.scenario("gripper-chatter"));
        SimulationResult r = Simulator.run(s.circuit(), s.solver().withEndTime(AT));
        CircuitModel c = r.model();

        OperatingPoint op = OperatingPointSolver.solve(c, AT, OperatingPointSolver.startFrom(r, AT - 0.055, AT));

        assertTrue(op.converged());
        assertTrue(op.residual() < RESIDUAL_BOUND, op.residual() + " 1/s in " + op.worstState());
        // the pilot poppet floats at its equilibrium lift, passing the pilot flow (it is the mean of a chatter)
        assertTrue(!op.held().containsKey("reducer.pilot"), op.held().toString());
        // a pilot-operated reducing valve regulates within a few percent of its setting at small demand
        // (REFERENCES.md: 1-3 %, common practice, no source); 5 % allows for the spring-chamber model
        double reduced = op.stateByName().get("reduced.p");
        assertEquals(SETTING, reduced, 0.05 * SETTING);

        List<Mode> modes = ModeAnalysis.at(c, op);
        Mode least = modes.stream().filter(Mode::oscillatory).findFirst().orElseThrow();
        // participation factors (Perez-Arriaga, Verghese and Schweppe, IEEE Trans. PAS-101(9), 1982) put the
        // pilot poppet among the parts that take part most in the least-damped mode
        assertTrue(least.parts().stream().limit(2).anyMatch(p -> p.name().equals("reducer.pilot")),
                least.name() + " " + least.parts());
        assertTrue(least.name().contains("reducer.pilot"), least.name());
        // the two paths to the same eigenvalue agree to the eigen-solver's round-off (1e-9: about 1e-7 of this
        // ratio; the balanced matrix is ill-conditioned enough that 1e-12 held only by chance)
        assertEquals(least.dampingRatio(), ModeAnalysis.minimumDampingRatio(c, op), 1e-9);
    }
}
