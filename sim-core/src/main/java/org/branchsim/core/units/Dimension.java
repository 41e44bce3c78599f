package org.branchsim.core.units;

/**
 * Physical dimensions branchsim knows, each with its SI unit symbol. Values are stored in these SI units
 * internally; conversion happens only when reading scenarios and writing results.
 */
public enum Dimension {
    DIMENSIONLESS("1"),
    PRESSURE("Pa"),
    VOLUME_FLOW("m^3/s"),
    LENGTH("m"),
    AREA("m^2"),
    VOLUME("m^3"),
    MASS("kg"),
    TIME("s"),
    FORCE("N"),
    STIFFNESS("N/m"),
    DAMPING("N*s/m"),
    TEMPERATURE("K"),
    KINEMATIC_VISCOSITY("m^2/s"),
    DYNAMIC_VISCOSITY("Pa*s"),
    DENSITY("kg/m^3"),
    DISPLACEMENT("m^3/rad"),
    ROTATIONAL_SPEED("rad/s"),
    TORQUE("N*m"),
    ROTATIONAL_INERTIA("kg*m^2"),
    ROTARY_DAMPING("N*m*s/rad"),
    ANGLE("rad"),
    VELOCITY("m/s"),
    FREQUENCY("Hz"),
    POWER("W"),
    ENERGY("J");

    private final String siSymbol;

    Dimension(String siSymbol) {
        this.siSymbol = siSymbol;
    }

    /** @return the SI unit symbol used internally, e.g. "Pa" */
    public String siSymbol() {
        return siSymbol;
    }

    /** @return a lower-case human name, e.g. "volume flow" */
    public String humanName() {
        return name().toLowerCase(java.util.Locale.ROOT).replace('_', ' ');
    }
}
