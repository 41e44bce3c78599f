package org.branchsim.core.units;

import java.util.Locale;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * Parses dimensioned values written as text, such as {@code "210 bar"}, {@code "12 L/min"} or
 * {@code "0.8 mm"}, into SI. A dimensioned value without a unit is an error, never silently SI. A value
 * written with a {@link Tolerance} reads as its nominal value.
 */
public final class Quantity {

    private static final Pattern VALUE_AND_UNIT =
            Pattern.compile("^\\s*([-+]?(?:\\d+\\.?\\d*|\\.\\d+)(?:[eE][-+]?\\d+)?)\\s*(.*?)\\s*$");

    private Quantity() {
    }

    /** The outcome of parsing: either an SI value or a reason the text is not acceptable. */
    public record Parsed(double si, Unit unit, String error) {
        /** @return true when the text was understood */
        public boolean ok() {
            return error == null;
        }
    }

    /**
     * @param text the user's text, e.g. "60 bar"
     * @param expected the dimension the field needs
     * @return the parsed SI value, or an explanation of what is wrong
     */
    public static Parsed parse(String text, Dimension expected) {
        Tolerance tol;
        try {
            tol = Tolerance.parse(text);
        } catch (IllegalArgumentException e) {
            return new Parsed(Double.NaN, null, "a value with a tolerance such as \"0.8 mm ± 0.02 mm\", "
                    + "\"15 N/mm ± 10 %\" or \"1.2 GPa .. 1.6 GPa\" (" + e.getMessage() + ")");
        }
        if (tol != null) {
            Parsed lo = parseNominal(tol.low() + " " + tol.unit(), expected);
            if (!lo.ok()) {
                return lo;
            }
            return parseNominal(tol.nominal(), expected);
        }
        return parseNominal(text, expected);
    }

    private static Parsed parseNominal(String text, Dimension expected) {
        Matcher m = VALUE_AND_UNIT.matcher(text);
        if (!m.matches()) {
            return new Parsed(Double.NaN, null, "a number followed by a " + expected.humanName() + " unit ("
                    + Units.examplesOf(expected) + ")");
        }
        double number = Double.parseDouble(m.group(1));
        String symbol = m.group(2);
        if (symbol.isEmpty()) {
            if (expected == Dimension.DIMENSIONLESS) {
                return new Parsed(number, Units.require("1"), null);
            }
            return new Parsed(Double.NaN, null, "a " + expected.humanName() + " with its unit ("
                    + Units.examplesOf(expected) + ")");
        }
        Unit unit = Units.find(symbol);
        if (unit == null) {
            return new Parsed(Double.NaN, null, "a known " + expected.humanName() + " unit ("
                    + Units.examplesOf(expected) + ")");
        }
        if (unit.dimension() != expected) {
            return new Parsed(Double.NaN, unit, "a " + expected.humanName() + " unit ("
                    + Units.examplesOf(expected) + "), not a " + unit.dimension().humanName() + " unit");
        }
        return new Parsed(unit.toSi(number), unit, null);
    }

    /**
     * Parses text that must be valid (programmatic use and tests).
     *
     * @throws IllegalArgumentException when the text is not a value of the expected dimension
     */
    public static double si(String text, Dimension expected) {
        Parsed p = parse(text, expected);
        if (!p.ok()) {
            throw new IllegalArgumentException(String.format(Locale.ROOT, "'%s': expected %s", text, p.error()));
        }
        return p.si();
    }
}
