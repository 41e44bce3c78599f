/**
 * How a run is integrated: the {@link org.branchsim.core.settings.SolverSettings} record (method, end time and
 * output interval in s, tolerances, limits) and the {@link org.branchsim.core.settings.Method} enum. A neutral
 * place so that the scenario reader can build settings without depending on the solver. Depends only on
 * {@code error} and {@code units}; {@code scenario}, {@code solve}, {@code results} and the commands depend on it.
 */
package org.branchsim.core.settings;
