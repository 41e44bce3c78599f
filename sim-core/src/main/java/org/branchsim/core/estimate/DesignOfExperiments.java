package org.branchsim.core.estimate;

import java.util.ArrayList;
import java.util.List;

/**
 * Points that spread evenly over the unit box [0, 1]^p: the Halton sequence (J. H. Halton, "On the efficiency of
 * certain quasi-random sequences of points in evaluating multi-dimensional integrals", Numer. Math. 2, 1960), the
 * radical inverse of the index in the first p primes as bases. Deterministic, so a study repeats exactly.
 */
public final class DesignOfExperiments {

    private static final int[] PRIMES = {2, 3, 5, 7, 11, 13, 17, 19, 23, 29, 31, 37, 41, 43, 47, 53, 59, 61, 67, 71};

    private DesignOfExperiments() {
    }

    /**
     * @param index index of the point (1, 2, ...)
     * @param p dimension (at most 20)
     * @return the Halton point of that index
     */
    public static double[] halton(int index, int p) {
        if (p > PRIMES.length) {
            throw new IllegalArgumentException("at most " + PRIMES.length + " dimensions, not " + p);
        }
        double[] x = new double[p];
        for (int d = 0; d < p; d++) {
            x[d] = radicalInverse(index, PRIMES[d]);
        }
        return x;
    }

    /** @return the first {@code count} Halton points (indices 1..count) */
    public static List<double[]> points(int count, int p) {
        List<double[]> out = new ArrayList<>();
        for (int i = 1; i <= count; i++) {
            out.add(halton(i, p));
        }
        return out;
    }

    /** @return the digits of i in base b mirrored about the radix point */
    static double radicalInverse(int i, int b) {
        double f = 1.0;
        double r = 0.0;
        int n = i;
        while (n > 0) {
            f /= b;
            r += f * (n % b);
            n /= b;
        }
        return r;
    }
}
