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

    /**
     * The outcome of parsing: either an SI value or a reason the text is not acceptable.
     *
     * @param si the (nominal) value in SI units, NaN on error
     * @param unit the unit written, or null
     * @param error what was expected, or null when the text was understood
     * @param lowSi lower limit of a value written with a tolerance, SI (the value itself otherwise)
     * @param highSi upper limit of a value written with a tolerance, SI (the value itself otherwise)
     */
    public record Parsed(double si, Unit unit, String error, double lowSi, double highSi) {

        /** A value without a tolerance, or an error. */
        public Parsed(double si, Unit unit, String error) {
            this(si, unit, error, si, si);
        }

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
        return parse(text, expected, UnitSystem.METRIC);
    }

    /**
     * @param text the user's text, e.g. "60 bar"
     * @param expected the dimension the field needs
     * @param system the unit system of the scenario: its units come first in hints
     * @return the parsed SI value (always finite), or an explanation of what is wrong
     */
    public static Parsed parse(String text, Dimension expected, UnitSystem system) {
        Tolerance tol;
        try {
            tol = Tolerance.parse(text);
        } catch (IllegalArgumentException e) {
            return new Parsed(Double.NaN, null, "a value with a tolerance such as \"0.8 mm \u00b1 0.02 mm\", "
                    + "\"15 N/mm \u00b1 10 %\" or \"1.2 GPa .. 1.6 GPa\" (" + e.getMessage() + ")");
        }
        if (tol != null) {
            if (!Double.isFinite(tol.low()) || !Double.isFinite(tol.high())) {
                return new Parsed(Double.NaN, null, "tolerance limits that are finite numbers");
            }
            Parsed lo = parseNominal(tol.low() + " " + tol.unit(), expected, system);
            if (!lo.ok()) {
                return lo;
            }
            Parsed hi = parseNominal(tol.high() + " " + tol.unit(), expected, system);
            if (!hi.ok()) {
                return hi;
            }
            Parsed nominal = parseNominal(tol.nominal(), expected, system);
            return nominal.ok() ? new Parsed(nominal.si(), nominal.unit(), null, Math.min(lo.si(), hi.si()),
                    Math.max(lo.si(), hi.si())) : nominal;
        }
        return parseNominal(text, expected, system);
    }

    private static Parsed parseNominal(String text, Dimension expected, UnitSystem system) {
        String units = Units.examplesOf(expected, system);
        Matcher m = VALUE_AND_UNIT.matcher(text);
        if (!m.matches()) {
            return new Parsed(Double.NaN, null, "a number followed by a " + expected.humanName() + " unit ("
                    + units + ")");
        }
        double number = Double.parseDouble(m.group(1));
        if (!Double.isFinite(number)) {
            return new Parsed(Double.NaN, null, "a finite number (at most about 1.8e308) followed by a "
                    + expected.humanName() + " unit");
        }
        String symbol = m.group(2);
        if (symbol.isEmpty()) {
            if (expected == Dimension.DIMENSIONLESS) {
                return new Parsed(number, Units.require("1"), null);
            }
            return new Parsed(Double.NaN, null, "a " + expected.humanName() + " with its unit (" + units + ")");
        }
        Unit unit = Units.find(symbol);
        if (unit == null) {
            if (expected == Dimension.PRESSURE && Units.isAbsolutePressure(symbol)) {
                return new Parsed(Double.NaN, null, "a gauge pressure (branchsim reads every pressure as gauge, "
                        + "tank = 0: write psig, barg, psi or bar), not an absolute one");
            }
            return new Parsed(Double.NaN, null, "a known " + expected.humanName() + " unit (" + units + ")");
        }
        if (unit.dimension() != expected) {
            return new Parsed(Double.NaN, unit, "a " + expected.humanName() + " unit (" + units + "), not a "
                    + unit.dimension().humanName() + " unit");
        }
        double si = unit.toSi(number);
        if (!Double.isFinite(si)) {
            return new Parsed(Double.NaN, unit, "a value that stays finite in SI units (" + text.trim()
                    + " overflows to infinity in " + expected.siSymbol() + ")");
        }
        return new Parsed(si, unit, null);
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
