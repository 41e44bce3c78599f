package org.branchsim.core.analysis;

/**
 * A harmonic seen in a signal next to the fundamental of an oscillation: a significant spectral peak at
 * an integer multiple of the fundamental frequency.
 *
 * @param multiple the integer multiple of the fundamental, at least 2
 * @param frequency the peak's own measured frequency, Hz
 * @param amplitude amplitude of the sine at that frequency over the whole window (least squares), SI unit of
 *                  the signal
 */
public record Harmonic(int multiple, double frequency, double amplitude) {
}
