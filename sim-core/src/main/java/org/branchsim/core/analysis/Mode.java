package org.branchsim.core.analysis;

import java.util.List;

/**
 * One mode of the linearised circuit: an eigenvalue lambda = sigma + i omega_d of its Jacobian, with the
 * parts that take part in it and its shape.
 *
 * @param real real part sigma, 1/s (positive: the mode grows)
 * @param imaginary imaginary part omega_d, rad/s (zero for a real mode)
 * @param naturalFrequency |lambda| / 2 pi, Hz
 * @param dampingRatio -sigma / |lambda| (1 for a real decaying or zero mode, negative when unstable)
 * @param name a short name from the parts that take part most, e.g. "reducer.pilot + reducer.chamber"
 * @param participation every free state's participation factor, normalised to sum to one, largest first
 * @param parts participation summed per part (a member such as {@code reducer.spool}, or a node or element
 *        pressure such as {@code reduced} or {@code reducer.chamber}), largest first
 * @param elements participation summed per element or node ({@code reducer}, {@code reduced}), largest first
 * @param components magnitudes of the right eigenvector's components in scaled states (state / its typical
 *        magnitude), normalised so that the largest is 1, largest first
 */
public record Mode(double real, double imaginary, double naturalFrequency, double dampingRatio, String name,
                   List<Share> participation, List<Share> parts, List<Share> elements, List<Share> components) {

    /** Default damping-ratio margin: oscillatory modes with 0 <= zeta below it are flagged LOW. */
    public static final double DEFAULT_MARGIN = 0.05;

    /** Stability of a mode against a damping-ratio margin. */
    public enum Verdict {
        /** zeta < 0: the mode grows (sigma > 0), including real modes with lambda > 0. */
        UNSTABLE,
        /** An oscillatory mode with 0 <= zeta < margin. */
        LOW,
        /** Damped at least as well as the margin asks, or a decaying real mode. */
        OK
    }

    /** A part's share of a mode. @param name state, part or element @param share 0..1 */
    public record Share(String name, double share) {
    }

    /** Copies the lists. */
    public Mode {
        participation = List.copyOf(participation);
        parts = List.copyOf(parts);
        elements = List.copyOf(elements);
        components = List.copyOf(components);
    }

    /** @return true for a complex (oscillatory) mode */
    public boolean oscillatory() {
        return imaginary > 0.0;
    }

    /** @return damped frequency omega_d / 2 pi, Hz */
    public double dampedFrequency() {
        return imaginary / (2 * Math.PI);
    }

    /** @return growth rate sigma = Re(lambda), 1/s: positive for an unstable mode (amplitude ~ e^(sigma t)) */
    public double growthRate() {
        return real;
    }

    /** @return the time the amplitude of an unstable mode takes to double, ln 2 / sigma, s (infinite if stable) */
    public double doublingTime() {
        return real > 0 ? Math.log(2.0) / real : Double.POSITIVE_INFINITY;
    }

    /**
     * @param margin damping-ratio margin, in (0, 1)
     * @return UNSTABLE when zeta < 0, LOW for an oscillatory mode with zeta below the margin, OK otherwise
     */
    public Verdict verdict(double margin) {
        if (!(margin > 0.0 && margin < 1.0)) {
            throw new IllegalArgumentException("damping-ratio margin must be in (0, 1), found " + margin);
        }
        if (dampingRatio < 0.0) {
            return Verdict.UNSTABLE;
        }
        return oscillatory() && dampingRatio < margin ? Verdict.LOW : Verdict.OK;
    }

    /** @return the verdict against {@link #DEFAULT_MARGIN} */
    public Verdict verdict() {
        return verdict(DEFAULT_MARGIN);
    }

    /** @return true for an oscillatory mode with damping ratio below {@link #DEFAULT_MARGIN} (unstable included) */
    public boolean lightlyDamped() {
        return oscillatory() && dampingRatio < DEFAULT_MARGIN;
    }
}
