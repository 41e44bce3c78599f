/**
 * JFreeChart figures of runs: time histories on panels over one time axis that ends at the end time (at most
 * eight series to a panel, identical signals drawn once, small flows on their own panel, value axes fitted after
 * start-up with clipped values named; axes in the scenario's unit system), the landing of each reducing valve
 * zoomed on the event (setting, settling band, peak, settling time, spool and pilot positions), comparisons of one
 * signal over several runs, and histograms of a study's metric. Every figure carries the simulation caution.
 *
 * <p>Dependencies: sim-core's {@code results}, {@code units} and {@code analysis} (the metrics a landing figure
 * marks), and JFreeChart; sim-core never depends on this package. Used by sim-cli.
 */
package org.branchsim.plots;
