package org.branchsim.core.solve;

import org.hipparchus.ode.sampling.ODEStateInterpolator;
import org.hipparchus.ode.sampling.ODEStepHandler;

/**
 * Integrates the power of every energy account over each accepted step with the two-point Radau IIA rule on
 * the integrator's dense output: nodes at theta = 1/3 and 1 with weights 3/4 and 1/4, exact for power histories
 * quadratic in time within a step (the quadrature of the two-stage Radau IIA method, c = (1/3, 1),
 * b = (3/4, 1/4); Hairer and Wanner, Solving Ordinary Differential Equations II, 2nd ed., 1996, sec. IV.5; from
 * memory, and checked: it integrates 1, theta and theta^2 over [0, 1] exactly). The implicit method evaluates the equations at both
 * nodes anyway (its interior error check at theta = 1/3 and its derivative at the step's end), so the powers of
 * those evaluations are reused and the quadrature costs no evaluation of its own; where a node was not
 * evaluated (the explicit methods' theta = 1/3, a step cut short by an event) it is evaluated. Every account is
 * integrated by the same rule, so the balance closes to round-off whatever the rule's own error. Energy in J.
 */
final class EnergyQuadrature implements ODEStepHandler {

    /** Times within this fraction of a step are the same instant (the integrator's own rounding of h/3). */
    private static final double SAME_TIME = 1e-9;

    private final RunEngine engine;
    private final double[] energy;

    EnergyQuadrature(RunEngine engine) {
        this.engine = engine;
        this.energy = new double[engine.model().accounts().size()];
        engine.rememberPowers();
    }

    @Override
    public void handleStep(ODEStateInterpolator interpolator) {
        double t0 = interpolator.getPreviousState().getTime();
        double t1 = interpolator.getCurrentState().getTime();
        double h = t1 - t0;
        if (h <= 0.0) {
            return;
        }
        double tolerance = SAME_TIME * h;
        double third = t0 + h / 3.0;
        double[] pThird = engine.powersAt(third, interpolator.getInterpolatedState(third).getPrimaryState(), tolerance);
        double[] pEnd = engine.powersAt(t1, interpolator.getCurrentState().getPrimaryState(), tolerance);
        for (int i = 0; i < energy.length; i++) {
            energy[i] += h * (0.75 * pThird[i] + 0.25 * pEnd[i]);
        }
    }

    /** @return integrated energy per account, J */
    double[] energy() {
        return energy.clone();
    }
}
