package org.branchsim.core.analysis;

import java.util.List;
import org.branchsim.core.units.Dimension;

/**
 * One oscillation component of one signal found by the spectral detector: a fundamental with the
 * harmonics the same periodic motion produces. A signal can carry several unrelated components.
 * Amplitudes are in the SI unit of the signal's dimension (Pa for a pressure, m for a position).
 *
 * @param signal signal name
 * @param dimension the signal's dimension
 * @param frequency fundamental frequency, Hz
 * @param amplitude amplitude of the fundamental over the whole window (least-squares fit of a sine and cosine
 *                  together with a straight line and the signal's other spectral peaks), SI
 * @param halfPeakToPeak half the peak-to-peak excursion of the signal over the window after its least-squares
 *                       straight line is removed (all components and noise together), SI
 * @param harmonics the harmonics seen (multiples 2, 3, ... with their own frequency and amplitude), lowest first
 * @param startAmplitude amplitude of the fundamental at the start of the window: the least-squares fit over the
 *                       first quarter of the window, carried back to the window start with the growth rate, SI
 * @param endAmplitude amplitude of the fundamental at the end of the window: the fit over the last quarter carried
 *                     forward to the window end with the growth rate, SI
 * @param growthRate exponential growth rate of the fundamental's amplitude, 1/s (negative: decaying), from the
 *                   first- and last-quarter fits: ln(a_last / a_first) / (time between the quarter centres)
 * @param trend growing, decaying or held; held (limit cycle) when |growthRate| / frequency is below
 *              {@link OscillationDetector#HOLD_RATE_PER_CYCLE}
 * @param cycles whole cycles of the fundamental in the window
 * @param threshold the caller's threshold for this signal (smallest amplitude that counts), SI
 * @param peakToFloor ratio of the Welch power spectral density at the fundamental's peak to the spectral floor
 *                    (median density over the analysed band), dimensionless; at least
 *                    {@link OscillationDetector#FLOOR_FACTOR}
 */
public record SignalOscillation(String signal, Dimension dimension, double frequency, double amplitude,
                                double halfPeakToPeak, List<Harmonic> harmonics, double startAmplitude,
                                double endAmplitude, double growthRate, Oscillation.Trend trend, int cycles,
                                double threshold, double peakToFloor) {

    /** Keeps an unmodifiable copy of the harmonics. */
    public SignalOscillation {
        harmonics = List.copyOf(harmonics);
    }

    /** @return end amplitude over the caller's threshold, dimensionless: how clearly the oscillation stands out */
    public double strength() {
        return endAmplitude / threshold;
    }

    /** @return the multiples of the fundamental seen as harmonics (2, 3, ...), lowest first */
    public List<Integer> multiples() {
        return harmonics.stream().map(Harmonic::multiple).toList();
    }

    /** @return the same component in the older single-frequency form */
    public Oscillation toOscillation() {
        return new Oscillation(signal, frequency, startAmplitude, endAmplitude, growthRate, trend, cycles);
    }
}
