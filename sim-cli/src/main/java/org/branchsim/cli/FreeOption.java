package org.branchsim.cli;

import java.util.ArrayList;
import java.util.List;
import org.branchsim.core.error.BranchsimException;
import org.branchsim.core.estimate.FreeParameter;
import org.branchsim.core.scenario.Located;
import org.branchsim.core.study.ParameterPath;
import org.branchsim.core.study.ValueText;
import org.branchsim.core.units.Tolerance;
import org.branchsim.core.units.Units;

/**
 * Reads {@code --free PATH[=LOW..HIGH]}: a parameter of the scenario and its bounds, in one unit. Without bounds
 * the scenario's value times {@link #DEFAULT_LOW} to times {@link #DEFAULT_HIGH} (a factor of two either way;
 * common practice, no source).
 */
final class FreeOption {

    static final double DEFAULT_LOW = 0.5;
    static final double DEFAULT_HIGH = 2.0;

    private FreeOption() {
    }

    static List<FreeParameter> parse(List<String> texts, Located document) {
        List<FreeParameter> out = new ArrayList<>();
        for (String text : texts) {
            int eq = text.indexOf('=');
            String path = (eq < 0 ? text : text.substring(0, eq)).trim();
            for (FreeParameter f : out) {
                if (f.path().equals(path)) {
                    throw OptionChecks.repeated("--free", "parameter", "\"" + path + "\" twice");
                }
            }
            ParameterPath pp;
            try {
                pp = ParameterPath.parse(path);
                pp.target(document);
            } catch (BranchsimException e) {
                throw e.within("--free");
            }
            Object current = pp.exists(document) && pp.find(document) instanceof Located.Scalar s ? s.value() : null;
            Tolerance bounds;
            if (eq >= 0) {
                try {
                    bounds = Tolerance.parse(text.substring(eq + 1).trim());
                } catch (IllegalArgumentException e) {
                    bounds = null;
                }
                if (bounds == null || !(bounds.high() > bounds.low())) {
                    throw OptionChecks.unreadable("--free", "PATH=LOW..HIGH with one unit, e.g. "
                            + "\"elements.reducer.dampingOrifice.diameter=0.4 mm..1.2 mm\"", "\"" + text + "\"");
                }
            } else {
                if (current == null || ValueText.dimensionOf(current) == null) {
                    throw OptionChecks.unreadable("--free", "bounds PATH=LOW..HIGH for a value the scenario does not "
                            + "write as a number", "\"" + text + "\"");
                }
                Object lo = ValueText.scale(current, DEFAULT_LOW);
                Object hi = ValueText.scale(current, DEFAULT_HIGH);
                bounds = Tolerance.parse(lo + " .. " + hi);
                if (bounds == null || !(bounds.high() > bounds.low())) {
                    throw OptionChecks.unreadable("--free", "a positive value to take half and double of as bounds "
                            + "(or bounds PATH=LOW..HIGH)", "\"" + current + "\"");
                }
            }
            String unit = bounds.unit();
            double factor = unit.isEmpty() ? 1.0 : Units.find(unit) == null ? Double.NaN : Units.find(unit).factor();
            if (Double.isNaN(factor)) {
                throw OptionChecks.unreadable("--free", "bounds in a known unit", "\"" + text + "\"");
            }
            out.add(new FreeParameter(path, bounds.low(), bounds.high(), unit, factor));
        }
        return out;
    }

    /** @return the scenario's value of a free parameter in the parameter's unit, or NaN when it is not written */
    static double current(FreeParameter f, Located document) {
        ParameterPath pp = ParameterPath.parse(f.path());
        if (!pp.exists(document) || !(pp.find(document) instanceof Located.Scalar s)) {
            return Double.NaN;
        }
        Object v = s.value();
        if (v instanceof Number n) {
            return n.doubleValue();
        }
        Tolerance t;
        try {
            t = Tolerance.parse(String.valueOf(v) + " .. " + v);
        } catch (IllegalArgumentException e) {
            return Double.NaN;
        }
        if (t == null || !t.unit().equals(f.unit())) {
            return Double.NaN;
        }
        return t.low();
    }
}
