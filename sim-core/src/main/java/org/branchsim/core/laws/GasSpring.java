package org.branchsim.core.laws;

/**
 * The gas of a gas-charged accumulator as a spring: an ideal gas compressed polytropically,
 * p V^n = const (absolute pressure, Pa; volume, m^3), n = 1 isothermal (Boyle) to n = 1.4 adiabatic for a
 * diatomic gas such as nitrogen (Poisson); or, with heat exchange through the shell, an ideal gas whose
 * temperature relaxes to the wall's with a thermal time constant tau (Otis and Pourmovahed, J. Dyn. Sys.
 * Meas. Control 107, 1985, from memory): dT/dt = -(gamma - 1) T / V dV/dt + (T_w - T) / tau, p = p0 (V0 / V)
 * (T / T0). Pure functions of SI numbers.
 */
public final class GasSpring {

    /** Ratio of specific heats of nitrogen near room temperature, 1.40 (ideal diatomic gas, 7/5). */
    public static final double NITROGEN_GAMMA = 1.4;

    private GasSpring() {
    }

    /**
     * @param p0 absolute pressure at the reference state, Pa
     * @param v0 gas volume at the reference state, m^3
     * @param v gas volume now, m^3 (positive)
     * @param n polytropic exponent, 1 to 1.4
     * @return absolute gas pressure p0 (v0 / v)^n, Pa
     */
    public static double polytropicPressure(double p0, double v0, double v, double n) {
        return p0 * Math.pow(v0 / v, n);
    }

    /**
     * @param p0 absolute pressure at the reference state, Pa
     * @param v0 gas volume at the reference state, m^3
     * @param p absolute pressure now, Pa (positive)
     * @param n polytropic exponent, 1 to 1.4
     * @return gas volume v0 (p0 / p)^(1/n), m^3
     */
    public static double polytropicVolume(double p0, double v0, double p, double n) {
        return v0 * Math.pow(p0 / p, 1.0 / n);
    }

    /**
     * Ideal gas of fixed mass: p V / T = p0 V0 / T0.
     *
     * @param p0 absolute pressure at the reference state, Pa
     * @param v0 gas volume at the reference state, m^3
     * @param t0 gas temperature at the reference state, K
     * @param v gas volume now, m^3
     * @param t gas temperature now, K
     * @return absolute gas pressure, Pa
     */
    public static double idealGasPressure(double p0, double v0, double t0, double v, double t) {
        return p0 * (v0 / v) * (t / t0);
    }

    /**
     * Energy balance of an ideal gas with heat exchange to a wall (thermal time constant model, from memory).
     *
     * @param t gas temperature, K
     * @param v gas volume, m^3
     * @param vDot rate of change of the gas volume, m^3/s
     * @param wall wall (ambient) temperature, K
     * @param tau thermal time constant, s
     * @param gamma ratio of specific heats
     * @return dT/dt, K/s
     */
    public static double temperatureRate(double t, double v, double vDot, double wall, double tau, double gamma) {
        return -(gamma - 1.0) * t / v * vDot + (wall - t) / tau;
    }

    /**
     * Small-signal stiffness of the gas behind a fluid column of area a: k = n p a^2 / V (N/m), the gas spring
     * of a Helmholtz resonator.
     *
     * @param n polytropic exponent
     * @param p absolute pressure, Pa
     * @param area column area, m^2
     * @param v gas volume, m^3
     * @return stiffness, N/m
     */
    public static double stiffness(double n, double p, double area, double v) {
        return n * p * area * area / v;
    }
}
