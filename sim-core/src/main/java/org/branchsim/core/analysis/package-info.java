/**
 * Conclusions drawn from runs: regulation metrics of reducing valves, oscillation detection (Welch spectra,
 * sinusoid fits, grouping across signals), scan windows between schedule changes, linearised modes with
 * participation factors, and trace comparison.
 *
 * <p>Dependencies: {@code results}, {@code model}, {@code elements}, {@code solve}, {@code units}, {@code error}.
 * Used by {@code study} and sim-cli.
 */
package org.branchsim.core.analysis;
