package org.branchsim.core.model;

/**
 * The work buffers of one run's Jacobian evaluations ({@link CircuitModel#jacobian}), allocated once per run so
 * that a Jacobian allocates nothing: the evaluation that collects the elements' partials, a second one that
 * evaluates a single element for the finite-difference fallback, and the per-node partial sums (inflow in
 * m^3/s and extra volume in m^3, per SI unit of each state). Like {@link Evaluation}, it reads and writes the
 * member modes of its run only.
 *
 * <p>The fallback, for an element that does not supply partials ({@link Element#suppliesPartials}): each column
 * j of the element's block (its own states and its ports' pressures) is perturbed by
 * h_j = r max(|y_j|, s_j), r = sqrt(eps) (about 1.5e-8; s_j the state's typical magnitude), only that element is
 * evaluated at y + h_j e_j and y - h_j e_j, and the central quotient (c(y + h_j) - c(y - h_j)) / (2 h_j) of each
 * of its contributions c (inflow and extra volume per node, derivatives of its own states) is its partial
 * (Dennis and Schnabel, Numerical Methods for Unconstrained Optimization and Nonlinear Equations, 1983, ch. 5:
 * truncation error O(h^2), round-off O(eps / h)). The step balancing the two, eps^(1/3), is not used: relative to
 * a working pressure of 140 bar it is 84 Pa, wider than the laminar region of a large opening near zero pressure
 * drop (a few Pa), where the quotient then straddles the transition and misses the slope several times over (an
 * accumulator on a small node stalled the integrator so); at sqrt(eps) the round-off is about 1e-8 of the
 * entry, far below what the integrator needs.
 */
public final class JacobianWorkspace {

    /** r = sqrt(eps), the central-difference step relative to max(|y_j|, s_j). */
    public static final double RELATIVE_STEP = Math.sqrt(Math.ulp(1.0));

    final Evaluation collecting;
    private final Evaluation single;
    final double[] rates;
    private final double[] singleRates;
    private final double[] perturbed;
    final double[][] inflowPartials;
    final double[][] volumePartials;
    /** Per node, d(inflow)/dt with the states held, m^3/s^2 (filled by {@link #timeDifference}). */
    final double[] inflowRates;
    /** Per node, d(extra volume)/dt with the states held, m^3/s. */
    final double[] volumeRates;
    private final double[] plusInflow;
    private final double[] plusVolume;
    private final double[] plusRates;
    private final double[] typical;

    JacobianWorkspace(Node[] nodes, Member.Mode[] modes, double[] impulses, double[] typical) {
        int n = typical.length;
        collecting = new Evaluation(nodes, modes, impulses);
        single = new Evaluation(nodes, modes, impulses);
        rates = new double[n];
        singleRates = new double[n];
        perturbed = new double[n];
        inflowPartials = new double[nodes.length][n];
        volumePartials = new double[nodes.length][n];
        inflowRates = new double[nodes.length];
        volumeRates = new double[nodes.length];
        plusInflow = new double[nodes.length];
        plusVolume = new double[nodes.length];
        plusRates = new double[n];
        this.typical = typical.clone();
    }

    /** @return the step h_j of column j at state y */
    double step(double[] y, int j) {
        double h = RELATIVE_STEP * Math.max(Math.abs(y[j]), typical[j]);
        return h == 0.0 || !Double.isFinite(h) ? RELATIVE_STEP : h;
    }

    /**
     * Central differences of one element's contributions over its block, added to the per-node partial sums and
     * written into its own rows of {@code jac}.
     *
     * @param element the element
     * @param columns its own states and its ports' pressure states (positions in the state vector)
     * @param rows its own states
     * @param t time, s
     * @param y state, SI (not changed)
     * @param jac output rows, df_i/dy_j
     */
    void differences(Element element, int[] columns, int[] rows, double t, double[] y, double[][] jac) {
        int nodeCount = plusInflow.length;
        System.arraycopy(y, 0, perturbed, 0, y.length);
        for (int j : columns) {
            double h = step(y, j);
            perturbed[j] = y[j] + h;
            evaluateSingle(element, t);
            for (int k = 0; k < nodeCount; k++) {
                plusInflow[k] = single.inflowOf(k);
                plusVolume[k] = single.extraVolumeOf(k);
            }
            for (int r : rows) {
                plusRates[r] = singleRates[r];
            }
            perturbed[j] = y[j] - h;
            evaluateSingle(element, t);
            perturbed[j] = y[j];
            double twoH = 2.0 * h;
            for (int k = 0; k < nodeCount; k++) {
                inflowPartials[k][j] += (plusInflow[k] - single.inflowOf(k)) / twoH;
                volumePartials[k][j] += (plusVolume[k] - single.extraVolumeOf(k)) / twoH;
            }
            for (int r : rows) {
                jac[r][j] = (plusRates[r] - singleRates[r]) / twoH;
            }
        }
    }

    /** Zeroes the time partials before {@link #timeDifference} adds to them. */
    void clearTimePartials(double[] ft) {
        java.util.Arrays.fill(ft, 0.0);
        java.util.Arrays.fill(inflowRates, 0.0);
        java.util.Arrays.fill(volumeRates, 0.0);
    }

    /**
     * The forward difference in time of one element's contributions at fixed states: the element alone is
     * evaluated at t + dt and at t; its inflow and extra volume per node are added to the node sums and its own
     * states' rates written into {@code ft}.
     *
     * @param element the element (it reads an input that ramps at t)
     * @param rows its own states
     * @param t time, s
     * @param dt step, s
     * @param y state, SI (not changed)
     * @param ft output rows of the element's own states, SI per second squared
     */
    void timeDifference(Element element, int[] rows, double t, double dt, double[] y, double[] ft) {
        int nodeCount = plusInflow.length;
        System.arraycopy(y, 0, perturbed, 0, y.length);
        evaluateSingle(element, t + dt);
        for (int k = 0; k < nodeCount; k++) {
            plusInflow[k] = single.inflowOf(k);
            plusVolume[k] = single.extraVolumeOf(k);
        }
        for (int r : rows) {
            plusRates[r] = singleRates[r];
        }
        evaluateSingle(element, t);
        for (int k = 0; k < nodeCount; k++) {
            inflowRates[k] += (plusInflow[k] - single.inflowOf(k)) / dt;
            volumeRates[k] += (plusVolume[k] - single.extraVolumeOf(k)) / dt;
        }
        for (int r : rows) {
            ft[r] = (plusRates[r] - singleRates[r]) / dt;
        }
    }

    private void evaluateSingle(Element element, double t) {
        single.reset(t, perturbed, singleRates, null, null);
        element.evaluate(single);
    }
}
