package org.branchsim.core.analysis;

import java.util.List;
import org.branchsim.core.units.Dimension;

/**
 * An oscillation of the circuit: the signals that oscillate together at one frequency, the one that does
 * so most, the parts they belong to, and whether it is chatter or hunting.
 *
 * @param kind chatter (a member striking its seat or stop repeatedly) or hunting (no impacts)
 * @param frequency frequency, Hz
 * @param trend growing, decaying or limit cycle (of the dominant signal)
 * @param growthRate amplitude growth rate of the dominant signal, 1/s
 * @param dominant the oscillation of the dominant signal (largest amplitude relative to its threshold)
 * @param dominantDimension the dominant signal's dimension (pressure or length)
 * @param elements elements and nodes that take part, most involved first
 * @param signals all oscillating signals at this frequency
 * @param impactingMember the member striking its seat or stop (chatter), or null
 * @param impactsPerSecond impacts of that member per second in the window
 */
public record OscillationFinding(Kind kind, double frequency, Oscillation.Trend trend, double growthRate,
                                 Oscillation dominant, Dimension dominantDimension, List<String> elements, List<Oscillation> signals,
                                 String impactingMember, double impactsPerSecond) {

    /** Chatter or hunting. */
    public enum Kind {
        /** A poppet or spool strikes its seat or stop repeatedly. */
        CHATTER,
        /** Pressure and spool oscillate without seat impacts. */
        HUNTING;

        /** @return lower-case label */
        public String label() {
            return name().toLowerCase(java.util.Locale.ROOT);
        }
    }
}
