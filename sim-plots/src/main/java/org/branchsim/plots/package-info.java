/**
 * JFreeChart figures of runs: time histories (overlaid or stacked on a shared time axis, axes in the scenario's
 * unit system), comparisons of one signal over several runs, and histograms of a study's metric. Every figure
 * carries the simulation caution.
 *
 * <p>Dependencies: sim-core's {@code results} and {@code units}, and JFreeChart; sim-core never depends on this
 * package. Used by sim-cli.
 */
package org.branchsim.plots;
