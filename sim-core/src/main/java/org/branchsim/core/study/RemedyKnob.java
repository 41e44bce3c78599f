package org.branchsim.core.study;

import java.util.Locale;
import org.branchsim.core.units.Dimension;
import org.branchsim.core.units.Unit;
import org.branchsim.core.units.UnitSystem;
import org.branchsim.core.units.Units;

/**
 * A parameter a remedy may change, how far it may go in each direction, and what a change means on hardware.
 * Values are SI. A parameter whose current value is zero (a damping left at its default) has no ratio to scale, so
 * it is searched over an absolute range instead.
 *
 * @param part the member or node the knob acts on, e.g. {@code reducer.pilot} or {@code branch}
 * @param path the scenario parameter path, e.g. {@code elements.reducer.pilot.damping}
 * @param dimension the parameter's dimension
 * @param current its current value, SI
 * @param lowest the smallest value searched, SI
 * @param highest the largest value searched, SI
 * @param metricUnit symbol used to write a new value in a metric scenario
 * @param usUnit symbol used in a US customary scenario
 * @param raiseWords what raising it means on hardware; {@code %s} stands for the new value with its unit
 * @param lowerWords what lowering it means on hardware; {@code %s} stands for the new value with its unit
 */
public record RemedyKnob(String part, String path, Dimension dimension, double current, double lowest,
                         double highest, String metricUnit, String usUnit, String raiseWords, String lowerWords) {

    /** @return the unit new values are written in for this unit system */
    public Unit unit(UnitSystem units) {
        return Units.require(units == UnitSystem.US ? usUnit : metricUnit);
    }

    /**
     * @param si a value, SI
     * @param units the scenario's unit system
     * @return the value as a scenario writes it, e.g. "0.45 mm", rounded to 3 significant digits
     */
    public String text(double si, UnitSystem units) {
        Unit u = unit(units);
        return ValueText.format(roundTo3(u.fromSi(si))) + " " + u.symbol();
    }

    /**
     * @param si a value, SI
     * @param units the scenario's unit system
     * @return the value as a scenario writes it, to six significant digits (for searches)
     */
    public String exactText(double si, UnitSystem units) {
        Unit u = unit(units);
        return ValueText.format(u.fromSi(si)) + " " + u.symbol();
    }

    /**
     * @param si the new value, SI
     * @param units the scenario's unit system
     * @return the change in words of the trade, e.g. "a smaller drilled damping orifice of 0.45 mm"
     */
    public String hardware(double si, UnitSystem units) {
        return String.format(Locale.ROOT, si >= current ? raiseWords : lowerWords, text(si, units));
    }

    /** @return true when the search is over an absolute range because the current value is zero */
    public boolean absolute() {
        return current == 0.0;
    }

    static double roundTo3(double x) {
        if (x == 0.0 || !Double.isFinite(x)) {
            return x;
        }
        return new java.math.BigDecimal(x).round(new java.math.MathContext(3)).doubleValue();
    }
}
