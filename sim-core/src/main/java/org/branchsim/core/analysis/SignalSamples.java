package org.branchsim.core.analysis;

import java.util.Objects;
import org.branchsim.core.error.BranchsimException;
import org.branchsim.core.error.ErrorKey;
import org.branchsim.core.units.Dimension;

/**
 * One uniformly sampled signal handed to the oscillation detector, with what counts as noise for it.
 * The samples are not copied: the caller must not change them while a detection runs.
 *
 * @param name signal name, e.g. {@code reducer.pilot.x}
 * @param dimension the signal's physical dimension (its samples are in the SI unit of that dimension)
 * @param samples the signal's values in SI, one per sample time of the trace
 * @param threshold smallest oscillation amplitude that counts, in the same SI unit as the samples; positive
 */
public record SignalSamples(String name, Dimension dimension, double[] samples, double threshold) {

    /** Checks that name, dimension and samples are present and that the threshold is positive and finite. */
    public SignalSamples {
        Objects.requireNonNull(name, "name");
        Objects.requireNonNull(dimension, "dimension");
        Objects.requireNonNull(samples, "samples");
        if (!(threshold > 0.0) || Double.isInfinite(threshold)) {
            throw new BranchsimException(ErrorKey.VALUE_NOT_FINITE,
                    "oscillation threshold of signal " + name, String.valueOf(threshold));
        }
    }
}
