package org.branchsim.core.scenario;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import org.branchsim.core.units.Dimension;
import org.branchsim.core.units.Units;

/**
 * Regular expressions (valid in Java and in ECMA-262, as JSON Schema asks) for the texts a dimensioned field
 * accepts: a number, then one of the unit spellings of the field's dimension as the reader accepts them
 * (products written {@code N*s/m}, {@code N s/m} or {@code N·s/m}, powers {@code m^3}, {@code m3} or
 * {@code m³}, spellings marked "any case" in any case), optionally with a tolerance ({@code ± 0.02 mm},
 * {@code ± 10 %}) or as a range ({@code 1.2 GPa .. 1.6 GPa}). A bare number matches only for dimensionless
 * fields. The reader stays the judge of the value itself (bounds, a tolerance's unit).
 */
public final class ValuePatterns {

    private static final String NUMBER = "[-+]?(?:\\d+\\.?\\d*|\\.\\d+)(?:[eE][-+]?\\d+)?";
    private static final String PRODUCT = "(?:\\s*[*\u00b7\u22c5]\\s*|\\s+)";
    private static final String METACHARACTERS = "\\^$.|?*+()[]{}";

    private ValuePatterns() {
    }

    /** @return the pattern of a whole value of the dimension, anchored at both ends */
    public static String of(Dimension dimension) {
        String unit = unit(dimension);
        if (dimension == Dimension.DIMENSIONLESS) {
            unit = "(?:" + unit + ")?";
        }
        return "^\\s*" + NUMBER + unit
                + "(?:\\s*(?:\u00b1|\\+/-|\\+-)\\s*" + NUMBER + "(?:" + unit + "|\\s*%)"
                + "|\\s*\\.\\.\\s*" + NUMBER + unit + ")?\\s*$";
    }

    /**
     * @return the unit after a number: any spelling of the dimension, after optional spaces; a spelling that
     *         starts with a digit ("1/min") only after a space, as the reader takes the digit for the number's
     */
    static String unit(Dimension dimension) {
        List<Units.Spelling> spellings = new ArrayList<>(Units.spellingsOf(dimension));
        spellings.sort(Comparator.comparingInt((Units.Spelling s) -> s.text().length()).reversed());
        List<String> glued = new ArrayList<>();
        List<String> spaced = new ArrayList<>();
        for (Units.Spelling s : spellings) {
            (Character.isDigit(s.text().charAt(0)) ? spaced : glued).add(spelling(s.text(), s.anyCase()));
        }
        String out = "\\s*(?:" + String.join("|", glued) + ")";
        if (!spaced.isEmpty()) {
            out = "(?:" + out + "|\\s+(?:" + String.join("|", spaced) + "))";
        }
        return out;
    }

    /** @return the pattern of one spelling with the variants the reader's normalisation accepts */
    static String spelling(String text, boolean anyCase) {
        boolean temperature = text.matches("(?i)(deg|\u00b0)[cf]");
        StringBuilder sb = new StringBuilder();
        for (int i = 0; i < text.length(); i++) {
            char c = text.charAt(i);
            if (temperature && i == text.length() - 1) {
                sb.append("\\s*");
            }
            if (c == '*') {
                sb.append(PRODUCT);
            } else if (c == '/') {
                sb.append("\\s*/\\s*");
            } else if (c == '^' && i + 1 < text.length() && (text.charAt(i + 1) == '2' || text.charAt(i + 1) == '3')) {
                char p = text.charAt(++i);
                sb.append("(?:\\^").append(p).append('|').append(p).append('|').append(p == '2' ? '\u00b2' : '\u00b3')
                        .append(')');
            } else if (anyCase && Character.isLetter(c) && Character.toLowerCase(c) != Character.toUpperCase(c)) {
                sb.append('[').append(Character.toLowerCase(c)).append(Character.toUpperCase(c)).append(']');
            } else if (METACHARACTERS.indexOf(c) >= 0) {
                sb.append('\\').append(c);
            } else {
                sb.append(c);
            }
        }
        return sb.toString();
    }

    /** @return a pattern matching the words in any case, anchored */
    static String anyCase(List<String> words) {
        List<String> alternatives = new ArrayList<>();
        for (String w : words) {
            alternatives.add(spelling(w, true));
        }
        return "^(?:" + String.join("|", alternatives) + ")$";
    }
}
