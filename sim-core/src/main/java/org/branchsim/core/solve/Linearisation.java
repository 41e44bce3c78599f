package org.branchsim.core.solve;

import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import org.branchsim.core.model.Circuit;
import org.branchsim.core.model.Element;
import org.branchsim.core.model.StateSlot;
import org.branchsim.core.parts.TravelLimitedMass;

/**
 * The Jacobian A = df/dy of a circuit's equations dy/dt = f(t, y) over its <em>free</em> states, at one time
 * and state: members held at a seat or stop are left out (their position and velocity are fixed while held).
 * Columns are taken by central differences, step {@link #RELATIVE_STEP} times the larger of |y_j| and the
 * state's typical magnitude s_j ({@link StateSlot#absoluteScale()}). The matrix is stored scaled,
 * A_s[r][c] = d(y_r / s_r) / d(y_c / s_c) = A[r][c] s_c / s_r, in 1/s: its eigenvalues are those of A, and
 * pressures in Pa next to positions in m no longer make it badly conditioned. Shared by the mode analysis
 * and the operating-point Newton solve. Uses the circuit's current member modes.
 */
public final class Linearisation {

    /** Central-difference step relative to max(|y_j|, s_j). */
    public static final double RELATIVE_STEP = 1e-6;

    private final double time;
    private final List<StateSlot> states;
    private final double[] scales;
    private final double[][] scaled;
    private final double norm;

    private Linearisation(double time, List<StateSlot> states, double[] scales, double[][] scaled) {
        this.time = time;
        this.states = states;
        this.scales = scales;
        this.scaled = scaled;
        double max = 0.0;
        for (double[] row : scaled) {
            double sum = 0.0;
            for (double a : row) {
                sum += Math.abs(a);
            }
            max = Math.max(max, sum);
        }
        this.norm = max;
    }

    /**
     * @param circuit circuit whose member modes say which members are held
     * @param t time, s (scheduled inputs are evaluated at t)
     * @param y state, SI (not changed)
     * @return the scaled Jacobian over the free states
     */
    public static Linearisation of(Circuit circuit, double t, double[] y) {
        List<StateSlot> free = freeStates(circuit);
        int n = free.size();
        double[] scale = new double[n];
        for (int k = 0; k < n; k++) {
            scale[k] = free.get(k).absoluteScale();
        }
        double[][] a = new double[n][n];
        double[] yp = y.clone();
        double[] fPlus = new double[y.length];
        double[] fMinus = new double[y.length];
        for (int c = 0; c < n; c++) {
            int j = free.get(c).solverIndex();
            double h = RELATIVE_STEP * Math.max(Math.abs(y[j]), scale[c]);
            yp[j] = y[j] + h;
            circuit.derivatives(t, yp, fPlus);
            yp[j] = y[j] - h;
            circuit.derivatives(t, yp, fMinus);
            yp[j] = y[j];
            for (int r = 0; r < n; r++) {
                int i = free.get(r).solverIndex();
                a[r][c] = (fPlus[i] - fMinus[i]) / (2 * h) * scale[c] / scale[r];
            }
        }
        return new Linearisation(t, Collections.unmodifiableList(free), scale, a);
    }

    /**
     * @param circuit a circuit
     * @return its states in solver order, without the position and velocity of members held at a stop
     */
    public static List<StateSlot> freeStates(Circuit circuit) {
        boolean[] held = new boolean[circuit.dimension()];
        for (Element e : circuit.elements()) {
            for (TravelLimitedMass member : e.members()) {
                if (member.mode() != TravelLimitedMass.Mode.FREE) {
                    held[member.positionSlot().solverIndex()] = true;
                    held[member.velocitySlot().solverIndex()] = true;
                }
            }
        }
        List<StateSlot> free = new ArrayList<>();
        for (StateSlot s : circuit.states()) {
            if (!held[s.solverIndex()]) {
                free.add(s);
            }
        }
        return free;
    }

    /** @return the time linearised at, s */
    public double time() {
        return time;
    }

    /** @return the free states, in the order of the matrix rows and columns */
    public List<StateSlot> states() {
        return states;
    }

    /** @return the number of free states */
    public int size() {
        return states.size();
    }

    /** @return the typical magnitude of free state k, SI */
    public double scale(int k) {
        return scales[k];
    }

    /** @return a copy of the scaled Jacobian A_s, 1/s */
    public double[][] scaledMatrix() {
        double[][] copy = new double[scaled.length][];
        for (int r = 0; r < scaled.length; r++) {
            copy[r] = scaled[r].clone();
        }
        return copy;
    }

    /** @return the infinity norm (largest absolute row sum) of the scaled Jacobian, 1/s */
    public double norm() {
        return norm;
    }
}
