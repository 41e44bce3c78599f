package org.branchsim.core.scenario;

import java.util.List;
import org.branchsim.core.elements.Pump;
import org.branchsim.core.units.Dimension;

/** The {@code pump} element type: a fixed-displacement pump, optionally with its kinematic flow ripple. */
final class PumpType {

    static final ElementDescriptor<Pump> DESCRIPTOR = ElementDescriptor.of("pump", "fixed-displacement pump",
            List.of("inlet", "outlet"),
            BlockSpec.of("pump",
                    FieldSpec.positive("displacement", Dimension.DISPLACEMENT)
                            .meaning("per revolution, e.g. \"16 cm^3/rev\""),
                    FieldSpec.nonNegative("speed", Dimension.ROTATIONAL_SPEED).schedulable()
                            .meaning("shaft speed, e.g. \"1450 rpm\""),
                    FieldSpec.number("volumetricEfficiency", 0.01, 1.0, 1.0)
                            .meaning("delivered flow over displaced flow"),
                    RippleBlock.FIELD),
            (id, r, ports, fluid) -> new Pump(id, ports.get("inlet"), ports.get("outlet"), r.si("displacement"),
                    r.si("speed"), r.si("volumetricEfficiency"), RippleBlock.read(r)))
            .input("speed", Pump::speed)
            .notes("Signals: `<id>.q`, `<id>.speed`; with a ripple the shaft angle is a state (`<id>.shaft.angle`). "
                    + "Docs: docs/theory.md 6.1.");

    private PumpType() {
    }
}
