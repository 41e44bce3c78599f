package org.branchsim.core.units;

import java.util.EnumMap;
import java.util.Map;

/**
 * The unit system results are written in, named in a scenario as {@code "metric"} (the units a metric shop floor
 * reads: bar, L/min, mm, kW; not strictly SI) or {@code "us"} (US customary: psi, gal/min, in, hp). Internally
 * everything stays SI.
 */
public enum UnitSystem {
    /** Metric units of the trade: bar, L/min, mm, N, kW. */
    METRIC,
    /** US customary units: psi, gal/min, in, lbf, hp. */
    US;

    private static final Map<Dimension, String> SI_DISPLAY = new EnumMap<>(Dimension.class);
    private static final Map<Dimension, String> US_DISPLAY = new EnumMap<>(Dimension.class);

    static {
        SI_DISPLAY.put(Dimension.PRESSURE, "bar");
        SI_DISPLAY.put(Dimension.VOLUME_FLOW, "L/min");
        SI_DISPLAY.put(Dimension.LENGTH, "mm");
        SI_DISPLAY.put(Dimension.AREA, "mm^2");
        SI_DISPLAY.put(Dimension.VOLUME, "cm^3");
        SI_DISPLAY.put(Dimension.VELOCITY, "m/s");
        SI_DISPLAY.put(Dimension.FORCE, "N");
        SI_DISPLAY.put(Dimension.ROTATIONAL_SPEED, "rpm");
        SI_DISPLAY.put(Dimension.TORQUE, "N*m");
        SI_DISPLAY.put(Dimension.POWER, "kW");
        SI_DISPLAY.put(Dimension.ENERGY, "kJ");
        SI_DISPLAY.put(Dimension.TEMPERATURE, "degC");
        SI_DISPLAY.put(Dimension.TIME, "s");

        US_DISPLAY.put(Dimension.PRESSURE, "psi");
        US_DISPLAY.put(Dimension.VOLUME_FLOW, "gal/min");
        US_DISPLAY.put(Dimension.LENGTH, "in");
        US_DISPLAY.put(Dimension.AREA, "in^2");
        US_DISPLAY.put(Dimension.VOLUME, "in^3");
        US_DISPLAY.put(Dimension.VELOCITY, "in/s");
        US_DISPLAY.put(Dimension.FORCE, "lbf");
        US_DISPLAY.put(Dimension.ROTATIONAL_SPEED, "rpm");
        US_DISPLAY.put(Dimension.TORQUE, "lbf*in");
        US_DISPLAY.put(Dimension.POWER, "hp");
        US_DISPLAY.put(Dimension.ENERGY, "ft*lbf");
        US_DISPLAY.put(Dimension.TEMPERATURE, "degF");
        US_DISPLAY.put(Dimension.TIME, "s");
    }

    /** @return the name a scenario uses for this unit system: "metric" or "us" */
    public String scenarioName() {
        return this == METRIC ? "metric" : "us";
    }

    /** @return the unit a value of this dimension is displayed in (SI unit when no display unit is set) */
    public Unit displayUnit(Dimension dimension) {
        String symbol = (this == METRIC ? SI_DISPLAY : US_DISPLAY).get(dimension);
        if (symbol == null) {
            return new Unit(dimension.siSymbol(), dimension, 1.0, 0.0);
        }
        return Units.require(symbol);
    }
}
