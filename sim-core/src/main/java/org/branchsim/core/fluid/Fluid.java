package org.branchsim.core.fluid;

import org.branchsim.core.units.Units;

/**
 * The hydraulic fluid at its working temperature: density, viscosity and the effective bulk modulus of
 * oil with entrained air (Merritt, Hydraulic Control Systems, 1967, ch. 2), and gaseous cavitation: below the
 * air-release pressure p_r dissolved air comes out of solution, the free-air amount growing from the entrained
 * fraction a_0 to a_0 + X_r at absolute vacuum (docs/theory.md section 7.4). All values SI: kg/m^3, m^2/s, Pa.
 * Pressures given to methods are gauge pressures, Pa.
 */
public final class Fluid {

    /** Absolute pressure scale below which the bulk modulus is progressively softened (cavitation guard), Pa. */
    public static final double CAVITATION_SCALE = 5_000.0;

    /**
     * Default air-release pressure, Pa gauge: -0.7 bar, i.e. 0.313 bar absolute. Oil saturated with air at
     * atmospheric pressure starts releasing it just below 1 bar absolute, but slowly (Gholizadeh, Burton and
     * Schoenau 2012 review such models); a lower effective release pressure for fast transients is common
     * practice, no source.
     */
    public static final double DEFAULT_RELEASE_PRESSURE = -0.7e5;

    /**
     * Default amount of air that can come out of solution by absolute vacuum, volume fraction at atmospheric
     * pressure (common practice, no source).
     */
    public static final double DEFAULT_RELEASABLE_AIR = 0.01;

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
    /** Air-release pressure, Pa absolute. */
    private final double releaseAbsolute;
    /** Amount of air released at absolute vacuum, volume fraction at atmospheric pressure. */
    private final double releasableAir;

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
        this(density, kinematicViscosity, oilBulkModulus, airFraction, gasExponent, temperature,
                DEFAULT_RELEASE_PRESSURE, DEFAULT_RELEASABLE_AIR);
    }

    /**
     * @param density density at the working temperature, kg/m^3
     * @param kinematicViscosity kinematic viscosity at the working temperature, m^2/s
     * @param oilBulkModulus bulk modulus of air-free oil, Pa
     * @param airFraction volume fraction of free (entrained) air at atmospheric pressure, 0..1
     * @param gasExponent polytropic exponent of the air: 1 isothermal, 1.4 adiabatic
     * @param temperature working temperature, K
     * @param releasePressure air-release (cavitation threshold) pressure, Pa gauge, between -1 atm and 0
     * @param releasableAir air that comes out of solution by absolute vacuum, volume fraction at atmospheric
     *        pressure, positive
     */
    public Fluid(double density, double kinematicViscosity, double oilBulkModulus, double airFraction,
                 double gasExponent, double temperature, double releasePressure, double releasableAir) {
        if (!(releasePressure > -Units.ATMOSPHERE && releasePressure <= 0.0 && releasableAir > 0.0)) {
            throw new IllegalArgumentException("an air-release pressure between -1 atm and 0 gauge and a positive "
                    + "releasable air fraction, not " + releasePressure + " Pa and " + releasableAir);
        }
        this.releaseAbsolute = releasePressure + Units.ATMOSPHERE;
        this.releasableAir = releasableAir;
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

    /** @return the air-release pressure, Pa gauge: below it air comes out of solution (the cavitation threshold) */
    public double releasePressure() {
        return releaseAbsolute - Units.ATMOSPHERE;
    }

    /** @return the air that comes out of solution by absolute vacuum, volume fraction at atmospheric pressure */
    public double releasableAir() {
        return releasableAir;
    }

    /** @return working temperature, K */
    public double temperature() {
        return temperature;
    }

    /**
     * Effective bulk modulus of oil, free air and the container wall in series:
     * 1/beta_e = 1/beta_oil + 1/beta_wall + (V_gas/V_total)/(n p_abs), with the gas volume following
     * p V^n = const from its atmospheric amount (Merritt 1967, ch. 2). Near zero absolute pressure the
     * value is softened smoothly (a numerical guard). Below the air-release pressure p_r the free-air amount
     * grows, X(p) = a_0 + X_r (1 - p_abs/p_r)^2, and the compliance gains the released air's
     * -dX/dp (p_atm/p_abs)^(1/n) / (1 - a_0 + g) beside the gas term ({@link #releasedBulkModulus}); near vacuum
     * the gas then dominates, beta_e tends to n p_abs and a node's absolute pressure decays towards zero without
     * reaching it (docs/theory.md section 7.4).
     *
     * @param gaugePressure node pressure, Pa gauge
     * @param wallBulkModulus bulk modulus of the wall (hose, tube), Pa; infinite for a rigid wall
     * @return effective bulk modulus, Pa
     */
    public double effectiveBulkModulus(double gaugePressure, double wallBulkModulus) {
        double pAbs = gaugePressure + Units.ATMOSPHERE;
        if (pAbs < releaseAbsolute) {
            return releasedBulkModulus(pAbs, wallBulkModulus);
        }
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
        if (pAbs < releaseAbsolute) {
            // below the air-release pressure: a central difference of beta_e (a step of 1e-4 of p_abs, at least 1 Pa)
            double h = Math.max(1e-4 * Math.abs(pAbs), 1.0);
            return (releasedBulkModulus(pAbs + h, wallBulkModulus) - releasedBulkModulus(pAbs - h, wallBulkModulus))
                    / (2 * h);
        }
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

    /**
     * The effective bulk modulus below the air-release pressure: free air X(p) = a_0 + X_r r, r = (1 - p/p_r)^2
     * (r = 1 at and below vacuum; no corner at p_r, where r and dr/dp vanish), the gas law frozen below 1 Pa
     * absolute (a guard: the state cannot reach there, beta_e being about n p_abs), gas volume g = X (p_atm/p)^(1/n)
     * per unit liquid-plus-air volume at atmosphere, compliance 1/beta_oil + 1/beta_wall + phi/(n p)
     * - dX/dp (p_atm/p)^(1/n) / (1 - a_0 + g), phi = g / (1 - a_0 + g): the air released by a fall in pressure adds
     * its volume as the entrained air's expansion does (an equilibrium, instant-release model).
     *
     * @param pAbs absolute pressure, Pa
     * @param wallBulkModulus wall bulk modulus, Pa
     * @return beta_e, Pa
     */
    private double releasedBulkModulus(double pAbs, double wallBulkModulus) {
        double pGas = Math.max(pAbs, 1.0);
        double below = Math.max(0.0, Math.min(1.0, 1.0 - pGas / releaseAbsolute));
        double amount = airFraction + releasableAir * below * below;
        double amountSlope = -2.0 * releasableAir * below / releaseAbsolute;
        double ratio = Units.ATMOSPHERE / pGas;
        double expansion = gasExponent == 1.0 ? ratio : Math.pow(ratio, inverseExponent);
        double g = amount * expansion;
        double mixture = 1.0 - airFraction + g;
        double compliance = oilCompliance + 1.0 / wallBulkModulus + g / mixture / (gasExponent * pGas)
                - amountSlope * expansion / mixture;
        // the guard's factor frozen at its value on the release pressure (within 0.2 % of 1 at the default), so
        // beta_e is continuous there and the gas law holds undistorted below it
        return softened(releaseAbsolute) / compliance;
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
