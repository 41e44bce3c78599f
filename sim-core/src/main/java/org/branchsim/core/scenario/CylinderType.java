package org.branchsim.core.scenario;

import java.util.List;
import java.util.Map;
import org.branchsim.core.elements.Cylinder;
import org.branchsim.core.fluid.Fluid;
import org.branchsim.core.model.Node;
import org.branchsim.core.units.Dimension;

/** The {@code cylinder} element type: a double-acting single-rod cylinder. */
final class CylinderType {

    private static final BlockSpec LEAKAGE = BlockSpec.of("leakage",
            FieldSpec.positive("clearance", Dimension.LENGTH).meaning("radial clearance of the annular gap"),
            FieldSpec.positive("length", Dimension.LENGTH).meaning("length of the gap"));

    private static final BlockSpec WORKPIECE = BlockSpec.of("workpiece",
            FieldSpec.positive("position", Dimension.LENGTH).meaning("piston position at which it is met"),
            FieldSpec.positive("stiffness", Dimension.STIFFNESS).meaning("contact stiffness of the part"),
            CommonFields.damping("contact damping"));

    static final ElementDescriptor<Cylinder> DESCRIPTOR = ElementDescriptor.of("cylinder",
            "double-acting single-rod cylinder", List.of("capEnd", "rodEnd"),
            BlockSpec.of("cylinder",
                    FieldSpec.positive("bore", Dimension.LENGTH).meaning("piston diameter"),
                    FieldSpec.positive("rod", Dimension.LENGTH).meaning("rod diameter, smaller than the bore"),
                    FieldSpec.positive("stroke", Dimension.LENGTH).meaning("piston travel"),
                    FieldSpec.positive("mass", Dimension.MASS).meaning("everything that moves with the piston"),
                    FieldSpec.nonNegative("deadVolumeCap", Dimension.VOLUME).byDefault("0 L")
                            .meaning("cap-end chamber volume at the end of stroke (the node's volume counts too)"),
                    FieldSpec.nonNegative("deadVolumeRod", Dimension.VOLUME).byDefault("0 L")
                            .meaning("rod-end chamber volume at the end of stroke (the node's volume counts too)"),
                    FieldSpec.nonNegative("coulombFriction", Dimension.FORCE).byDefault("0 N")
                            .meaning("Coulomb (dry) friction force"),
                    FieldSpec.nonNegative("viscousFriction", Dimension.DAMPING).byDefault("0 N*s/m")
                            .meaning("viscous friction coefficient")
                            .tuning(Tuning.damping(10, CommonFields.members(), 100.0, 2e4, "load damping", "N*s/m",
                                    "lbf*s/in", "more load damping (meter-out throttling or a load damper), about %s")),
                    FieldSpec.positive("frictionVelocity", Dimension.VELOCITY).byDefault("1 mm/s")
                            .meaning("Coulomb regularisation velocity"),
                    FieldSpec.nonNegative("position", Dimension.LENGTH).byDefault("0 mm")
                            .meaning("initial piston position (0 = retracted)"),
                    FieldSpec.quantity("load", Dimension.FORCE).byDefault("0 N").schedulable()
                            .meaning("external force opposing extension"),
                    FieldSpec.block("internalLeakage", LEAKAGE)
                            .meaning("laminar leakage across the piston (gap diameter = bore), e.g. "
                                    + "`{ \"clearance\": \"8 um\", \"length\": \"25 mm\" }`; none when left out"),
                    FieldSpec.block("externalLeakage", LEAKAGE)
                            .meaning("laminar leakage past the rod seal to the outside (gap diameter = rod); none "
                                    + "when left out"),
                    FieldSpec.block("workpiece", WORKPIECE)
                            .meaning("a stiff part met at a stroke position, e.g. `{ \"position\": \"80 mm\", "
                                    + "\"stiffness\": \"200 kN/mm\", \"damping\": \"2 kN*s/m\" }`; none when left out"))
                    .with(CylinderType::rodInsideBore)
                    .with(CylinderType::startWithinStroke)
                    .with(CylinderType::workpieceWithinStroke),
            CylinderType::build)
            .input("load", Cylinder::load);

    private CylinderType() {
    }

    private static void rodInsideBore(Reading r) {
        if (r.valid("bore", "rod") && r.si("rod") >= r.si("bore")) {
            r.refuse("rod", "a rod diameter smaller than the bore (" + Fields.format(r.si("bore") * 1e3) + " mm)");
        }
    }

    private static void startWithinStroke(Reading r) {
        if (r.valid("position", "stroke") && r.si("position") > r.si("stroke")) {
            r.refuse("position", "a position within the stroke (0 to " + Fields.format(r.si("stroke") * 1e3) + " mm)");
        }
    }

    private static void workpieceWithinStroke(Reading r) {
        Reading wp = r.block("workpiece");
        if (wp != null && wp.valid("position") && r.valid("stroke") && wp.si("position") >= r.si("stroke")) {
            wp.refuse("position", "a contact position inside the stroke");
        }
    }

    private static Cylinder build(String id, Reading r, Map<String, Node> ports, Fluid fluid) {
        Cylinder.Parameters p = new Cylinder.Parameters(r.si("bore"), r.si("rod"), r.si("stroke"), r.si("mass"),
                r.si("deadVolumeCap"), r.si("deadVolumeRod"), r.si("coulombFriction"), r.si("viscousFriction"),
                r.si("frictionVelocity"), r.si("position"));
        Reading wp = r.block("workpiece");
        Cylinder.Contact contact = wp == null ? null
                : new Cylinder.Contact(wp.si("position"), wp.si("stiffness"), wp.si("damping"));
        return new Cylinder(id, ports.get("capEnd"), ports.get("rodEnd"), p, leakage(r.block("internalLeakage")),
                leakage(r.block("externalLeakage")), contact, r.si("load"));
    }

    private static Cylinder.Leakage leakage(Reading r) {
        return r == null ? null : new Cylinder.Leakage(r.si("clearance"), r.si("length"));
    }
}
