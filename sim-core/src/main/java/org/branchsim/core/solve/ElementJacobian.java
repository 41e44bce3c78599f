package org.branchsim.core.solve;

import org.branchsim.core.model.CircuitModel;
import org.branchsim.core.solve.stiff.JacobianSource;

/**
 * The Jacobian df/dy of a circuit's equations assembled from its elements' closed-form partial derivatives (and
 * the per-element central-difference fallback for elements that supply none), for the implicit integrator in
 * place of finite differences of the whole right-hand side ({@link CircuitModel#jacobian}). Units: row i in
 * state i's SI unit per second, column j per SI unit of state j.
 *
 * <p>The member modes: built on a run's engine it uses that run's modes; built on the model alone (the
 * integrator is created before it sees the run), it keeps its own engine and takes each member's mode from the
 * state and derivative it is handed ({@code RunEngine#inferModes}: held exactly on a stop, at rest, with zero
 * derivatives). One instance serves one run on one thread.
 */
final class ElementJacobian implements JacobianSource {

    private final RunEngine engine;
    private final boolean inferModes;

    /** @param model the model; the modes are inferred from each state and derivative */
    ElementJacobian(CircuitModel model) {
        this.engine = new RunEngine(model);
        this.inferModes = true;
    }

    /** @param engine a run's engine, whose member modes are used as they are */
    ElementJacobian(RunEngine engine) {
        this.engine = engine;
        this.inferModes = false;
    }

    @Override
    public void jacobian(double t, double[] y, double[] f0, double[][] jac) {
        if (inferModes) {
            engine.inferModes(y, f0);
        }
        engine.jacobian(t, y, jac);
    }
}
