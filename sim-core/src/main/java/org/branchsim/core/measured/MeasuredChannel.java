package org.branchsim.core.measured;

import org.branchsim.core.units.Unit;

/**
 * One channel of a measured file: its samples converted to SI, on the file's own time base.
 *
 * @param file the file it was read from (for messages)
 * @param name the column's name without its unit, e.g. {@code P2}
 * @param unit the unit the logger wrote the values in
 * @param time sample times, s (strictly increasing; for a timestamp column, s since the Unix epoch)
 * @param values values, SI
 */
public record MeasuredChannel(String file, String name, Unit unit, double[] time, double[] values) {

    /** Copies the arrays. */
    public MeasuredChannel {
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

    /** @return the number of samples */
    public int size() {
        return time.length;
    }
}
