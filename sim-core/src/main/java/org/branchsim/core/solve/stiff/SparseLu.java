package org.branchsim.core.solve.stiff;

import java.util.ArrayList;
import java.util.BitSet;
import java.util.List;

/**
 * Sparse LU factorisation of the iteration matrix d * I - J of a linearly implicit step (d, 1/s; J the Jacobian
 * in SI per second per SI unit of each state), for circuits whose Jacobian is sparse. Three phases:
 * <ol>
 * <li>once per pattern: the pattern is symmetrised and a minimum degree order computed on it
 * ({@link MinimumDegreeOrdering}), which also gives the pattern of the factors with every fill entry (the
 * symbolic factorisation), stored row by row;</li>
 * <li>once per step size ({@link #factorise}): the entries of the pattern are gathered from the Jacobian in that
 * order and factorised row by row (Doolittle's form of Gaussian elimination, unit lower L) with the diagonal as
 * pivot, touching only the stored entries;</li>
 * <li>once per stage ({@link #solve}): forward and back substitution over the stored entries.</li>
 * </ol>
 * The static pivots are checked: a pivot u_ii = a_ii - sum_k l_ik u_ki that has lost more than eight digits to
 * cancellation, |u_ii| &lt; {@code PIVOT_THRESHOLD} (|a_ii| + sum_k |l_ik u_ki|), or is zero or not finite, makes
 * that step's matrix be factorised by dense LU with partial pivoting instead (which also reports a singular
 * matrix). Unlike a threshold on the size of multipliers (Duff, Erisman and Reid, Direct Methods for Sparse
 * Matrices, 1986, threshold pivoting), the test does not depend on how rows and columns are scaled: both sides
 * scale alike when a row or a column of A is multiplied by a constant, so states in Pa beside states in m do not
 * trip it. The componentwise backward error of LU is bounded by a multiple of |L||U| (Higham, Accuracy and
 * Stability of Numerical Algorithms, 2nd ed., 2002, Thm 9.3); the test bounds the diagonal of |L||U| by
 * 1e8 |u_ii|. Entries of the Jacobian outside the pattern are not read.
 */
public final class SparseLu implements StepMatrixSolver {

    /** Smallest ratio of a pivot to the sum of the magnitudes it was computed from before dense LU takes over. */
    static final double PIVOT_THRESHOLD = 1e-8;

    private final int n;
    private final int[] oldOfNew;
    /** Row i of the factors occupies [rowStart[i], rowStart[i+1]) of columns and values, columns sorted. */
    private final int[] rowStart;
    private final int[] columns;
    private final int[] diagonalAt;
    private final double[] values;
    /** Entries read from the Jacobian: position in values, original row, original column. */
    private final int[] gatherAt;
    private final int[] gatherRow;
    private final int[] gatherColumn;
    private final double[] work;
    private final double[] permuted;
    private DenseLu dense;
    private boolean denseThisStep;
    private long fallbacks;

    /**
     * Orders the pattern and computes the pattern of the factors.
     *
     * @param pattern where the Jacobian may be non-zero (the diagonal is always stored)
     */
    public SparseLu(SparsityPattern pattern) {
        this.n = pattern.dimension();
        BitSet[] symmetric = new BitSet[n];
        for (int i = 0; i < n; i++) {
            symmetric[i] = new BitSet(n);
        }
        List<int[]> entries = new ArrayList<>();
        for (int j = 0; j < n; j++) {
            BitSet rows = pattern.rows(j);
            for (int i = rows.nextSetBit(0); i >= 0; i = rows.nextSetBit(i + 1)) {
                symmetric[i].set(j);
                symmetric[j].set(i);
                entries.add(new int[] {i, j});
            }
        }
        MinimumDegreeOrdering order = new MinimumDegreeOrdering(symmetric);
        this.oldOfNew = order.oldOfNew();
        int[] newOfOld = order.newOfOld();
        List<List<Integer>> lower = new ArrayList<>();
        for (int i = 0; i < n; i++) {
            lower.add(new ArrayList<>());
        }
        int[][] upper = new int[n][];
        for (int k = 0; k < n; k++) {
            upper[k] = order.upperColumns(k);
            for (int i : upper[k]) {
                lower.get(i).add(k); // k ascending: each lower list comes out sorted
            }
        }
        this.rowStart = new int[n + 1];
        for (int i = 0; i < n; i++) {
            rowStart[i + 1] = rowStart[i] + lower.get(i).size() + 1 + upper[i].length;
        }
        this.columns = new int[rowStart[n]];
        this.diagonalAt = new int[n];
        for (int i = 0; i < n; i++) {
            int p = rowStart[i];
            for (int k : lower.get(i)) {
                columns[p++] = k;
            }
            diagonalAt[i] = p;
            columns[p++] = i;
            for (int j : upper[i]) {
                columns[p++] = j;
            }
        }
        this.values = new double[columns.length];
        this.gatherAt = new int[entries.size()];
        this.gatherRow = new int[entries.size()];
        this.gatherColumn = new int[entries.size()];
        for (int e = 0; e < entries.size(); e++) {
            int[] rc = entries.get(e);
            gatherRow[e] = rc[0];
            gatherColumn[e] = rc[1];
            gatherAt[e] = position(newOfOld[rc[0]], newOfOld[rc[1]]);
        }
        this.work = new double[n];
        this.permuted = new double[n];
    }

    private int position(int row, int column) {
        int at = java.util.Arrays.binarySearch(columns, rowStart[row], rowStart[row + 1], column);
        if (at < 0) {
            throw new IllegalStateException("entry (" + row + ", " + column + ") missing from the factor pattern");
        }
        return at;
    }

    /** @return the number of stored entries of L and U together (diagonal and fill included) */
    public int storedEntries() {
        return columns.length;
    }

    /** @return how many factorisations fell back to dense LU because a pivot failed the cancellation test */
    public long denseFallbacks() {
        return fallbacks;
    }

    @Override
    public boolean factorise(double diagonal, double[][] jacobian) {
        java.util.Arrays.fill(values, 0.0);
        for (int e = 0; e < gatherAt.length; e++) {
            values[gatherAt[e]] -= jacobian[gatherRow[e]][gatherColumn[e]];
        }
        for (int i = 0; i < n; i++) {
            values[diagonalAt[i]] += diagonal;
        }
        denseThisStep = !eliminate();
        if (denseThisStep) {
            fallbacks++;
            if (dense == null) {
                dense = new DenseLu(n);
            }
            return dense.factorise(diagonal, jacobianOnPattern(jacobian));
        }
        return true;
    }

    /** @return the Jacobian restricted to the pattern (the dense fallback must not see entries outside it) */
    private double[][] jacobianOnPattern(double[][] jacobian) {
        double[][] restricted = new double[n][n];
        for (int e = 0; e < gatherAt.length; e++) {
            restricted[gatherRow[e]][gatherColumn[e]] = jacobian[gatherRow[e]][gatherColumn[e]];
        }
        return restricted;
    }

    /** Row-by-row elimination in place; @return false when a pivot fails the cancellation test */
    private boolean eliminate() {
        double[] w = work;
        for (int i = 0; i < n; i++) {
            int start = rowStart[i];
            int end = rowStart[i + 1];
            int diagonal = diagonalAt[i];
            for (int p = start; p < end; p++) {
                w[columns[p]] = values[p];
            }
            double magnitude = Math.abs(values[diagonal]);
            for (int p = start; p < diagonal; p++) {
                int k = columns[p];
                double multiplier = w[k] / values[diagonalAt[k]];
                w[k] = multiplier;
                if (multiplier != 0.0) {
                    for (int q = diagonalAt[k] + 1, qEnd = rowStart[k + 1]; q < qEnd; q++) {
                        int c = columns[q];
                        double update = multiplier * values[q];
                        w[c] -= update;
                        if (c == i) {
                            magnitude += Math.abs(update);
                        }
                    }
                }
            }
            for (int p = start; p < end; p++) {
                int c = columns[p];
                values[p] = w[c];
                w[c] = 0.0;
            }
            double pivot = values[diagonal];
            if (!Double.isFinite(pivot) || !Double.isFinite(magnitude) || pivot == 0.0
                    || Math.abs(pivot) < PIVOT_THRESHOLD * magnitude) {
                return false;
            }
        }
        return true;
    }

    @Override
    public void solve(double[] b) {
        if (denseThisStep) {
            dense.solve(b);
            return;
        }
        double[] x = permuted;
        for (int i = 0; i < n; i++) {
            x[i] = b[oldOfNew[i]];
        }
        for (int i = 0; i < n; i++) {
            double s = x[i];
            for (int p = rowStart[i], end = diagonalAt[i]; p < end; p++) {
                s -= values[p] * x[columns[p]];
            }
            x[i] = s;
        }
        for (int i = n - 1; i >= 0; i--) {
            double s = x[i];
            int d = diagonalAt[i];
            for (int p = d + 1, end = rowStart[i + 1]; p < end; p++) {
                s -= values[p] * x[columns[p]];
            }
            x[i] = s / values[d];
        }
        for (int i = 0; i < n; i++) {
            b[oldOfNew[i]] = x[i];
        }
    }
}
