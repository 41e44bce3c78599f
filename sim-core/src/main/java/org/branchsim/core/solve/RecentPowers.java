package org.branchsim.core.solve;

/**
 * The energy accounts' powers (W) of the latest few derivative evaluations of a run, each with its time (s) and
 * state (SI), so that the energy quadrature can reuse the powers of evaluations the integrator made anyway
 * (its interior error check and its step-end derivative) instead of evaluating the equations again.
 */
final class RecentPowers {

    /** Evaluations remembered: the quadrature asks for the last two of an accepted step. */
    private static final int KEPT = 4;
    /** States agree when they differ by at most this fraction of their size (the same point, rounded). */
    private static final double SAME_STATE = 1e-9;

    private final double[] times = new double[KEPT];
    private final double[][] states;
    private final double[][] powers;
    private final double[] scale;
    private int newest = -1;
    private int filled;

    /**
     * @param dimension number of states
     * @param accounts number of energy accounts
     * @param scale each state's absolute size below which differences are rounding (SI)
     */
    RecentPowers(int dimension, int accounts, double[] scale) {
        this.states = new double[KEPT][dimension];
        this.powers = new double[KEPT][accounts];
        this.scale = scale.clone();
    }

    /**
     * Makes room for the next evaluation's record.
     *
     * @param t time of the evaluation, s
     * @param y its state (copied)
     * @return the buffer the evaluation must write its powers into
     */
    double[] next(double t, double[] y) {
        newest = (newest + 1) % KEPT;
        filled = Math.min(KEPT, filled + 1);
        times[newest] = t;
        System.arraycopy(y, 0, states[newest], 0, y.length);
        return powers[newest];
    }

    /**
     * @param t time, s
     * @param y state, SI
     * @param timeTolerance largest time difference still taken as the same instant, s
     * @return the powers of the newest remembered evaluation at (t, y) (a copy), or null when there is none
     */
    double[] find(double t, double[] y, double timeTolerance) {
        for (int k = 0; k < filled; k++) {
            int slot = Math.floorMod(newest - k, KEPT);
            if (Math.abs(times[slot] - t) <= timeTolerance && same(states[slot], y)) {
                return powers[slot].clone();
            }
        }
        return null;
    }

    private boolean same(double[] a, double[] b) {
        for (int i = 0; i < a.length; i++) {
            double size = Math.max(Math.max(Math.abs(a[i]), Math.abs(b[i])), scale[i]);
            if (Math.abs(a[i] - b[i]) > SAME_STATE * size) {
                return false;
            }
        }
        return true;
    }
}
