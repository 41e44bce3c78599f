package org.branchsim.core.scenario;

import java.util.List;
import java.util.Map;
import org.branchsim.core.elements.Motor;
import org.branchsim.core.fluid.Fluid;
import org.branchsim.core.model.Node;
import org.branchsim.core.units.Dimension;

/** The {@code motor} element type: a fixed-displacement hydraulic motor with its friction and loads. */
final class MotorType {

    private static final BlockSpec LEAKAGE = BlockSpec.of("leakage",
            FieldSpec.positive("flow", Dimension.VOLUME_FLOW).meaning("leakage flow at the pressure `at`"),
            FieldSpec.positive("at", Dimension.PRESSURE).meaning("pressure difference of that leakage flow"));

    private static final BlockSpec FRICTION = BlockSpec.of("friction",
            FieldSpec.nonNegative("coulomb", Dimension.TORQUE).required()
                    .meaning("running (Coulomb) friction torque"),
            FieldSpec.nonNegative("breakaway", Dimension.TORQUE)
                    .meaning("breakaway (static) torque, at least `coulomb`; `coulomb` when left out"),
            FieldSpec.positive("stribeckSpeed", Dimension.ROTATIONAL_SPEED).byDefault("5 rpm")
                    .meaning("speed over which friction falls from breakaway to Coulomb"),
            FieldSpec.positive("smoothing", Dimension.ROTATIONAL_SPEED).byDefault("0.05 rpm")
                    .meaning("speed over which friction changes sign through rest (tanh regularisation); the shaft "
                            + "creeps at most about this fast below breakaway"));

    private static final BlockSpec OVERRUNNING = BlockSpec.of("overrunning",
            FieldSpec.positive("torque", Dimension.TORQUE).required()
                    .meaning("torque of the weight at the motor shaft with its arm horizontal"),
            FieldSpec.quantity("angle", Dimension.ANGLE).byDefault("0 deg")
                    .meaning("load angle from its lowest position at the start, 0 to 360 deg in the direction a "
                            + "turn from a to b moves it (340 deg: 20 deg short of the lowest position)"),
            FieldSpec.number("ratio", 1e-3, 1e4, 1.0)
                    .meaning("motor turns per load turn (gear ratio)"));

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
                            .meaning("active load torque opposing rotation from a to b (pushes one way at any speed)"),
                    FieldSpec.block("leakage", LEAKAGE)
                            .meaning("laminar leakage between a and b, e.g. `{ \"flow\": \"0.5 L/min\", \"at\": \"100 bar\" }`;"
                                    + " none when left out"),
                    FieldSpec.block("friction", FRICTION)
                            .meaning("friction torque with breakaway, e.g. `{ \"coulomb\": \"20 N*m\", \"breakaway\": "
                                    + "\"35 N*m\" }`; none when left out"),
                    FieldSpec.block("overrunning", OVERRUNNING)
                            .meaning("a weight on the shaft that gravity swings down and that can drive the motor, e.g. "
                                    + "`{ \"torque\": \"400 N*m\", \"angle\": \"30 deg\", \"ratio\": 20 }`; none when "
                                    + "left out")),
            MotorType::build)
            .input("loadTorque", Motor::loadTorque)
            .notes("Signals: `<id>.speed`, `<id>.q`, `<id>.torque` (D (p_a - p_b), at the shaft), `<id>.power` (that "
                    + "torque times the speed), with friction `<id>.friction`, with an overrunning load "
                    + "`<id>.load.angle`. Docs: docs/theory.md 6.4.");

    private MotorType() {
    }

    private static Motor build(String id, Reading r, Map<String, Node> ports, Fluid fluid) {
        Reading leak = r.block("leakage");
        double k = leak == null ? 0.0 : leak.si("flow") / leak.si("at");
        Motor.Friction friction = null;
        Reading f = r.block("friction");
        if (f != null) {
            double coulomb = f.si("coulomb");
            double breakaway = f.has("breakaway") ? f.si("breakaway") : coulomb;
            if (breakaway < coulomb) {
                f.refuse("breakaway", "a breakaway torque at least the Coulomb torque");
                return null;
            }
            friction = new Motor.Friction(coulomb, breakaway, f.si("stribeckSpeed"), f.si("smoothing"));
        }
        Reading o = r.block("overrunning");
        Motor.OverrunningLoad overrunning = o == null ? null
                : new Motor.OverrunningLoad(o.si("torque"), o.si("angle"), o.si("ratio"));
        return new Motor(id, ports.get("a"), ports.get("b"), r.si("displacement"), r.si("inertia"), r.si("damping"), k,
                r.si("loadTorque"), friction, overrunning);
    }
}
