package org.branchsim.core.solve.stiff;

import java.util.function.Supplier;

/**
 * Chooses the solver of the iteration matrix d * I - J by the number of states: dense LU below
 * {@link #SPARSE_FROM_STATES}, sparse LU ({@link SparseLu}) from there on. The size was measured by timing one
 * factorisation and four solves of the iteration matrices of the demos and of the replicated clamp branch of
 * {@code branchsim timing --scaling} (docs/performance.md, "Size scaling"): dense LU was cheaper at 7 to 13 states,
 * sparse LU from 17 states on. A measurement may force either kind for the work it runs on the current thread.
 */
public final class StepMatrixChoice {

    /** The kinds of solver. */
    public enum Kind {
        /** Dense LU with partial pivoting. */
        DENSE,
        /** Sparse LU on a minimum degree order, dense LU as fallback for a step whose pivot fails. */
        SPARSE
    }

    /** Fewest states for which the sparse solver is chosen. */
    public static final int SPARSE_FROM_STATES = 15;

    private static final ThreadLocal<Kind> FORCED = new ThreadLocal<>();

    private StepMatrixChoice() {
    }

    /**
     * @param dimension number of states
     * @return the kind forced on this thread, else the kind chosen by size
     */
    public static Kind kindFor(int dimension) {
        Kind forced = FORCED.get();
        if (forced != null) {
            return forced;
        }
        return dimension >= SPARSE_FROM_STATES ? Kind.SPARSE : Kind.DENSE;
    }

    /**
     * @param pattern where the Jacobian may be non-zero
     * @return a fresh solver of the kind {@link #kindFor} gives for the pattern's dimension
     */
    public static StepMatrixSolver solverFor(SparsityPattern pattern) {
        return kindFor(pattern.dimension()) == Kind.SPARSE ? new SparseLu(pattern) : new DenseLu(pattern.dimension());
    }

    /**
     * Runs {@code work} on the current thread with every solver chosen meanwhile of the given kind (for
     * measurements that compare the two); the choice by size resumes afterwards.
     *
     * @param kind the kind to use
     * @param work what to run
     * @param <T> its result type
     * @return the work's result
     */
    public static <T> T forcing(Kind kind, Supplier<T> work) {
        Kind before = FORCED.get();
        FORCED.set(kind);
        try {
            return work.get();
        } finally {
            if (before == null) {
                FORCED.remove();
            } else {
                FORCED.set(before);
            }
        }
    }
}
