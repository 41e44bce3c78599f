package org.branchsim.core.demos;

import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assertions.fail;

import java.util.Arrays;
import java.util.List;
import org.branchsim.core.model.CircuitModel;
import org.branchsim.core.model.Evaluation;
import org.branchsim.core.model.JacobianWorkspace;
import org.branchsim.core.model.Member;
import org.branchsim.core.model.ScheduledInput;
import org.branchsim.core.model.StateSlot;
import org.branchsim.core.scenario.ScenarioLoader;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

/**
 * The time derivative df/dt the model forms from the elements that read a ramping input only (a forward difference
 * of their contributions, CircuitModel#jacobian) against central differences of the whole right-hand side in time,
 * (f(t + h) - f(t - h)) / (2 h) with h = eps^(1/3) max(t, 1 ms) (Dennis and Schnabel, Numerical Methods for
 * Unconstrained Optimization and Nonlinear Equations, 1983, ch. 5, sec. 5.6), in the middle of every ramp of every
 * demo. An element that read an input it did not declare, or a tank's ramping pressure missed, would leave its
 * rows or its nodes' rows short by the whole term. The state is the demo's initial one with its pressures spread
 * (5 bar plus 13 bar per state index), so that every opening that ramps changes a flow. Agreement as in JacobianAgreement: relative 1e-5 of the entry,
 * or 1e-6 of the largest scaled entry.
 */
class TimeDerivativeTest {

    @ParameterizedTest
    @ValueSource(strings = {"fixture-clamp", "feed-stall", "gripper-chatter", "pilot-supply-hunting",
            "press-two-branches", "regulation-characteristic", "mobile-arm"})
    void theElementLocalTimeDerivativeAgreesWithDifferencesOfTheWholeRightHandSide(String demo) {
        CircuitModel model = ScenarioLoader.load(DemoRuns.scenario(demo)).circuit();
        Member.Mode[] modes = new Member.Mode[model.members().size()];
        Arrays.fill(modes, Member.Mode.FREE);
        double[] impulses = new double[model.accounts().size()];
        Evaluation work = model.workspace(modes, impulses);
        JacobianWorkspace jw = model.jacobianWorkspace(modes, impulses);
        double[] y = model.initialState();
        int n = y.length;
        List<StateSlot> states = model.states();
        // pressures spread (every pair of nodes differs) so that a valve's opening changes its flow
        for (int i = 0; i < n; i++) {
            if (states.get(i).dimension() == org.branchsim.core.units.Dimension.PRESSURE) {
                y[i] = 1e5 * (5.0 + 13.0 * i);
            }
        }
        int ramps = 0;
        for (ScheduledInput in : model.inputs()) {
            for (ScheduledInput.Ramp r : in.ramps()) {
                if (r.duration() <= 0.0) {
                    continue;
                }
                ramps++;
                double t = r.start() + 0.5 * r.duration();
                double[] ft = new double[n];
                model.jacobian(jw, t, y, new double[n][n], Math.sqrt(Math.ulp(1.0)) * Math.max(t, 1e-3), ft);
                double h = Math.cbrt(Math.ulp(1.0)) * Math.max(t, 1e-3);
                double[] plus = new double[n];
                double[] minus = new double[n];
                model.evaluate(work, t + h, y, plus, null, null);
                model.evaluate(work, t - h, y, minus, null, null);
                double largest = 0.0;
                double[] central = new double[n];
                for (int i = 0; i < n; i++) {
                    central[i] = (plus[i] - minus[i]) / (2 * h);
                    double s = states.get(i).absoluteScale();
                    largest = Math.max(largest, Math.max(Math.abs(central[i]), Math.abs(ft[i])) / s);
                }
                assertTrue(largest > 0.0, demo + ": " + in.name() + " ramping at " + t + " s changes nothing");
                for (int i = 0; i < n; i++) {
                    double s = states.get(i).absoluteScale();
                    double a = ft[i] / s;
                    double d = central[i] / s;
                    double allowed = 1e-5 * Math.max(Math.abs(a), Math.abs(d)) + 1e-6 * largest;
                    if (Math.abs(a - d) > allowed) {
                        fail(String.format(java.util.Locale.ROOT, "%s: d(%s)'/dt at %.6g s (%s ramping): element-local "
                                + "%.9g, central differences %.9g", demo, states.get(i).name(), t, in.name(), ft[i],
                                central[i]));
                    }
                }
            }
        }
        assertTrue(ramps > 0, demo + " has a ramp to check");
    }
}
