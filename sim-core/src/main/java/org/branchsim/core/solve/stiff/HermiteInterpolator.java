package org.branchsim.core.solve.stiff;

import org.hipparchus.ode.EquationsMapper;
import org.hipparchus.ode.ODEStateAndDerivative;
import org.hipparchus.ode.sampling.AbstractODEStateInterpolator;

/**
 * Cubic Hermite dense output over one step from the states and derivatives at both ends: third order,
 * matching the Rosenbrock method's order, and continuous with continuous first derivative across steps.
 */
final class HermiteInterpolator extends AbstractODEStateInterpolator {

    HermiteInterpolator(boolean forward, ODEStateAndDerivative globalPrevious, ODEStateAndDerivative globalCurrent,
                        ODEStateAndDerivative softPrevious, ODEStateAndDerivative softCurrent, EquationsMapper mapper) {
        super(forward, globalPrevious, globalCurrent, softPrevious, softCurrent, mapper);
    }

    @Override
    protected HermiteInterpolator create(boolean forward, ODEStateAndDerivative globalPrevious,
                                         ODEStateAndDerivative globalCurrent, ODEStateAndDerivative softPrevious,
                                         ODEStateAndDerivative softCurrent, EquationsMapper mapper) {
        return new HermiteInterpolator(forward, globalPrevious, globalCurrent, softPrevious, softCurrent, mapper);
    }

    @Override
    protected ODEStateAndDerivative computeInterpolatedStateAndDerivatives(EquationsMapper mapper, double time,
                                                                           double theta, double thetaH,
                                                                           double oneMinusThetaH) {
        ODEStateAndDerivative s0 = getGlobalPreviousState();
        ODEStateAndDerivative s1 = getGlobalCurrentState();
        double h = s1.getTime() - s0.getTime();
        double[] y0 = s0.getCompleteState();
        double[] y1 = s1.getCompleteState();
        double[] f0 = s0.getCompleteDerivative();
        double[] f1 = s1.getCompleteDerivative();
        double t = theta;
        double t2 = t * t;
        double t3 = t2 * t;
        double h00 = 2 * t3 - 3 * t2 + 1;
        double h10 = t3 - 2 * t2 + t;
        double h01 = -2 * t3 + 3 * t2;
        double h11 = t3 - t2;
        double d00 = (6 * t2 - 6 * t) / h;
        double d10 = 3 * t2 - 4 * t + 1;
        double d01 = (-6 * t2 + 6 * t) / h;
        double d11 = 3 * t2 - 2 * t;
        double[] y = new double[y0.length];
        double[] yDot = new double[y0.length];
        for (int i = 0; i < y.length; i++) {
            y[i] = h00 * y0[i] + h10 * h * f0[i] + h01 * y1[i] + h11 * h * f1[i];
            yDot[i] = d00 * y0[i] + d10 * f0[i] + d01 * y1[i] + d11 * f1[i];
        }
        return mapper.mapStateAndDerivative(time, y, yDot);
    }
}
