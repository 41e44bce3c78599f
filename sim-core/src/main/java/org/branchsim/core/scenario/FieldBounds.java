package org.branchsim.core.scenario;

import java.util.ArrayList;
import java.util.EnumMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.branchsim.core.units.Dimension;
import org.branchsim.core.units.Quantity;

/**
 * The physical bounds of every dimensioned scenario field, in one declarative table: a row per field name
 * whose meaning sets its own bounds (an end time, a diameter, a bulk modulus), else a row per dimension (any
 * pressure, any mass). A value outside its row is refused at {@code check} with the row's text, so the
 * limits a user reads in the message are the limits the code applies.
 *
 * <p>The bounds are wide: they refuse what cannot describe a hydraulic circuit (a 1e308 bar setting, an
 * infinite volume, a 1e-300 s output interval), not unusual designs. The lower bound applies to values other
 * than zero; whether zero itself is allowed is the field's own rule ("greater than zero", "zero or more"),
 * except for temperatures, whose bounds are absolute. Pressures are gauge, so the lowest pressure is a
 * perfect vacuum, -1.01325 bar. docs/scenario-format.md lists this table (a test keeps the two equal).
 */
public final class FieldBounds {

    /**
     * The bounds of one row.
     *
     * @param dimension the dimension of the values
     * @param lowText the lower bound as written in the table and in messages, e.g. "1 um"
     * @param highText the upper bound as written, e.g. "2 m"
     * @param low the lower bound, SI
     * @param high the upper bound, SI
     * @param fields the field names the row is for (empty for a whole dimension)
     */
    public record Range(Dimension dimension, String lowText, String highText, double low, double high,
                        List<String> fields) {

        /** @return true when the SI value lies within the row (zero always does, except for temperatures) */
        public boolean allows(double si) {
            if (si == 0.0 && dimension != Dimension.TEMPERATURE) {
                return true;
            }
            return si >= low && si <= high;
        }

        /** @return the "expected" part of a message, e.g. {@code a length from 1 um to 2 m} */
        public String expected() {
            return "a " + dimension.humanName() + " from " + lowText + " to " + highText;
        }
    }

    private static final Map<String, Range> BY_FIELD = new LinkedHashMap<>();
    private static final Map<Dimension, Range> BY_DIMENSION = new EnumMap<>(Dimension.class);

    static {
        field(Dimension.TIME, "1 us", "24 h", "endTime");
        field(Dimension.TIME, "0.1 us", "24 h", "outputInterval");
        field(Dimension.TIME, "1e-12 s", "24 h", "maxStep");
        field(Dimension.TIME, "1e-18 s", "1 s", "minStep");
        field(Dimension.TIME, "1e-15 s", "1 s", "eventTolerance");
        field(Dimension.LENGTH, "1 um", "2 m", "diameter", "bore", "rod", "seatDiameter", "innerDiameter");
        field(Dimension.LENGTH, "0.1 um", "1 mm", "clearance");
        field(Dimension.LENGTH, "1 um", "200 mm", "thickness");
        field(Dimension.PRESSURE, "1 MPa", "1000 GPa", "bulkModulus", "modulus");
        field(Dimension.VOLUME, "1e-12 m^3", "10 m^3", "volume", "chamberVolume");
        field(Dimension.ANGLE, "1 deg", "180 deg", "coneAngle");

        dimension(Dimension.PRESSURE, "-1.01325 bar", "10000 bar");
        dimension(Dimension.VOLUME_FLOW, "1e-6 L/min", "100000 L/min");
        dimension(Dimension.LENGTH, "0.1 um", "20 m");
        dimension(Dimension.AREA, "1e-12 m^2", "4 m^2");
        dimension(Dimension.VOLUME, "1e-12 m^3", "10 m^3");
        dimension(Dimension.MASS, "1 mg", "1000 t");
        dimension(Dimension.TIME, "1e-12 s", "24 h");
        dimension(Dimension.FORCE, "-100000 kN", "100000 kN");
        dimension(Dimension.STIFFNESS, "0.001 N/m", "1e12 N/m");
        dimension(Dimension.DAMPING, "1e-6 N*s/m", "1e9 N*s/m");
        dimension(Dimension.TEMPERATURE, "-40 degC", "150 degC");
        dimension(Dimension.KINEMATIC_VISCOSITY, "0.1 cSt", "100000 cSt");
        dimension(Dimension.DYNAMIC_VISCOSITY, "1e-5 Pa*s", "100 Pa*s");
        dimension(Dimension.DENSITY, "100 kg/m^3", "3000 kg/m^3");
        dimension(Dimension.DISPLACEMENT, "0.001 cm^3/rev", "1000000 cm^3/rev");
        dimension(Dimension.ROTATIONAL_SPEED, "0.001 rpm", "100000 rpm");
        dimension(Dimension.TORQUE, "-1000000 N*m", "1000000 N*m");
        dimension(Dimension.ROTATIONAL_INERTIA, "1e-9 kg*m^2", "1000000 kg*m^2");
        dimension(Dimension.ROTARY_DAMPING, "1e-9 N*m*s/rad", "1e9 N*m*s/rad");
        dimension(Dimension.ANGLE, "0.01 deg", "360 deg");
        dimension(Dimension.VELOCITY, "1e-6 m/s", "100 m/s");
        dimension(Dimension.FREQUENCY, "1e-6 Hz", "1e9 Hz");
        dimension(Dimension.POWER, "-1e9 W", "1e9 W");
        dimension(Dimension.ENERGY, "-1e12 J", "1e12 J");
    }

    private FieldBounds() {
    }

    private static Range range(Dimension d, String low, String high, List<String> fields) {
        return new Range(d, low, high, Quantity.si(low, d), Quantity.si(high, d), fields);
    }

    private static void field(Dimension d, String low, String high, String... names) {
        Range r = range(d, low, high, List.of(names));
        for (String n : names) {
            BY_FIELD.put(n, r);
        }
    }

    private static void dimension(Dimension d, String low, String high) {
        BY_DIMENSION.put(d, range(d, low, high, List.of()));
    }

    /**
     * @param field the field name (the last segment of its path, e.g. "diameter")
     * @param dimension the field's dimension
     * @return the bounds of the field: its own row when it has one of this dimension, else its dimension's
     *         row, else null (dimensionless values carry their own ranges)
     */
    public static Range of(String field, Dimension dimension) {
        Range r = BY_FIELD.get(field);
        if (r != null && r.dimension() == dimension) {
            return r;
        }
        return BY_DIMENSION.get(dimension);
    }

    /** @return the table as Markdown, as docs/scenario-format.md shows it */
    public static String markdownTable() {
        StringBuilder sb = new StringBuilder("| fields | lowest (other than zero) | highest |\n|---|---|---|\n");
        List<Range> seen = new ArrayList<>();
        for (Range r : BY_FIELD.values()) {
            if (!seen.contains(r)) {
                seen.add(r);
                List<String> names = new ArrayList<>();
                r.fields().forEach(n -> names.add("`" + n + "`"));
                sb.append("| ").append(String.join(", ", names)).append(" | ").append(r.lowText()).append(" | ")
                        .append(r.highText()).append(" |\n");
            }
        }
        for (Range r : BY_DIMENSION.values()) {
            sb.append("| any other ").append(r.dimension().humanName()).append(" | ").append(r.lowText())
                    .append(" | ").append(r.highText()).append(" |\n");
        }
        return sb.toString();
    }
}
