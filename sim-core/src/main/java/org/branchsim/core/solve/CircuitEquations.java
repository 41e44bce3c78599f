package org.branchsim.core.solve;

import org.branchsim.core.error.BranchsimException;
import org.branchsim.core.error.ErrorKey;
import org.branchsim.core.model.Circuit;
import org.hipparchus.ode.OrdinaryDifferentialEquation;

/** Adapts a {@link Circuit} to Hipparchus: dy/dt = f(t, y), refusing non-finite states. */
final class CircuitEquations implements OrdinaryDifferentialEquation {
    private final Circuit circuit;
    private final FailureReporter reporter;

    CircuitEquations(Circuit circuit, FailureReporter reporter) {
        this.circuit = circuit;
        this.reporter = reporter;
    }

    @Override
    public int getDimension() {
        return circuit.dimension();
    }

    @Override
    public double[] computeDerivatives(double t, double[] y) {
        for (int i = 0; i < y.length; i++) {
            if (!Double.isFinite(y[i])) {
                throw new BranchsimException(ErrorKey.NAN_IN_STATE, reporter.time(t),
                        circuit.states().get(i).name(), Double.toString(y[i]), reporter.describeLastGood());
            }
        }
        double[] yDot = new double[y.length];
        circuit.derivatives(t, y, yDot);
        return yDot;
    }
}
