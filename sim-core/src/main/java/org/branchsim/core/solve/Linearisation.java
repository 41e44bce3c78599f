package org.branchsim.core.solve;

import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import org.branchsim.core.model.CircuitModel;
import org.branchsim.core.model.Element;
import org.branchsim.core.model.Member;
import org.branchsim.core.model.PeriodicDrive;
import org.branchsim.core.model.StateSlot;
import org.branchsim.core.results.SimulationResult;

/**
 * The Jacobian A = df/dy of a circuit's equations dy/dt = f(t, y) over its <em>free</em> states, at one time
 * and state: members held at a seat or stop are left out (their position and velocity are fixed while held).
 * The matrix is the integrator's: assembled from the elements' closed-form partial derivatives
 * ({@link RunEngine#jacobian(double, double[], double[][])}, docs/theory.md 10.1), with the run's member modes, so
 * a slope is exact also where an opening's laminar region is narrower than any difference step would be. The
 * matrix is stored scaled,
 * A_s[r][c] = d(y_r / s_r) / d(y_c / s_c) = A[r][c] s_c / s_r, in 1/s: its eigenvalues are those of A, and
 * pressures in Pa next to positions in m no longer make it badly conditioned. Shared by the mode analysis
 * and the operating-point Newton solve.
 */
public final class Linearisation {

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
        this.norm = rowSumNorm(scaled);
    }

    /** @return the largest row sum of absolute values of a matrix (its infinity norm), in its own unit */
    public static double rowSumNorm(double[][] a) {
        double max = 0.0;
        for (double[] row : a) {
            double sum = 0.0;
            for (double x : row) {
                sum += Math.abs(x);
            }
            max = Math.max(max, sum);
        }
        return max;
    }

    /**
     * Linearises about an operating point, its members held as it holds them.
     *
     * @param model the model the operating point was found for
     * @param point the operating point
     * @return the scaled Jacobian over the free states
     */
    public static Linearisation at(CircuitModel model, OperatingPoint point) {
        RunEngine engine = new RunEngine(model);
        engine.hold(point.held());
        return of(engine, point.time(), point.state());
    }

    /**
     * Linearises about the end of a run (which need not be an equilibrium), its members held as the run left
     * them.
     *
     * @param run a finished run
     * @return the scaled Jacobian over the free states at the run's end time and final state
     */
    public static Linearisation atEndOf(SimulationResult run) {
        RunEngine engine = new RunEngine(run.model());
        engine.hold(run.description().finalModes());
        return of(engine, run.description().settings().endTime(), run.finalState());
    }

    /**
     * @param engine the run whose member modes say which members are held
     * @param t time, s (scheduled inputs are evaluated at t)
     * @param y state, SI (not changed)
     * @return the scaled Jacobian over the free states
     */
    static Linearisation of(RunEngine engine, double t, double[] y) {
        List<StateSlot> free = freeStates(engine);
        int n = free.size();
        double[] scale = new double[n];
        int[] columns = new int[n];
        for (int k = 0; k < n; k++) {
            scale[k] = free.get(k).absoluteScale();
            columns[k] = engine.position(free.get(k));
        }
        double[][] full = new double[y.length][y.length];
        engine.jacobian(t, y, full);
        double[][] a = new double[n][n];
        for (int r = 0; r < n; r++) {
            for (int c = 0; c < n; c++) {
                a[r][c] = full[columns[r]][columns[c]] * scale[c] / scale[r];
            }
        }
        return new Linearisation(t, Collections.unmodifiableList(free), scale, a);
    }

    /** @return the model's states in state-vector order, without the position and velocity of held members */
    static List<StateSlot> freeStates(RunEngine engine) {
        CircuitModel model = engine.model();
        boolean[] held = new boolean[model.dimension()];
        List<Member> members = model.members();
        for (int k = 0; k < members.size(); k++) {
            if (engine.mode(k) != Member.Mode.FREE) {
                held[engine.position(members.get(k).positionSlot())] = true;
                held[engine.position(members.get(k).velocitySlot())] = true;
            }
        }
        for (Element e : model.elements()) {
            if (e instanceof PeriodicDrive d && d.drivePhase() != null) {
                held[engine.position(d.drivePhase())] = true;
            }
        }
        List<StateSlot> free = new ArrayList<>();
        for (StateSlot s : model.states()) {
            if (!held[engine.position(s)]) {
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
