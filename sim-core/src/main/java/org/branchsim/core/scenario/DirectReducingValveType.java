package org.branchsim.core.scenario;

import java.util.List;
import java.util.Map;
import org.branchsim.core.elements.DirectReducingValve;
import org.branchsim.core.elements.MeteringEdge;
import org.branchsim.core.fluid.Fluid;
import org.branchsim.core.model.Node;
import org.branchsim.core.units.Dimension;

/** The {@code directReducingValve} element type: a direct-acting pressure reducing valve. */
final class DirectReducingValveType {

    private static final BlockSpec SPOOL = SpoolBlock.spec(
            CommonFields.damping("viscous damping of the spool")
                    .tuning(Tuning.damping(10, CommonFields.members(), 1.0, 500.0, "spool damping", "N*s/m",
                            "lbf*s/in", "a damping land or a throttled spring chamber on the spool, about %s")),
            SpoolBlock.springRate().tuning(Tuning.scaled(20, CommonFields.members(), Tuning.SIZE_RANGE,
                    Tuning.Direction.RAISE, "N/mm", "lbf/in", "a stiffer spool spring of %s (lower gain, more droop)",
                    "a softer spool spring of %s")),
            SpoolBlock.meteringWidth(),
            SpoolBlock.endOrificeDiameter(),
            CommonFields.restitution("its open and closed stops"));

    static final ElementDescriptor<DirectReducingValve> DESCRIPTOR = ElementDescriptor.of("directReducingValve",
            "direct-acting pressure reducing valve", List.of("inlet", "outlet", "drain"),
            BlockSpec.of("directReducingValve",
                    FieldSpec.positive("setting", Dimension.PRESSURE)
                            .meaning("outlet pressure at the closing point; the spring preload follows and must be "
                                    + "positive"),
                    FieldSpec.block("spool", SPOOL).required().meaning("spool block as for `pilotReducingValve`, "
                            + "without `springPreload`")),
            DirectReducingValveType::build)
            .notes("Signals: `<id>.p.out`, `<id>.q`, `<id>.spool.x`, `<id>.drain.q` (spring-chamber displacement), "
                    + "`<id>.metering.power`.");

    private DirectReducingValveType() {
    }

    private static DirectReducingValve build(String id, Reading r, Map<String, Node> ports, Fluid fluid) {
        Reading s = r.block("spool");
        MeteringEdge edge = SpoolBlock.edge(s);
        DirectReducingValve v = new DirectReducingValve(id, ports.get("inlet"), ports.get("outlet"), ports.get("drain"),
                edge, s.si("mass"), s.si("springRate"), r.si("setting"), s.si("damping"), s.si("stroke"),
                SpoolBlock.endChamber(s));
        if (v.preload() <= 0.0) {
            r.refuse("setting", "a setting high enough for a positive spring preload (above "
                    + Fields.format(s.si("springRate") * edge.openLength() / edge.endArea() / 1e5)
                    + " bar with this spring)");
            return null;
        }
        return v.withRestitution(s.si("restitution"));
    }
}
