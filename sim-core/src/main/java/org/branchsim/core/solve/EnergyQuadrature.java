package org.branchsim.core.solve;

import org.branchsim.core.model.Circuit;
import org.hipparchus.ode.sampling.ODEStateInterpolator;
import org.hipparchus.ode.sampling.ODEStepHandler;

/**
 * Integrates the power of every energy account over each accepted step with two-point Gauss-Legendre
 * quadrature on the integrator's dense output (exact for cubic power histories within a step).
 */
final class EnergyQuadrature implements ODEStepHandler {
    private static final double NODE = 0.5 / Math.sqrt(3.0);
    private final Circuit circuit;
    private final double[] energy;

    EnergyQuadrature(Circuit circuit) {
        this.circuit = circuit;
        this.energy = new double[circuit.accounts().size()];
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
        for (double ta : new double[] {mid - NODE * h, mid + NODE * h}) {
            double[] p = circuit.samplePowers(ta, interpolator.getInterpolatedState(ta).getPrimaryState());
            for (int i = 0; i < p.length; i++) {
                energy[i] += 0.5 * h * p[i];
            }
        }
    }

    /** @return integrated energy per account, J */
    double[] energy() {
        return energy.clone();
    }
}
