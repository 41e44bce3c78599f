package org.branchsim.core.scenario;

import org.branchsim.core.laws.KinematicRipple;
import org.branchsim.core.units.Dimension;

/** The optional {@code ripple} block of a pump: its kinematic flow ripple ({@link KinematicRipple}). */
final class RippleBlock {

    static final BlockSpec SPEC = BlockSpec.of("ripple",
            FieldSpec.choice("kind", FieldSpec.word("axial-piston", "z pistons on a swash plate or bent axis"),
                    FieldSpec.word("gear", "external gear pump, two equal involute gears")).required()
                    .meaning("the kinematics that make the ripple"),
            FieldSpec.number("count", 3, 60, 9).required()
                    .meaning("number of pistons, or of teeth per gear (a whole number)"),
            FieldSpec.positive("pressureAngle", Dimension.ANGLE).byDefault("20 deg")
                    .meaning("gear pressure angle (gear pumps only)"));

    /** The field of a pump's descriptor. */
    static final FieldSpec FIELD = FieldSpec.block("ripple", SPEC)
            .meaning("kinematic flow ripple, e.g. `{ \"kind\": \"axial-piston\", \"count\": 9 }`; a steady delivery "
                    + "when left out (docs/theory.md 6.1)");

    private RippleBlock() {
    }

    /**
     * @param pump the pump's reading
     * @return its ripple, or null when it has none or it was refused
     */
    static KinematicRipple read(Reading pump) {
        Reading r = pump.block("ripple");
        if (r == null) {
            return null;
        }
        double count = r.si("count");
        if (Double.isNaN(count)) {
            return null;
        }
        if (count != Math.rint(count)) {
            r.refuse("count", "a whole number of pistons or teeth");
            return null;
        }
        KinematicRipple.Kind kind = "gear".equals(r.text("kind")) ? KinematicRipple.Kind.GEAR
                : KinematicRipple.Kind.AXIAL_PISTON;
        return new KinematicRipple(kind, (int) count, r.si("pressureAngle"));
    }
}
