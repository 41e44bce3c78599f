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

    /**
     * Fills the Jacobian as {@link #jacobian} and, if the source can, the time derivative df/dt at (t, y) by its
     * own means (e.g. differencing only the parts of f that depend on time).
     *
     * @param dt step of a forward difference in time, s
     * @param ft output, df/dt, SI per second squared
     * @return true when {@code ft} was filled; false leaves it to the integrator (a difference of the whole f)
     */
    default boolean jacobianAndTimeDerivative(double t, double[] y, double[] f0, double[][] jac, double dt, double[] ft) {
        jacobian(t, y, f0, jac);
        return false;
    }
}
