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
        Unit bar = UnitSystem.METRIC.displayUnit(Dimension.PRESSURE);
        Unit psi = UnitSystem.US.displayUnit(Dimension.PRESSURE);
        assertEquals("bar", bar.symbol());
        assertEquals("psi", psi.symbol());
        assertEquals(60.0, bar.fromSi(bar.toSi(60.0)), 1e-12);
        assertEquals(14.503773773, psi.fromSi(1e5), 1e-8);
    }

    @Test
    void unitsOfTheTradeAreReadInAnyCase() {
        // NIST SP 811 (2008), B.8: psi = 6.894757 E+03 Pa; worked number 3000 psi = 206.8427 bar
        assertEquals(206.8427, Quantity.si("3000 PSI", Dimension.PRESSURE) / 1e5, 1e-4);
        assertEquals(Quantity.si("3000 psi", Dimension.PRESSURE), Quantity.si("3000 Psi", Dimension.PRESSURE));
        assertEquals(60e5, Quantity.si("60 Bar", Dimension.PRESSURE), 1e-6);
        assertEquals(60e5, Quantity.si("60 BAR", Dimension.PRESSURE), 1e-6);
        // NIST SP 811 (2008), B.8: gallon (U.S.) per minute = 6.309020 E-05 m^3/s
        assertEquals(6.309020e-5, Quantity.si("1 GPM", Dimension.VOLUME_FLOW), 1e-11);
        assertEquals(Quantity.si("20 L/min", Dimension.VOLUME_FLOW), Quantity.si("20 LPM", Dimension.VOLUME_FLOW));
    }

    @Test
    void gaugeSpellingsMeanGaugeAndAbsoluteOnesAreRefused() {
        assertEquals(Quantity.si("100 psi", Dimension.PRESSURE), Quantity.si("100 psig", Dimension.PRESSURE));
        assertEquals(4e5, Quantity.si("4 barg", Dimension.PRESSURE), 1e-9);
        Quantity.Parsed absolute = Quantity.parse("100 psia", Dimension.PRESSURE);
        assertFalse(absolute.ok());
        assertTrue(absolute.error().contains("gauge"), absolute.error());
        assertFalse(Quantity.parse("5 bara", Dimension.PRESSURE).ok());
    }

    @Test
    void kilopoundsPerSquareInchAndFahrenheitMatchNist() {
        // NIST SP 811 (2008), B.8: kip per square inch (ksi) = 6.894757 E+06 Pa
        assertEquals(6.894757e6, Quantity.si("1 ksi", Dimension.PRESSURE), 1.0);
        assertEquals(Quantity.si("1 ksi", Dimension.PRESSURE), Quantity.si("1 kpsi", Dimension.PRESSURE));
        assertEquals(Quantity.si("1 ksi", Dimension.PRESSURE), Quantity.si("1 KSI", Dimension.PRESSURE));
        // NIST SP 811 (2008), B.9: T/K = (t/degF + 459.67)/1.8; 100 degF = 310.927 8 K
        assertEquals(310.92778, Quantity.si("100 \u00b0F", Dimension.TEMPERATURE), 1e-5);
        assertEquals(310.92778, Quantity.si("100 degf", Dimension.TEMPERATURE), 1e-5);
        assertEquals(310.92778, Quantity.si("100 deg F", Dimension.TEMPERATURE), 1e-5);
        // NIST SP 811 (2008), B.9: T/K = t/degC + 273.15
        assertEquals(313.15, Quantity.si("40 \u00b0C", Dimension.TEMPERATURE), 1e-9);
        assertEquals(313.15, Quantity.si("40 DEGC", Dimension.TEMPERATURE), 1e-9);
        assertEquals(313.15, Quantity.si("40 \u2103", Dimension.TEMPERATURE), 1e-9);
    }

    @Test
    void theCaseOfAnSiPrefixIsNeverGuessed() {
        // SI prefixes m = 1e-3 and M = 1e6 differ only in case (BIPM, The International System of Units,
        // 9th edition 2019, table 7): a symbol with a prefix is read only as written
        assertEquals(100.0, Quantity.si("1 mbar", Dimension.PRESSURE), 1e-12);
        assertFalse(Quantity.parse("1 Mbar", Dimension.PRESSURE).ok());
        assertFalse(Quantity.parse("1 MBAR", Dimension.PRESSURE).ok());
        assertFalse(Quantity.parse("1 mPa", Dimension.PRESSURE).ok());
        assertFalse(Quantity.parse("1 MPA", Dimension.PRESSURE).ok());
        assertFalse(Quantity.parse("1 MM", Dimension.LENGTH).ok());
        assertEquals(1e6, Quantity.si("1 MPa", Dimension.PRESSURE), 1e-9);
    }

    @Test
    void hintsListTheScenariosUnitSystemFirst() {
        Quantity.Parsed us = Quantity.parse("3000", Dimension.PRESSURE, UnitSystem.US);
        assertTrue(us.error().contains("(psi, ksi, "), us.error());
        Quantity.Parsed metric = Quantity.parse("200", Dimension.PRESSURE, UnitSystem.METRIC);
        assertTrue(metric.error().contains("(bar, Pa, kPa, MPa, GPa, mbar, psi, ksi)"), metric.error());
        Quantity.Parsed flow = Quantity.parse("5 gallons", Dimension.VOLUME_FLOW, UnitSystem.US);
        assertTrue(flow.error().contains("(gal/min, in^3/s, "), flow.error());
    }

    @Test
    void nonFiniteNumbersAndOverflowInSiAreRefused() {
        // the largest finite IEEE 754 binary64 value is about 1.797e308 (IEEE 754-2008)
        assertFalse(Quantity.parse("1e999 s", Dimension.TIME).ok());
        Quantity.Parsed overflow = Quantity.parse("1e308 bar", Dimension.PRESSURE);
        assertFalse(overflow.ok());
        assertTrue(overflow.error().contains("finite in SI"), overflow.error());
        assertTrue(Quantity.parse("1e300 Pa", Dimension.PRESSURE).ok());
    }
}
