package org.branchsim.core.laws;

/**
 * Flow through a sharp-edged orifice: Q = Cd A sqrt(2 dp / rho) in the turbulent range (Merritt,
 * Hydraulic Control Systems, 1967; Rabie, Fluid Power Engineering, 2009, eqs 2.34-2.39), blended into a
 * laminar law near dp = 0 so the slope stays finite:
 * <pre>  Q = Cd A sqrt(2/rho) dp / (dp^2 + dp_t^2)^(1/4)</pre>
 * For |dp| much larger than dp_t this is the square-root law; for |dp| much smaller it is linear,
 * Q = 2 delta^2 A d_h dp / (rho nu), which is Merritt's laminar orifice law Cd = delta sqrt(Re) when the
 * transition pressure is chosen at the Reynolds number where delta sqrt(Re) = Cd:
 * dp_t = rho/2 (Re_t nu / (Cd d_h))^2 with Re_t = (Cd/delta)^2 (delta about 0.2, from memory, quoted by Merritt).
 * Flow is positive from the upstream port (dp = p_a - p_b > 0).
 */
public final class OrificeLaw {

    /** Merritt's laminar orifice coefficient delta (from memory, Merritt 1967). */
    public static final double LAMINAR_DELTA = 0.2;

    private OrificeLaw() {
    }

    /**
     * @param cd discharge coefficient in the turbulent range
     * @param hydraulicDiameter hydraulic diameter of the opening, m
     * @param density fluid density, kg/m^3
     * @param kinematicViscosity kinematic viscosity, m^2/s
     * @return the transition pressure difference dp_t, Pa
     */
    public static double transitionPressure(double cd, double hydraulicDiameter, double density,
                                            double kinematicViscosity) {
        double reT = (cd / LAMINAR_DELTA) * (cd / LAMINAR_DELTA);
        double v = reT * kinematicViscosity / (cd * hydraulicDiameter);
        return 0.5 * density * v * v;
    }

    /**
     * @param cd discharge coefficient
     * @param area flow area, m^2 (zero or positive)
     * @param dp pressure difference p_a - p_b, Pa
     * @param density fluid density, kg/m^3
     * @param dpTransition transition pressure difference, Pa (positive)
     * @return flow from a to b, m^3/s
     */
    public static double flow(double cd, double area, double dp, double density, double dpTransition) {
        return cd * area * Math.sqrt(2.0 / density) * dp / Math.sqrt(Math.sqrt(dp * dp + dpTransition * dpTransition));
    }

    /**
     * @return the hydraulic diameter of a circular hole of that area, m
     */
    public static double circularDiameter(double area) {
        return Math.sqrt(4.0 * area / Math.PI);
    }

    /** @return the area of a circular hole, m^2 */
    public static double circleArea(double diameter) {
        return 0.25 * Math.PI * diameter * diameter;
    }
}
