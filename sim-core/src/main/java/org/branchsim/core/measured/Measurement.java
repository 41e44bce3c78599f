package org.branchsim.core.measured;

/**
 * A measured channel mapped to a circuit signal, on a time base that may have been shifted onto the
 * simulation's.
 *
 * @param signal the circuit signal it records, e.g. {@code clampLine.p}
 * @param channel the measured column's name
 * @param file the file it came from
 * @param time sample times, s
 * @param values values, SI
 */
public record Measurement(String signal, String channel, String file, double[] time, double[] values) {

    /** Copies the arrays. */
    public Measurement {
        time = time.clone();
        values = values.clone();
    }

    @Override
    public double[] time() {
        return time.clone();
    }

    @Override
    public double[] values() {
        return values.clone();
    }

    /**
     * @param offset the logger's time of the simulation's zero, s
     * @return the same samples at times t - offset
     */
    public Measurement shifted(double offset) {
        double[] t = time.clone();
        for (int k = 0; k < t.length; k++) {
            t[k] -= offset;
        }
        return new Measurement(signal, channel, file, t, values);
    }

    /** @return the first sample time, s */
    public double start() {
        return time[0];
    }

    /** @return the last sample time, s */
    public double end() {
        return time[time.length - 1];
    }

    /** @return the mean sample interval, s */
    public double meanInterval() {
        return (end() - start()) / (time.length - 1);
    }
}
