package org.branchsim.core.study;

import java.util.Locale;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

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
