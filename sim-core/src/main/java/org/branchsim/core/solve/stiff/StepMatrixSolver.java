package org.branchsim.core.solve.stiff;

/**
 * Factorises the iteration matrix d * I - J of a linearly implicit step (d = 1 / (h gamma), 1/s; J the
 * Jacobian, 1/s) once per step size and solves it once per stage. Dense LU serves small circuits; a solver
 * that exploits the circuit's sparsity may serve large ones.
 */
public interface StepMatrixSolver {

    /**
     * Factorises {@code diagonal * I - jacobian}.
     *
     * @param diagonal d, 1/s
     * @param jacobian J, n x n (entries outside the solver's pattern, if it has one, are ignored)
     * @return false when the matrix is singular to working precision
     */
    boolean factorise(double diagonal, double[][] jacobian);

    /** Solves (d I - J) x = b in place: {@code b} is replaced by x. */
    void solve(double[] b);
}
