package org.branchsim.core.fluid;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

/** Viscosity, density and effective bulk modulus against published relations and worked numbers. */
class FluidPropertiesTest {

    @Test
    void isoVg46IsFortySixCentistokesAtFortyDegrees() {
        // ISO 3448: the grade number is the mid-point kinematic viscosity at 40 degC, mm^2/s
        ViscosityModel m = ViscosityModel.throughPoints(313.15, IsoGrade.VG46.nu40(), 373.15, IsoGrade.VG46.nu100());
        assertEquals(46e-6, m.kinematicViscosity(313.15), 46e-6 * 1e-9);
    }

    @Test
    void waltherLineMatchesWorkedExample() {
        // ASTM D341 (Walther): log10 log10(nu + 0.7) = A - B log10 T; VG 46 with nu40 = 46, nu100 = 6.8 cSt
        // gives A = 9.41799, B = 3.68444, nu(20 degC) = 133.8 cSt, nu(60 degC) = 20.62 cSt (REFERENCES.md)
        ViscosityModel m = ViscosityModel.throughPoints(313.15, 46e-6, 373.15, 6.8e-6);
        assertEquals(9.41799, m.a(), 5e-5);
        assertEquals(3.68444, m.b(), 5e-5);
        assertEquals(133.8, m.kinematicViscosity(293.15) * 1e6, 0.1);
        assertEquals(20.62, m.kinematicViscosity(333.15) * 1e6, 0.01);
    }

    @Test
    void densityFallsWithTemperature() {
        // rho(T) = rho15 / (1 + alpha (T - 15 degC)), alpha 7e-4 /K (from memory; common practice): 870 -> 855.0 at 40 degC
        assertEquals(855.0, Fluid.densityAt(870.0, 7e-4, 313.15), 0.05);
    }

    @Test
    void effectiveBulkModulusWithTubeAndAirMatchesWorkedExample() {
        // Merritt, Hydraulic Control Systems, 1967, ch. 2: 1/beta_e = 1/beta_oil + 1/beta_wall + (Vg/Vt)/beta_gas,
        // steel tube d = 10 mm, t = 1.5 mm, E = 206 GPa -> beta_wall = 30.9 GPa; oil 1.6 GPa + tube -> 1.52 GPa;
        // with 1 % free air at atmosphere (isothermal): 0.67 GPa at 10 bar, 1.44 GPa at 50 bar, 1.50 GPa at 100 bar.
        double wall = 206e9 * 1.5e-3 / 10e-3;
        assertEquals(30.9e9, wall, 1e6);
        Fluid noAir = new Fluid(870, 32e-6, 1.6e9, 0.0, 1.0, 313.15);
        assertEquals(1.52e9, noAir.effectiveBulkModulus(100e5, wall), 0.005e9);
        Fluid air = new Fluid(870, 32e-6, 1.6e9, 0.01, 1.0, 313.15);
        assertEquals(0.67e9, air.effectiveBulkModulus(10e5, wall), 0.005e9);
        assertEquals(1.44e9, air.effectiveBulkModulus(50e5, wall), 0.01e9);
        assertEquals(1.50e9, air.effectiveBulkModulus(100e5, wall), 0.005e9);
    }
}
