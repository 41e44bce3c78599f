/**
 * Studies over many runs of one scenario: parameter paths into the scenario document, sweeps and tolerance
 * studies on a thread pool, stability thresholds on the linear model, remedy candidates and the diagnosis that
 * ties an oscillation to its mode and confirms cures in the time domain.
 *
 * <p>Dependencies: {@code scenario}, {@code solve}, {@code analysis}, {@code results}, {@code model},
 * {@code elements}, {@code units}, {@code error}. The top of sim-core; used by sim-cli only.
 */
package org.branchsim.core.study;
