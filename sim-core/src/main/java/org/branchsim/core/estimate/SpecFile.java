package org.branchsim.core.estimate;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.branchsim.core.error.BranchsimException;
import org.branchsim.core.error.ErrorKey;
import org.branchsim.core.scenario.DocumentParser;
import org.branchsim.core.scenario.Located;
import org.branchsim.core.units.Quantity;
import org.branchsim.core.units.Unit;
import org.branchsim.core.units.Units;

/**
 * A specification for {@code tune}, in the scenario's style (JSON, or YAML by extension; format in
 * docs/spec-format.md): the reducing valve it concerns, the requirements (metric, "max" or "min" limit with unit,
 * optional weight), the free parameters with bounds, and optional tolerances for a robust check of the best design.
 *
 * @param valve id of the reducing valve
 * @param specs the requirements
 * @param free the free parameters (bounds in the unit written for "low")
 * @param tolerances tolerance text per path for the check of the best design (e.g. "0.02 mm" or "10 %")
 * @param toleranceRuns runs of that check (0 when there are no tolerances)
 * @param toleranceSeed seed of its draws
 */
public record SpecFile(String valve, List<Spec> specs, List<FreeParameter> free, Map<String, String> tolerances,
                       int toleranceRuns, long toleranceSeed) {

    /** Most runs of the tolerance check. */
    public static final int MAX_TOLERANCE_RUNS = 10_000;

    /**
     * @param fileName name for messages
     * @param text the file's text
     * @return the specification
     * @throws BranchsimException SPEC_INVALID, located, for any mistake
     */
    public static SpecFile read(String fileName, String text) {
        Located root = DocumentParser.parse(fileName, text, DocumentParser.isYaml(fileName));
        Located.Obj o = obj(fileName, root, "(document)");
        for (String k : o.keys()) {
            if (!List.of("formatVersion", "description", "valve", "specs", "free", "tolerances").contains(k)) {
                int[] at = o.keyLocation(k);
                throw new BranchsimException(ErrorKey.SPEC_INVALID, fileName, at[0], at[1], k,
                        "one of formatVersion, description, valve, specs, free, tolerances", "\"" + k + "\"");
            }
        }
        String valve = text(fileName, o, "valve", true);
        List<Spec> specs = new ArrayList<>();
        for (Located item : arr(fileName, o, "specs").items()) {
            specs.add(spec(fileName, obj(fileName, item, "specs item")));
        }
        List<FreeParameter> free = new ArrayList<>();
        for (Located item : arr(fileName, o, "free").items()) {
            free.add(free(fileName, obj(fileName, item, "free item")));
        }
        Map<String, String> tol = new LinkedHashMap<>();
        int runs = 0;
        long seed = 1;
        if (o.get("tolerances") != null) {
            Located.Obj t = obj(fileName, o.get("tolerances"), "tolerances");
            runs = (int) number(fileName, t, "runs", 1, MAX_TOLERANCE_RUNS);
            seed = t.get("seed") == null ? 1 : (long) number(fileName, t, "seed", 0, Long.MAX_VALUE);
            Located.Obj values = obj(fileName, t.get("values"), "tolerances.values");
            for (String path : values.keys()) {
                tol.put(path, text(fileName, values, path, true));
            }
        }
        if (specs.isEmpty() || free.isEmpty()) {
            throw new BranchsimException(ErrorKey.SPEC_INVALID, fileName, root.line(), root.column(),
                    specs.isEmpty() ? "specs" : "free", "at least one item", "none");
        }
        return new SpecFile(valve, specs, free, tol, runs, seed);
    }

    private static Spec spec(String file, Located.Obj o) {
        String name = text(file, o, "metric", true);
        SpecMetric metric = SpecMetric.find(name);
        if (metric == null) {
            Located at = o.get("metric");
            throw new BranchsimException(ErrorKey.SPEC_INVALID, file, at.line(), at.column(), "metric",
                    "overshoot, deviation, settlingTime, peak, drainFlow or dampingRatio", "\"" + name + "\"");
        }
        boolean max = o.get("max") != null;
        if (max == (o.get("min") != null)) {
            throw new BranchsimException(ErrorKey.SPEC_INVALID, file, o.line(), o.column(), metric.key(),
                    "exactly one of \"max\" and \"min\"", max ? "both" : "neither");
        }
        String key = max ? "max" : "min";
        String written = text(file, o, key, true);
        Located at = o.get(key);
        double limit;
        if (metric.plainNumber()) {
            limit = parse(written.strip());
            if (!(limit > -1.0 && limit < 1.0)) {
                throw new BranchsimException(ErrorKey.SPEC_INVALID, file, at.line(), at.column(), metric.key() + "." + key,
                        "a damping ratio, a plain number between -1 and 1 such as \"0.1\"", "\"" + written + "\"");
            }
        } else if (metric.dimension() == null) {
            String s = written.strip();
            limit = s.endsWith("%") ? parse(s.substring(0, s.length() - 1)) : Double.NaN;
            if (Double.isNaN(limit)) {
                throw new BranchsimException(ErrorKey.SPEC_INVALID, file, at.line(), at.column(), metric.key() + "." + key,
                        "a percentage of the setting such as \"15 %\"", "\"" + written + "\"");
            }
        } else {
            Quantity.Parsed q = Quantity.parse(written, metric.dimension());
            if (!q.ok()) {
                throw new BranchsimException(ErrorKey.SPEC_INVALID, file, at.line(), at.column(), metric.key() + "." + key,
                        "a " + metric.dimension().humanName() + " with its unit (" + Units.examplesOf(metric.dimension())
                                + ")", "\"" + written + "\"");
            }
            limit = q.si();
        }
        double weight = o.get("weight") == null ? 1.0 : number(file, o, "weight", Double.MIN_VALUE, 1e6);
        return new Spec(metric, max, limit, weight, written);
    }

    private static FreeParameter free(String file, Located.Obj o) {
        String path = text(file, o, "path", true);
        String lowText = text(file, o, "low", true);
        String highText = text(file, o, "high", true);
        double[] low = valueAndUnit(file, o.get("low"), lowText);
        double[] high = valueAndUnit(file, o.get("high"), highText);
        String unit = unitOf(lowText);
        if (!unitOf(highText).equals(unit) || !(high[0] > low[0])) {
            Located at = o.get("high");
            throw new BranchsimException(ErrorKey.SPEC_INVALID, file, at.line(), at.column(), path + ".high",
                    "a value above \"low\" in the same unit (" + (unit.isEmpty() ? "none" : unit) + ")",
                    "\"" + highText + "\"");
        }
        return new FreeParameter(path, low[0], high[0], unit, low[1]);
    }

    private static double[] valueAndUnit(String file, Located at, String text) {
        String unit = unitOf(text);
        double x = parse(text.strip().substring(0, text.strip().length() - unit.length()).strip());
        Unit u = unit.isEmpty() ? null : Units.find(unit);
        if (Double.isNaN(x) || (!unit.isEmpty() && u == null)) {
            throw new BranchsimException(ErrorKey.SPEC_INVALID, file, at.line(), at.column(), "bound",
                    "a number with the parameter's unit, e.g. \"0.4 mm\"", "\"" + text + "\"");
        }
        return new double[] {x, u == null ? 1.0 : u.factor()};
    }

    private static String unitOf(String text) {
        String s = text.strip();
        int i = 0;
        while (i < s.length() && "+-.0123456789eE".indexOf(s.charAt(i)) >= 0) {
            i++;
        }
        return s.substring(i).strip();
    }

    private static double parse(String s) {
        try {
            return Double.parseDouble(s.strip());
        } catch (NumberFormatException e) {
            return Double.NaN;
        }
    }

    private static Located.Obj obj(String file, Located l, String what) {
        if (l instanceof Located.Obj o) {
            return o;
        }
        throw new BranchsimException(ErrorKey.SPEC_INVALID, file, l == null ? 1 : l.line(), l == null ? 1 : l.column(),
                what, "an object { ... }", l == null ? "nothing" : l.describe());
    }

    private static Located.Arr arr(String file, Located.Obj o, String key) {
        Located l = o.get(key);
        if (l instanceof Located.Arr a) {
            return a;
        }
        throw new BranchsimException(ErrorKey.SPEC_INVALID, file, l == null ? o.line() : l.line(),
                l == null ? o.column() : l.column(), key, "a list [ ... ]", l == null ? "nothing" : l.describe());
    }

    private static String text(String file, Located.Obj o, String key, boolean required) {
        Located l = o.get(key);
        if (l instanceof Located.Scalar s && s.value() != null && (s.isText() || s.isNumber())) {
            return String.valueOf(s.value());
        }
        throw new BranchsimException(ErrorKey.SPEC_INVALID, file, l == null ? o.line() : l.line(),
                l == null ? o.column() : l.column(), key, "a value", l == null ? "nothing" : l.describe());
    }

    private static double number(String file, Located.Obj o, String key, double min, double max) {
        Located l = o.get(key);
        if (l instanceof Located.Scalar s && s.value() instanceof Number n && n.doubleValue() >= min
                && n.doubleValue() <= max) {
            return n.doubleValue();
        }
        throw new BranchsimException(ErrorKey.SPEC_INVALID, file, l == null ? o.line() : l.line(),
                l == null ? o.column() : l.column(), key, "a number from " + min + " to " + max,
                l == null ? "nothing" : l.describe());
    }
}
