package org.branchsim.cli;

import java.util.Locale;

/**
 * Writes a double with 7 significant digits exactly as {@code String.format(Locale.ROOT, "%.7g", v)} does (the
 * {@code %g} conversion of {@link java.util.Formatter}: the decimal digits of the double rounded half-up to 7
 * digits; plain notation when the rounded value is at least 1e-4 and below 1e7, otherwise {@code d.dddddde+XX}),
 * and zero (of either sign) as {@code 0}, without the formatter's per-call parsing. The digits come from
 * {@link Double#toString(double)}; when the digits after the seventh lie so near a half that another correct
 * digit generator could round the other way, the formatter itself is asked, so the text is always the
 * formatter's. Unitless: the caller converts to the display unit first.
 */
final class SignificantDigits {

    /** Significant digits written. */
    static final int DIGITS = 7;

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
        String s = Double.toString(v);
        char[] digits = new char[DIGITS];
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
            out.append(String.format(Locale.ROOT, "%.7g", v));
            return;
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
        if (first == 1) {
            out.append('-');
        }
        if (decExp >= -4 && decExp < DIGITS) {
            plain(out, digits, decExp);
        } else {
            scientific(out, digits, decExp);
        }
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
