package org.branchsim.core.analysis;

/**
 * The harmonic rule shared by the detector and the grouping: a frequency f is the m-th multiple of a
 * fundamental f0 when |f - m f0| &lt;= tolerance * f0 for the nearest integer m. The tolerance is a fraction of
 * the fundamental, not of the multiple, because the frequency error of a spectral peak is about the same in Hz
 * at every multiple; a tolerance relative to m f0 would call 263 Hz the 7th harmonic of 37 Hz (1.5 % off).
 */
final class Harmonics {

    private Harmonics() {
    }

    /**
     * @param f a frequency, Hz
     * @param fundamental a candidate fundamental, Hz
     * @param tolerance allowed distance from the multiple, as a fraction of the fundamental
     * @return the multiple m (at least 1), or 0 when f is not a multiple of the fundamental
     */
    static int multiple(double f, double fundamental, double tolerance) {
        if (!(fundamental > 0.0) || !(f > 0.0)) {
            return 0;
        }
        long m = Math.round(f / fundamental);
        if (m < 1 || m > Integer.MAX_VALUE || Math.abs(f - m * fundamental) > tolerance * fundamental) {
            return 0;
        }
        return (int) m;
    }
}
