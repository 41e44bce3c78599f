package org.branchsim.core.units;

import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * A value written with a tolerance: {@code "0.8 mm ± 0.02 mm"} (or {@code +/-}), {@code "15 N/mm ± 10 %"},
 * or a range {@code "1.2 GPa .. 1.6 GPa"}. Ordinary runs use the nominal value (the midpoint of a range);
 * tolerance studies draw values between the limits.
 *
 * @param nominal nominal value as text, e.g. "0.8 mm"
 * @param low lower limit, same unit as the nominal
 * @param high upper limit, same unit as the nominal
 * @param unit the nominal's unit symbol (empty for a bare number)
 */
public record Tolerance(String nominal, double low, double high, String unit) {

    private static final Pattern PLUS_MINUS = Pattern.compile("^(.+?)\\s*(?:±|\\+/-|\\+-)\\s*(.+)$");
    private static final Pattern RANGE = Pattern.compile("^(.+?)\\s*\\.\\.\\s*(.+)$");
    private static final Pattern NUMBER_UNIT =
            Pattern.compile("^\\s*([-+]?(?:\\d+\\.?\\d*|\\.\\d+)(?:[eE][-+]?\\d+)?)\\s*(.*?)\\s*$");

    /**
     * @param text the user's text
     * @return the tolerance, or null when the text has none
     * @throws IllegalArgumentException when a tolerance is written but cannot be understood
     */
    public static Tolerance parse(String text) {
        Matcher pm = PLUS_MINUS.matcher(text);
        if (pm.matches()) {
            double[] nom = numberAndUnit(pm.group(1));
            String unit = unitOf(pm.group(1));
            String tolText = pm.group(2).trim();
            double tol;
            if (tolText.endsWith("%")) {
                tol = Math.abs(nom[0]) * Double.parseDouble(tolText.substring(0, tolText.length() - 1).trim()) / 100.0;
            } else {
                double[] t = numberAndUnit(tolText);
                if (!unitOf(tolText).equals(unit)) {
                    throw new IllegalArgumentException("the tolerance needs the nominal's unit (" + unit + ") or %");
                }
                tol = Math.abs(t[0]);
            }
            return new Tolerance(pm.group(1).trim(), nom[0] - tol, nom[0] + tol, unit);
        }
        Matcher rm = RANGE.matcher(text);
        if (rm.matches()) {
            double a = numberAndUnit(rm.group(1))[0];
            double b = numberAndUnit(rm.group(2))[0];
            String unit = unitOf(rm.group(1));
            if (!unitOf(rm.group(2)).equals(unit)) {
                throw new IllegalArgumentException("both ends of a range need the same unit");
            }
            double lo = Math.min(a, b);
            double hi = Math.max(a, b);
            String mid = format((lo + hi) / 2) + (unit.isEmpty() ? "" : " " + unit);
            return new Tolerance(mid, lo, hi, unit);
        }
        return null;
    }

    /** @return the value at fraction u (0..1) between the limits, written with the unit */
    public String at(double u) {
        double x = low + u * (high - low);
        return format(x) + (unit.isEmpty() ? "" : " " + unit);
    }

    private static double[] numberAndUnit(String s) {
        Matcher m = NUMBER_UNIT.matcher(s);
        if (!m.matches()) {
            throw new IllegalArgumentException("expected a number with its unit, found \"" + s.trim() + "\"");
        }
        return new double[] {Double.parseDouble(m.group(1))};
    }

    private static String unitOf(String s) {
        Matcher m = NUMBER_UNIT.matcher(s);
        return m.matches() ? m.group(2) : "";
    }

    private static String format(double x) {
        String s = String.format(java.util.Locale.ROOT, "%.6g", x);
        if (!s.contains("e") && s.contains(".")) {
            s = s.replaceAll("0+$", "").replaceAll("\\.$", "");
        }
        return s;
    }
}
