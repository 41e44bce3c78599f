package org.branchsim.core.solve;

import org.branchsim.core.model.CircuitModel;
import org.branchsim.core.solve.stiff.JacobianSource;

/**
 * The Jacobian df/dy of a circuit's equations assembled from its elements' closed-form partial derivatives (and
 * the per-element central-difference fallback for elements that supply none), for the implicit integrator in
 * place of finite differences of the whole right-hand side ({@link CircuitModel#jacobian}). Units: row i in
 * state i's SI unit per second, column j per SI unit of state j.
 *
 * <p>It is built on a run's engine and uses that run's member modes as the stop events leave them, so a held
 * member's rows are those of a held member. One instance serves one run on one thread.
 */
final class ElementJacobian implements JacobianSource {

    private final RunEngine engine;

    /** @param engine a run's engine, whose member modes are used as they are */
    ElementJacobian(RunEngine engine) {
        this.engine = engine;
    }

    @Override
    public void jacobian(double t, double[] y, double[] f0, double[][] jac) {
        engine.jacobian(t, y, jac);
    }

    /** The time derivative from the elements that read a ramping input only (CircuitModel#jacobian). */
    @Override
    public boolean jacobianAndTimeDerivative(double t, double[] y, double[] f0, double[][] jac, double dt, double[] ft) {
        engine.jacobian(t, y, jac, dt, ft);
        return true;
    }
}
