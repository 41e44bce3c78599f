package org.branchsim.core.solve.stiff;

import java.util.BitSet;

/**
 * A fill-reducing elimination order for a sparse matrix with a symmetric pattern, and the pattern of its LU
 * factors in that order (the symbolic factorisation). The order is the minimum degree order on the elimination
 * graph: at each step the vertex with the fewest remaining neighbours is eliminated (ties broken by the lower
 * original index, so the order is deterministic), and its remaining neighbours are joined into a clique, which
 * is exactly the fill the elimination creates (Rose, "A graph-theoretic study of the numerical solution of
 * sparse positive definite systems of linear equations", in Graph Theory and Computing, 1972; George and Liu,
 * "The evolution of the minimum degree ordering algorithm", SIAM Review 31(1), 1989). On a circuit where every
 * branch hangs on one pump node, the branches are eliminated first and the shared node last, so the shared node
 * creates no fill. Built once per pattern; dimensionless (indices only).
 */
final class MinimumDegreeOrdering {

    private final int[] oldOfNew;
    private final int[] newOfOld;
    private final int[][] upper;

    /**
     * @param symmetric the symmetric pattern: {@code symmetric[i]} holds the j != i with a(i, j) or a(j, i) non-zero
     *                  (not changed)
     */
    MinimumDegreeOrdering(BitSet[] symmetric) {
        int n = symmetric.length;
        BitSet[] graph = new BitSet[n];
        for (int i = 0; i < n; i++) {
            graph[i] = (BitSet) symmetric[i].clone();
            graph[i].clear(i);
        }
        oldOfNew = new int[n];
        newOfOld = new int[n];
        BitSet[] laterNeighbours = new BitSet[n];
        BitSet alive = new BitSet(n);
        alive.set(0, n);
        for (int step = 0; step < n; step++) {
            int best = -1;
            int bestDegree = Integer.MAX_VALUE;
            for (int v = alive.nextSetBit(0); v >= 0; v = alive.nextSetBit(v + 1)) {
                int degree = graph[v].cardinality();
                if (degree < bestDegree) {
                    bestDegree = degree;
                    best = v;
                }
            }
            BitSet clique = graph[best];
            for (int u = clique.nextSetBit(0); u >= 0; u = clique.nextSetBit(u + 1)) {
                graph[u].or(clique);
                graph[u].clear(u);
                graph[u].clear(best);
            }
            alive.clear(best);
            oldOfNew[step] = best;
            newOfOld[best] = step;
            laterNeighbours[step] = clique;
        }
        upper = new int[n][];
        for (int i = 0; i < n; i++) {
            BitSet later = laterNeighbours[i];
            int[] cols = new int[later.cardinality()];
            int k = 0;
            for (int u = later.nextSetBit(0); u >= 0; u = later.nextSetBit(u + 1)) {
                cols[k++] = newOfOld[u];
            }
            java.util.Arrays.sort(cols);
            upper[i] = cols;
        }
    }

    /** @return the original index of each position in the elimination order */
    int[] oldOfNew() {
        return oldOfNew.clone();
    }

    /** @return the position in the elimination order of each original index */
    int[] newOfOld() {
        return newOfOld.clone();
    }

    /**
     * @param i a position in the elimination order
     * @return the positions j > i where row i of U (and column i of L) may be non-zero after elimination, sorted
     */
    int[] upperColumns(int i) {
        return upper[i].clone();
    }

    /** @return the number of off-diagonal entries of L plus U, fill included */
    int offDiagonalCount() {
        int count = 0;
        for (int[] row : upper) {
            count += 2 * row.length;
        }
        return count;
    }
}
