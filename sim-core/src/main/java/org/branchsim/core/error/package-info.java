/**
 * The one exception type, {@link org.branchsim.core.error.BranchsimException}, and its message keys
 * ({@link org.branchsim.core.error.ErrorKey}): each key says whether the user's input is at fault (exit code 2) or
 * the run failed (exit code 1); scenario problems carry their file, line, column and field path
 * ({@link org.branchsim.core.error.Problem}).
 *
 * <p>Dependencies: none inside branchsim; every other package may throw these.
 */
package org.branchsim.core.error;
