package org.branchsim.core.units;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNull;

import org.junit.jupiter.api.Test;

/** Values written with a tolerance read as their nominal value and give their limits. */
class ToleranceTest {

    @Test
    void plusMinusAbsolutePercentAndRange() {
        Tolerance a = Tolerance.parse("0.8 mm ± 0.02 mm");
        assertEquals(0.78, a.low(), 1e-12);
        assertEquals(0.82, a.high(), 1e-12);
        assertEquals("mm", a.unit());
        Tolerance b = Tolerance.parse("15 N/mm +/- 10 %");
        assertEquals(13.5, b.low(), 1e-12);
        assertEquals(16.5, b.high(), 1e-12);
        Tolerance c = Tolerance.parse("1.2 GPa .. 1.6 GPa");
        assertEquals("1.4 GPa", c.nominal());
        assertEquals("1.5 GPa", c.at(0.75));
        assertNull(Tolerance.parse("0.8 mm"));
    }

    @Test
    void quantitiesWithToleranceReadAsNominal() {
        assertEquals(0.8e-3, Quantity.si("0.8 mm ± 0.02 mm", Dimension.LENGTH), 1e-15);
        assertEquals(1.4e9, Quantity.si("1.2 GPa .. 1.6 GPa", Dimension.PRESSURE), 1.0);
        assertFalse(Quantity.parse("0.8 mm ± 0.02 bar", Dimension.LENGTH).ok());
    }
}
