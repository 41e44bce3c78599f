package org.branchsim.core.solve;

import org.branchsim.core.error.BranchsimException;
import org.branchsim.core.error.ErrorKey;
import org.hipparchus.ode.OrdinaryDifferentialEquation;

/** Adapts one run of a circuit model to Hipparchus: dy/dt = f(t, y), refusing non-finite states. */
final class CircuitEquations implements OrdinaryDifferentialEquation {
    private final RunEngine engine;
    private final FailureReporter reporter;

    CircuitEquations(RunEngine engine, FailureReporter reporter) {
        this.engine = engine;
        this.reporter = reporter;
    }

    @Override
    public int getDimension() {
        return engine.model().dimension();
    }

    @Override
    public double[] computeDerivatives(double t, double[] y) {
        for (int i = 0; i < y.length; i++) {
            if (!Double.isFinite(y[i])) {
                throw new BranchsimException(ErrorKey.NAN_IN_STATE, reporter.time(t),
                        engine.model().states().get(i).name(), Double.toString(y[i]), reporter.describeLastGood());
            }
        }
        double[] yDot = new double[y.length];
        engine.derivatives(t, y, yDot);
        return yDot;
    }
}
