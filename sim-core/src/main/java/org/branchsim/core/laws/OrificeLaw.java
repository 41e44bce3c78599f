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
 *
 * <p>Partial derivatives in closed form (docs/theory.md section 10.x), with k = Cd A sqrt(2/rho) and
 * r = dp^2 + dp_t^2: dQ/d(dp) = k (dp^2/2 + dp_t^2) / r^(5/4) (finite at dp = 0, where it is the laminar
 * conductance k / sqrt(dp_t)); dQ/dA = Q / A; dQ/d(dp_t) = -k dp dp_t / (2 r^(5/4)). The transition pressure
 * of an opening of hydraulic diameter d_h is dp_t = K / d_h^2 with K = rho/2 (Re_t nu / Cd)^2 a constant of the
 * opening and the fluid ({@link #transitionConstant}), so an element computes K once and no transcendental
 * function is evaluated per call; for a round hole of area A, d_h^2 = 4 A / pi and dp_t = pi K / (4 A).
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
        return transitionConstant(cd, density, kinematicViscosity) / (hydraulicDiameter * hydraulicDiameter);
    }

    /**
     * @param cd discharge coefficient in the turbulent range
     * @param density fluid density, kg/m^3
     * @param kinematicViscosity kinematic viscosity, m^2/s
     * @return K = rho/2 (Re_t nu / Cd)^2, Pa m^2, so that the transition pressure of an opening of hydraulic
     *         diameter d_h is K / d_h^2
     */
    public static double transitionConstant(double cd, double density, double kinematicViscosity) {
        double reT = (cd / LAMINAR_DELTA) * (cd / LAMINAR_DELTA);
        double v = reT * kinematicViscosity / cd;
        return 0.5 * density * v * v;
    }

    /**
     * @param transitionConstant K of {@link #transitionConstant}, Pa m^2
     * @param area area of a round hole, m^2 (positive)
     * @return the transition pressure pi K / (4 A) of a round hole of that area, Pa
     */
    public static double roundHoleTransition(double transitionConstant, double area) {
        return 0.25 * Math.PI * transitionConstant / area;
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
     * @param cd discharge coefficient
     * @param area flow area, m^2 (zero or positive)
     * @param dp pressure difference p_a - p_b, Pa
     * @param density fluid density, kg/m^3
     * @param dpTransition transition pressure difference, Pa (positive)
     * @return dQ/d(dp), m^3/(s Pa): k (dp^2/2 + dp_t^2) / (dp^2 + dp_t^2)^(5/4)
     */
    public static double slope(double cd, double area, double dp, double density, double dpTransition) {
        double r = dp * dp + dpTransition * dpTransition;
        double quarter = Math.sqrt(Math.sqrt(r));
        return cd * area * Math.sqrt(2.0 / density) * (0.5 * dp * dp + dpTransition * dpTransition) / (r * quarter);
    }

    /**
     * @param cd discharge coefficient
     * @param area flow area, m^2 (zero or positive)
     * @param dp pressure difference p_a - p_b, Pa
     * @param density fluid density, kg/m^3
     * @param dpTransition transition pressure difference, Pa (positive)
     * @return dQ/d(dp_t), m^3/(s Pa): -k dp dp_t / (2 (dp^2 + dp_t^2)^(5/4))
     */
    public static double transitionSlope(double cd, double area, double dp, double density, double dpTransition) {
        double r = dp * dp + dpTransition * dpTransition;
        double quarter = Math.sqrt(Math.sqrt(r));
        return -cd * area * Math.sqrt(2.0 / density) * dp * dpTransition / (2.0 * r * quarter);
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
