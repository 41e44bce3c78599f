package org.branchsim.core.analysis;

/**
 * A sustained oscillation found in one signal after the transients.
 *
 * @param signal signal name
 * @param frequency frequency, Hz
 * @param amplitude amplitude (half peak-to-peak) at the start of the analysed window, SI
 * @param endAmplitude amplitude at the end of the window, SI
 * @param growthRate exponential growth rate of the amplitude, 1/s (negative: decaying)
 * @param trend whether it grows, decays or holds (limit cycle)
 * @param cycles number of cycles seen in the window
 */
public record Oscillation(String signal, double frequency, double amplitude, double endAmplitude,
                          double growthRate, Trend trend, int cycles) {

    /** How the amplitude evolves over the window. */
    public enum Trend {
        /** Amplitude grows. */
        GROWING,
        /** Amplitude decays but is still present at the end of the window. */
        DECAYING,
        /** Amplitude holds: a limit cycle. */
        LIMIT_CYCLE;

        /** @return a lower-case label for reports */
        public String label() {
            return name().toLowerCase(java.util.Locale.ROOT).replace('_', ' ');
        }
    }
}
