package org.branchsim.core.scenario;

/** Reading helper: whether values read are all usable (a value with a problem reads as NaN). */
final class Geometry {
    private Geometry() {
    }

    /** @return true when none of the values is NaN */
    static boolean ok(double... values) {
        for (double v : values) {
            if (Double.isNaN(v)) {
                return false;
            }
        }
        return true;
    }
}
