package org.branchsim.core.analysis;

import java.util.List;

/**
 * One mode of the linearised circuit: an eigenvalue lambda = sigma + i omega_d of its Jacobian.
 *
 * @param real real part sigma, 1/s
 * @param imaginary imaginary part omega_d, rad/s (zero for a real mode)
 * @param naturalFrequency |lambda| / 2 pi, Hz
 * @param dampingRatio -sigma / |lambda| (1 for a real decaying mode, negative when unstable)
 * @param participation states that take part most, with their normalised participation factors
 * @param elements elements (or nodes) that take part most, summed over their states
 */
public record Mode(double real, double imaginary, double naturalFrequency, double dampingRatio,
                   List<Share> participation, List<Share> elements) {

    /** Damping ratio below which a mode is flagged as lightly damped. */
    public static final double LIGHT_DAMPING = 0.1;

    /** A part's share of a mode. @param name state or element @param share 0..1 */
    public record Share(String name, double share) {
    }

    /** @return true for a complex (oscillatory) mode */
    public boolean oscillatory() {
        return imaginary > 0.0;
    }

    /** @return damped frequency omega_d / 2 pi, Hz */
    public double dampedFrequency() {
        return imaginary / (2 * Math.PI);
    }

    /** @return true for an oscillatory mode with damping ratio below {@link #LIGHT_DAMPING} */
    public boolean lightlyDamped() {
        return oscillatory() && dampingRatio < LIGHT_DAMPING;
    }
}
