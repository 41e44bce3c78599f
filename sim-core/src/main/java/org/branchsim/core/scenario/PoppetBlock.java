package org.branchsim.core.scenario;

import org.branchsim.core.elements.PoppetGeometry;
import org.branchsim.core.units.Dimension;

/** The fields of a poppet on a conical seat (relief valves, the pilot stage of a reducing valve). */
final class PoppetBlock {

    private PoppetBlock() {
    }

    /**
     * @param damping the poppet's damping field (it carries the poppet's remedy role)
     * @param springRate the poppet's spring rate field
     * @return the poppet body: seat, cone, spring rate, mass, damping, lift and discharge coefficient
     */
    static FieldSpec[] body(FieldSpec damping, FieldSpec springRate) {
        return new FieldSpec[] {
            FieldSpec.positive("seatDiameter", Dimension.LENGTH).meaning("diameter of the seat the poppet closes"),
            FieldSpec.positive("coneAngle", Dimension.ANGLE).byDefault("90 deg")
                    .meaning("full cone angle; \"180 deg\" is a flat seat"),
            springRate,
            FieldSpec.positive("mass", Dimension.MASS).meaning("moving mass (poppet plus a third of the spring)"),
            damping,
            FieldSpec.positive("maxLift", Dimension.LENGTH).meaning("lift at the stop"),
            CommonFields.sharpEdgeCd()
        };
    }

    /** @return a poppet spring rate field that is not a remedy candidate */
    static FieldSpec springRate() {
        return FieldSpec.positive("springRate", Dimension.STIFFNESS).meaning("poppet spring rate");
    }

    /** @return the poppet body read, without preload (set to 0) */
    static PoppetGeometry read(Reading r) {
        return new PoppetGeometry(r.si("seatDiameter"), r.si("coneAngle"), r.si("springRate"), 0.0, r.si("mass"),
                r.si("damping"), r.si("maxLift"), r.si("cd"));
    }
}
