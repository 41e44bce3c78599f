package org.branchsim.core.scenario;

import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Set;
import org.branchsim.core.units.Dimension;
import org.branchsim.core.units.Quantity;
import org.branchsim.core.units.UnitSystem;
import org.branchsim.core.units.Units;

/**
 * Reads the fields of one scenario object, checking each value and recording a {@link Problem} with file,
 * line, column and field path for anything wrong. Missing or wrong values read as NaN (or null) so that
 * reading can go on and report every problem of the file at once. {@link #finish()} reports unknown keys.
 */
final class Fields {
    private final Located.Obj obj;
    private final String path;
    private final Problems problems;
    private final Set<String> known = new LinkedHashSet<>();

    Fields(Located.Obj obj, String path, Problems problems) {
        this.obj = obj;
        this.path = path;
        this.problems = problems;
    }

    /**
     * @return Fields over {@code value} when it is an object; otherwise records a problem and returns Fields
     *         over an empty object
     */
    static Fields of(Located value, String path, Problems problems) {
        if (value instanceof Located.Obj o) {
            return new Fields(o, path, problems);
        }
        problems.add(value, path, "an object { ... }", value == null ? "nothing" : value.describe());
        return new Fields(new Located.Obj(value == null ? 0 : value.line(), value == null ? 0 : value.column()),
                path, problems);
    }

    String path() {
        return path;
    }

    /** Records a note about a field that does not stop the scenario (an old spelling still accepted). */
    void note(String key, String text) {
        problems.note(raw(key), path(key), text);
    }

    String path(String key) {
        return path.isEmpty() ? key : path + "." + key;
    }

    Located.Obj node() {
        return obj;
    }

    Problems problems() {
        return problems;
    }

    boolean has(String key) {
        known.add(key);
        return obj.get(key) != null;
    }

    Located raw(String key) {
        known.add(key);
        return obj.get(key);
    }

    private void missing(String key, String expected) {
        problems.add(obj, path(key), expected, "no \"" + key + "\" field");
    }

    /** Which values of a field are allowed besides its bounds. */
    private enum Sign {
        ANY, POSITIVE, NON_NEGATIVE
    }

    /** A dimensioned value that must be present. */
    double quantity(String key, Dimension d) {
        return required(key, d, Sign.ANY);
    }

    /** A dimensioned value with a default (SI) when absent. */
    double quantity(String key, Dimension d, double defaultSi) {
        return has(key) ? quantity(key, d) : defaultSi;
    }

    /** A dimensioned value that must be above zero. */
    double positive(String key, Dimension d) {
        return required(key, d, Sign.POSITIVE);
    }

    /** A dimensioned value above zero, with a default (SI) when absent. */
    double positive(String key, Dimension d, double defaultSi) {
        return has(key) ? positive(key, d) : defaultSi;
    }

    /** A dimensioned value at or above zero that must be present. */
    double nonNegative(String key, Dimension d) {
        return required(key, d, Sign.NON_NEGATIVE);
    }

    /** A dimensioned value at or above zero, with a default (SI) when absent. */
    double nonNegative(String key, Dimension d, double defaultSi) {
        return has(key) ? nonNegative(key, d) : defaultSi;
    }

    private double required(String key, Dimension d, Sign sign) {
        Located v = raw(key);
        if (v == null) {
            missing(key, "a " + d.humanName() + " such as \"" + example(d, problems.units()) + "\"");
            return Double.NaN;
        }
        return checked(v, path(key), key, d, sign, problems);
    }

    /** A plain number (dimensionless) within [min, max], with a default. */
    double number(String key, double min, double max, double defaultValue) {
        Located v = raw(key);
        if (v == null) {
            return defaultValue;
        }
        Quantity.Parsed p = parse(v, path(key), Dimension.DIMENSIONLESS, problems);
        if (p == null) {
            return Double.NaN;
        }
        if (p.lowSi() < min || p.highSi() > max || p.si() < min || p.si() > max) {
            problems.add(v, path(key), "a number from " + Units.plain(min) + " to " + Units.plain(max)
                    + (p.lowSi() != p.highSi() ? " over the whole tolerance band" : ""), v.describe());
            return Double.NaN;
        }
        return p.si();
    }

    /** A text value that must be present. */
    String text(String key) {
        Located v = raw(key);
        if (v == null) {
            missing(key, "a text value");
            return null;
        }
        if (v instanceof Located.Scalar s && s.isText()) {
            return (String) s.value();
        }
        problems.add(v, path(key), "a text value in quotes", v.describe());
        return null;
    }

    /** A text value with a default. */
    String text(String key, String defaultValue) {
        return has(key) ? text(key) : defaultValue;
    }

    /** A boolean with a default. */
    boolean flag(String key, boolean defaultValue) {
        Located v = raw(key);
        if (v == null) {
            return defaultValue;
        }
        if (v instanceof Located.Scalar s && s.value() instanceof Boolean b) {
            return b;
        }
        problems.add(v, path(key), "true or false", v.describe());
        return defaultValue;
    }

    /** A nested object, or null when absent. */
    Fields object(String key) {
        Located v = raw(key);
        if (v == null) {
            return null;
        }
        return of(v, path(key), problems);
    }

    /** A nested list; empty when absent. */
    List<Located> list(String key) {
        Located v = raw(key);
        if (v == null) {
            return List.of();
        }
        if (v instanceof Located.Arr a) {
            return a.items();
        }
        problems.add(v, path(key), "a list [ ... ]", v.describe());
        return List.of();
    }

    /** Records one problem against a key. */
    void problem(String key, String expected, String found) {
        Located v = obj.get(key);
        problems.add(v == null ? obj : v, path(key), expected, found);
    }

    /** Reports keys that were never asked for. */
    void finish() {
        for (String key : obj.keys()) {
            if (!known.contains(key)) {
                int[] at = obj.keyLocation(key);
                problems.addAt(at[0], at[1], path(key), "one of the fields " + String.join(", ", new ArrayList<>(known)),
                        "unknown field \"" + key + "\"");
            }
        }
    }

    /**
     * Parses a dimensioned value at a location and checks it against the bounds of its dimension (see
     * {@link FieldBounds}); records a problem and returns NaN when it is not acceptable.
     */
    static double parseQuantity(Located v, String path, Dimension d, Problems problems) {
        String field = path.substring(path.lastIndexOf('.') + 1);
        return checked(v, path, field, d, Sign.ANY, problems);
    }

    private static double checked(Located v, String path, String field, Dimension d, Sign sign, Problems problems) {
        Quantity.Parsed p = parse(v, path, d, problems);
        if (p == null) {
            return Double.NaN;
        }
        String band = p.lowSi() != p.highSi() ? " over the whole tolerance band" : "";
        if (sign == Sign.POSITIVE && p.lowSi() <= 0.0) {
            problems.add(v, path, "a value greater than zero" + band, v.describe());
            return Double.NaN;
        }
        if (sign == Sign.NON_NEGATIVE && p.lowSi() < 0.0) {
            problems.add(v, path, "a value of zero or more" + band, v.describe());
            return Double.NaN;
        }
        FieldBounds.Range range = FieldBounds.of(field, d);
        if (range != null && (!range.allows(p.lowSi()) || !range.allows(p.highSi()) || !range.allows(p.si()))) {
            problems.add(v, path, range.expected() + band, v.describe());
            return Double.NaN;
        }
        return p.si();
    }

    /** @return the parsed value, or null after recording a problem */
    private static Quantity.Parsed parse(Located v, String path, Dimension d, Problems problems) {
        if (v instanceof Located.Scalar s) {
            if (s.isNumber()) {
                double x = ((Number) s.value()).doubleValue();
                if (d != Dimension.DIMENSIONLESS) {
                    problems.add(v, path, "a " + d.humanName() + " with its unit, such as \"" + example(d, problems.units()) + "\"",
                            v.describe() + " (a number without unit)");
                    return null;
                }
                if (!Double.isFinite(x)) {
                    problems.add(v, path, "a finite number", v.describe());
                    return null;
                }
                return new Quantity.Parsed(x, null, null);
            }
            if (s.isText()) {
                Quantity.Parsed p = Quantity.parse((String) s.value(), d, problems.units());
                if (p.ok()) {
                    return p;
                }
                problems.add(v, path, p.error(), v.describe());
                return null;
            }
        }
        problems.add(v, path, d == Dimension.DIMENSIONLESS ? "a number"
                : "a " + d.humanName() + " such as \"" + example(d, problems.units()) + "\"", v.describe());
        return null;
    }

    /** @return an example value of a dimension in the display unit of the scenario's unit system, e.g. "1 bar" */
    static String example(Dimension d, UnitSystem system) {
        return "1 " + system.displayUnit(d).symbol();
    }

    /** @return a number for messages */
    static String format(double v) {
        return Units.plain(v);
    }
}
