package org.branchsim.core.solve.stiff;

import java.util.ArrayList;
import java.util.BitSet;
import java.util.List;

/**
 * Which entries of the Jacobian can be non-zero, and a grouping of its columns such that no two columns of
 * a group share a non-zero row (Curtis, Powell and Reid, J. Inst. Maths Applics 13, 1974). One
 * finite-difference evaluation then serves a whole group.
 */
public final class SparsityPattern {
    private final int n;
    private final BitSet[] columnRows;
    private final int[][] groups;

    private SparsityPattern(int n, BitSet[] columnRows) {
        this.n = n;
        this.columnRows = columnRows;
        this.groups = colour(n, columnRows);
    }

    /** @return a full pattern: every column in its own group */
    public static SparsityPattern dense(int n) {
        BitSet[] cols = new BitSet[n];
        for (int j = 0; j < n; j++) {
            cols[j] = new BitSet(n);
            cols[j].set(0, n);
        }
        return new SparsityPattern(n, cols);
    }

    /**
     * @param n dimension
     * @param blocks sets of state indices that may all depend on each other (one per element)
     * @return the union of the blocks' patterns plus the diagonal
     */
    public static SparsityPattern ofBlocks(int n, List<int[]> blocks) {
        BitSet[] cols = new BitSet[n];
        for (int j = 0; j < n; j++) {
            cols[j] = new BitSet(n);
            cols[j].set(j);
        }
        for (int[] block : blocks) {
            for (int j : block) {
                for (int i : block) {
                    cols[j].set(i);
                }
            }
        }
        return new SparsityPattern(n, cols);
    }

    private static int[][] colour(int n, BitSet[] cols) {
        // greedy colouring, densest columns first (Curtis-Powell-Reid with largest-first ordering)
        Integer[] order = new Integer[n];
        for (int j = 0; j < n; j++) {
            order[j] = j;
        }
        java.util.Arrays.sort(order, (a, b) -> cols[b].cardinality() != cols[a].cardinality()
                ? Integer.compare(cols[b].cardinality(), cols[a].cardinality()) : Integer.compare(a, b));
        List<List<Integer>> groups = new ArrayList<>();
        List<BitSet> used = new ArrayList<>();
        for (int j : order) {
            int g = 0;
            while (g < groups.size() && used.get(g).intersects(cols[j])) {
                g++;
            }
            if (g == groups.size()) {
                groups.add(new ArrayList<>());
                used.add(new BitSet(n));
            }
            groups.get(g).add(j);
            used.get(g).or(cols[j]);
        }
        int[][] out = new int[groups.size()][];
        for (int g = 0; g < out.length; g++) {
            out[g] = groups.get(g).stream().mapToInt(Integer::intValue).toArray();
        }
        return out;
    }

    /** @return the dimension */
    public int dimension() {
        return n;
    }

    /** @return the column groups */
    int[][] groups() {
        return groups;
    }

    /** @return the rows that may be non-zero in column j */
    BitSet rows(int j) {
        return columnRows[j];
    }

    /** @return the number of column groups (derivative evaluations per Jacobian) */
    public int groupCount() {
        return groups.length;
    }
}
