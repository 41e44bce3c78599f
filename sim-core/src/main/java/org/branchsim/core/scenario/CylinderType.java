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
            CommonFields.damping("contact damping"),
            FieldSpec.positive("dampingFade", Dimension.LENGTH).byDefault("0.1 mm")
                    .meaning("penetration over which the contact damping fades in (the contact only pushes)"));

    private static final BlockSpec LOAD_ROW = BlockSpec.of("loadRow",
            FieldSpec.nonNegative("position", Dimension.LENGTH).meaning("piston position of the row, above the "
                    + "previous row's"),
            FieldSpec.quantity("force", Dimension.FORCE).meaning("load opposing extension at that position"));

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
                    FieldSpec.number("restitution", 0.0, 1.0, 0.0)
                            .meaning("coefficient of restitution at the end stops: 0 stops the piston dead, up to 1 "
                                    + "rebounds it with that fraction of its impact velocity"),
                    FieldSpec.quantity("load", Dimension.FORCE).byDefault("0 N").schedulable()
                            .meaning("external force opposing extension"),
                    FieldSpec.blockList("loadTable", LOAD_ROW)
                            .meaning("a load against piston position added to `load`: rows `{ \"position\": \"20 mm\", "
                                    + "\"force\": \"2 kN\" }` in rising position, straight lines between rows, the end "
                                    + "rows' forces beyond them; none when left out"),
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
        double[][] table = loadTable(r);
        if (table == null) {
            return null;
        }
        Cylinder.Parameters p = new Cylinder.Parameters(r.si("bore"), r.si("rod"), r.si("stroke"), r.si("mass"),
                r.si("deadVolumeCap"), r.si("deadVolumeRod"), r.si("coulombFriction"), r.si("viscousFriction"),
                r.si("frictionVelocity"), r.si("position"));
        Reading wp = r.block("workpiece");
        Cylinder.Contact contact = wp == null ? null
                : new Cylinder.Contact(wp.si("position"), wp.si("stiffness"), wp.si("damping"),
                        wp.si("dampingFade"));
        Cylinder c = new Cylinder(id, ports.get("capEnd"), ports.get("rodEnd"), p, leakage(r.block("internalLeakage")),
                leakage(r.block("externalLeakage")), contact, r.si("load"))
                .withEndStopRestitution(r.si("restitution"));
        return table[0].length == 0 ? c : c.withPositionLoad(table[0], table[1]);
    }

    /** @return the load table's positions and forces, SI (empty arrays when left out), or null after a problem */
    private static double[][] loadTable(Reading r) {
        List<Reading> rows = r.items("loadTable", LOAD_ROW);
        if (r.has("loadTable") && rows.isEmpty()) {
            r.refuse("loadTable", "at least one row { \"position\": ..., \"force\": ... }");
            return null;
        }
        double[] x = new double[rows.size()];
        double[] f = new double[rows.size()];
        for (int k = 0; k < rows.size(); k++) {
            Reading row = rows.get(k);
            if (!row.valid("position", "force")) {
                return null;
            }
            x[k] = row.si("position");
            f[k] = row.si("force");
            if (k > 0 && x[k] <= x[k - 1]) {
                row.refuse("position", "a position above the previous row's (" + Fields.format(x[k - 1] * 1e3)
                        + " mm)");
                return null;
            }
        }
        return new double[][] {x, f};
    }

    private static Cylinder.Leakage leakage(Reading r) {
        return r == null ? null : new Cylinder.Leakage(r.si("clearance"), r.si("length"));
    }
}
