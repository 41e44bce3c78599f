package org.branchsim.core.solve;

import org.branchsim.core.results.Trace;
import org.hipparchus.ode.ODEStateAndDerivative;
import org.hipparchus.ode.sampling.ODEStateInterpolator;
import org.hipparchus.ode.sampling.ODEStepHandler;

/**
 * Samples every signal on the uniform grid t_k = k * h from the integrator's dense output, independent of
 * the steps taken. Also counts accepted steps and remembers the last accepted state for failure reports.
 */
final class GridSampler implements ODEStepHandler {
    private final RunEngine engine;
    private final Trace trace;
    private final double interval;
    private final double endTime;
    private final FailureReporter reporter;
    private long nextIndex;
    private long steps;

    GridSampler(RunEngine engine, Trace trace, double interval, double endTime, FailureReporter reporter) {
        this.engine = engine;
        this.trace = trace;
        this.interval = interval;
        this.endTime = endTime;
        this.reporter = reporter;
    }

    @Override
    public void init(ODEStateAndDerivative initialState, double finalTime) {
        nextIndex = 0;
        steps = 0;
    }

    @Override
    public void handleStep(ODEStateInterpolator interpolator) {
        if (!interpolator.isPreviousStateInterpolated()) {
            steps++;
        }
        double t1 = interpolator.getCurrentState().getTime();
        while (true) {
            double tk = Math.min(nextIndex * interval, endTime);
            if (tk > t1 || nextIndex * interval > endTime + 0.5 * interval) {
                break;
            }
            ODEStateAndDerivative s = interpolator.getInterpolatedState(tk);
            trace.add(tk, engine.sampleSignals(tk, s.getPrimaryState()));
            nextIndex++;
        }
        ODEStateAndDerivative end = interpolator.getCurrentState();
        reporter.accepted(end.getTime(), end.getPrimaryState());
    }

    long steps() {
        return steps;
    }
}
