package org.branchsim.core.scenario;

import java.util.List;
import java.util.Set;
import org.branchsim.core.laws.OrificeLaw;
import org.branchsim.core.units.Dimension;

/** Field declarations several element types share: discharge coefficients and an opening's size. */
final class CommonFields {

    /** Sharp-edged orifice contraction coefficient pi/(pi+2) (Merritt 1967, section 3.2), the default Cd. */
    static final double SHARP_EDGE_CD = Math.PI / (Math.PI + 2.0);

    private CommonFields() {
    }

    /** @return a discharge coefficient from 0.05 to 1, by default the sharp-edged value */
    static FieldSpec sharpEdgeCd() {
        return FieldSpec.number("cd", 0.05, 1.0, SHARP_EDGE_CD)
                .computedDefault(SHARP_EDGE_CD, "0.611 = π/(π+2)")
                .meaning("discharge coefficient (sharp edge: π/(π+2), Merritt 1967)");
    }

    /**
     * @param where the stops it strikes, e.g. "its seat and lift stop"
     * @return the coefficient of restitution of a moving member at its stops, 0 (dead stop, the default) to 1
     */
    static FieldSpec restitution(String where) {
        return FieldSpec.number("restitution", 0.0, 1.0, 0.0)
                .meaning("coefficient of restitution at " + where + ": 0 stops it dead, up to 1 rebounds it with that "
                        + "fraction of its impact velocity (Newton's law of impact)");
    }

    /**
     * @param meaning what the opening is, e.g. "fully open"
     * @return the fields {@code diameter} and {@code area}, exactly one of which gives an opening's size
     */
    static FieldSpec[] openingSize(String meaning) {
        return new FieldSpec[] {
            FieldSpec.positive("diameter", Dimension.LENGTH).meaning("diameter of a round hole of the " + meaning
                    + " area; or give `area`"),
            FieldSpec.positive("area", Dimension.AREA).meaning(meaning + " flow area; or give `diameter`")
        };
    }

    /** @return the choice between {@code diameter} and {@code area} */
    static Choice openingChoice() {
        return new Choice(List.of(List.of("diameter"), List.of("area")), true, "area",
                "either \"diameter\" or \"area\"", "diameter",
                "a \"diameter\" (e.g. \"1.2 mm\") or an \"area\" (e.g. \"1 mm^2\")");
    }

    /** @return the opening's area from {@code diameter} or {@code area}, m^2 */
    static double openingArea(Reading r) {
        return r.has("area") ? r.si("area") : OrificeLaw.circleArea(r.si("diameter"));
    }

    /** @return a viscous damping field of a moving member, zero by default */
    static FieldSpec damping(String meaning) {
        return FieldSpec.nonNegative("damping", Dimension.DAMPING).byDefault("0 N*s/m").meaning(meaning);
    }

    /** @return a set of member names for a {@link Tuning} */
    static Set<String> members(String... names) {
        return Set.of(names);
    }
}
