package org.branchsim.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.Locale;
import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;

/**
 * The trace's number text against the JDK's own formatter, whose {@code %g} conversion is specified in the Java SE
 * 17 API, java.util.Formatter, "Floating Point" conversions: round to the precision (half-up), then plain notation
 * when the rounded value is at least 10^-4 and below 10^precision, otherwise computerised scientific notation.
 */
class SignificantDigitsTest {

    private static final int RANDOM_VALUES = 200_000;

    @Test
    void agreesWithTheFormatterOnRandomDoublesOfEveryMagnitude() {
        // Given doubles with random significands and decimal exponents from -30 to 30, of both signs
        SplittableRandom random = new SplittableRandom(20261202L);
        for (int i = 0; i < RANDOM_VALUES; i++) {
            double v = (random.nextBoolean() ? 1 : -1) * random.nextDouble() * Math.pow(10, random.nextInt(-30, 31));
            // Then the text is the formatter's
            assertEquals(formatter(v), text(v), () -> "value " + v);
        }
    }

    @Test
    void agreesWithTheFormatterOnGridTimesAndDecimalFractions() {
        // Given the times of output grids (k * 1 ms, k * 0.25 ms) and values with few decimals, which sit exactly
        // on or next to a half after scaling to seven digits
        for (int k = 1; k < 100_000; k++) {
            for (double v : new double[] {k * 1e-3, k * 2.5e-4, k / 8.0, k * 1e-7 + 0.5, k * 0.05e-7}) {
                // Then the text is the formatter's
                assertEquals(formatter(v), text(v), () -> "value " + v);
            }
        }
    }

    @Test
    void agreesWithTheFormatterAtRoundingAndNotationBoundaries() {
        // Given values that round across a power of ten, sit on a half, or straddle 1e-4 and 1e7
        double[] values = {9.9999995, 9.99999949, 0.99999995, 9999999.5, 9999999.4, 1e7, 1e-4, 9.9999995e-5,
            0.000099999994, 1.0000005, 1.00000049, 123456.75, 0.1, 0.001, 22.04, 1450, 6.3, 1e-300, 4.9e-324,
            Double.MAX_VALUE, -Double.MIN_NORMAL, 2.5, 1234567, 12345675, 0.5, 100, 1e22, 1e23, -0.0001};
        for (double v : values) {
            // Then the text is the formatter's
            assertEquals(formatter(v), text(v), () -> "value " + v);
        }
    }

    @Test
    void zeroOfEitherSignIsAPlainZeroAndNonFiniteValuesReadAsTheFormatterWritesThem() {
        // common practice, no source: the trace has always written 0 for an exact zero
        assertEquals("0", text(0.0));
        assertEquals("0", text(-0.0));
        assertEquals(formatter(Double.NaN), text(Double.NaN));
        assertEquals(formatter(Double.NEGATIVE_INFINITY), text(Double.NEGATIVE_INFINITY));
    }

    private static String formatter(double v) {
        return String.format(Locale.ROOT, "%.7g", v);
    }

    private static String text(double v) {
        StringBuilder sb = new StringBuilder();
        SignificantDigits.append(sb, v);
        return sb.toString();
    }
}
