package org.branchsim.core.scenario;

import java.util.List;
import java.util.Map;
import org.branchsim.core.elements.Accumulator;
import org.branchsim.core.fluid.Fluid;
import org.branchsim.core.model.Node;
import org.branchsim.core.units.Dimension;

/** The {@code accumulator} element type: a gas-charged (bladder or piston) accumulator. */
final class AccumulatorType {

    /** Default fill: fluid up to 3/4 of the gas volume (a 4:1 compression ratio; common practice, no source). */
    static final double DEFAULT_FILL = 0.75;

    static final ElementDescriptor<Accumulator> DESCRIPTOR = ElementDescriptor.of("accumulator",
            "gas-charged accumulator (bladder or piston)", List.of("port"),
            BlockSpec.of("accumulator",
                    FieldSpec.positive("gasVolume", Dimension.VOLUME)
                            .meaning("gas volume at precharge (the shell's volume when empty)"),
                    FieldSpec.positive("prechargePressure", Dimension.PRESSURE)
                            .meaning("gas precharge, gauge; no fluid stays in the accumulator below it"),
                    FieldSpec.positive("prechargeTemperature", Dimension.TEMPERATURE).byDefault("20 degC")
                            .meaning("gas temperature when precharged (at the fluid's temperature the precharge "
                                    + "reads p0,abs × T/T0)"),
                    FieldSpec.number("exponent", 1.0, 1.4, 1.4)
                            .meaning("polytropic exponent n of p V^n = const: 1 isothermal (slow), 1.4 adiabatic "
                                    + "(fast); or give `thermalTimeConstant`"),
                    FieldSpec.positive("thermalTimeConstant", Dimension.TIME)
                            .meaning("heat exchange time constant of the gas with the shell (then the gas "
                                    + "temperature is a state); or give `exponent`"),
                    FieldSpec.positive("capacity", Dimension.VOLUME).computedDefault(Double.NaN, "¾ × gasVolume")
                            .meaning("fluid volume at the full stop, less than `gasVolume`"),
                    FieldSpec.positive("inletDiameter", Dimension.LENGTH)
                            .meaning("diameter of the fluid-side inlet (port and poppet), an orifice"),
                    CommonFields.sharpEdgeCd())
                    .with(new Choice(List.of(List.of("exponent"), List.of("thermalTimeConstant")), false,
                            "exponent", "either \"exponent\" or \"thermalTimeConstant\"", null, null)),
            AccumulatorType::build)
            .notes("Signals: `<id>.q` (flow in), `<id>.gas.p` (gauge), `<id>.gas.volume`, `<id>.fluid.volume`, and with "
                    + "a thermal time constant `<id>.gas.T`. Docs: docs/theory.md 6.9.");

    private AccumulatorType() {
    }

    private static Accumulator build(String id, Reading r, Map<String, Node> ports, Fluid fluid) {
        double gas = r.si("gasVolume");
        double capacity = r.has("capacity") ? r.si("capacity") : DEFAULT_FILL * gas;
        if (capacity >= gas) {
            r.refuse("capacity", "a fluid volume at the full stop below the gas volume (" + Fields.format(gas * 1e3)
                    + " L)");
            return null;
        }
        double tau = r.has("thermalTimeConstant") ? r.si("thermalTimeConstant") : Double.NaN;
        Accumulator.GasCharge charge = new Accumulator.GasCharge(gas, r.si("prechargePressure"),
                r.si("prechargeTemperature"), r.si("exponent"), tau);
        return new Accumulator(id, ports.get("port"), charge, capacity, r.si("inletDiameter"), r.si("cd"));
    }
}
