package org.branchsim.core.estimate;

import java.util.Arrays;

/**
 * The standard deviation of the white noise on a smoothly varying record, from its second differences: for white
 * noise of standard deviation sigma, d = x[k+1] - 2 x[k] + x[k-1] has standard deviation sigma sqrt(6), while a
 * straight-line trend cancels (the successive-difference idea of J. von Neumann, "Distribution of the ratio of the
 * mean square successive difference to the variance", Ann. Math. Stat. 12, 1941, taken one order further); the
 * median of |d| of a normal variable d is 0.6745 times its standard deviation (the median absolute deviation;
 * F. R. Hampel, J. Am. Stat. Assoc. 69, 1974), which the few samples at steps and landings barely move.
 */
public final class NoiseEstimate {

    /** Median of |z| for a standard normal z. */
    public static final double MAD_NORMAL = 0.6744897501960817;

    private NoiseEstimate() {
    }

    /**
     * @param x samples (at least 3)
     * @return the estimated noise standard deviation, same unit as x
     */
    public static double sigma(double[] x) {
        double[] d = new double[x.length - 2];
        for (int k = 0; k < d.length; k++) {
            d[k] = Math.abs(x[k + 2] - 2 * x[k + 1] + x[k]);
        }
        Arrays.sort(d);
        int n = d.length;
        double median = n % 2 == 1 ? d[n / 2] : 0.5 * (d[n / 2 - 1] + d[n / 2]);
        return median / (MAD_NORMAL * Math.sqrt(6.0));
    }
}
