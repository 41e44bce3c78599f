package org.branchsim.core.laws;

/**
 * Laminar leakage through the clearance of a concentric annulus (plane Poiseuille flow unrolled):
 * Q = pi D c^3 dp / (12 mu L) (Rabie, Fluid Power Engineering, 2009, eq. 2.19; White, Fluid Mechanics).
 * A fully eccentric annulus leaks (1 + 1.5 e^2) = 2.5 times more; {@code eccentricity} e is 0..1.
 */
public final class AnnularLeakage {

    private AnnularLeakage() {
    }

    /**
     * @param diameter mean diameter of the annulus, m
     * @param clearance radial clearance, m
     * @param length length of the sealing land, m
     * @param eccentricity relative eccentricity 0 (concentric) .. 1 (touching)
     * @return conductance Q/dp per unit dynamic viscosity, m^3/(s Pa) * Pa s = m^3
     */
    public static double conductanceTimesViscosity(double diameter, double clearance, double length, double eccentricity) {
        return Math.PI * diameter * clearance * clearance * clearance / (12.0 * length)
                * (1.0 + 1.5 * eccentricity * eccentricity);
    }

    /**
     * @return leakage flow, m^3/s, for pressure difference dp (Pa) and dynamic viscosity mu (Pa s)
     */
    public static double flow(double diameter, double clearance, double length, double eccentricity,
                              double dp, double mu) {
        return conductanceTimesViscosity(diameter, clearance, length, eccentricity) * dp / mu;
    }
}
