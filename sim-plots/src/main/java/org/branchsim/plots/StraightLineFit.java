package org.branchsim.plots;

/**
 * The least-squares straight line y = intercept + slope x through sample pairs, from the normal equations
 * (slope = S_xy / S_xx with S_xy = sum (x - mean x)(y - mean y), S_xx = sum (x - mean x)^2). Units are those of
 * the samples: the slope is in units of y per unit of x.
 *
 * @param slope slope of the line, y unit per x unit (NaN when fewer than two distinct x)
 * @param intercept value of the line at x = 0, y unit (NaN when the slope is)
 * @param count number of sample pairs fitted
 */
public record StraightLineFit(double slope, double intercept, int count) {

    /**
     * @param x abscissae
     * @param y ordinates, as many as x
     * @return the least-squares line of y on x
     */
    public static StraightLineFit of(double[] x, double[] y) {
        if (x.length != y.length) {
            throw new IllegalArgumentException(x.length + " abscissae but " + y.length + " ordinates");
        }
        int n = x.length;
        if (n < 2) {
            return new StraightLineFit(Double.NaN, Double.NaN, n);
        }
        double mx = 0;
        double my = 0;
        for (int k = 0; k < n; k++) {
            mx += x[k];
            my += y[k];
        }
        mx /= n;
        my /= n;
        double sxx = 0;
        double sxy = 0;
        for (int k = 0; k < n; k++) {
            sxx += (x[k] - mx) * (x[k] - mx);
            sxy += (x[k] - mx) * (y[k] - my);
        }
        if (!(sxx > 0)) {
            return new StraightLineFit(Double.NaN, Double.NaN, n);
        }
        double slope = sxy / sxx;
        return new StraightLineFit(slope, my - slope * mx, n);
    }
}
