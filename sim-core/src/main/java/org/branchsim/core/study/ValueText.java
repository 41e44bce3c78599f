package org.branchsim.core.study;

import java.util.Locale;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.branchsim.core.units.Dimension;
import org.branchsim.core.units.Tolerance;
import org.branchsim.core.units.Unit;
import org.branchsim.core.units.Units;

/**
 * Arithmetic on values as a scenario writes them: "0.8 mm" times 0.7 is "0.56 mm", keeping the user's
 * unit; a bare number stays a number.
 */
public final class ValueText {

    private static final Pattern NUMBER_AND_UNIT =
            Pattern.compile("^\\s*([-+]?(?:\\d+\\.?\\d*|\\.\\d+)(?:[eE][-+]?\\d+)?)\\s*(.*?)\\s*$");

    private ValueText() {
    }

    /**
     * @param value a String such as "0.8 mm" or a Number
     * @param factor multiplier
     * @return the scaled value, same unit (String) or a Double
     * @throws IllegalArgumentException when the value is not a number with an optional unit
     */
    public static Object scale(Object value, double factor) {
        if (value instanceof Number n) {
            return n.doubleValue() * factor;
        }
        Matcher m = NUMBER_AND_UNIT.matcher(String.valueOf(value));
        if (!m.matches()) {
            throw new IllegalArgumentException("not a number with a unit: " + value);
        }
        double x = Double.parseDouble(m.group(1)) * factor;
        String unit = m.group(2);
        return unit.isEmpty() ? (Object) x : format(x) + " " + unit;
    }

    /**
     * @param value a value as a scenario writes it: a Number, or a text such as "0.8 mm" (a tolerance allowed)
     * @return its dimension: dimensionless for a number or a bare number in text, the unit's dimension for a
     *         text with a known unit; null when the value is not a number (a name, a list, a text with an
     *         unknown unit)
     */
    public static Dimension dimensionOf(Object value) {
        if (value instanceof Number) {
            return Dimension.DIMENSIONLESS;
        }
        if (!(value instanceof String text)) {
            return null;
        }
        String unit;
        try {
            Tolerance t = Tolerance.parse(text);
            if (t != null) {
                unit = t.unit();
            } else {
                Matcher m = NUMBER_AND_UNIT.matcher(text);
                if (!m.matches()) {
                    return null;
                }
                unit = m.group(2);
            }
        } catch (IllegalArgumentException e) {
            return null;
        }
        if (unit.isEmpty()) {
            return Dimension.DIMENSIONLESS;
        }
        Unit u = Units.find(unit);
        return u == null ? null : u.dimension();
    }

    /** @return a number written with up to 6 significant digits, no exponent for ordinary magnitudes */
    public static String format(double x) {
        String s = String.format(Locale.ROOT, "%.6g", x);
        if (s.contains("e")) {
            return s;
        }
        if (s.contains(".")) {
            s = s.replaceAll("0+$", "").replaceAll("\\.$", "");
        }
        return s;
    }
}
