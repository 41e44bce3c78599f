package org.branchsim.core.solve.stiff;

/**
 * Supplies the Jacobian df/dy of dy/dt = f(t, y) to an implicit integrator, in place of its own finite
 * differences: for instance assembled from partial derivatives the circuit's elements state in closed form.
 * Units: row i in state i's SI unit per second, column j per SI unit of state j.
 */
@FunctionalInterface
public interface JacobianSource {

    /**
     * Fills {@code jac[i][j]} with df_i/dy_j at (t, y); every entry is written (zeros included).
     *
     * @param t time, s
     * @param y state, SI (not changed)
     * @param f0 f(t, y), already computed by the integrator, SI per second
     * @param jac output, n x n
     */
    void jacobian(double t, double[] y, double[] f0, double[][] jac);
}
