package org.branchsim.core.solve.stiff;

import org.hipparchus.ode.EquationsMapper;
import org.hipparchus.ode.ODEStateAndDerivative;
import org.hipparchus.ode.sampling.AbstractODEStateInterpolator;

/**
 * Cubic Hermite dense output over one step from the states and derivatives at both ends: third order,
 * matching the Rosenbrock method's order, and continuous with continuous first derivative across steps.
 * The end values are copied once per step, and interpolated states are kept for the step, because every
 * event detector asks for the same check times.
 */
final class HermiteInterpolator extends AbstractODEStateInterpolator {

    /** End values of the global step, shared by restricted copies. */
    private static final class Ends {
        private final double t0;
        private final double h;
        private final double[] y0;
        private final double[] y1;
        private final double[] f0;
        private final double[] f1;
        private final double[] cachedTimes = new double[CACHE];
        private final ODEStateAndDerivative[] cached = new ODEStateAndDerivative[CACHE];
        private int cachedCount;

        Ends(ODEStateAndDerivative s0, ODEStateAndDerivative s1) {
            t0 = s0.getTime();
            h = s1.getTime() - t0;
            y0 = s0.getCompleteState();
            y1 = s1.getCompleteState();
            f0 = s0.getCompleteDerivative();
            f1 = s1.getCompleteDerivative();
        }
    }

    /** Interpolated states kept per step: the check times of all detectors in one step. */
    private static final int CACHE = 32;

    private final Ends ends;

    HermiteInterpolator(boolean forward, ODEStateAndDerivative globalPrevious, ODEStateAndDerivative globalCurrent,
                        ODEStateAndDerivative softPrevious, ODEStateAndDerivative softCurrent, EquationsMapper mapper) {
        this(forward, globalPrevious, globalCurrent, softPrevious, softCurrent, mapper,
                new Ends(globalPrevious, globalCurrent));
    }

    private HermiteInterpolator(boolean forward, ODEStateAndDerivative globalPrevious,
                                ODEStateAndDerivative globalCurrent, ODEStateAndDerivative softPrevious,
                                ODEStateAndDerivative softCurrent, EquationsMapper mapper, Ends ends) {
        super(forward, globalPrevious, globalCurrent, softPrevious, softCurrent, mapper);
        this.ends = ends;
    }

    @Override
    protected HermiteInterpolator create(boolean forward, ODEStateAndDerivative globalPrevious,
                                         ODEStateAndDerivative globalCurrent, ODEStateAndDerivative softPrevious,
                                         ODEStateAndDerivative softCurrent, EquationsMapper mapper) {
        return new HermiteInterpolator(forward, globalPrevious, globalCurrent, softPrevious, softCurrent, mapper, ends);
    }

    @Override
    protected ODEStateAndDerivative computeInterpolatedStateAndDerivatives(EquationsMapper mapper, double time,
                                                                           double theta, double thetaH,
                                                                           double oneMinusThetaH) {
        Ends e = ends;
        for (int k = 0; k < e.cachedCount; k++) {
            if (e.cachedTimes[k] == time) {
                return e.cached[k];
            }
        }
        double h = e.h;
        double t = theta;
        double t2 = t * t;
        double t3 = t2 * t;
        double h00 = 2 * t3 - 3 * t2 + 1;
        double h10 = (t3 - 2 * t2 + t) * h;
        double h01 = -2 * t3 + 3 * t2;
        double h11 = (t3 - t2) * h;
        double d00 = (6 * t2 - 6 * t) / h;
        double d10 = 3 * t2 - 4 * t + 1;
        double d11 = 3 * t2 - 2 * t;
        int n = e.y0.length;
        double[] y = new double[n];
        double[] yDot = new double[n];
        for (int i = 0; i < n; i++) {
            double dy = e.y1[i] - e.y0[i];
            y[i] = e.y0[i] + h01 * dy + h10 * e.f0[i] + h11 * e.f1[i];
            yDot[i] = -d00 * dy + d10 * e.f0[i] + d11 * e.f1[i];
        }
        ODEStateAndDerivative s = mapper.mapStateAndDerivative(time, y, yDot);
        int slot = e.cachedCount < CACHE ? e.cachedCount++ : (int) (Double.doubleToLongBits(time) & (CACHE - 1));
        e.cachedTimes[slot] = time;
        e.cached[slot] = s;
        return s;
    }
}
