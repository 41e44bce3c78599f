package org.branchsim.core.solve;

import org.hipparchus.ode.nonstiff.DormandPrince54Integrator;

/** Hipparchus's Dormand-Prince 5(4) that also counts the steps its error control rejects. */
final class CountingDormandPrince extends DormandPrince54Integrator {
    private long rejected;

    CountingDormandPrince(double minStep, double maxStep, double[] absTol, double[] relTol) {
        super(minStep, maxStep, absTol, relTol);
    }

    @Override
    protected double estimateError(double[][] yDotK, double[] y0, double[] y1, double h) {
        double error = super.estimateError(yDotK, y0, y1, h);
        if (error >= 1.0) {
            rejected++;
        }
        return error;
    }

    long rejected() {
        return rejected;
    }
}
