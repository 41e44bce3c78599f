package org.branchsim.core.solve;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.Map;
import org.branchsim.core.model.Member;
import org.branchsim.core.results.SimulationResult;
import org.branchsim.core.scenario.Scenario;
import org.branchsim.core.scenario.ScenarioLoader;
import org.junit.jupiter.api.Test;

/**
 * The integrator's Jacobian source reads the run's own member modes: at the end of a run where members are held
 * at seats and stops (the relief poppet, the pilot, a cylinder at its end stop), a held member's position and
 * velocity rows are zero (DESIGN.md 3: a member held at a stop keeps its position and velocity), and the same
 * member released gives a non-zero velocity row (its force depends on the pressures).
 */
class ElementJacobianTest {

    @Test
    void heldMembersHaveZeroRowsAndFreeOnesDoNot() {
        Scenario s = ScenarioLoader.load(Path.of("..", "scenarios", "feed-stall.json"));
        double t = s.solver().endTime();
        SimulationResult run = Simulator.run(s.circuit(), s.solver());
        Map<String, Member.Mode> held = run.description().finalModes();
        assertFalse(held.isEmpty(), "some member is held at the end");
        double[] y = run.finalState();
        int n = y.length;

        RunEngine engine = new RunEngine(s.circuit());
        engine.hold(held);
        double[] f0 = new double[n];
        engine.derivatives(t, y, f0);
        double[][] heldJac = new double[n][n];
        new ElementJacobian(engine).jacobian(t, y, f0, heldJac);
        engine.hold(Map.of());
        double[][] freeJac = new double[n][n];
        new ElementJacobian(engine).jacobian(t, y, f0, freeJac);

        for (Member m : s.circuit().members()) {
            if (!held.containsKey(m.id())) {
                continue;
            }
            int x = engine.position(m.positionSlot());
            int v = engine.position(m.velocitySlot());
            double freeVelocityRow = 0.0;
            for (int j = 0; j < n; j++) {
                assertEquals(0.0, heldJac[x][j], 0.0, m.id() + " position row, column " + j);
                assertEquals(0.0, heldJac[v][j], 0.0, m.id() + " velocity row, column " + j);
                freeVelocityRow += Math.abs(freeJac[v][j]);
            }
            assertTrue(freeVelocityRow > 0.0, m.id() + " released: its acceleration depends on the state");
        }
    }
}
