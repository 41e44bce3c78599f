package org.branchsim.core.measured;

/** Linear interpolation of sampled signals onto other times. */
public final class Resampling {

    private Resampling() {
    }

    /**
     * @param t sample times, strictly increasing
     * @param x samples
     * @param at times wanted
     * @return x linearly interpolated at each wanted time; NaN outside [t first, t last]
     */
    public static double[] linear(double[] t, double[] x, double[] at) {
        double[] out = new double[at.length];
        int k = 0;
        for (int i = 0; i < at.length; i++) {
            double q = at[i];
            if (!(q >= t[0] && q <= t[t.length - 1])) {
                out[i] = Double.NaN;
                continue;
            }
            if (i > 0 && q < at[i - 1]) {
                k = 0;
            }
            while (k < t.length - 2 && t[k + 1] < q) {
                k++;
            }
            double span = t[k + 1] - t[k];
            double w = span > 0 ? (q - t[k]) / span : 0.0;
            out[i] = x[k] + w * (x[k + 1] - x[k]);
        }
        return out;
    }

    /**
     * @param from first time, s
     * @param to last time, s (included when it falls on the grid)
     * @param step interval, s (positive)
     * @return the uniform grid from, from + step, ... up to to
     */
    public static double[] grid(double from, double to, double step) {
        int n = (int) Math.floor((to - from) / step * (1 + 1e-12)) + 1;
        double[] g = new double[Math.max(n, 0)];
        for (int k = 0; k < g.length; k++) {
            g[k] = from + k * step;
        }
        return g;
    }
}
