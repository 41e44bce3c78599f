package org.branchsim.core.solve;

import java.util.Map;
import org.branchsim.core.elements.Accumulator;
import org.branchsim.core.elements.HydraulicLine;
import org.branchsim.core.fluid.Fluid;
import org.branchsim.core.model.CircuitBuilder;
import org.branchsim.core.model.CircuitModel;
import org.branchsim.core.model.Node;
import org.branchsim.core.model.ScheduledInput;
import org.branchsim.core.results.SimulationResult;
import org.branchsim.core.settings.SolverSettings;
import org.junit.jupiter.api.Test;

/**
 * The Jacobian of a circuit of the accumulator and the hydraulic line (both with closed-form partials) against central differences of the whole right-hand side, at the start and along a
 * run in which the accumulator charges through a short line. Sources and tolerance: {@link JacobianAgreement}
 * (Dennis and Schnabel 1983, ch. 5). The accumulator's inlet is laminar over only a few Pa about zero pressure
 * drop: a fallback quotient with the step eps^(1/3) max(|p|, s), 84 Pa at 140 bar, missed its slope by 85 % and
 * stalled the integrator, which this test would have caught.
 */
class NewPartsJacobianTest {

    @Test
    void accumulatorOnALineAgreesWithCentralDifferences() {
        double charged = 140e5;
        Fluid oil = new Fluid(870.0, 46e-6, 1.6e9, 0.0, 1.4, 313.15);
        Node supply = Node.tank("supply", charged);
        supply.tankPressure().addRamp(new ScheduledInput.Ramp(0.01, 0.0, charged + 1e5));
        Node neckEnd = Node.volume("neckEnd", 1e-6, Double.POSITIVE_INFINITY, charged);
        HydraulicLine neck = new HydraulicLine("neck", supply, neckEnd, 0.05, 4e-3, Double.POSITIVE_INFINITY, 1);
        Accumulator acc = new Accumulator("acc", neckEnd,
                new Accumulator.GasCharge(0.5e-3, 50e5, 313.15, 1.4, Double.NaN), 0.375e-3, 12e-3, 0.7);
        CircuitModel c = new CircuitBuilder("helmholtz", oil).add(supply).add(neckEnd).add(neck).add(acc).build();
        JacobianAgreement.check(c, Map.of(), 0.0, c.initialState(), "at t = 0");
        for (double t : new double[] {0.005, 0.011, 0.02}) {
            SimulationResult run = Simulator.run(c, SolverSettings.defaults(t, 1e-4));
            JacobianAgreement.check(c, run.description().finalModes(), t, run.finalState(), "at t = " + t + " s");
        }
    }
}
