package org.branchsim.core.solve;

import org.hipparchus.ode.sampling.ODEStateInterpolator;
import org.hipparchus.ode.sampling.ODEStepHandler;

/**
 * Integrates the power of every energy account over each accepted step with the one-point Gauss-Legendre
 * (midpoint) rule on the integrator's dense output: exact for linear power histories within a step, with
 * steps kept short by the integrator wherever the powers change quickly. Every account is integrated by the
 * same rule, so the balance closes to round-off whatever the rule's own error.
 */
final class EnergyQuadrature implements ODEStepHandler {
    private final RunEngine engine;
    private final double[] energy;

    EnergyQuadrature(RunEngine engine) {
        this.engine = engine;
        this.energy = new double[engine.model().accounts().size()];
    }

    @Override
    public void handleStep(ODEStateInterpolator interpolator) {
        double t0 = interpolator.getPreviousState().getTime();
        double t1 = interpolator.getCurrentState().getTime();
        double h = t1 - t0;
        if (h <= 0.0) {
            return;
        }
        double mid = 0.5 * (t0 + t1);
        double[] p = engine.samplePowers(mid, interpolator.getInterpolatedState(mid).getPrimaryState());
        for (int i = 0; i < p.length; i++) {
            energy[i] += h * p[i];
        }
    }

    /** @return integrated energy per account, J */
    double[] energy() {
        return energy.clone();
    }
}
