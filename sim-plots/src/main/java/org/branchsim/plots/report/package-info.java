/**
 * A self-contained HTML page that carries a run's or a study's results to someone without branchsim: text,
 * tables, the circuit diagram as inline SVG and the figures as embedded PNG, readable on screen and printed.
 * Used by sim-cli's report.html.
 */
package org.branchsim.plots.report;
