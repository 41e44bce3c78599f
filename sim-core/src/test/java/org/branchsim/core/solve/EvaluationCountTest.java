package org.branchsim.core.solve;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.branchsim.core.TestFluids;
import org.branchsim.core.elements.Pump;
import org.branchsim.core.model.CircuitBuilder;
import org.branchsim.core.model.CircuitModel;
import org.branchsim.core.model.Node;
import org.branchsim.core.results.SimulationResult;
import org.branchsim.core.settings.Method;
import org.branchsim.core.settings.SolverSettings;
import org.junit.jupiter.api.Test;

/**
 * The evaluation count of a run includes the evaluations made to record outputs, not only those the integrator
 * makes. The output grid is sampled from the dense output, independent of the steps taken (DESIGN.md section 4),
 * so two runs that differ only in their output interval take the same steps and their counts differ by exactly
 * the number of extra grid samples: one evaluation per sample t_k = k h, k = 0 .. T / h.
 */
class EvaluationCountTest {

    private static final double END_TIME = 0.0375;

    @Test
    void everyOutputSampleIsCounted() {
        // Given the dead-ended volume fed at 10 L/min (Merritt, Hydraulic Control Systems, Wiley 1967, ch. 2)
        CircuitModel c = deadEndedVolume();

        for (Method m : new Method[] {Method.EXPLICIT, Method.IMPLICIT}) {
            // When it runs with 200 and with 1000 output intervals, the maximum step fixed at T / 100 in both
            SimulationResult coarse = Simulator.run(c, SolverSettings.defaults(END_TIME, END_TIME / 200).withMethod(m));
            SimulationResult fine = Simulator.run(c, SolverSettings.defaults(END_TIME, END_TIME / 1000).withMethod(m));

            // Then the steps are the same, the samples are 201 and 1001, and the counts differ by the 800 samples
            assertEquals(coarse.statistics().acceptedSteps(), fine.statistics().acceptedSteps(), m.name());
            assertEquals(201, coarse.trace().size(), m.name());
            assertEquals(1001, fine.trace().size(), m.name());
            assertEquals(800, fine.statistics().evaluations() - coarse.statistics().evaluations(), m.name());
            // and the count covers at least the samples plus one energy midpoint per accepted step
            // (one-point Gauss-Legendre rule, Abramowitz & Stegun, Handbook of Mathematical Functions, 1964, 25.4.29)
            assertTrue(coarse.statistics().evaluations()
                    > coarse.trace().size() + coarse.statistics().acceptedSteps(), m.name());
        }
    }

    private static CircuitModel deadEndedVolume() {
        Node tank = Node.tank("tank", 0.0);
        Node line = Node.volume("line", 1e-3, Double.POSITIVE_INFINITY, 0.0);
        double flow = 10e-3 / 60.0;
        double omega = 1500 * 2 * Math.PI / 60;
        Pump pump = new Pump("pump", tank, line, flow / omega, omega, 1.0);
        return new CircuitBuilder("buildup", TestFluids.referenceOil()).add(tank).add(line).add(pump).build();
    }
}
