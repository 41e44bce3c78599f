/**
 * Estimation and optimisation on the model: weighted least-squares fits of free parameters to measured traces
 * (Levenberg-Marquardt, confidence intervals from the Jacobian at the optimum, correlations, identifiability)
 * and derivative-free searches for a design that meets a specification (a coarse design of experiments, then
 * BOBYQA from several starts in parallel), with the specification file's reader. Parameters are searched in
 * [0, 1] scaled to their bounds.
 *
 * <p>Dependencies: {@code study} (variants and their runs), {@code measured}, {@code analysis}, {@code scenario},
 * {@code solve}, {@code results}, {@code units}, {@code error}; Hipparchus optim and linear algebra. Used by
 * sim-cli only.
 */
package org.branchsim.core.estimate;
