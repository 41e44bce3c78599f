package org.branchsim.core.settings;

import java.util.Locale;

/** Integration methods a scenario can choose, each under the word a scenario (or a command option) names it by. */
public enum Method {
    /** Adaptive Dormand-Prince 5(4), explicit; fine for non-stiff circuits. */
    EXPLICIT,
    /**
     * Linearly implicit Rosenbrock method RODAS of order 4 (L-stable, stiffly accurate, with its own dense
     * output), for stiff circuits: the default.
     */
    IMPLICIT,
    /** Dormand-Prince 8(5,3), explicit, for tight-tolerance reference solutions (slow on stiff circuits). */
    REFERENCE,
    /** Linearly implicit Rosenbrock method RODAS3 of order 3 (L-stable), the implicit method before RODAS. */
    IMPLICIT_ORDER3;

    /** @return the word that names the method, e.g. {@code implicit-order3} */
    public String word() {
        return name().toLowerCase(Locale.ROOT).replace('_', '-');
    }

    /**
     * @param word a method's word, any case ({@code implicit_order3} is also read as {@code implicit-order3})
     * @return the method, or null when no method has that word
     */
    public static Method named(String word) {
        if (word == null) {
            return null;
        }
        String w = word.trim().toLowerCase(Locale.ROOT).replace('_', '-');
        for (Method m : values()) {
            if (m.word().equals(w)) {
                return m;
            }
        }
        return null;
    }
}
