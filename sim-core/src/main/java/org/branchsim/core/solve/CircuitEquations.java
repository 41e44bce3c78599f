package org.branchsim.core.solve;

import org.branchsim.core.error.BranchsimException;
import org.branchsim.core.error.ErrorKey;
import org.branchsim.core.solve.stiff.DerivativesInto;

/** Adapts one run of a circuit model to Hipparchus: dy/dt = f(t, y), refusing non-finite states. */
final class CircuitEquations implements DerivativesInto {
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
        double[] yDot = new double[y.length];
        derivatives(t, y, yDot);
        return yDot;
    }

    @Override
    public void derivatives(double t, double[] y, double[] yDot) {
        for (int i = 0; i < y.length; i++) {
            if (!Double.isFinite(y[i])) {
                throw new BranchsimException(ErrorKey.NAN_IN_STATE, reporter.time(t),
                        engine.model().states().get(i).name(), Double.toString(y[i]), reporter.describeLastGood());
            }
        }
        engine.derivatives(t, y, yDot);
    }
}
