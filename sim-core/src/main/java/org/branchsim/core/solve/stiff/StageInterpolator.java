package org.branchsim.core.solve.stiff;

import org.hipparchus.ode.EquationsMapper;
import org.hipparchus.ode.ODEStateAndDerivative;
import org.hipparchus.ode.sampling.AbstractODEStateInterpolator;

/**
 * The continuous extension of a RODAS step built from its stages (Hairer and Wanner, Solving Ordinary
 * Differential Equations II, 2nd ed., 1996, sec. IV.7, dense output of their code RODAS): with
 * theta = (t - t0)/h,
 * <pre>
 *   y(theta) = (1 - theta) y0 + theta (y1 + (1 - theta) (q2 + theta q3)),   q_k = sum_j d_kj u_j
 * </pre>
 * where u_j are the stage increments. Unlike a Hermite cubic from the end-point derivatives it follows the
 * stiff components inside the step as the method itself does. Units: those of the states (SI), time in s.
 * Interpolated states are kept for the step, because every event detector asks for the same check times.
 */
final class StageInterpolator extends AbstractODEStateInterpolator {

    /** End values and stage combinations of the global step, shared by restricted copies. */
    private static final class Step {
        private final double t0;
        private final double h;
        private final double[] y0;
        private final double[] y1;
        private final double[] q2;
        private final double[] q3;
        private final double[] cachedTimes = new double[CACHE];
        private final ODEStateAndDerivative[] cached = new ODEStateAndDerivative[CACHE];
        private int cachedCount;

        Step(ODEStateAndDerivative s0, ODEStateAndDerivative s1, double[] q2, double[] q3) {
            t0 = s0.getTime();
            h = s1.getTime() - t0;
            y0 = s0.getCompleteState();
            y1 = s1.getCompleteState();
            this.q2 = q2;
            this.q3 = q3;
        }
    }

    /** Interpolated states kept per step: the check times of all detectors in one step. */
    private static final int CACHE = 32;

    private final Step step;

    /**
     * @param start state at the step's start
     * @param end state at the step's end
     * @param q2 first stage combination of the dense output (copied by the caller)
     * @param q3 second stage combination of the dense output (copied by the caller)
     * @param mapper the equations' mapper
     */
    StageInterpolator(ODEStateAndDerivative start, ODEStateAndDerivative end, double[] q2, double[] q3,
                      EquationsMapper mapper) {
        this(true, start, end, start, end, mapper, new Step(start, end, q2, q3));
    }

    private StageInterpolator(boolean forward, ODEStateAndDerivative globalPrevious,
                              ODEStateAndDerivative globalCurrent, ODEStateAndDerivative softPrevious,
                              ODEStateAndDerivative softCurrent, EquationsMapper mapper, Step step) {
        super(forward, globalPrevious, globalCurrent, softPrevious, softCurrent, mapper);
        this.step = step;
    }

    @Override
    protected StageInterpolator create(boolean forward, ODEStateAndDerivative globalPrevious,
                                       ODEStateAndDerivative globalCurrent, ODEStateAndDerivative softPrevious,
                                       ODEStateAndDerivative softCurrent, EquationsMapper mapper) {
        return new StageInterpolator(forward, globalPrevious, globalCurrent, softPrevious, softCurrent, mapper, step);
    }

    @Override
    protected ODEStateAndDerivative computeInterpolatedStateAndDerivatives(EquationsMapper mapper, double time,
                                                                           double theta, double thetaH,
                                                                           double oneMinusThetaH) {
        Step e = step;
        for (int k = 0; k < e.cachedCount; k++) {
            if (e.cachedTimes[k] == time) {
                return e.cached[k];
            }
        }
        double s = theta;
        double r = 1.0 - s;
        // y = y0 + s (y1 - y0) + s r q2 + s^2 r q3; dy/ds = (y1 - y0) + (1 - 2 s) q2 + (2 s - 3 s^2) q3
        double w2 = s * r;
        double w3 = s * s * r;
        double d2 = (1.0 - 2.0 * s) / e.h;
        double d3 = (2.0 * s - 3.0 * s * s) / e.h;
        int n = e.y0.length;
        double[] y = new double[n];
        double[] yDot = new double[n];
        for (int i = 0; i < n; i++) {
            double dy = e.y1[i] - e.y0[i];
            y[i] = r * e.y0[i] + s * e.y1[i] + w2 * e.q2[i] + w3 * e.q3[i];
            yDot[i] = dy / e.h + d2 * e.q2[i] + d3 * e.q3[i];
        }
        if (s == 1.0) {
            System.arraycopy(e.y1, 0, y, 0, n);
        }
        ODEStateAndDerivative st = mapper.mapStateAndDerivative(time, y, yDot);
        int slot = e.cachedCount < CACHE ? e.cachedCount++ : (int) (Double.doubleToLongBits(time) & (CACHE - 1));
        e.cachedTimes[slot] = time;
        e.cached[slot] = st;
        return st;
    }
}
