package org.branchsim.core.fluid;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

/**
 * The closed-form slope d(beta_e)/dp of the effective bulk modulus of oil, air and wall in series (Merritt,
 * Hydraulic Control Systems, 1967, ch. 2).
 */
class BulkModulusSlopeTest {

    /** Steel tube wall, 30.9 GPa (REFERENCES.md: E t / d with d = 10 mm, t = 1.5 mm, E = 206 GPa). */
    private static final double WALL = 30.9e9;

    @Test
    void airFreeOilHasAConstantModulus() {
        // 1/beta_e = 1/beta_oil + 1/beta_wall does not depend on pressure (Merritt 1967, ch. 2)
        Fluid oil = new Fluid(870, 32e-6, 1.6e9, 0.0, 1.0, 313.15);
        assertEquals(0.0, oil.bulkModulusSlope(100e5, WALL), 0.0);
    }

    @Test
    void slopeIntegratesToMerrittsRiseFromTenToFiftyBar() {
        // Merritt 1967, ch. 2, 1 % free air (isothermal): beta_e rises from 0.67 GPa at 10 bar to 1.44 GPa at
        // 50 bar (worked numbers, rounded to 0.005 and 0.01 GPa); Simpson's rule on 400 panels of the slope
        Fluid air = new Fluid(870, 32e-6, 1.6e9, 0.01, 1.0, 313.15);
        int panels = 400;
        double a = 10e5;
        double b = 50e5;
        double h = (b - a) / panels;
        double sum = air.bulkModulusSlope(a, WALL) + air.bulkModulusSlope(b, WALL);
        for (int k = 1; k < panels; k++) {
            sum += (k % 2 == 1 ? 4 : 2) * air.bulkModulusSlope(a + k * h, WALL);
        }
        double rise = sum * h / 3;
        assertEquals(1.44e9 - 0.67e9, rise, 0.015e9);
        // and exactly the rise of the modulus itself (fundamental theorem; Simpson's error bound (b-a) h^4/180 max|f''''|)
        assertEquals(air.effectiveBulkModulus(b, WALL) - air.effectiveBulkModulus(a, WALL), rise, 1e-6 * rise);
    }

    @Test
    void slopeAgreesWithCentralDifferencesNearVacuumAndAtPressure() {
        // central differences (Dennis and Schnabel 1983, ch. 5), step 1e-4 of the pressure scale; the softened
        // region near vacuum (within 100 kPa of zero absolute) and the adiabatic air law (n = 1.4) included
        Fluid air = new Fluid(870, 32e-6, 1.6e9, 0.005, 1.4, 313.15);
        for (double gauge : new double[] {-99_000, -90_000, -50_000, 0.0, 5e5, 50e5, 200e5}) {
            double h = 1e-4 * Math.max(1e4, Math.abs(gauge + 101_325));
            double central = (air.effectiveBulkModulus(gauge + h, WALL) - air.effectiveBulkModulus(gauge - h, WALL))
                    / (2 * h);
            double slope = air.bulkModulusSlope(gauge, WALL);
            assertEquals(central, slope, 1e-6 * Math.abs(slope), "at " + gauge + " Pa gauge");
        }
    }
}
