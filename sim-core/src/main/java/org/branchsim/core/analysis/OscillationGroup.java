package org.branchsim.core.analysis;

import java.util.List;

/**
 * One physical oscillation of the circuit seen in several signals: the components whose fundamentals agree,
 * or where one is an integer multiple of the group's fundamental (a signal that shows only the second
 * harmonic of the same motion).
 *
 * @param frequency the group's fundamental frequency, Hz: the strength-weighted mean of the members'
 *                  frequencies, each divided by its multiple
 * @param trend growing, decaying or limit cycle: the trend of the strongest member
 * @param growthRate exponential growth rate of the strongest member's amplitude, 1/s
 * @param strength strength of the strongest member (its end amplitude over its threshold), dimensionless
 * @param members the signals taking part, strongest first (ties by signal name)
 */
public record OscillationGroup(double frequency, Oscillation.Trend trend, double growthRate, double strength,
                               List<Member> members) {

    /** Keeps an unmodifiable copy of the members. */
    public OscillationGroup {
        members = List.copyOf(members);
    }

    /**
     * One signal's part in a group.
     *
     * @param oscillation the signal's component
     * @param multiple which multiple of the group's fundamental the component's own fundamental is (1 when it
     *                 oscillates at the group's frequency, 2 when the signal shows only the second harmonic)
     */
    public record Member(SignalOscillation oscillation, int multiple) {
    }

    /** @return the strongest member's component */
    public SignalOscillation dominant() {
        return members.get(0).oscillation();
    }
}
