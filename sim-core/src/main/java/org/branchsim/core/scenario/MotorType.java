package org.branchsim.core.scenario;

import java.util.List;
import java.util.Map;
import org.branchsim.core.elements.Motor;
import org.branchsim.core.fluid.Fluid;
import org.branchsim.core.model.Node;
import org.branchsim.core.units.Dimension;

/** The {@code motor} element type: a fixed-displacement hydraulic motor. */
final class MotorType {

    private static final BlockSpec LEAKAGE = BlockSpec.of("leakage",
            FieldSpec.positive("flow", Dimension.VOLUME_FLOW).meaning("leakage flow at the pressure `at`"),
            FieldSpec.positive("at", Dimension.PRESSURE).meaning("pressure difference of that leakage flow"));

    static final ElementDescriptor<Motor> DESCRIPTOR = ElementDescriptor.of("motor",
            "fixed-displacement hydraulic motor", List.of("a", "b"),
            BlockSpec.of("motor",
                    FieldSpec.positive("displacement", Dimension.DISPLACEMENT).meaning("per revolution"),
                    FieldSpec.positive("inertia", Dimension.ROTATIONAL_INERTIA).meaning("shaft and load inertia"),
                    FieldSpec.nonNegative("damping", Dimension.ROTARY_DAMPING).byDefault("0 N*m*s/rad")
                            .meaning("rotary viscous damping of the shaft")
                            .tuning(Tuning.damping(10, CommonFields.members(), 1e-3, 1.0, "shaft damping",
                                    "N*m*s/rad", "N*m*s/rad", "more shaft damping (a throttled motor return line), "
                                            + "about %s")),
                    FieldSpec.quantity("loadTorque", Dimension.TORQUE).byDefault("0 N*m").schedulable()
                            .meaning("load torque opposing rotation from a to b"),
                    FieldSpec.block("leakage", LEAKAGE)
                            .meaning("laminar leakage between a and b, e.g. `{ \"flow\": \"0.5 L/min\", \"at\": \"100 bar\" }`;"
                                    + " none when left out")),
            MotorType::build)
            .input("loadTorque", Motor::loadTorque);

    private MotorType() {
    }

    private static Motor build(String id, Reading r, Map<String, Node> ports, Fluid fluid) {
        Reading leak = r.block("leakage");
        double k = leak == null ? 0.0 : leak.si("flow") / leak.si("at");
        return new Motor(id, ports.get("a"), ports.get("b"), r.si("displacement"), r.si("inertia"), r.si("damping"), k,
                r.si("loadTorque"));
    }
}
