package org.branchsim.core.analysis;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.branchsim.core.error.BranchsimException;
import org.branchsim.core.error.ErrorKey;
import org.branchsim.core.model.CircuitModel;
import org.branchsim.core.model.StateSlot;
import org.branchsim.core.results.SimulationResult;
import org.branchsim.core.solve.Linearisation;
import org.branchsim.core.solve.OperatingPoint;
import org.hipparchus.complex.Complex;
import org.hipparchus.linear.Array2DRowRealMatrix;
import org.hipparchus.exception.MathIllegalStateException;
import org.hipparchus.linear.EigenDecompositionNonSymmetric;
import org.hipparchus.linear.RealMatrix;

/**
 * Modes of a circuit linearised about a state: the eigenvalues and eigenvectors of the scaled Jacobian over
 * the free states ({@link Linearisation}; members held at a seat or stop stay held). Normally the state is an
 * {@link OperatingPoint} ({@link #at}); {@link #onTrajectory} linearises about a simulated state, which on a
 * limit cycle or during a motion is not an equilibrium and gives only indicative modes.
 * <p>
 * For each mode lambda = sigma + i omega_d: natural frequency |lambda| / 2 pi, damping ratio -sigma / |lambda|,
 * a {@link Mode.Verdict}; participation factors p_ki = |phi_ki psi_ik| (right eigenvector phi, left
 * eigenvector psi, rows of V^-1; Perez-Arriaga, Verghese and Schweppe, Selective modal analysis with
 * applications to electric power systems, part I, IEEE Trans. PAS-101(9), 1982), normalised to sum to one
 * and summed per part and per element; and the right eigenvector's component magnitudes. Eigenvalues within
 * {@link #ZERO_EIGENVALUE} times the Jacobian's norm of zero are round-off of the finite-difference
 * Jacobian and are taken as exactly zero (neutral, not unstable).
 */
public final class ModeAnalysis {

    /** |lambda| at or below this fraction of the scaled Jacobian's infinity norm counts as zero. */
    public static final double ZERO_EIGENVALUE = 1e-8;
    /** Parts with at least this share name a mode (at most {@link #NAME_PARTS} of them, at least one). */
    public static final double NAME_SHARE = 0.15;
    /** Most parts in a mode's name. */
    public static final int NAME_PARTS = 3;

    private ModeAnalysis() {
    }

    /**
     * Modes about an operating point, its members held as it holds them.
     *
     * @param circuit the model the operating point was found for
     * @param point its operating point
     * @return modes, oscillatory ones first by rising damping ratio, then real ones by falling real part
     */
    public static List<Mode> at(CircuitModel circuit, OperatingPoint point) {
        return of(Linearisation.at(circuit, point));
    }

    private static List<Mode> of(Linearisation lin) {
        try {
            return modesOf(lin);
        } catch (MathIllegalStateException e) {
            throw new BranchsimException(ErrorKey.MODES_FAILED, Double.toString(lin.time()), e.getMessage());
        }
    }

    /**
     * Modes about a simulated state, the end of a run, which need not be an equilibrium (indicative only on a
     * limit cycle); members held as the run left them.
     *
     * @param run a run ended at the time of interest
     * @return modes, sorted as by {@link #at}
     */
    public static List<Mode> onTrajectory(SimulationResult run) {
        return of(Linearisation.atEndOf(run));
    }

    /**
     * The smallest damping ratio of the oscillatory modes about an operating point, from the eigenvalues alone
     * (no eigenvectors or participation). Real modes are not included.
     *
     * @param circuit the model the operating point was found for
     * @param point its operating point
     * @return min over oscillatory modes of -sigma / |lambda|; positive infinity when no mode is oscillatory
     */
    public static double minimumDampingRatio(CircuitModel circuit, OperatingPoint point) {
        Linearisation lin = Linearisation.at(circuit, point);
        if (lin.size() == 0) {
            return Double.POSITIVE_INFINITY;
        }
        double min = Double.POSITIVE_INFINITY;
        for (Complex l : new EigenDecompositionNonSymmetric(new Array2DRowRealMatrix(lin.scaledMatrix(), false))
                .getEigenvalues()) {
            if (l.getImaginary() > 0) {
                min = Math.min(min, -l.getReal() / Math.hypot(l.getReal(), l.getImaginary()));
            }
        }
        return min;
    }

    /** @return the element or node a state or member belongs to: its name up to the first dot */
    public static String owner(String stateName) {
        int dot = stateName.indexOf('.');
        return dot < 0 ? stateName : stateName.substring(0, dot);
    }

    /**
     * @return the part a state belongs to: its name without the last segment ({@code reducer.spool.x} ->
     *         {@code reducer.spool}, {@code reducer.chamber.p} -> {@code reducer.chamber}, {@code reduced.p} -> {@code reduced})
     */
    public static String part(String stateName) {
        int dot = stateName.lastIndexOf('.');
        return dot < 0 ? stateName : stateName.substring(0, dot);
    }

    private static List<Mode> modesOf(Linearisation lin) {
        List<String> names = new ArrayList<>();
        for (StateSlot s : lin.states()) {
            names.add(s.name());
        }
        return of(lin.scaledMatrix(), names);
    }

    /**
     * Modes of a given scaled Jacobian (matrix level; the circuit-level methods call it).
     *
     * @param a square matrix, 1/s, rows and columns in the order of {@code names}
     * @param names state names
     * @return modes, sorted as by {@link #at}
     */
    static List<Mode> of(double[][] a, List<String> names) {
        int n = names.size();
        if (n == 0) {
            return List.of();
        }
        double norm = Linearisation.rowSumNorm(a);

        // balance first (a diagonal similarity D^-1 A D: same eigenvalues, better conditioned for the QR
        // iteration); A's right eigenvectors are D v and its left ones w D^-1, so participation is unchanged
        double[] d = Balancing.scales(a);
        RealMatrix m = new Array2DRowRealMatrix(Balancing.apply(a, d), false);
        EigenDecompositionNonSymmetric eig = new EigenDecompositionNonSymmetric(m);
        Complex[] lambda = eig.getEigenvalues();
        RealMatrix v = eig.getV();
        RealMatrix w = eig.getVInv();
        for (int i = 0; i < n; i++) {
            for (int j = 0; j < n; j++) {
                v.multiplyEntry(i, j, d[i]);
                w.multiplyEntry(j, i, 1.0 / d[i]);
            }
        }
        List<Mode> modes = new ArrayList<>();
        for (int k = 0; k < n; k++) {
            double re = lambda[k].getReal();
            double im = lambda[k].getImaginary();
            if (im < 0) {
                continue;
            }
            // a complex pair occupies columns k (real part) and k + 1 (imaginary part) of V, rows k and k + 1
            // of V^-1; the magnitudes of the complex components are the same for both eigenvalues of the pair
            boolean pair = im > 0 && k + 1 < n;
            double[] p = new double[n];
            double[] shape = new double[n];
            double sum = 0.0;
            double largest = 0.0;
            for (int i = 0; i < n; i++) {
                double right = pair ? Math.hypot(v.getEntry(i, k), v.getEntry(i, k + 1)) : Math.abs(v.getEntry(i, k));
                double left = pair ? Math.hypot(w.getEntry(k, i), w.getEntry(k + 1, i)) : Math.abs(w.getEntry(k, i));
                p[i] = right * left;
                shape[i] = right;
                sum += p[i];
                largest = Math.max(largest, right);
            }
            List<Mode.Share> states = new ArrayList<>();
            List<Mode.Share> components = new ArrayList<>();
            Map<String, Double> byPart = new LinkedHashMap<>();
            Map<String, Double> byElement = new LinkedHashMap<>();
            for (int i = 0; i < n; i++) {
                double share = sum > 0 ? p[i] / sum : 0.0;
                String name = names.get(i);
                states.add(new Mode.Share(name, share));
                components.add(new Mode.Share(name, largest > 0 ? shape[i] / largest : 0.0));
                byPart.merge(part(name), share, Double::sum);
                byElement.merge(owner(name), share, Double::sum);
            }
            List<Mode.Share> parts = sorted(byPart);
            double mag = Math.hypot(re, im);
            if (mag <= ZERO_EIGENVALUE * norm) {
                re = 0.0;
                im = 0.0;
                mag = 0.0;
            }
            modes.add(new Mode(re, im, mag / (2 * Math.PI), mag > 0 ? -re / mag : 1.0, name(parts),
                    bySize(states), parts, sorted(byElement), bySize(components)));
        }
        modes.sort(Comparator.comparing((Mode md) -> !md.oscillatory())
                .thenComparingDouble(md -> md.oscillatory() ? md.dampingRatio() : -md.real()));
        return modes;
    }

    private static String name(List<Mode.Share> parts) {
        List<String> top = new ArrayList<>();
        for (Mode.Share s : parts) {
            if (top.isEmpty() || s.share() >= NAME_SHARE && top.size() < NAME_PARTS) {
                top.add(s.name());
            }
        }
        return String.join(" + ", top);
    }

    private static List<Mode.Share> sorted(Map<String, Double> shares) {
        List<Mode.Share> out = new ArrayList<>();
        shares.forEach((name, share) -> out.add(new Mode.Share(name, share)));
        return bySize(out);
    }

    private static List<Mode.Share> bySize(List<Mode.Share> shares) {
        List<Mode.Share> out = new ArrayList<>(shares);
        out.sort(Comparator.comparingDouble(Mode.Share::share).reversed());
        return out;
    }
}
