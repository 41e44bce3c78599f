package org.branchsim.core.laws;

/**
 * Steady friction of a fully developed flow in a smooth round pipe (White, Fluid Mechanics, ch. 6): Darcy
 * friction factor lambda = 64 / Re for laminar flow (Hagen-Poiseuille, Re &lt; 2000), lambda = 0.3164 Re^-0.25
 * for turbulent flow in a smooth pipe (Blasius, 4000 &lt; Re &lt; 1e5), and a cubic smoothstep between the two
 * over 2000 &lt; Re &lt; 4000 (the transition band; common practice, no source). The pressure drop is
 * lambda (L / d) rho v^2 / 2, signed with the flow. SI: Pa, m^3/s, m, kg/m^3, m^2/s.
 */
public final class PipeFriction {

    /** Reynolds number below which the flow is laminar. */
    public static final double LAMINAR_LIMIT = 2000.0;
    /** Reynolds number above which the flow is taken as turbulent. */
    public static final double TURBULENT_LIMIT = 4000.0;

    private PipeFriction() {
    }

    /**
     * @param speed mean flow speed, m/s (either sign)
     * @param diameter inner diameter, m
     * @param nu kinematic viscosity, m^2/s
     * @return Reynolds number |v| d / nu
     */
    public static double reynolds(double speed, double diameter, double nu) {
        return Math.abs(speed) * diameter / nu;
    }

    /**
     * @param re Reynolds number (positive)
     * @return Darcy friction factor lambda
     */
    public static double darcyFactor(double re) {
        if (re <= LAMINAR_LIMIT) {
            return 64.0 / re;
        }
        if (re >= TURBULENT_LIMIT) {
            return blasius(re);
        }
        double f = (re - LAMINAR_LIMIT) / (TURBULENT_LIMIT - LAMINAR_LIMIT);
        double s = f * f * (3.0 - 2.0 * f);
        return (1.0 - s) * 64.0 / re + s * blasius(re);
    }

    private static double blasius(double re) {
        return 0.3164 / Math.pow(re, 0.25);
    }

    /**
     * @param re Reynolds number (positive)
     * @return d(lambda)/d(Re) of {@link #darcyFactor}: -64/Re^2 laminar, -lambda_B/(4 Re) for Blasius, and the
     *         product rule through the smoothstep s(f) = 3f^2 - 2f^3, f = (Re - 2000)/2000, between them
     */
    public static double darcyFactorSlope(double re) {
        if (re <= LAMINAR_LIMIT) {
            return -64.0 / (re * re);
        }
        double turbulent = blasius(re);
        double turbulentSlope = -0.25 * turbulent / re;
        if (re >= TURBULENT_LIMIT) {
            return turbulentSlope;
        }
        double width = TURBULENT_LIMIT - LAMINAR_LIMIT;
        double f = (re - LAMINAR_LIMIT) / width;
        double s = f * f * (3.0 - 2.0 * f);
        double sSlope = 6.0 * f * (1.0 - f) / width;
        double laminar = 64.0 / re;
        return sSlope * (turbulent - laminar) + (1.0 - s) * (-laminar / re) + s * turbulentSlope;
    }

    /**
     * @param q volume flow, m^3/s (either sign)
     * @param diameter inner diameter, m
     * @param length pipe length, m
     * @param density kg/m^3
     * @param nu kinematic viscosity, m^2/s
     * @return the pressure drop in the direction of the flow, Pa (same sign as q; laminar and linear near 0)
     */
    public static double pressureDrop(double q, double diameter, double length, double density, double nu) {
        double area = 0.25 * Math.PI * diameter * diameter;
        double laminar = laminarResistance(diameter, length, density, nu) * q;
        double re = reynolds(q / area, diameter, nu);
        if (re <= LAMINAR_LIMIT) {
            return laminar;
        }
        double v = q / area;
        return darcyFactor(re) * (length / diameter) * 0.5 * density * v * Math.abs(v);
    }

    /**
     * The slope of {@link #pressureDrop} with the flow: the Hagen-Poiseuille resistance 128 rho nu L / (pi d^4)
     * while laminar, else, from dp = lambda(Re) (L/d) rho v|v|/2 with Re = |v| d/nu,
     * d(dp)/dq = (L/d) (rho/2) (|v|/A) (2 lambda + Re lambda'(Re)) (for Blasius 7/4 of dp/q).
     *
     * @param q volume flow, m^3/s (either sign)
     * @param diameter inner diameter, m
     * @param length pipe length, m
     * @param density kg/m^3
     * @param nu kinematic viscosity, m^2/s
     * @return d(dp)/dq, Pa s/m^3 (positive)
     */
    public static double pressureDropSlope(double q, double diameter, double length, double density, double nu) {
        double area = 0.25 * Math.PI * diameter * diameter;
        double speed = Math.abs(q) / area;
        double re = reynolds(speed, diameter, nu);
        if (re <= LAMINAR_LIMIT) {
            return laminarResistance(diameter, length, density, nu);
        }
        return (length / diameter) * 0.5 * density * speed / area
                * (2.0 * darcyFactor(re) + re * darcyFactorSlope(re));
    }

    /** @return the Hagen-Poiseuille resistance 128 rho nu L / (pi d^4), Pa s/m^3 */
    private static double laminarResistance(double diameter, double length, double density, double nu) {
        return 128.0 * density * nu * length / (Math.PI * Math.pow(diameter, 4));
    }
}
