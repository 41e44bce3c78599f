package org.branchsim.core.fluid;

/**
 * Kinematic viscosity of a mineral oil against temperature by the Walther relation of ASTM D341:
 * {@code log10(log10(nu + 0.7)) = A - B log10(T)}, nu in cSt (mm^2/s), T in K. The standard's small
 * correction terms below 2 cSt are not applied; hydraulic oils stay well above that in service.
 */
public final class ViscosityModel {

    private static final double CST = 1e-6;
    private final double a;
    private final double b;

    private ViscosityModel(double a, double b) {
        this.a = a;
        this.b = b;
    }

    /**
     * Fits the Walther line through two points.
     *
     * @param t1 first temperature, K
     * @param nu1 kinematic viscosity at t1, m^2/s
     * @param t2 second temperature, K (different from t1)
     * @param nu2 kinematic viscosity at t2, m^2/s
     * @return the model
     */
    public static ViscosityModel throughPoints(double t1, double nu1, double t2, double nu2) {
        double w1 = walther(nu1 / CST);
        double w2 = walther(nu2 / CST);
        double b = (w1 - w2) / (Math.log10(t2) - Math.log10(t1));
        double a = w1 + b * Math.log10(t1);
        return new ViscosityModel(a, b);
    }

    private static double walther(double nuCst) {
        return Math.log10(Math.log10(nuCst + 0.7));
    }

    /** @return the Walther constant A (nu in cSt, T in K) */
    public double a() {
        return a;
    }

    /** @return the Walther constant B (nu in cSt, T in K) */
    public double b() {
        return b;
    }

    /**
     * @param temperature absolute temperature, K
     * @return kinematic viscosity, m^2/s
     */
    public double kinematicViscosity(double temperature) {
        double w = a - b * Math.log10(temperature);
        return (Math.pow(10.0, Math.pow(10.0, w)) - 0.7) * CST;
    }
}
