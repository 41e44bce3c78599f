package org.branchsim.core.solve.stiff;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Random;
import org.branchsim.core.model.CircuitModel;
import org.branchsim.core.model.Evaluation;
import org.branchsim.core.model.Member;
import org.branchsim.core.scenario.DocumentParser;
import org.branchsim.core.scenario.Located;
import org.branchsim.core.scenario.Scenario;
import org.branchsim.core.scenario.ScenarioLoader;
import org.branchsim.core.solve.Simulator;
import org.branchsim.core.study.BranchReplica;
import org.hipparchus.linear.Array2DRowRealMatrix;
import org.hipparchus.linear.SingularValueDecomposition;
import org.junit.jupiter.api.Test;

/**
 * Sparse LU of d I - J against manufactured exact solutions (x chosen, b = A x computed directly), against dense LU,
 * on random sparse systems shaped like circuits (branches on one shared node), on a circuit's own matrix, and on
 * matrices whose static pivots fail or that are singular.
 */
class SparseLuTest {

    private static final double EPS = Math.ulp(1.0);

    /**
     * Forward error bound of a backward-stable solve: |x - x^| / |x| <= c * n * eps * cond(A) (Higham, Accuracy
     * and Stability of Numerical Algorithms, 2nd ed., 2002, Thm 7.2 with the backward error of Thm 9.4); c = 10
     * allows for modest element growth (common practice, no source).
     */
    private static double forwardBound(double[][] a) {
        double cond = new SingularValueDecomposition(new Array2DRowRealMatrix(a)).getConditionNumber();
        return 10.0 * a.length * EPS * cond;
    }

    /**
     * The same bound for a strictly row diagonally dominant A with cond_inf(A) bounded by |A|_inf over the smallest
     * dominance margin min_i (|a_ii| - sum_j!=i |a_ij|) (Varah, "A lower bound for the smallest singular value of
     * a matrix", Linear Algebra Appl. 11, 1975).
     */
    private static double dominantForwardBound(double[][] a) {
        double norm = 0.0;
        double margin = Double.POSITIVE_INFINITY;
        for (int i = 0; i < a.length; i++) {
            double off = 0.0;
            for (int k = 0; k < a.length; k++) {
                off += k == i ? 0.0 : Math.abs(a[i][k]);
            }
            norm = Math.max(norm, off + Math.abs(a[i][i]));
            margin = Math.min(margin, Math.abs(a[i][i]) - off);
        }
        return 10.0 * a.length * EPS * norm / margin;
    }

    /** @return random blocks: one shared state 0 and branches of {@code size} states, each coupled to state 0 */
    private static List<int[]> branchBlocks(int branches, int size) {
        List<int[]> blocks = new ArrayList<>();
        for (int b = 0; b < branches; b++) {
            int first = 1 + b * size;
            blocks.add(new int[] {0, first});
            for (int k = 0; k + 1 < size; k++) {
                blocks.add(new int[] {first + k, first + k + 1});
            }
            blocks.add(new int[] {first, first + 2, first + size - 1});
        }
        return blocks;
    }

    private static double[][] randomOnPattern(SparsityPattern p, Random random) {
        int n = p.dimension();
        double[][] j = new double[n][n];
        for (int c = 0; c < n; c++) {
            var rows = p.rows(c);
            for (int r = rows.nextSetBit(0); r >= 0; r = rows.nextSetBit(r + 1)) {
                j[r][c] = 2 * random.nextDouble() - 1;
            }
        }
        return j;
    }

    private static double[][] iterationMatrix(double d, double[][] jac) {
        int n = jac.length;
        double[][] a = new double[n][n];
        for (int i = 0; i < n; i++) {
            for (int k = 0; k < n; k++) {
                a[i][k] = -jac[i][k];
            }
            a[i][i] += d;
        }
        return a;
    }

    private static double[] times(double[][] a, double[] x) {
        double[] b = new double[a.length];
        for (int i = 0; i < a.length; i++) {
            double s = 0.0;
            for (int k = 0; k < x.length; k++) {
                s += a[i][k] * x[k];
            }
            b[i] = s;
        }
        return b;
    }

    private static double relativeError(double[] x, double[] exact) {
        double num = 0.0;
        double den = 0.0;
        for (int i = 0; i < x.length; i++) {
            num = Math.max(num, Math.abs(x[i] - exact[i]));
            den = Math.max(den, Math.abs(exact[i]));
        }
        return num / den;
    }

    private static double[] randomVector(int n, Random random) {
        double[] x = new double[n];
        for (int i = 0; i < n; i++) {
            x[i] = 2 * random.nextDouble() - 1;
        }
        return x;
    }

    @Test
    void diagonallyDominantSystemsMatchExactSolutionAndDenseLu() {
        Random random = new Random(11);
        for (int trial = 0; trial < 20; trial++) {
            SparsityPattern p = SparsityPattern.ofBlocks(1 + 12 * 6, branchBlocks(12, 6));
            double[][] jac = randomOnPattern(p, random);
            double rowMax = 0.0;
            for (double[] row : jac) {
                rowMax = Math.max(rowMax, Arrays.stream(row).map(Math::abs).sum());
            }
            double d = 1.0 + rowMax; // strictly diagonally dominant rows
            double[][] a = iterationMatrix(d, jac);
            double[] exact = randomVector(p.dimension(), random);
            double[] x = times(a, exact);
            double[] y = x.clone();
            SparseLu sparse = new SparseLu(p);
            assertTrue(sparse.factorise(d, jac));
            sparse.solve(x);
            DenseLu dense = new DenseLu(p.dimension());
            assertTrue(dense.factorise(d, jac));
            dense.solve(y);
            double bound = dominantForwardBound(a);
            assertTrue(relativeError(x, exact) <= bound, "sparse error " + relativeError(x, exact) + " > " + bound);
            assertTrue(relativeError(x, y) <= 2 * bound, "sparse and dense differ by " + relativeError(x, y));
            assertEquals(0, sparse.denseFallbacks(), "a diagonally dominant matrix needs no pivoting "
                    + "(Golub and Van Loan, Matrix Computations, 3rd ed., 1996, Thm 3.4.3)");
        }
    }

    @Test
    void nonDominantSystemsMatchExactSolution() {
        Random random = new Random(12);
        int fellBack = 0;
        for (int trial = 0; trial < 20; trial++) {
            SparsityPattern p = SparsityPattern.ofBlocks(1 + 8 * 5, branchBlocks(8, 5));
            double[][] jac = randomOnPattern(p, random);
            double d = 0.05; // entries of order 1 off the diagonal: far from dominant
            double[][] a = iterationMatrix(d, jac);
            double[] exact = randomVector(p.dimension(), random);
            double[] x = times(a, exact);
            SparseLu sparse = new SparseLu(p);
            assertTrue(sparse.factorise(d, jac));
            sparse.solve(x);
            double bound = forwardBound(a);
            assertTrue(relativeError(x, exact) <= bound, "trial " + trial + ": error " + relativeError(x, exact)
                    + " > " + bound);
            fellBack += (int) sparse.denseFallbacks();
        }
        assertTrue(fellBack < 20, "most non-dominant matrices pass the threshold test: " + fellBack + " fell back");
    }

    /**
     * A zero static pivot: A = [[0, 1, 0], [1, 0, 0], [0, 0, 1]] is a permutation, its own inverse (exact solution
     * x = (b1, b0, b2)); without row exchanges the first pivot is zero, so dense LU must take over.
     */
    @Test
    void zeroPivotFallsBackToDenseLuAndStillSolves() {
        SparsityPattern p = SparsityPattern.ofBlocks(3, List.of(new int[] {0, 1}));
        double d = 1.0;
        double[][] jac = {{1, -1, 0}, {-1, 1, 0}, {0, 0, 0}};
        SparseLu lu = new SparseLu(p);
        assertTrue(lu.factorise(d, jac));
        assertEquals(1, lu.denseFallbacks());
        double[] b = {3.0, 5.0, 7.0};
        lu.solve(b);
        assertEquals(5.0, b[0], 1e-15);
        assertEquals(3.0, b[1], 1e-15);
        assertEquals(7.0, b[2], 1e-15);
    }

    /** A = [[1, 1], [1, 1]] (rank 1): singular, so the factorisation must report it. */
    @Test
    void singularMatrixIsReported() {
        SparsityPattern p = SparsityPattern.ofBlocks(2, List.of(new int[] {0, 1}));
        double[][] jac = {{-1, -1}, {-1, -1}};
        assertFalse(new SparseLu(p).factorise(0.0, jac));
    }

    /**
     * Arrowhead pattern (one state coupled to all others): eliminated leaves first, it creates no fill at all,
     * whereas the shared state first would fill the whole matrix (the classic example of George and Liu,
     * Computer Solution of Large Sparse Positive Definite Systems, 1981, ch. 1 and 5; from memory for the chapters).
     */
    @Test
    void minimumDegreeOrderCreatesNoFillOnAnArrowhead() {
        int n = 50;
        List<int[]> blocks = new ArrayList<>();
        for (int i = 1; i < n; i++) {
            blocks.add(new int[] {0, i});
        }
        SparseLu lu = new SparseLu(SparsityPattern.ofBlocks(n, blocks));
        assertEquals(n + 2 * (n - 1), lu.storedEntries());
    }

    /** Entries outside the pattern are not read: the solve is that of the matrix restricted to the pattern. */
    @Test
    void entriesOutsideThePatternAreIgnored() {
        SparsityPattern p = SparsityPattern.ofBlocks(2, List.of());
        double[][] jac = {{-1, 1000}, {1000, -3}};
        SparseLu lu = new SparseLu(p);
        assertTrue(lu.factorise(1.0, jac));
        double[] b = {4.0, 8.0};
        lu.solve(b);
        // diagonal matrix diag(2, 4): x = (2, 2)
        assertEquals(2.0, b[0], 1e-15);
        assertEquals(2.0, b[1], 1e-15);
    }

    /**
     * The matrix of the clamp demo with its clamp branch copied four times (57 states), at a state 0.4 s into the
     * run: for step sizes from 1 us to 10 ms the normwise backward error |b - A x^| / (|A| |x^| + |b|) stays at
     * the level of a backward-stable solve (Rigal and Gaches, J. ACM 14, 1967; Higham 2002, Thm 7.1), and the
     * solution matches the manufactured exact one where the problem is well conditioned after row and column
     * scaling, checked through dense LU with partial pivoting.
     */
    @Test
    void circuitMatrixSolvesLikeDenseLu() {
        Located base = DocumentParser.parse(Path.of("..", "scenarios", "fixture-clamp.json"));
        Scenario s = ScenarioLoader.build("fixture-clamp x4", BranchReplica.replicate("fixture-clamp.json", base,
                "reducer", 4));
        CircuitModel model = s.circuit();
        assertEquals(17 + 3 * 10, model.dimension(), "17 states for one branch, 10 per extra branch");
        double[] y = Simulator.run(model, s.solver().withEndTime(0.4)).finalState();
        SparsityPattern p = SparsityPattern.ofBlocks(model.dimension(), model.couplings());
        Member.Mode[] modes = new Member.Mode[model.members().size()];
        Arrays.fill(modes, Member.Mode.FREE);
        Evaluation work = model.workspace(modes, new double[model.accounts().size()]);
        int n = model.dimension();
        double[] f0 = new double[n];
        model.evaluate(work, 0.4, y, f0, null, null);
        double[] typical = new double[n];
        for (int i = 0; i < n; i++) {
            typical[i] = model.states().get(i).absoluteScale();
        }
        double[][] jac = new double[n][n];
        new DifferenceJacobian(1e-7, typical, p.groups()).estimate(yp -> {
            double[] f = new double[n];
            model.evaluate(work, 0.4, yp, f, null, null);
            return f;
        }, y, f0, (column, quotient) -> {
            var rows = p.rows(column);
            for (int r = rows.nextSetBit(0); r >= 0; r = rows.nextSetBit(r + 1)) {
                jac[r][column] = quotient.applyAsDouble(r);
            }
        });
        Random random = new Random(13);
        SparseLu sparse = new SparseLu(p);
        for (double h : new double[] {1e-6, 1e-5, 1e-4, 1e-3, 1e-2}) {
            double d = 1.0 / (h * 0.5);
            double[][] a = iterationMatrix(d, jac);
            double[] exact = new double[n];
            for (int i = 0; i < n; i++) {
                exact[i] = typical[i] * (2 * random.nextDouble() - 1);
            }
            double[] b = times(a, exact);
            double[] x = b.clone();
            assertTrue(sparse.factorise(d, jac));
            sparse.solve(x);
            double[] r = times(a, x);
            double residual = 0.0;
            double aNorm = 0.0;
            for (int i = 0; i < n; i++) {
                residual = Math.max(residual, Math.abs(b[i] - r[i]));
                aNorm = Math.max(aNorm, Arrays.stream(a[i]).map(Math::abs).sum());
            }
            double xNorm = Arrays.stream(x).map(Math::abs).max().orElse(0);
            double bNorm = Arrays.stream(b).map(Math::abs).max().orElse(0);
            double backward = residual / (aNorm * xNorm + bNorm);
            assertTrue(backward <= 10 * n * EPS, "h = " + h + " s: backward error " + backward);
            double[] y2 = b.clone();
            DenseLu dense = new DenseLu(n);
            assertTrue(dense.factorise(d, jac));
            dense.solve(y2);
            for (int i = 0; i < n; i++) {
                assertEquals(y2[i], x[i], 1e-6 * typical[i] + 1e-9 * Math.abs(exact[i]),
                        "state " + model.states().get(i).name() + " at h = " + h + " s");
                assertEquals(exact[i], x[i], 1e-6 * typical[i] + 1e-6 * Math.abs(exact[i]),
                        "state " + model.states().get(i).name() + " against the exact solution at h = " + h + " s");
            }
        }
    }
}
