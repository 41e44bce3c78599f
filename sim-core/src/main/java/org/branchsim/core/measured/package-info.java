/**
 * Measured traces from data loggers: a reader of logger CSV text (time in s, ms or ISO timestamps, channels with
 * their units, every mistake located by file, line and column), the mapping of channels to the circuit's
 * signals, alignment of the logger's time base with the simulation (by a trigger crossing or by
 * cross-correlation) and linear resampling. Values are converted to SI on reading.
 *
 * <p>Dependencies: {@code analysis} (the spectral oscillation detector), {@code units}, {@code error}. Reads text,
 * never files (the command line reads them).
 */
package org.branchsim.core.measured;
