package org.branchsim.core.settings;

/** Integration methods a scenario can choose. */
public enum Method {
    /** Adaptive Dormand-Prince 5(4), explicit; fine for non-stiff circuits. */
    EXPLICIT,
    /** Linearly implicit Rosenbrock method of order 3 (L-stable), for stiff circuits. */
    IMPLICIT,
    /** Dormand-Prince 8(5,3), explicit, for tight-tolerance reference solutions (slow on stiff circuits). */
    REFERENCE
}
