package org.branchsim.core.scenario;

import org.branchsim.core.laws.OrificeLaw;
import org.branchsim.core.units.Dimension;

/** Reading helpers for geometric fields that can be given in more than one way. */
final class Geometry {
    private Geometry() {
    }

    /** Reads an opening given either as {@code diameter} or as {@code area} (exactly one), m^2. */
    static double area(Fields f, String diameterKey, String areaKey) {
        boolean hasD = f.has(diameterKey);
        boolean hasA = f.has(areaKey);
        if (hasD && hasA) {
            f.problem(areaKey, "either \"" + diameterKey + "\" or \"" + areaKey + "\"", "both");
            return Double.NaN;
        }
        if (hasA) {
            return f.positive(areaKey, Dimension.AREA);
        }
        if (hasD) {
            return OrificeLaw.circleArea(f.positive(diameterKey, Dimension.LENGTH));
        }
        f.problem(diameterKey, "a \"" + diameterKey + "\" (e.g. \"1.2 mm\") or an \"" + areaKey + "\" (e.g. \"1 mm^2\")",
                "neither");
        return Double.NaN;
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
