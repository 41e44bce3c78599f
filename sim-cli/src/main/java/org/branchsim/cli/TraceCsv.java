package org.branchsim.cli;

import java.util.Locale;
import org.branchsim.core.results.Trace;
import org.branchsim.core.units.Unit;
import org.branchsim.core.units.UnitSystem;

/**
 * Writes a trace as CSV: first column {@code t [s]}, then one column per signal headed
 * {@code <name> [<unit>]} in the chosen unit system. Numbers use 7 significant digits and '.' decimals.
 */
public final class TraceCsv {

    private TraceCsv() {
    }

    /** @return the CSV text */
    public static String format(Trace trace, UnitSystem units) {
        int n = trace.columns().size();
        Unit[] unit = new Unit[n];
        StringBuilder sb = new StringBuilder("t [s]");
        for (int i = 0; i < n; i++) {
            Trace.Column c = trace.columns().get(i);
            unit[i] = units.displayUnit(c.dimension());
            sb.append(',').append(c.name()).append(" [").append(unit[i].symbol()).append(']');
        }
        sb.append('\n');
        for (int k = 0; k < trace.size(); k++) {
            sb.append(number(trace.time(k)));
            for (int i = 0; i < n; i++) {
                sb.append(',').append(number(unit[i].fromSi(trace.value(k, i))));
            }
            sb.append('\n');
        }
        return sb.toString();
    }

    static String number(double v) {
        if (v == 0.0) {
            return "0";
        }
        return String.format(Locale.ROOT, "%.7g", v);
    }
}
