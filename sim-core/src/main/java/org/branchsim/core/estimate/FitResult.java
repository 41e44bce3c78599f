package org.branchsim.core.estimate;

import java.util.List;

/**
 * The outcome of a weighted least-squares fit, in the scaled parameters u in [0, 1] (multiply by the bounds'
 * width for the parameter's unit).
 *
 * @param start the start the best optimum was reached from
 * @param optimum the optimum found
 * @param costBefore sum of squared weighted residuals at the first start
 * @param costAfter sum of squared weighted residuals at the optimum
 * @param observations number of residuals n
 * @param variance residual variance s^2 = costAfter / (n - p)
 * @param tQuantile the 97.5 % quantile of Student's t with n - p degrees of freedom
 * @param covariance approximate covariance of u, s^2 (J^T J)^-1 (pseudo-inverse; NaN where undetermined)
 * @param halfWidth half-width of the approximate 95 % confidence interval of each u, t sqrt(covariance_ii)
 * @param correlation correlation matrix of the estimates
 * @param identifiability per parameter: null when identifiable, else why not
 * @param conditionIndex largest over smallest singular value of the column-scaled Jacobian
 * @param iterations Levenberg-Marquardt iterations of the best start
 * @param modelRuns model runs (residual vectors) of all starts together
 * @param startsTried the starts, each with the cost it reached (NaN when it failed)
 */
public record FitResult(double[] start, double[] optimum, double costBefore, double costAfter, int observations,
                        double variance, double tQuantile, double[][] covariance, double[] halfWidth,
                        double[][] correlation, List<String> identifiability, double conditionIndex, int iterations,
                        int modelRuns, List<double[]> startsTried) {

    /** @return true when every parameter is identifiable */
    public boolean identifiable() {
        return identifiability.stream().allMatch(java.util.Objects::isNull);
    }
}
