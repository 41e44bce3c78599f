package org.branchsim.core.laws;

/**
 * Continuity in a lumped, compressible volume: the pressure of a volume V of fluid with effective bulk modulus
 * beta_e rises at dp/dt = beta_e / V * (sum of inflows), the inflows including the displacement flows of moving
 * boundaries (Merritt, Hydraulic Control Systems, 1967, ch. 2). Pressures in Pa, volumes in m^3, flows in
 * m^3/s. Used for the circuit's nodes and for the chambers inside valves.
 */
public final class Compressibility {

    private Compressibility() {
    }

    /**
     * @param bulkModulus effective bulk modulus beta_e at the volume's pressure, Pa
     * @param volume the volume, m^3 (positive)
     * @param netInflow sum of the flows into the volume, m^3/s
     * @return the pressure's rate of change, Pa/s
     */
    public static double pressureRate(double bulkModulus, double volume, double netInflow) {
        return bulkModulus / volume * netInflow;
    }
}
