package org.branchsim.core.analysis;

import java.util.HashSet;
import java.util.List;
import java.util.Set;

/**
 * The linear mode an oscillation found in the time domain belongs to. A limit cycle grows out of a mode that is
 * unstable or lightly damped at the operating point; its frequency moves away from the mode's as the amplitude
 * grows (seat impacts, saturation), so the match weighs the shape (which parts move) as well as the frequency.
 * <p>
 * Rule (common practice, no source): candidates are the oscillatory modes whose damped frequency lies within
 * {@link #FREQUENCY_SPAN} times the oscillation's fundamental either way and whose participation on the
 * oscillating parts is at least {@link #LEAST_OVERLAP}; the score is overlap x exp(-|ln(f_mode / f)|), highest
 * wins. A sustained oscillation of a circuit whose inputs are constant needs an operating point that does not
 * damp it, so when some candidates are damped less than the margin, only those compete (a limit cycle with seat
 * impacts runs well below the frequency of the unstable mode it grows from, and a well-damped mode nearer in
 * frequency must not take its place).
 *
 * @param mode the matched mode
 * @param frequencyRatio the mode's damped frequency over the oscillation's fundamental
 * @param overlap the mode's participation summed over the parts whose signals oscillate, 0..1
 */
public record ModeMatch(Mode mode, double frequencyRatio, double overlap) {

    /** Widest ratio between a mode's frequency and the oscillation's fundamental that may still match. */
    public static final double FREQUENCY_SPAN = 2.0;
    /** Least participation on the oscillating parts for a mode to match. */
    public static final double LEAST_OVERLAP = 0.2;

    /**
     * @param finding an oscillation found in the time domain
     * @param modes the modes at the operating point in (or at the end of) its window
     * @param margin damping ratio below which a mode counts as not damping the oscillation
     * @return the best match, or null when no mode qualifies
     */
    public static ModeMatch find(OscillationFinding finding, List<Mode> modes, double margin) {
        Set<String> moving = new HashSet<>();
        for (SignalOscillation s : finding.signals()) {
            moving.add(ModeAnalysis.part(s.signal()));
        }
        ModeMatch best = null;
        double bestScore = 0.0;
        boolean weakOnly = false;
        for (Mode m : modes) {
            if (!m.oscillatory()) {
                continue;
            }
            double ratio = m.dampedFrequency() / finding.frequency();
            if (ratio > FREQUENCY_SPAN || ratio < 1.0 / FREQUENCY_SPAN) {
                continue;
            }
            double overlap = 0.0;
            for (Mode.Share s : m.parts()) {
                if (moving.contains(s.name())) {
                    overlap += s.share();
                }
            }
            if (overlap < LEAST_OVERLAP) {
                continue;
            }
            double score = overlap * Math.exp(-Math.abs(Math.log(ratio)));
            boolean weak = m.dampingRatio() < margin;
            if (weak && !weakOnly) {
                weakOnly = true;
                bestScore = 0.0;
                best = null;
            }
            if ((weak || !weakOnly) && score > bestScore) {
                bestScore = score;
                best = new ModeMatch(m, ratio, overlap);
            }
        }
        return best;
    }
}
