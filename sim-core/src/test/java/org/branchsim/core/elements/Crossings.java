package org.branchsim.core.elements;

import org.branchsim.core.results.Trace;

/** Test helper: the frequency of an oscillating signal from its upward crossings of a level. */
final class Crossings {

    private Crossings() {
    }

    /**
     * @param t trace
     * @param signal signal name
     * @param level the level crossed
     * @param after ignore crossings before this time, s
     * @return (number of periods) / (time between the first and last upward crossing), Hz
     */
    static double frequency(Trace t, String signal, double level, double after) {
        double[] s = t.series(signal);
        double first = Double.NaN;
        double lastCrossing = Double.NaN;
        int periods = -1;
        for (int k = 1; k < s.length; k++) {
            if (t.time(k - 1) < after) {
                continue;
            }
            if (s[k - 1] < level && s[k] >= level) {
                double f = (level - s[k - 1]) / (s[k] - s[k - 1]);
                double tc = t.time(k - 1) + f * (t.time(k) - t.time(k - 1));
                if (Double.isNaN(first)) {
                    first = tc;
                }
                lastCrossing = tc;
                periods++;
            }
        }
        if (periods < 2) {
            throw new AssertionError(signal + " crossed " + level + " upwards fewer than 3 times");
        }
        return periods / (lastCrossing - first);
    }
}
