package org.branchsim.core.units;

import java.util.ArrayList;
import java.util.Collections;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.regex.Pattern;

/**
 * The table of unit symbols branchsim accepts. Factors are exact where NIST SP 811 (2008), Appendix B,
 * gives them exactly: in = 0.0254 m, ft = 0.3048 m, lb = 0.45359237 kg, standard gravity 9.80665 m/s^2,
 * US gallon = 231 in^3, bar = 1e5 Pa, T/K = (t/degF + 459.67)/1.8.
 *
 * <p>Symbols are matched as written (after {@link #normalise}). A few symbols of the trade are also matched
 * in any case ("PSI", "Bar", "GPM", "DegF"): those with no SI prefix that a change of case could turn into
 * another unit. Symbols with an SI prefix ("mbar" millibar, "MPa" megapascal, "mm", "ms") are matched only
 * as written, so that "Mbar" or "MM" are refused instead of read as milli-units. Pressures are gauge
 * throughout; "psig" and "barg" say so explicitly and mean the same as "psi" and "bar".
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

    /** One row of the table: a unit and every spelling accepted for it. */
    private record Entry(Unit unit, List<String> spellings, boolean anyCase, boolean usCustomary) {
    }

    private static final List<Entry> TABLE = new ArrayList<>();
    private static final Map<String, Unit> BY_SYMBOL = new LinkedHashMap<>();
    private static final Map<String, Unit> BY_SYMBOL_ANY_CASE = new LinkedHashMap<>();
    /** Patterns of {@link #normalise}, compiled once (before the table is indexed). */
    private static final Pattern DEGREE_SPACE = Pattern.compile("^(?i)(deg|\u00b0)\\s+([cf])$");
    private static final Pattern SPACED_TIMES = Pattern.compile("\\s*\\*\\s*");
    private static final Pattern SPACED_SLASH = Pattern.compile("\\s*/\\s*");
    private static final Pattern SPACES = Pattern.compile("\\s+");
    private static final Pattern BARE_POWER = Pattern.compile("([A-Za-z])([23])(?![0-9])");

    static {
        Dimension d = Dimension.PRESSURE;
        add(d, 1.0, "Pa");
        add(d, 1e3, "kPa");
        add(d, 1e6, "MPa");
        add(d, 1e9, "GPa");
        anyCase(d, 1e5, "bar", "barg");
        add(d, 1e2, "mbar");
        us(anyCase(d, PSI, "psi", "psig"));
        us(anyCase(d, 1e3 * PSI, "ksi", "kpsi"));

        d = Dimension.VOLUME_FLOW;
        add(d, 1.0, "m^3/s");
        anyCase(d, LITRE / MINUTE, "L/min", "lpm");
        add(d, LITRE, "L/s", "l/s");
        add(d, 1e-6, "cm^3/s", "mL/s");
        add(d, 1e-6 / MINUTE, "cm^3/min", "mL/min");
        add(d, 1e-3 / 3600.0, "m^3/h");
        us(anyCase(d, US_GALLON / MINUTE, "gal/min", "gpm"));
        us(anyCase(d, INCH * INCH * INCH, "in^3/s"));

        d = Dimension.LENGTH;
        add(d, 1.0, "m");
        add(d, 1e-2, "cm");
        add(d, 1e-3, "mm");
        add(d, 1e-6, "um", "\u00b5m", "\u03bcm");
        us(anyCase(d, INCH, "in"));
        us(anyCase(d, FOOT, "ft"));

        d = Dimension.AREA;
        add(d, 1.0, "m^2");
        add(d, 1e-4, "cm^2");
        add(d, 1e-6, "mm^2");
        us(anyCase(d, INCH * INCH, "in^2"));

        d = Dimension.VOLUME;
        add(d, 1.0, "m^3");
        add(d, LITRE, "L", "l");
        add(d, 1e-6, "cm^3", "mL", "ml", "cc");
        add(d, 1e-9, "mm^3");
        us(anyCase(d, INCH * INCH * INCH, "in^3"));
        us(anyCase(d, US_GALLON, "gal"));

        d = Dimension.DISPLACEMENT;
        add(d, 1.0, "m^3/rad");
        add(d, 1e-6 / REVOLUTION, "cm^3/rev", "mL/rev", "cc/rev");
        us(anyCase(d, INCH * INCH * INCH / REVOLUTION, "in^3/rev"));

        d = Dimension.ROTATIONAL_SPEED;
        add(d, 1.0, "rad/s");
        anyCase(d, REVOLUTION / MINUTE, "rpm", "rev/min", "1/min");
        add(d, REVOLUTION, "rev/s");

        d = Dimension.MASS;
        add(d, 1.0, "kg");
        add(d, 1e-3, "g");
        add(d, 1e-6, "mg");
        add(d, 1e3, "t");
        us(anyCase(d, POUND_MASS, "lb", "lbm"));

        d = Dimension.TIME;
        add(d, 1.0, "s");
        add(d, 1e-3, "ms");
        add(d, 1e-6, "us", "\u00b5s", "\u03bcs");
        add(d, MINUTE, "min");
        add(d, 3600.0, "h");

        d = Dimension.FORCE;
        add(d, 1.0, "N");
        add(d, 1e3, "kN");
        us(anyCase(d, POUND_FORCE, "lbf"));

        d = Dimension.STIFFNESS;
        add(d, 1.0, "N/m");
        add(d, 1e3, "N/mm", "kN/m");
        add(d, 1e6, "kN/mm");
        us(anyCase(d, POUND_FORCE / INCH, "lbf/in"));

        d = Dimension.DAMPING;
        add(d, 1.0, "N*s/m");
        add(d, 1e3, "N*s/mm", "kN*s/m");
        us(anyCase(d, POUND_FORCE / INCH, "lbf*s/in"));

        d = Dimension.TEMPERATURE;
        TABLE.add(new Entry(new Unit("K", d, 1.0, 0.0), List.of("K"), false, false));
        TABLE.add(new Entry(new Unit("degC", d, 1.0, 273.15),
                List.of("degC", "\u00b0C", "\u2103"), true, false));
        TABLE.add(new Entry(new Unit("degF", d, 1.0 / 1.8, 459.67 / 1.8),
                List.of("degF", "\u00b0F", "\u2109"), true, true));

        d = Dimension.KINEMATIC_VISCOSITY;
        add(d, 1.0, "m^2/s");
        anyCase(d, 1e-6, "cSt");
        add(d, 1e-6, "mm^2/s");

        d = Dimension.DYNAMIC_VISCOSITY;
        add(d, 1.0, "Pa*s");
        add(d, 1e-3, "mPa*s", "cP");

        d = Dimension.DENSITY;
        add(d, 1.0, "kg/m^3");
        add(d, 1e3, "g/cm^3", "kg/L");
        us(anyCase(d, POUND_MASS / (FOOT * FOOT * FOOT), "lb/ft^3"));

        d = Dimension.TORQUE;
        add(d, 1.0, "N*m", "Nm");
        us(anyCase(d, POUND_FORCE * INCH, "lbf*in"));
        us(anyCase(d, POUND_FORCE * FOOT, "lbf*ft"));

        d = Dimension.ROTATIONAL_INERTIA;
        add(d, 1.0, "kg*m^2");
        add(d, 1e-4, "kg*cm^2");

        d = Dimension.ROTARY_DAMPING;
        add(d, 1.0, "N*m*s/rad");
        add(d, 1.0 / REVOLUTION * MINUTE, "N*m/rpm");

        d = Dimension.ANGLE;
        add(d, 1.0, "rad");
        anyCase(d, Math.PI / 180.0, "deg", "\u00b0");

        d = Dimension.VELOCITY;
        add(d, 1.0, "m/s");
        add(d, 1e-3, "mm/s");
        us(anyCase(d, INCH, "in/s"));

        d = Dimension.FREQUENCY;
        anyCase(d, 1.0, "Hz");

        d = Dimension.POWER;
        add(d, 1.0, "W");
        add(d, 1e3, "kW");
        us(anyCase(d, 550.0 * FOOT * POUND_FORCE, "hp"));

        d = Dimension.ENERGY;
        add(d, 1.0, "J");
        add(d, 1e3, "kJ");
        us(anyCase(d, FOOT * POUND_FORCE, "ft*lbf"));

        add(Dimension.DIMENSIONLESS, 1.0, "1");
        add(Dimension.DIMENSIONLESS, 0.01, "%");

        index();
    }

    private Units() {
    }

    private static Entry add(Dimension dimension, double factor, String symbol, String... aliases) {
        return row(dimension, factor, false, symbol, aliases);
    }

    private static Entry anyCase(Dimension dimension, double factor, String symbol, String... aliases) {
        return row(dimension, factor, true, symbol, aliases);
    }

    private static Entry row(Dimension dimension, double factor, boolean anyCase, String symbol, String... aliases) {
        List<String> spellings = new ArrayList<>();
        spellings.add(symbol);
        spellings.addAll(List.of(aliases));
        Entry e = new Entry(new Unit(symbol, dimension, factor, 0.0), List.copyOf(spellings), anyCase, false);
        TABLE.add(e);
        return e;
    }

    /** Marks the last row added as a US customary unit (listed first in hints for US scenarios). */
    private static void us(Entry e) {
        TABLE.set(TABLE.lastIndexOf(e), new Entry(e.unit(), e.spellings(), e.anyCase(), true));
    }

    /**
     * Builds the lookup maps and checks that no any-case spelling can be read as another unit: a clash is a
     * defect of this table, found when the class loads.
     */
    private static void index() {
        for (Entry e : TABLE) {
            for (String s : e.spellings()) {
                if (BY_SYMBOL.put(normalise(s), e.unit()) != null) {
                    throw new IllegalStateException("unit spelling listed twice: " + s);
                }
            }
        }
        // every spelling by its case-folded form (the keys of BY_SYMBOL are normalised already)
        Map<String, List<Map.Entry<String, Unit>>> byFolded = new HashMap<>();
        for (Map.Entry<String, Unit> other : BY_SYMBOL.entrySet()) {
            byFolded.computeIfAbsent(other.getKey().toLowerCase(Locale.ROOT), k -> new ArrayList<>()).add(other);
        }
        for (Entry e : TABLE) {
            if (!e.anyCase()) {
                continue;
            }
            for (String s : e.spellings()) {
                String folded = fold(s);
                for (Map.Entry<String, Unit> other : byFolded.getOrDefault(folded, List.of())) {
                    if (!other.getValue().equals(e.unit())) {
                        throw new IllegalStateException("any-case spelling " + s + " clashes with " + other.getKey());
                    }
                }
                BY_SYMBOL_ANY_CASE.put(folded, e.unit());
            }
        }
    }

    private static String fold(String spelling) {
        return normalise(spelling).toLowerCase(Locale.ROOT);
    }

    /**
     * Writes a unit symbol in one canonical spelling: products with '*', powers with '^',
     * so that "N s/m", "N·s/m" and "N*s/m" are the same unit, and "m³", "m3" and "m^3" too.
     */
    static String normalise(String symbol) {
        String s = symbol.trim()
                .replace('\u00b7', '*').replace('\u22c5', '*')
                .replace("\u00b2", "^2").replace("\u00b3", "^3");
        s = DEGREE_SPACE.matcher(s).replaceAll("$1$2");
        s = SPACED_TIMES.matcher(s).replaceAll("*");
        s = SPACED_SLASH.matcher(s).replaceAll("/");
        s = SPACES.matcher(s).replaceAll("*");
        return BARE_POWER.matcher(s).replaceAll("$1^$2");
    }

    /**
     * @param symbol a unit symbol as written by a user
     * @return the unit, or null when the symbol is unknown
     */
    public static Unit find(String symbol) {
        String n = normalise(symbol);
        Unit exact = BY_SYMBOL.get(n);
        return exact != null ? exact : BY_SYMBOL_ANY_CASE.get(n.toLowerCase(Locale.ROOT));
    }

    /**
     * A way of writing a unit that scenarios may use.
     *
     * @param text the spelling as the table lists it (products with '*', powers with '^')
     * @param anyCase true when it is also read in any case
     * @param unit the unit it stands for
     */
    public record Spelling(String text, boolean anyCase, Unit unit) {
    }

    /** @return every spelling accepted for a dimension, in table order (for patterns such as a JSON Schema's) */
    public static List<Spelling> spellingsOf(Dimension dimension) {
        List<Spelling> out = new ArrayList<>();
        for (Entry e : TABLE) {
            if (e.unit().dimension() == dimension) {
                e.spellings().forEach(s -> out.add(new Spelling(s, e.anyCase(), e.unit())));
            }
        }
        return Collections.unmodifiableList(out);
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

    /** @return the canonical symbols of a dimension, for error messages (metric units first) */
    public static String examplesOf(Dimension dimension) {
        return examplesOf(dimension, UnitSystem.METRIC);
    }

    /**
     * @param dimension the dimension a field needs
     * @param system the unit system the scenario writes its results in
     * @return every canonical symbol of the dimension, the system's own units first (its display unit
     *         leading), for hints in error messages
     */
    public static String examplesOf(Dimension dimension, UnitSystem system) {
        String display = system.displayUnit(dimension).symbol();
        List<String> first = new ArrayList<>();
        List<String> rest = new ArrayList<>();
        for (Entry e : TABLE) {
            if (e.unit().dimension() != dimension) {
                continue;
            }
            boolean own = e.usCustomary() == (system == UnitSystem.US);
            String symbol = e.unit().symbol();
            if (symbol.equals(display)) {
                first.add(0, symbol);
            } else {
                (own ? first : rest).add(symbol);
            }
        }
        first.addAll(rest);
        return String.join(", ", first);
    }

    /**
     * @return true when the symbol is a pressure unit with an "a" for absolute appended ("psia", "bara"),
     *         which branchsim refuses because it reads every pressure as gauge
     */
    public static boolean isAbsolutePressure(String symbol) {
        String n = normalise(symbol);
        if (n.length() < 2 || Character.toLowerCase(n.charAt(n.length() - 1)) != 'a') {
            return false;
        }
        Unit u = find(n.substring(0, n.length() - 1));
        return u != null && u.dimension() == Dimension.PRESSURE && !n.endsWith("Pa");
    }

    /**
     * Writes the table of accepted spellings as Markdown, one row per dimension; docs/scenario-format.md
     * carries this text (a test keeps the two equal).
     *
     * @return the Markdown table
     */
    public static String markdownTable() {
        StringBuilder sb = new StringBuilder("| dimension | accepted spellings (`=` joins spellings of one unit) |\n"
                + "|---|---|\n");
        for (Dimension d : Dimension.values()) {
            List<String> cells = new ArrayList<>();
            for (Entry e : TABLE) {
                if (e.unit().dimension() != d) {
                    continue;
                }
                List<String> written = new ArrayList<>();
                for (String s : e.spellings()) {
                    written.add("`" + s + "`");
                }
                cells.add(String.join(" = ", written) + (e.anyCase() ? " (any case)" : ""));
            }
            if (!cells.isEmpty()) {
                sb.append("| ").append(d.humanName()).append(" | ").append(String.join("; ", cells)).append(" |\n");
            }
        }
        return sb.toString();
    }

    /** @return {@code value} written for messages, e.g. 1.5e-05 or 210 */
    public static String plain(double value) {
        if (value == Math.rint(value) && Math.abs(value) < 1e15) {
            return String.format(Locale.ROOT, "%.0f", value);
        }
        String s = String.format(Locale.ROOT, "%.6g", value);
        int e = s.indexOf('e');
        String mantissa = e < 0 ? s : s.substring(0, e);
        if (mantissa.contains(".")) {
            mantissa = mantissa.replaceAll("0+$", "").replaceAll("\\.$", "");
        }
        return e < 0 ? mantissa : mantissa + s.substring(e);
    }
}
