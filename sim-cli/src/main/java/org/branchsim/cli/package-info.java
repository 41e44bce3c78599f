/**
 * The {@code branchsim} command line (picocli): one class per command (run, check, sweep, tolerance, modes,
 * diagnose, timing), small collaborators they share (scenario argument, option checks, variant progress, study
 * table, output folder, metrics and diagnosis reports, figure sets), and the mapping of errors to exit codes
 * (2 for the user's input, 1 for a failed run). Commands share code through those collaborators, never through
 * each other's static methods.
 *
 * <p>Dependencies: sim-plots and sim-core; nothing depends on this package.
 */
package org.branchsim.cli;
