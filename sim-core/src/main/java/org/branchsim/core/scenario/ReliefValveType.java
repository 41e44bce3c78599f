package org.branchsim.core.scenario;

import java.util.List;
import java.util.Map;
import org.branchsim.core.elements.PoppetGeometry;
import org.branchsim.core.elements.ReliefValve;
import org.branchsim.core.fluid.Fluid;
import org.branchsim.core.model.Node;
import org.branchsim.core.units.Dimension;

/** The {@code reliefValve} element type: a direct-acting poppet relief valve. */
final class ReliefValveType {

    private static final FieldSpec DAMPING = CommonFields.damping("viscous damping of the poppet")
            .tuning(Tuning.damping(10, CommonFields.members(), 10.0, 2000.0, "poppet damping", "N*s/m", "lbf*s/in",
                    "a damping piston on the relief poppet, about %s"));

    static final ElementDescriptor<ReliefValve> DESCRIPTOR = ElementDescriptor.of("reliefValve",
            "direct-acting poppet relief valve", List.of("inlet", "outlet"),
            BlockSpec.of("reliefValve",
                    FieldSpec.positive("setting", Dimension.PRESSURE)
                            .meaning("cracking pressure (preload = setting × seat area); or give `preload`"),
                    FieldSpec.positive("preload", Dimension.FORCE)
                            .meaning("spring force at zero lift; or give `setting`"))
                    .plus(PoppetBlock.body(DAMPING, PoppetBlock.springRate()))
                    .plus(CommonFields.restitution("its seat and lift stop"))
                    .with(Choice.exactlyOne("setting", "exactly one of \"setting\" (a pressure) or \"preload\" (a force)",
                            List.of(List.of("setting"), List.of("preload")))),
            ReliefValveType::build);

    private ReliefValveType() {
    }

    private static ReliefValve build(String id, Reading r, Map<String, Node> ports, Fluid fluid) {
        PoppetGeometry body = PoppetBlock.read(r);
        double seat = body.seatDiameter();
        double preload = r.has("preload") ? r.si("preload") : r.si("setting") * 0.25 * Math.PI * seat * seat;
        return new ReliefValve(id, ports.get("inlet"), ports.get("outlet"), body.withPreload(preload))
                .withRestitution(r.si("restitution"));
    }
}
