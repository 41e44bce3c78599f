package org.branchsim.core.scenario;

import java.util.List;
import org.branchsim.core.fluid.Fluid;
import org.branchsim.core.fluid.IsoGrade;
import org.branchsim.core.fluid.ViscosityModel;
import org.branchsim.core.units.Dimension;
import org.branchsim.core.units.Units;

/**
 * The {@code fluid} section: temperature, viscosity (an ISO VG grade, a fixed value, or two points of the
 * oil's own Walther line), density, bulk modulus and entrained air, read into a {@link Fluid}.
 */
final class FluidSection {

    /** Volumetric thermal expansion coefficient of mineral oil, 1/K (common practice, no source). */
    private static final double DEFAULT_EXPANSION = 7e-4;
    /** 40 degC and 100 degC, K: the two points of an oil's Walther line (ISO 3448 grades are named at 40 degC). */
    private static final double T40 = 313.15;
    private static final double T100 = 373.15;

    static final BlockSpec SPEC = BlockSpec.of("fluid",
            FieldSpec.quantity("temperature", Dimension.TEMPERATURE).byDefault("40 degC").meaning("working temperature"),
            FieldSpec.text("grade").byDefault("VG46").meaning("ISO VG grade: " + IsoGrade.names()),
            FieldSpec.positive("viscosity", Dimension.KINEMATIC_VISCOSITY)
                    .meaning("instead of `grade`: a fixed kinematic viscosity"),
            FieldSpec.positive("viscosity40", Dimension.KINEMATIC_VISCOSITY)
                    .meaning("instead of `grade`: the oil's own viscosity at 40 °C (with `viscosity100`; Walther line)"),
            FieldSpec.positive("viscosity100", Dimension.KINEMATIC_VISCOSITY)
                    .meaning("the oil's own viscosity at 100 °C (with `viscosity40`)"),
            FieldSpec.positive("density15", Dimension.DENSITY).byDefault("870 kg/m^3")
                    .meaning("density at 15 °C (corrected to the working temperature)"),
            FieldSpec.positive("density", Dimension.DENSITY).meaning("instead of `density15`: density at the working "
                    + "temperature"),
            FieldSpec.positive("bulkModulus", Dimension.PRESSURE).byDefault("1.6 GPa").meaning("bulk modulus of air-free oil"),
            FieldSpec.number("airContent", 0.0, 0.5, 0.0)
                    .meaning("free air volume fraction at atmospheric pressure, a number or e.g. \"0.5 %\""),
            FieldSpec.choice("airProcess", FieldSpec.word("isothermal"), FieldSpec.word("adiabatic"))
                    .meaning("how entrained air is compressed (adiabatic: polytropic exponent 1.4)"),
            FieldSpec.quantity("airReleasePressure", Dimension.PRESSURE).byDefault("-0.7 bar")
                    .meaning("gauge pressure below which dissolved air comes out of solution (gaseous cavitation); "
                            + "a run reports every node that falls below it"),
            FieldSpec.number("releasableAir", 1e-6, 0.5, Fluid.DEFAULT_RELEASABLE_AIR)
                    .meaning("air that comes out of solution by absolute vacuum, a volume fraction at atmospheric "
                            + "pressure, a number or e.g. \"1 %\""))
            .with(new Choice(List.of(List.of("grade"), List.of("viscosity"), List.of("viscosity40", "viscosity100")),
                    false, "viscosity", "one way of giving viscosity: \"grade\", \"viscosity\", or \"viscosity40\" with "
                    + "\"viscosity100\"", null, null))
            .with(new Choice(List.of(List.of("density15"), List.of("density")), false, "density",
                    "either \"density15\" (at 15 degC) or \"density\" (at the working temperature)", null, null))
            .with(FluidSection::knownGrade)
            .with(FluidSection::thinnerWhenHot)
            .with(FluidSection::releaseAboveVacuum);

    private FluidSection() {
    }

    private static void knownGrade(Reading r) {
        String g = r.text("grade");
        if (g != null && r.has("grade") && IsoGrade.parse(g) == null) {
            r.problem("grade", "an ISO VG grade (" + IsoGrade.names() + ")", "\"" + g + "\"");
            r.putText("grade", null);
        }
    }

    private static void releaseAboveVacuum(Reading r) {
        if (r.valid("airReleasePressure")
                && !(r.si("airReleasePressure") > -Units.ATMOSPHERE && r.si("airReleasePressure") <= 0.0)) {
            r.refuse("airReleasePressure", "a gauge pressure between -1.013 bar (absolute vacuum) and 0");
        }
    }

    private static void thinnerWhenHot(Reading r) {
        if (r.has("viscosity40") && r.has("viscosity100") && r.valid("viscosity40", "viscosity100")
                && r.si("viscosity100") >= r.si("viscosity40")) {
            r.refuse("viscosity100", "a viscosity at 100 degC lower than at 40 degC");
        }
    }

    /**
     * Reads the section; a missing section is a problem, and reading goes on with a default oil so that the
     * rest of the file is checked too.
     */
    static Fluid read(Fields root) {
        Fields f = root.object("fluid");
        if (f == null) {
            root.problem("fluid", SPEC.missingHint("fluid"), "none");
            return new Fluid(870, 46e-6, 1.6e9, 0, 1, T40);
        }
        Reading r = BlockReader.read(f, SPEC);
        f.finish();
        double temperature = r.si("temperature");
        double nu = viscosity(r, temperature);
        double density = r.has("density") ? r.si("density")
                : Fluid.densityAt(r.si("density15"), DEFAULT_EXPANSION, temperature);
        double n = "adiabatic".equals(r.text("airProcess")) ? 1.4 : 1.0;
        double release = r.valid("airReleasePressure") ? r.si("airReleasePressure") : Fluid.DEFAULT_RELEASE_PRESSURE;
        double releasable = r.valid("releasableAir") ? r.si("releasableAir") : Fluid.DEFAULT_RELEASABLE_AIR;
        return new Fluid(density, nu, r.si("bulkModulus"), r.si("airContent"), n, temperature,
                release > -Units.ATMOSPHERE && release <= 0.0 ? release : Fluid.DEFAULT_RELEASE_PRESSURE, releasable);
    }

    private static double viscosity(Reading r, double temperature) {
        if (r.has("viscosity")) {
            return r.si("viscosity");
        }
        if (r.has("viscosity40") || r.has("viscosity100")) {
            if (!r.valid("viscosity40", "viscosity100") || Double.isNaN(temperature)) {
                return Double.NaN;
            }
            return ViscosityModel.throughPoints(T40, r.si("viscosity40"), T100, r.si("viscosity100"))
                    .kinematicViscosity(temperature);
        }
        String g = r.text("grade");
        IsoGrade iso = g == null ? null : IsoGrade.parse(g);
        if (iso == null || Double.isNaN(temperature)) {
            return Double.NaN;
        }
        return ViscosityModel.throughPoints(T40, iso.nu40(), T100, iso.nu100()).kinematicViscosity(temperature);
    }
}
