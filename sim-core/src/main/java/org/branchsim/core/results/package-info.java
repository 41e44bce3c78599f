/**
 * What a run produced: the trace sampled on the output grid (SI), solver statistics, the events and the energy
 * balance.
 *
 * <p>Dependencies: {@code model} and {@code units}. Filled by {@code solve}; read by {@code analysis},
 * {@code study}, sim-plots and sim-cli.
 */
package org.branchsim.core.results;
