package org.branchsim.core.units;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/**
 * Unit factors against NIST Special Publication 811 (2008), Appendix B: in = 0.0254 m exactly,
 * lb = 0.45359237 kg exactly, standard gravity 9.80665 m/s^2, psi = 6894.757293168 Pa,
 * US gallon = 231 in^3 = 3.785411784 L, in^3 = 16.387064 cm^3, degF = degC * 9/5 + 32.
 */
class UnitConversionTest {

    private static final double EXACT = 1e-12;

    @Test
    void psiMatchesNist() {
        assertEquals(6894.757293168, Quantity.si("1 psi", Dimension.PRESSURE), 6894.757 * EXACT);
        // worked number: 3000 psi = 206.8427 bar
        assertEquals(206.8427, Quantity.si("3000 psi", Dimension.PRESSURE) / 1e5, 1e-4);
    }

    @Test
    void gallonPerMinuteMatchesNist() {
        // worked number: 10 gal/min = 37.8541 L/min
        double si = Quantity.si("10 gal/min", Dimension.VOLUME_FLOW);
        assertEquals(37.85411784, si * 60_000.0, 1e-9);
    }

    @Test
    void inchAndCubicInchAreExact() {
        assertEquals(0.0254, Quantity.si("1 in", Dimension.LENGTH), EXACT);
        assertEquals(16.387064e-6, Quantity.si("1 in^3", Dimension.VOLUME), 1e-18);
        assertEquals(16.387064e-6, Quantity.si("1 in³", Dimension.VOLUME), 1e-18);
    }

    @Test
    void fahrenheitConvertsWithOffset() {
        assertEquals(273.15, Quantity.si("32 degF", Dimension.TEMPERATURE), 1e-9);
        assertEquals(373.15, Quantity.si("212 degF", Dimension.TEMPERATURE), 1e-9);
        assertEquals(313.15, Quantity.si("40 degC", Dimension.TEMPERATURE), 1e-9);
    }

    @Test
    void productSpellingsAreTheSameUnit() {
        assertEquals(Quantity.si("5 N*s/m", Dimension.DAMPING), Quantity.si("5 N s/m", Dimension.DAMPING));
        assertEquals(1000.0, Quantity.si("1 N/mm", Dimension.STIFFNESS), EXACT);
        assertEquals(1e-6, Quantity.si("1 cSt", Dimension.KINEMATIC_VISCOSITY), 1e-18);
    }

    @Test
    void missingUnitWrongDimensionAndUnknownUnitAreRejected() {
        Quantity.Parsed bare = Quantity.parse("60", Dimension.PRESSURE);
        assertFalse(bare.ok());
        assertTrue(bare.error().contains("with its unit"));
        Quantity.Parsed wrong = Quantity.parse("60 mm", Dimension.PRESSURE);
        assertFalse(wrong.ok());
        assertTrue(wrong.error().contains("not a length unit"));
        Quantity.Parsed unknown = Quantity.parse("60 barr", Dimension.PRESSURE);
        assertFalse(unknown.ok());
        assertTrue(unknown.error().contains("known pressure unit"));
        assertTrue(Quantity.parse("0.61", Dimension.DIMENSIONLESS).ok());
    }

    @Test
    void displayUnitsRoundTrip() {
        Unit bar = UnitSystem.SI.displayUnit(Dimension.PRESSURE);
        Unit psi = UnitSystem.US.displayUnit(Dimension.PRESSURE);
        assertEquals("bar", bar.symbol());
        assertEquals("psi", psi.symbol());
        assertEquals(60.0, bar.fromSi(bar.toSi(60.0)), 1e-12);
        assertEquals(14.503773773, psi.fromSi(1e5), 1e-8);
    }
}
