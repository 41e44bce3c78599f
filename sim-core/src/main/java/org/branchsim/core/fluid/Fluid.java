package org.branchsim.core.fluid;

import org.branchsim.core.units.Units;

/**
 * The hydraulic fluid at its working temperature: density, viscosity and the effective bulk modulus of
 * oil with entrained air (Merritt, Hydraulic Control Systems, 1967, ch. 2). All values SI: kg/m^3,
 * m^2/s, Pa. Pressures given to methods are gauge pressures, Pa.
 */
public final class Fluid {

    /** Absolute pressure scale below which the bulk modulus is progressively softened (cavitation guard), Pa. */
    public static final double CAVITATION_SCALE = 5_000.0;

    private final double density;
    private final double kinematicViscosity;
    private final double oilBulkModulus;
    private final double airFraction;
    private final double gasExponent;
    private final double temperature;
    /** 1 / n, computed once. */
    private final double inverseExponent;
    /** 1 / beta_oil, Pa^-1, computed once. */
    private final double oilCompliance;

    /**
     * @param density density at the working temperature, kg/m^3
     * @param kinematicViscosity kinematic viscosity at the working temperature, m^2/s
     * @param oilBulkModulus bulk modulus of air-free oil, Pa
     * @param airFraction volume fraction of free (entrained) air at atmospheric pressure, 0..1
     * @param gasExponent polytropic exponent of the air: 1 isothermal, 1.4 adiabatic
     * @param temperature working temperature, K
     */
    public Fluid(double density, double kinematicViscosity, double oilBulkModulus, double airFraction,
                 double gasExponent, double temperature) {
        this.density = density;
        this.kinematicViscosity = kinematicViscosity;
        this.oilBulkModulus = oilBulkModulus;
        this.airFraction = airFraction;
        this.gasExponent = gasExponent;
        this.temperature = temperature;
        this.inverseExponent = 1.0 / gasExponent;
        this.oilCompliance = 1.0 / oilBulkModulus;
    }

    /**
     * Density against temperature by thermal expansion, rho(T) = rho15 / (1 + alpha (T - 15 degC))
     * (common practice; alpha about 7e-4 /K from memory).
     *
     * @param density15 density at 15 degC, kg/m^3
     * @param alpha volumetric expansion coefficient, 1/K
     * @param temperature temperature, K
     * @return density, kg/m^3
     */
    public static double densityAt(double density15, double alpha, double temperature) {
        return density15 / (1.0 + alpha * (temperature - 288.15));
    }

    /** @return density, kg/m^3 */
    public double density() {
        return density;
    }

    /** @return kinematic viscosity, m^2/s */
    public double kinematicViscosity() {
        return kinematicViscosity;
    }

    /** @return dynamic viscosity, Pa*s */
    public double dynamicViscosity() {
        return density * kinematicViscosity;
    }

    /** @return working temperature, K */
    public double temperature() {
        return temperature;
    }

    /**
     * Effective bulk modulus of oil, free air and the container wall in series:
     * 1/beta_e = 1/beta_oil + 1/beta_wall + (V_gas/V_total)/(n p_abs), with the gas volume following
     * p V^n = const from its atmospheric amount (Merritt 1967, ch. 2). Near zero absolute pressure the
     * value is softened smoothly to zero so that a node cannot be drawn below vacuum; this is a numerical
     * guard, not a cavitation model.
     *
     * @param gaugePressure node pressure, Pa gauge
     * @param wallBulkModulus bulk modulus of the wall (hose, tube), Pa; infinite for a rigid wall
     * @return effective bulk modulus, Pa
     */
    public double effectiveBulkModulus(double gaugePressure, double wallBulkModulus) {
        double pAbs = gaugePressure + Units.ATMOSPHERE;
        double compliance = oilCompliance + 1.0 / wallBulkModulus;
        if (airFraction > 0.0) {
            double pGas = Math.max(pAbs, 1.0);
            double gasVolume = gasVolume(pGas);
            double fraction = gasVolume / (1.0 - airFraction + gasVolume);
            compliance += fraction / (gasExponent * pGas);
        }
        return softened(pAbs) / compliance;
    }

    /**
     * The slope d(beta_e)/dp of {@link #effectiveBulkModulus} in closed form (docs/theory.md section 10.x): with
     * the compliance C(p) = 1/beta_oil + 1/beta_wall + phi(p) / (n p) and the softening factor S(p_abs),
     * beta_e = S / C and d(beta_e)/dp = S'/C - S C'/C^2, where the gas volume g = a (p_atm/p)^(1/n) gives
     * dg/dp = -g / (n p), phi = g / (1 - a + g) gives dphi/dp = (1 - a) / (1 - a + g)^2 dg/dp, and
     * C' = dphi/dp / (n p) - phi / (n p^2). Below 1 Pa absolute the gas law is frozen (slope zero there).
     *
     * @param gaugePressure node pressure, Pa gauge
     * @param wallBulkModulus bulk modulus of the wall, Pa; infinite for a rigid wall
     * @return d(beta_e)/dp, dimensionless (Pa per Pa)
     */
    public double bulkModulusSlope(double gaugePressure, double wallBulkModulus) {
        double pAbs = gaugePressure + Units.ATMOSPHERE;
        double compliance = oilCompliance + 1.0 / wallBulkModulus;
        double complianceSlope = 0.0;
        if (airFraction > 0.0) {
            double pGas = Math.max(pAbs, 1.0);
            double g = gasVolume(pGas);
            double denominator = 1.0 - airFraction + g;
            double fraction = g / denominator;
            compliance += fraction / (gasExponent * pGas);
            if (pAbs > 1.0) {
                double gSlope = -g * inverseExponent / pGas;
                double fractionSlope = (1.0 - airFraction) / (denominator * denominator) * gSlope;
                complianceSlope = fractionSlope / (gasExponent * pGas) - fraction / (gasExponent * pGas * pGas);
            }
        }
        double factor = softened(pAbs);
        return softenedSlope(pAbs) / compliance - factor * complianceSlope / (compliance * compliance);
    }

    /** @return the volume fraction the entrained air takes at absolute pressure pGas, relative to its amount */
    private double gasVolume(double pGas) {
        double ratio = Units.ATMOSPHERE / pGas;
        return airFraction * (gasExponent == 1.0 ? ratio : Math.pow(ratio, inverseExponent));
    }

    private static double softenedSlope(double pAbs) {
        if (pAbs >= 20.0 * CAVITATION_SCALE || pAbs <= 0.0) {
            return 0.0;
        }
        double e = Math.exp(-pAbs / CAVITATION_SCALE);
        return -Math.expm1(-pAbs / CAVITATION_SCALE) > 1e-4 ? e / CAVITATION_SCALE : 0.0;
    }

    private static double softened(double pAbs) {
        if (pAbs >= 20.0 * CAVITATION_SCALE) {
            return 1.0; // the factor differs from 1 by less than exp(-20) = 2e-9 here
        }
        if (pAbs <= 0.0) {
            return 1e-4;
        }
        return Math.max(1e-4, -Math.expm1(-pAbs / CAVITATION_SCALE));
    }
}
