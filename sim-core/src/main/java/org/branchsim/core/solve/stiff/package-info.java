/**
 * The implicit integrator: RODAS3, a four-stage L-stable Rosenbrock method of order 3 with an embedded order-2
 * error estimate, on Hipparchus's adaptive step-size integrator framework, with its cubic Hermite dense output,
 * LU solvers (dense, and sparse on a minimum degree order for circuits from {@link
 * org.branchsim.core.solve.stiff.StepMatrixChoice#SPARSE_FROM_STATES} states) and grouped finite-difference Jacobian
 * (Curtis, Powell and Reid).
 *
 * <p>Dependencies: Hipparchus only, nothing else inside branchsim. Used by {@code solve}.
 */
package org.branchsim.core.solve.stiff;
