package org.branchsim.core.study;

import org.branchsim.core.analysis.Mode;

import java.util.List;

/**
 * How close a forced response's drive frequency lies to a mode of the circuit, and how much a single lightly damped
 * mode there magnifies the drive: a forced response cannot be damped away (it lasts as long as its source runs);
 * its size is set by the source and by this magnification.
 *
 * <p>Magnification of a second-order mode driven at frequency ratio r = f_drive / f_n with damping ratio zeta:
 * M = 1 / sqrt((1 - r^2)^2 + (2 zeta r)^2), 1 well below the mode, 1/(2 zeta) at r = 1, about 1/r^2 well above
 * (the magnitude of the standard second-order frequency response; Ogata, Modern Control Engineering, 5th ed., 2010,
 * ch. 7, second-order factors; from memory of the section).
 *
 * @param mode the oscillatory mode nearest the drive frequency (ratio closest to 1 on a log scale)
 * @param ratio drive frequency over the mode's natural frequency
 * @param magnification M at that ratio and the mode's damping ratio (dimensionless)
 */
public record DriveResonance(Mode mode, double ratio, double magnification) {

    /**
     * @param frequencyRatio r = f_drive / f_n, positive
     * @param dampingRatio zeta, positive
     * @return the magnification M of a second-order mode driven at r
     */
    public static double magnification(double frequencyRatio, double dampingRatio) {
        double r = frequencyRatio;
        double a = 1.0 - r * r;
        double b = 2.0 * dampingRatio * r;
        return 1.0 / Math.sqrt(a * a + b * b);
    }

    /**
     * @param driveFrequency frequency of the drive, Hz
     * @param modes the circuit's modes (real modes are skipped)
     * @return the oscillatory mode nearest the drive, or null when there is none
     */
    public static DriveResonance nearest(double driveFrequency, List<Mode> modes) {
        Mode best = null;
        double bestDistance = Double.POSITIVE_INFINITY;
        for (Mode m : modes) {
            if (m.imaginary() == 0.0 || !(m.naturalFrequency() > 0.0)) {
                continue;
            }
            double distance = Math.abs(Math.log(driveFrequency / m.naturalFrequency()));
            if (distance < bestDistance) {
                bestDistance = distance;
                best = m;
            }
        }
        if (best == null) {
            return null;
        }
        double r = driveFrequency / best.naturalFrequency();
        return new DriveResonance(best, r, magnification(r, Math.max(best.dampingRatio(), 0.0)));
    }
}
