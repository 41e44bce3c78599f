package org.branchsim.core.laws;

/**
 * Steady flow (Bernoulli) force on a metering member: F = 2 Cd Cv A dp cos(theta), acting to close the
 * opening (Merritt, Hydraulic Control Systems, 1967, jet angle theta about 69 deg for a sharp-edged spool
 * port with no radial clearance, from memory); equivalently F = rho Q v cos(theta) (Vacca and Franzoni,
 * Hydraulic Fluid Power, 2021, sec. 3.8.1). For a spool A = w x.
 */
public final class FlowForce {

    /** Jet angle of a sharp-edged spool port, rad (69 deg, Merritt 1967, from memory). */
    public static final double SPOOL_JET_ANGLE = Math.toRadians(69.0);
    /** cos({@link #SPOOL_JET_ANGLE}), computed once. */
    public static final double SPOOL_JET_COSINE = Math.cos(SPOOL_JET_ANGLE);
    /** Velocity coefficient of a sharp-edged orifice jet (Merritt 1967). */
    public static final double VELOCITY_COEFFICIENT = 0.98;

    private FlowForce() {
    }

    /**
     * @param cd discharge coefficient
     * @param cv velocity coefficient
     * @param area metering area, m^2
     * @param dp pressure difference across the opening (absolute value is used), Pa
     * @param jetAngle jet angle to the member's axis, rad
     * @return closing force, N (never negative)
     */
    public static double closingForce(double cd, double cv, double area, double dp, double jetAngle) {
        return closingForceAtCosine(cd, cv, area, dp, Math.cos(jetAngle));
    }

    /**
     * The same law with the jet angle's cosine computed once by the caller (the hot path of an evaluation).
     *
     * @param cd discharge coefficient
     * @param cv velocity coefficient
     * @param area metering area, m^2
     * @param dp pressure difference across the opening (absolute value is used), Pa
     * @param jetCosine cosine of the jet angle to the member's axis
     * @return closing force, N (never negative)
     */
    public static double closingForceAtCosine(double cd, double cv, double area, double dp, double jetCosine) {
        return 2.0 * cd * cv * area * Math.abs(dp) * jetCosine;
    }

    /**
     * @return dF/d(dp) of {@link #closingForceAtCosine}, N/Pa: 2 Cd Cv A sign(dp) cos(theta) (zero at dp = 0, where
     *         the law has a corner and either one-sided slope is +-2 Cd Cv A cos(theta))
     */
    public static double pressureSlopeAtCosine(double cd, double cv, double area, double dp, double jetCosine) {
        return 2.0 * cd * cv * area * Math.signum(dp) * jetCosine;
    }

    /** @return dF/dA of {@link #closingForceAtCosine}, N/m^2: 2 Cd Cv |dp| cos(theta) */
    public static double areaSlopeAtCosine(double cd, double cv, double dp, double jetCosine) {
        return 2.0 * cd * cv * Math.abs(dp) * jetCosine;
    }
}
