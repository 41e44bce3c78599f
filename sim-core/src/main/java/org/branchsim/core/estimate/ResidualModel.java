package org.branchsim.core.estimate;

import java.util.List;

/**
 * A model of measurements for a least-squares fit: for each point u in [0, 1]^p (the free parameters scaled
 * to their bounds) the vector of weighted residuals (model minus measurement, divided by the measurement's
 * standard deviation). Points come in batches so that an implementation may evaluate them in parallel.
 */
public interface ResidualModel {

    /** @return the number of free parameters p */
    int parameters();

    /**
     * @param points points u in [0, 1]^p
     * @return per point its residual vector (all of one length), or null where the model failed at the point
     */
    List<double[]> residuals(List<double[]> points);
}
