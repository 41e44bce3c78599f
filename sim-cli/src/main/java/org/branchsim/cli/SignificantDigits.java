package org.branchsim.cli;

import java.util.Locale;

/**
 * Writes a double with 7 significant digits exactly as {@code String.format(Locale.ROOT, "%.7g", v)} does (the
 * {@code %g} conversion of {@link java.util.Formatter}: the decimal digits of the double rounded half-up to 7
 * digits; plain notation when the rounded value is at least 1e-4 and below 1e7, otherwise {@code d.dddddde+XX}),
 * and zero (of either sign) as {@code 0}, without the formatter's per-call parsing. The digits come from the
 * binary value scaled and rounded; where that could disagree with rounding the double's shortest decimal digits
 * (a fraction near one half) from the digits of {@link Double#toString(double)}; and where even those lie so near
 * a half that another correct digit generator could round the other way, from the formatter itself, so the text
 * is always the formatter's. Unitless: the caller converts to the display unit first.
 */
final class SignificantDigits {

    /** Significant digits written. */
    static final int DIGITS = 7;
    /** Closest a scaled fraction may come to one half, in units of the seventh digit, for the fast path. */
    private static final double HALF_MARGIN = 1e-4;
    /** Marks a value the fast path leaves to the next one. */
    private static final int NO_FAST_PATH = Integer.MIN_VALUE;
    /** 10^0 .. 10^37 (exact up to 10^22). */
    private static final double[] POWERS = new double[38];

    static {
        for (int k = 0; k < POWERS.length; k++) {
            POWERS[k] = Double.parseDouble("1e" + k);
        }
    }

    private SignificantDigits() {
    }

    /**
     * Appends v to the text.
     *
     * @param out where the text goes
     * @param v the number, any unit
     */
    static void append(StringBuilder out, double v) {
        if (v == 0.0) {
            out.append('0');
            return;
        }
        if (!Double.isFinite(v)) {
            out.append(String.format(Locale.ROOT, "%.7g", v));
            return;
        }
        char[] digits = new char[DIGITS];
        int decExp = fastDigits(Math.abs(v), digits);
        if (decExp == NO_FAST_PATH) {
            decExp = toStringDigits(v, digits);
            if (decExp == NO_FAST_PATH) {
                out.append(String.format(Locale.ROOT, "%.7g", v));
                return;
            }
        }
        if (v < 0) {
            out.append('-');
        }
        if (decExp >= -4 && decExp < DIGITS) {
            plain(out, digits, decExp);
        } else {
            scientific(out, digits, decExp);
        }
    }

    /**
     * Rounds the binary value itself: scaled to [1e6, 1e7) it is rounded to the nearest integer, unless its
     * fraction lies within {@link #HALF_MARGIN} of one half, where rounding the double's shortest decimal digits
     * (as the formatter does) could go the other way; the scaling's own error is near 1e-9 of a unit.
     *
     * @param a a finite positive number
     * @param digits output: the 7 digits
     * @return the decimal exponent of the first digit, or {@link #NO_FAST_PATH}
     */
    private static int fastDigits(double a, char[] digits) {
        if (!(a >= 1e-30 && a < 1e30)) {
            return NO_FAST_PATH;
        }
        int e = (int) Math.floor(Math.log10(a));
        double scaled = scale(a, DIGITS - 1 - e);
        if (scaled >= 1e7) {
            e++;
            scaled = scale(a, DIGITS - 1 - e);
        } else if (scaled < 1e6) {
            e--;
            scaled = scale(a, DIGITS - 1 - e);
        }
        if (!(scaled >= 1e6 && scaled < 1e7)) {
            return NO_FAST_PATH;
        }
        long m = (long) scaled;
        double fraction = scaled - m;
        if (Math.abs(fraction - 0.5) < HALF_MARGIN) {
            return NO_FAST_PATH;
        }
        if (fraction > 0.5) {
            m++;
        }
        if (m == 10_000_000L) {
            m = 1_000_000L;
            e++;
        }
        for (int k = DIGITS - 1; k >= 0; k--) {
            digits[k] = (char) ('0' + (int) (m % 10));
            m /= 10;
        }
        return e;
    }

    /** @return a times 10^k, k from -37 to 37 */
    private static double scale(double a, int k) {
        return k >= 0 ? a * POWERS[k] : a / POWERS[-k];
    }

    /**
     * Rounds the digits of {@link Double#toString(double)} half-up to 7, as the formatter rounds its digits.
     *
     * @param v a finite non-zero number
     * @param digits output: the 7 digits
     * @return the decimal exponent of the first digit, or {@link #NO_FAST_PATH} when the digits after the
     *         seventh read 4999... or 5000...
     */
    private static int toStringDigits(double v, char[] digits) {
        String s = Double.toString(v);
        int first = s.charAt(0) == '-' ? 1 : 0;
        int ePos = s.indexOf('E');
        int end = ePos < 0 ? s.length() : ePos;
        int exp10 = ePos < 0 ? 0 : Integer.parseInt(s, ePos + 1, s.length(), 10);
        // decimal exponent of the first non-zero digit, and the digits themselves
        int point = s.indexOf('.', first);
        int decExp = Integer.MIN_VALUE;
        int n = 0;
        int roundingDigit = -1;
        boolean tailAllNines = true;
        boolean tailAllZeros = true;
        int position = 0;
        for (int i = first; i < end; i++) {
            char c = s.charAt(i);
            if (c == '.') {
                continue;
            }
            int placeFromPoint = point - first - 1 - position;
            position++;
            if (decExp == Integer.MIN_VALUE) {
                if (c == '0') {
                    continue;
                }
                decExp = placeFromPoint + exp10;
            }
            if (n < DIGITS) {
                digits[n++] = c;
            } else if (roundingDigit < 0) {
                roundingDigit = c - '0';
            } else {
                tailAllNines &= c == '9';
                tailAllZeros &= c == '0';
            }
        }
        while (n < DIGITS) {
            digits[n++] = '0';
        }
        if (roundingDigit >= 0 && nearHalf(roundingDigit, tailAllNines, tailAllZeros)) {
            return NO_FAST_PATH;
        }
        if (roundingDigit >= 5) {
            int k = DIGITS - 1;
            while (k >= 0 && digits[k] == '9') {
                digits[k--] = '0';
            }
            if (k < 0) {
                digits[0] = '1';
                decExp++;
            } else {
                digits[k]++;
            }
        }
        return decExp;
    }

    /**
     * @return whether the digits after the seventh read 4999... or 5000... (or a lone 4 or 5), where a digit
     *         generator that differs in the last digit could round the other way
     */
    private static boolean nearHalf(int roundingDigit, boolean tailAllNines, boolean tailAllZeros) {
        return (roundingDigit == 4 && tailAllNines) || (roundingDigit == 5 && tailAllZeros);
    }

    private static void plain(StringBuilder out, char[] digits, int decExp) {
        if (decExp < 0) {
            out.append("0.");
            for (int i = -1; i > decExp; i--) {
                out.append('0');
            }
            out.append(digits);
            return;
        }
        out.append(digits, 0, decExp + 1);
        if (decExp + 1 < DIGITS) {
            out.append('.').append(digits, decExp + 1, DIGITS - decExp - 1);
        }
    }

    private static void scientific(StringBuilder out, char[] digits, int decExp) {
        out.append(digits[0]).append('.').append(digits, 1, DIGITS - 1).append('e').append(decExp < 0 ? '-' : '+');
        int a = Math.abs(decExp);
        if (a < 10) {
            out.append('0');
        }
        out.append(a);
    }
}
