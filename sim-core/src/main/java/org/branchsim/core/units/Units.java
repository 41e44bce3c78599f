package org.branchsim.core.units;

import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.stream.Collectors;

/**
 * The table of unit symbols branchsim accepts. Factors are exact where NIST SP 811 (2008), Appendix B,
 * gives them exactly: in = 0.0254 m, lb = 0.45359237 kg, standard gravity 9.80665 m/s^2, US gallon =
 * 231 in^3, bar = 1e5 Pa.
 */
public final class Units {

    /** Standard acceleration of free fall, m/s^2 (exact, NIST SP 811). */
    public static final double STANDARD_GRAVITY = 9.80665;
    /** International inch, m (exact). */
    public static final double INCH = 0.0254;
    /** Avoirdupois pound, kg (exact). */
    public static final double POUND_MASS = 0.45359237;
    /** Pound-force, N (exact: lb times standard gravity). */
    public static final double POUND_FORCE = POUND_MASS * STANDARD_GRAVITY;
    /** Pound-force per square inch, Pa. */
    public static final double PSI = POUND_FORCE / (INCH * INCH);
    /** US liquid gallon, m^3 (exact: 231 in^3). */
    public static final double US_GALLON = 231.0 * INCH * INCH * INCH;
    /** Standard atmosphere, Pa (exact). */
    public static final double ATMOSPHERE = 101_325.0;

    private static final double LITRE = 1e-3;
    private static final double MINUTE = 60.0;
    private static final double REVOLUTION = 2.0 * Math.PI;
    private static final double FOOT = 12.0 * INCH;

    private static final Map<String, Unit> BY_SYMBOL = new LinkedHashMap<>();

    static {
        Dimension d = Dimension.PRESSURE;
        add(d, 1.0, "Pa");
        add(d, 1e3, "kPa");
        add(d, 1e6, "MPa");
        add(d, 1e9, "GPa");
        add(d, 1e5, "bar");
        add(d, 1e2, "mbar");
        add(d, PSI, "psi");
        add(d, 1e3 * PSI, "ksi");

        d = Dimension.VOLUME_FLOW;
        add(d, 1.0, "m^3/s");
        add(d, LITRE / MINUTE, "L/min", "l/min", "lpm");
        add(d, LITRE, "L/s", "l/s");
        add(d, 1e-6, "cm^3/s", "mL/s");
        add(d, 1e-6 / MINUTE, "cm^3/min", "mL/min");
        add(d, 1e-3 / 3600.0, "m^3/h");
        add(d, US_GALLON / MINUTE, "gal/min", "gpm");
        add(d, INCH * INCH * INCH, "in^3/s");

        d = Dimension.LENGTH;
        add(d, 1.0, "m");
        add(d, 1e-2, "cm");
        add(d, 1e-3, "mm");
        add(d, 1e-6, "um", "\u00b5m", "\u03bcm");
        add(d, INCH, "in");
        add(d, FOOT, "ft");

        d = Dimension.AREA;
        add(d, 1.0, "m^2");
        add(d, 1e-4, "cm^2");
        add(d, 1e-6, "mm^2");
        add(d, INCH * INCH, "in^2");

        d = Dimension.VOLUME;
        add(d, 1.0, "m^3");
        add(d, LITRE, "L", "l");
        add(d, 1e-6, "cm^3", "mL", "ml", "cc");
        add(d, 1e-9, "mm^3");
        add(d, INCH * INCH * INCH, "in^3");
        add(d, US_GALLON, "gal");

        d = Dimension.DISPLACEMENT;
        add(d, 1.0, "m^3/rad");
        add(d, 1e-6 / REVOLUTION, "cm^3/rev", "mL/rev", "cc/rev");
        add(d, INCH * INCH * INCH / REVOLUTION, "in^3/rev");

        d = Dimension.ROTATIONAL_SPEED;
        add(d, 1.0, "rad/s");
        add(d, REVOLUTION / MINUTE, "rpm", "rev/min", "1/min");
        add(d, REVOLUTION, "rev/s");

        d = Dimension.MASS;
        add(d, 1.0, "kg");
        add(d, 1e-3, "g");
        add(d, 1e3, "t");
        add(d, POUND_MASS, "lb");

        d = Dimension.TIME;
        add(d, 1.0, "s");
        add(d, 1e-3, "ms");
        add(d, 1e-6, "us");
        add(d, MINUTE, "min");
        add(d, 3600.0, "h");

        d = Dimension.FORCE;
        add(d, 1.0, "N");
        add(d, 1e3, "kN");
        add(d, POUND_FORCE, "lbf");

        d = Dimension.STIFFNESS;
        add(d, 1.0, "N/m");
        add(d, 1e3, "N/mm", "kN/m");
        add(d, 1e6, "kN/mm");
        add(d, POUND_FORCE / INCH, "lbf/in");

        d = Dimension.DAMPING;
        add(d, 1.0, "N*s/m");
        add(d, 1e3, "N*s/mm", "kN*s/m");
        add(d, POUND_FORCE / INCH, "lbf*s/in");

        addTemperature("K", 1.0, 0.0);
        addTemperature("degC", 1.0, 273.15);
        addTemperature("degF", 5.0 / 9.0, 273.15 - 32.0 * 5.0 / 9.0);

        d = Dimension.KINEMATIC_VISCOSITY;
        add(d, 1.0, "m^2/s");
        add(d, 1e-6, "cSt", "mm^2/s");

        d = Dimension.DYNAMIC_VISCOSITY;
        add(d, 1.0, "Pa*s");
        add(d, 1e-3, "mPa*s", "cP");

        d = Dimension.DENSITY;
        add(d, 1.0, "kg/m^3");
        add(d, 1e3, "g/cm^3", "kg/L");
        add(d, POUND_MASS / (FOOT * FOOT * FOOT), "lb/ft^3");

        d = Dimension.TORQUE;
        add(d, 1.0, "N*m", "Nm");
        add(d, POUND_FORCE * INCH, "lbf*in");
        add(d, POUND_FORCE * FOOT, "lbf*ft");

        d = Dimension.ROTATIONAL_INERTIA;
        add(d, 1.0, "kg*m^2");
        add(d, 1e-4, "kg*cm^2");

        d = Dimension.ROTARY_DAMPING;
        add(d, 1.0, "N*m*s/rad");
        add(d, 1.0 / REVOLUTION * MINUTE, "N*m/rpm");

        d = Dimension.ANGLE;
        add(d, 1.0, "rad");
        add(d, Math.PI / 180.0, "deg");

        d = Dimension.VELOCITY;
        add(d, 1.0, "m/s");
        add(d, 1e-3, "mm/s");
        add(d, INCH, "in/s");

        d = Dimension.FREQUENCY;
        add(d, 1.0, "Hz");

        d = Dimension.POWER;
        add(d, 1.0, "W");
        add(d, 1e3, "kW");
        add(d, 550.0 * FOOT * POUND_FORCE, "hp");

        d = Dimension.ENERGY;
        add(d, 1.0, "J");
        add(d, 1e3, "kJ");
        add(d, FOOT * POUND_FORCE, "ft*lbf");

        add(Dimension.DIMENSIONLESS, 1.0, "1");
        add(Dimension.DIMENSIONLESS, 0.01, "%");
    }

    private Units() {
    }

    private static void add(Dimension dimension, double factor, String symbol, String... aliases) {
        Unit unit = new Unit(symbol, dimension, factor, 0.0);
        BY_SYMBOL.put(normalise(symbol), unit);
        for (String alias : aliases) {
            BY_SYMBOL.put(normalise(alias), unit);
        }
    }

    private static void addTemperature(String symbol, double factor, double offset) {
        BY_SYMBOL.put(normalise(symbol), new Unit(symbol, Dimension.TEMPERATURE, factor, offset));
    }

    /**
     * Writes a unit symbol in one canonical spelling: products with '*', powers with '^',
     * so that "N s/m", "N·s/m" and "N*s/m" are the same unit, and "m³", "m3" and "m^3" too.
     */
    static String normalise(String symbol) {
        String s = symbol.trim()
                .replace('\u00b7', '*').replace('\u22c5', '*')
                .replace("\u00b2", "^2").replace("\u00b3", "^3")
                .replaceAll("\\s*\\*\\s*", "*")
                .replaceAll("\\s*/\\s*", "/")
                .replaceAll("\\s+", "*")
                .replaceAll("([A-Za-z])([23])(?![0-9])", "$1^$2");
        return s;
    }

    /**
     * @param symbol a unit symbol as written by a user
     * @return the unit, or null when the symbol is unknown
     */
    public static Unit find(String symbol) {
        return BY_SYMBOL.get(normalise(symbol));
    }

    /** @return the canonical symbols accepted for a dimension, in table order */
    public static List<String> symbolsOf(Dimension dimension) {
        return Collections.unmodifiableList(BY_SYMBOL.values().stream()
                .filter(u -> u.dimension() == dimension)
                .map(Unit::symbol)
                .distinct()
                .collect(Collectors.toList()));
    }

    /**
     * @param symbol canonical or alias symbol
     * @return the unit
     * @throws IllegalArgumentException when the symbol is unknown (a programming error at this level)
     */
    public static Unit require(String symbol) {
        Unit u = find(symbol);
        if (u == null) {
            throw new IllegalArgumentException("unknown unit symbol '" + symbol + "'");
        }
        return u;
    }

    /** @return a short list of example symbols for a dimension, for error messages */
    public static String examplesOf(Dimension dimension) {
        List<String> all = symbolsOf(dimension);
        return String.join(", ", all.subList(0, Math.min(6, all.size())));
    }

    /** @return {@code value} written for messages, e.g. 1.5e-05 or 210 */
    public static String plain(double value) {
        if (value == Math.rint(value) && Math.abs(value) < 1e15) {
            return String.format(Locale.ROOT, "%.0f", value);
        }
        return String.format(Locale.ROOT, "%.6g", value);
    }
}
