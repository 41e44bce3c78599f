package org.branchsim.core.laws;

/**
 * Pressure waves in a liquid-filled line (Wylie and Streeter, Fluid Transients in Systems, Prentice Hall 1993,
 * ch. 2): the speed c = sqrt(beta_e / rho), where the effective bulk modulus takes the wall's compliance in
 * series with the liquid's (Korteweg 1878): a thin-walled tube of Young's modulus E, inner diameter d and wall
 * thickness t adds 1/beta_wall = d / (E t); a hose is given its own bulk modulus. A sudden change of velocity
 * dv raises the pressure by rho c dv (Joukowsky). SI: Pa, kg/m^3, m, m/s.
 */
public final class WaveSpeed {

    private WaveSpeed() {
    }

    /**
     * @param youngsModulus tube material's Young's modulus E, Pa
     * @param wallThickness wall thickness t, m
     * @param innerDiameter inner diameter d, m
     * @return the thin-wall tube's bulk modulus E t / d, Pa
     */
    public static double thinWallTubeModulus(double youngsModulus, double wallThickness, double innerDiameter) {
        return youngsModulus * wallThickness / innerDiameter;
    }

    /**
     * @param bulkModulus effective bulk modulus of liquid and wall, Pa
     * @param density kg/m^3
     * @return wave speed sqrt(beta_e / rho), m/s
     */
    public static double speed(double bulkModulus, double density) {
        return Math.sqrt(bulkModulus / density);
    }

    /**
     * @param density kg/m^3
     * @param speed wave speed, m/s
     * @param velocityChange sudden change of the mean flow velocity, m/s
     * @return the pressure change rho c dv, Pa
     */
    public static double joukowsky(double density, double speed, double velocityChange) {
        return density * speed * velocityChange;
    }
}
