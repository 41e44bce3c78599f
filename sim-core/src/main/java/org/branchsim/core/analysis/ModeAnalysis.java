package org.branchsim.core.analysis;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.branchsim.core.model.Circuit;
import org.branchsim.core.model.Element;
import org.branchsim.core.model.StateSlot;
import org.branchsim.core.parts.TravelLimitedMass;
import org.hipparchus.complex.Complex;
import org.hipparchus.linear.Array2DRowRealMatrix;
import org.hipparchus.linear.EigenDecompositionNonSymmetric;
import org.hipparchus.linear.RealMatrix;

/**
 * Linearises a circuit around a state: the Jacobian of the whole ODE by central differences, with members
 * held at a seat or stop kept held (their position and velocity are left out), scaled by each state's typical
 * magnitude, then its eigenvalues and eigenvectors. For each mode it reports natural frequency, damping ratio
 * and participation factors p_ik = |r_ik l_ki| (right and left eigenvectors; Perez-Arriaga, Verghese and
 * Schweppe, IEEE Trans. PAS-101(9), 1982; citation from memory), normalised to sum to one, summed per element.
 */
public final class ModeAnalysis {

    private static final double RELATIVE_STEP = 1e-6;
    private static final int TOP = 4;

    private ModeAnalysis() {
    }

    /**
     * @param circuit circuit whose members' modes are those at the state (e.g. just after a run to t)
     * @param t time, s
     * @param y state, SI
     * @return modes, oscillatory ones first by rising damping ratio, then real ones by rising decay rate
     */
    public static List<Mode> at(Circuit circuit, double t, double[] y) {
        List<Integer> free = freeStates(circuit);
        int n = free.size();
        List<StateSlot> slots = circuit.states();
        double[] scale = new double[n];
        for (int k = 0; k < n; k++) {
            scale[k] = slots.get(free.get(k)).absoluteScale();
        }
        double[][] a = new double[n][n];
        double[] yp = y.clone();
        double[] fPlus = new double[y.length];
        double[] fMinus = new double[y.length];
        for (int c = 0; c < n; c++) {
            int j = free.get(c);
            double h = RELATIVE_STEP * Math.max(Math.abs(y[j]), scale[c]);
            yp[j] = y[j] + h;
            circuit.derivatives(t, yp, fPlus);
            yp[j] = y[j] - h;
            circuit.derivatives(t, yp, fMinus);
            yp[j] = y[j];
            for (int r = 0; r < n; r++) {
                int i = free.get(r);
                // scaled: d(x_i/s_i)/d(x_j/s_j)
                a[r][c] = (fPlus[i] - fMinus[i]) / (2 * h) * scale[c] / scale[r];
            }
        }
        RealMatrix m = new Array2DRowRealMatrix(a, false);
        EigenDecompositionNonSymmetric eig = new EigenDecompositionNonSymmetric(m);
        Complex[] lambda = eig.getEigenvalues();
        RealMatrix v = eig.getV();
        RealMatrix w = eig.getVInv();
        List<Mode> modes = new ArrayList<>();
        for (int k = 0; k < n; k++) {
            double re = lambda[k].getReal();
            double im = lambda[k].getImaginary();
            if (im < 0) {
                continue;
            }
            boolean pair = im > 0 && k + 1 < n;
            double[] p = new double[n];
            double sum = 0.0;
            for (int i = 0; i < n; i++) {
                double right = pair ? Math.hypot(v.getEntry(i, k), v.getEntry(i, k + 1)) : Math.abs(v.getEntry(i, k));
                double left = pair ? Math.hypot(w.getEntry(k, i), w.getEntry(k + 1, i)) : Math.abs(w.getEntry(k, i));
                p[i] = right * left;
                sum += p[i];
            }
            List<Mode.Share> states = new ArrayList<>();
            Map<String, Double> byElement = new LinkedHashMap<>();
            for (int i = 0; i < n; i++) {
                double share = sum > 0 ? p[i] / sum : 0.0;
                String name = slots.get(free.get(i)).name();
                states.add(new Mode.Share(name, share));
                byElement.merge(owner(name), share, Double::sum);
            }
            states.sort(Comparator.comparingDouble(Mode.Share::share).reversed());
            List<Mode.Share> elements = new ArrayList<>();
            byElement.forEach((e, s) -> elements.add(new Mode.Share(e, s)));
            elements.sort(Comparator.comparingDouble(Mode.Share::share).reversed());
            double mag = Math.hypot(re, im);
            modes.add(new Mode(re, im, mag / (2 * Math.PI), mag > 0 ? -re / mag : 1.0,
                    List.copyOf(states.subList(0, Math.min(TOP, states.size()))),
                    List.copyOf(elements.subList(0, Math.min(TOP, elements.size())))));
        }
        modes.sort(Comparator.comparing((Mode md) -> !md.oscillatory())
                .thenComparingDouble(md -> md.oscillatory() ? md.dampingRatio() : -md.real()));
        return modes;
    }

    /** @return the element or node a state or member belongs to: its name up to the first dot */
    public static String owner(String stateName) {
        int dot = stateName.indexOf('.');
        return dot < 0 ? stateName : stateName.substring(0, dot);
    }

    private static List<Integer> freeStates(Circuit circuit) {
        List<Integer> held = new ArrayList<>();
        for (Element e : circuit.elements()) {
            for (TravelLimitedMass member : e.members()) {
                if (member.mode() != TravelLimitedMass.Mode.FREE) {
                    held.add(member.positionSlot().solverIndex());
                    held.add(member.velocitySlot().solverIndex());
                }
            }
        }
        List<Integer> free = new ArrayList<>();
        for (int i = 0; i < circuit.dimension(); i++) {
            if (!held.contains(i)) {
                free.add(i);
            }
        }
        return free;
    }
}
