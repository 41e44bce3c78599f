package org.branchsim.core.scenario;

import java.util.ArrayList;
import java.util.List;

/**
 * Fields of one object that are alternatives: a value given in one of several ways (an opening as a
 * {@code diameter} or an {@code area}; a valve's {@code setting} or its spring {@code preload}; a viscosity as
 * an ISO grade, a fixed value, or two points). Each alternative is a group of fields written together; at most
 * one alternative may be written, and a required choice needs exactly one. The fields of an alternative that
 * are {@link FieldSpec#isRequired() required} are required when that alternative is the one written.
 *
 * @param alternatives the groups of field names, in the order the reference lists them
 * @param required true when one alternative must be written; false when none may be (its fields' defaults
 *        then apply, those of the first alternative)
 * @param manyAt the field a "too many" problem is reported at
 * @param manyExpected what a "too many" problem says was expected
 * @param noneAt the field a "none" problem is reported at (required choices)
 * @param noneExpected what a "none" problem says was expected (required choices)
 */
public record Choice(List<List<String>> alternatives, boolean required, String manyAt, String manyExpected,
                     String noneAt, String noneExpected) {

    /** Copies the groups. */
    public Choice {
        List<List<String>> copy = new ArrayList<>();
        for (List<String> a : alternatives) {
            copy.add(List.copyOf(a));
        }
        alternatives = List.copyOf(copy);
    }

    /**
     * @param at the field both problems are reported at
     * @param expected what both problems say was expected
     * @param alternatives the groups of field names
     * @return a choice where exactly one alternative must be written
     */
    public static Choice exactlyOne(String at, String expected, List<List<String>> alternatives) {
        return new Choice(alternatives, true, at, expected, at, expected);
    }

    /** @return true when the field belongs to one of the alternatives */
    public boolean covers(String field) {
        return alternatives.stream().anyMatch(a -> a.contains(field));
    }

    /** @return every field of every alternative, in order */
    public List<String> fields() {
        List<String> out = new ArrayList<>();
        alternatives.forEach(out::addAll);
        return out;
    }

    /** @return what a "too many" problem found, e.g. "both" or "3 ways" */
    public String manyFound(int written) {
        return written == 2 && alternatives.size() == 2 ? "both" : written + " ways";
    }
}
