/**
 * The only layer that knows Hipparchus's ODE package: the circuit as an ordinary differential equation, event
 * detectors for every discontinuity, integrator choice, the output grid sampler, energy quadrature, operating
 * points (damped Newton) and the linearisation for modes.
 *
 * <p>Dependencies: {@code model}, {@code parts}, {@code results}, {@code fluid}, {@code units}, {@code error} and
 * {@code solve.stiff}. Used by {@code scenario} (solver settings, until the engine branch of issue 10 moves them),
 * {@code analysis} and {@code study}.
 */
package org.branchsim.core.solve;
