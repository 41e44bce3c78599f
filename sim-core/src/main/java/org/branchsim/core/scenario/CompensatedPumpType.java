package org.branchsim.core.scenario;

import java.util.List;
import java.util.Map;
import org.branchsim.core.elements.CompensatedPump;
import org.branchsim.core.fluid.Fluid;
import org.branchsim.core.model.Node;
import org.branchsim.core.units.Dimension;

/** The {@code compensated-pump} element type: a pressure-compensated variable-displacement pump. */
final class CompensatedPumpType {

    private static final BlockSpec COMPENSATOR = BlockSpec.of("compensator",
            FieldSpec.positive("setting", Dimension.PRESSURE).required()
                    .meaning("outlet pressure at which the pump destrokes (the spool's null)"),
            FieldSpec.positive("spoolDiameter", Dimension.LENGTH).byDefault("6 mm")
                    .meaning("compensator spool diameter; the outlet pressure acts on its end"),
            FieldSpec.positive("springRate", Dimension.STIFFNESS).byDefault("50 N/mm")
                    .meaning("compensator spring rate (the preload follows from the setting)"),
            FieldSpec.positive("mass", Dimension.MASS).byDefault("15 g").meaning("spool mass"),
            FieldSpec.nonNegative("damping", Dimension.DAMPING).byDefault("30 N*s/m").meaning("spool viscous damping"),
            FieldSpec.positive("nullTravel", Dimension.LENGTH).byDefault("0.5 mm")
                    .meaning("travel from the spring stop to the null, where both edges are closed"),
            FieldSpec.positive("travel", Dimension.LENGTH).byDefault("0.8 mm")
                    .meaning("travel from the spring stop to the far stop, more than `nullTravel`"),
            FieldSpec.positive("width", Dimension.LENGTH).byDefault("2 mm")
                    .meaning("metering width of each edge (slots)"),
            CommonFields.sharpEdgeCd());

    private static final BlockSpec CONTROL_PISTON = BlockSpec.of("controlPiston",
            FieldSpec.positive("diameter", Dimension.LENGTH).byDefault("16 mm").meaning("control piston diameter"),
            FieldSpec.positive("stroke", Dimension.LENGTH).byDefault("10 mm")
                    .meaning("piston stroke from full to zero displacement"),
            FieldSpec.positive("deadVolume", Dimension.VOLUME).byDefault("5 cm^3")
                    .meaning("control chamber volume at full displacement"),
            FieldSpec.positive("mass", Dimension.MASS).byDefault("1 kg")
                    .meaning("swash plate (yoke) and piston mass reduced to the piston"),
            FieldSpec.nonNegative("damping", Dimension.DAMPING).byDefault("2 kN*s/m")
                    .meaning("viscous damping of the yoke at the piston"),
            FieldSpec.positive("biasPressure", Dimension.PRESSURE).byDefault("10 bar")
                    .meaning("control pressure at which the bias spring lets the yoke move"),
            FieldSpec.positive("endPressure", Dimension.PRESSURE).byDefault("30 bar")
                    .meaning("control pressure at zero displacement, more than `biasPressure`"),
            FieldSpec.positive("bleedDiameter", Dimension.LENGTH).byDefault("0.6 mm")
                    .meaning("bleed orifice from the control chamber to the inlet"));

    static final ElementDescriptor<CompensatedPump> DESCRIPTOR = ElementDescriptor.of("compensatedPump",
            "pressure-compensated variable-displacement pump", List.of("inlet", "outlet"),
            BlockSpec.of("compensatedPump",
                    FieldSpec.positive("displacement", Dimension.DISPLACEMENT)
                            .meaning("displacement at full stroke, per revolution"),
                    FieldSpec.nonNegative("speed", Dimension.ROTATIONAL_SPEED).schedulable()
                            .meaning("shaft speed, e.g. \"1800 rpm\""),
                    FieldSpec.number("volumetricEfficiency", 0.01, 1.0, 1.0)
                            .meaning("delivered flow over displaced flow"),
                    FieldSpec.block("compensator", COMPENSATOR).required()
                            .meaning("the compensator spool, e.g. `{ \"setting\": \"210 bar\" }`"),
                    FieldSpec.block("controlPiston", CONTROL_PISTON)
                            .meaning("control piston and yoke; the defaults when left out"),
                    RippleBlock.FIELD),
            CompensatedPumpType::build)
            .input("speed", CompensatedPump::speed)
            .notes("Signals: `<id>.q`, `<id>.speed`, `<id>.displacement.fraction`, `<id>.control.p`, `<id>.control.q`, "
                    + "and the members `<id>.compensator` and `<id>.yoke`. Control oil returns to the inlet. Docs: "
                    + "docs/theory.md 6.13.");

    private CompensatedPumpType() {
    }

    private static CompensatedPump build(String id, Reading r, Map<String, Node> ports, Fluid fluid) {
        Reading c = r.block("compensator");
        if (c.si("travel") <= c.si("nullTravel")) {
            c.refuse("travel", "a travel beyond the null travel (" + Fields.format(c.si("nullTravel") * 1e3) + " mm)");
            return null;
        }
        CompensatedPump.Compensator comp = new CompensatedPump.Compensator(c.si("setting"), c.si("spoolDiameter"),
                c.si("springRate"), c.si("mass"), c.si("damping"), c.si("nullTravel"), c.si("travel"), c.si("width"),
                c.si("cd"));
        if (comp.preload() <= 0.0) {
            c.refuse("setting", "a setting whose spool force exceeds the spring's force at the null ("
                    + Fields.format(c.si("springRate") * c.si("nullTravel") / comp.area() / 1e5) + " bar)");
            return null;
        }
        Reading p = r.block("controlPiston");
        CompensatedPump.ControlPiston piston = p == null ? defaultPiston() : new CompensatedPump.ControlPiston(
                p.si("diameter"), p.si("stroke"), p.si("deadVolume"), p.si("mass"), p.si("damping"),
                p.si("biasPressure"), p.si("endPressure"), p.si("bleedDiameter"));
        if (piston.endPressure() <= piston.biasPressure()) {
            p.refuse("endPressure", "a pressure above the bias pressure");
            return null;
        }
        return new CompensatedPump(id, ports.get("inlet"), ports.get("outlet"), r.si("displacement"), r.si("speed"),
                r.si("volumetricEfficiency"), RippleBlock.read(r), comp, piston);
    }

    /** The control piston of the field defaults above, SI. */
    static CompensatedPump.ControlPiston defaultPiston() {
        return new CompensatedPump.ControlPiston(16e-3, 10e-3, 5e-6, 1.0, 2000.0, 10e5, 30e5, 0.6e-3);
    }
}
