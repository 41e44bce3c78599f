package org.branchsim.core.laws;

/**
 * Kinematic flow ripple of a positive-displacement pump: the instantaneous delivery over the mean delivery as a
 * function of the shaft angle (rad), with no compression or leakage effects (what the piston or tooth motion alone
 * delivers).
 * <ul>
 * <li>Axial-piston pump with z pistons on a swash plate: each piston delivers at a rate proportional to
 * sin(theta + 2 pi i / z) while that sine is positive (its delivery stroke), so
 * Q/Q_mean = (pi/z) sum_i max(0, sin(theta + 2 pi i/z)) (the mean of the sum over a turn is z/pi).
 * The ripple repeats 2 z times per turn for odd z and z times for even z.</li>
 * <li>External gear pump, two equal involute gears of z teeth (addendum one module, pressure angle alpha, contact
 * ratio taken as one): Q is proportional to r_a^2 - r_w^2 - s^2, s the distance of the contact point from the
 * pitch point, sweeping one base pitch p_b = pi m cos(alpha) per tooth. With r_a^2 - r_w^2 = m^2 (z + 1) and
 * k = pi^2 cos^2(alpha): Q/Q_mean = 1 + k (1/12 - u^2) / (z + 1 - k/12), u = frac(z theta / 2 pi) - 1/2. The ripple
 * repeats z times per turn (the tooth frequency).</li>
 * </ul>
 * Sources: Ivantysyn and Ivantysynova, Hydrostatic Pumps and Motors, 2001 (piston kinematics; gear pump flow);
 * Manring and Kasaragadda, The theoretical flow ripple of an external gear pump, J. Dyn. Sys. Meas. Control 125,
 * 2003. See docs/theory.md 6.1.
 *
 * @param kind the pump's kinematics
 * @param count number of pistons or of teeth per gear
 * @param pressureAngle gear pressure angle, rad (ignored for a piston pump)
 */
public record KinematicRipple(Kind kind, int count, double pressureAngle) {

    /** The kinematics of the displacement elements. */
    public enum Kind {
        /** Axial-piston pump (swash plate or bent axis). */
        AXIAL_PISTON,
        /** External gear pump with two equal involute gears. */
        GEAR
    }

    /**
     * @param kind the kinematics
     * @param count pistons or teeth, at least 3
     * @param pressureAngle gear pressure angle, rad
     */
    public KinematicRipple {
        if (count < 3) {
            throw new IllegalArgumentException("at least 3 pistons or teeth: " + count);
        }
    }

    /**
     * @param owner the id of the pump
     * @return the ripple in words, e.g. "flow ripple of pump (axial piston, 9 pistons: 18 periods a turn)"
     */
    public String describe(String owner) {
        String what = kind == Kind.AXIAL_PISTON ? "axial piston, " + count + " pistons" : "gear, " + count + " teeth";
        return "flow ripple of " + owner + " (" + what + ": " + periodsPerTurn() + " periods a turn)";
    }

    /** @return the number of ripple periods per shaft turn (2z for an odd piston count, else z) */
    public int periodsPerTurn() {
        return kind == Kind.AXIAL_PISTON && count % 2 == 1 ? 2 * count : count;
    }

    /**
     * @param shaftAngle shaft angle, rad
     * @return instantaneous over mean delivery, dimensionless (mean 1 over a turn)
     */
    public double factor(double shaftAngle) {
        if (kind == Kind.AXIAL_PISTON) {
            double sum = 0.0;
            for (int i = 0; i < count; i++) {
                sum += Math.max(0.0, Math.sin(shaftAngle + 2.0 * Math.PI * i / count));
            }
            return Math.PI / count * sum;
        }
        double k = gearConstant();
        double u = toothPhase(shaftAngle) - 0.5;
        return 1.0 + k * (1.0 / 12.0 - u * u) / (count + 1.0 - k / 12.0);
    }

    /**
     * @param shaftAngle shaft angle, rad
     * @return d(factor)/d(shaft angle), per rad (one-sided at the kinks, where a piston or tooth changes over)
     */
    public double slope(double shaftAngle) {
        if (kind == Kind.AXIAL_PISTON) {
            double sum = 0.0;
            for (int i = 0; i < count; i++) {
                double phase = shaftAngle + 2.0 * Math.PI * i / count;
                if (Math.sin(phase) > 0.0) {
                    sum += Math.cos(phase);
                }
            }
            return Math.PI / count * sum;
        }
        double k = gearConstant();
        double u = toothPhase(shaftAngle) - 0.5;
        return -2.0 * k * u * (count / (2.0 * Math.PI)) / (count + 1.0 - k / 12.0);
    }

    private double gearConstant() {
        double c = Math.cos(pressureAngle);
        return Math.PI * Math.PI * c * c;
    }

    private double toothPhase(double shaftAngle) {
        double turns = count * shaftAngle / (2.0 * Math.PI);
        return turns - Math.floor(turns);
    }
}
