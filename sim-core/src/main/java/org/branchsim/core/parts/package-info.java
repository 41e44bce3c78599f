/**
 * Reusable pieces of elements: a travel-limited moving member (spool, poppet, piston) whose stops are events, the
 * forces on it, and corner events of piecewise laws. SI units: m, m/s, N, kg.
 *
 * <p>Dependencies: {@code model} (binder, evaluation, state view) and {@code units}. Used by {@code elements} and
 * {@code solve}.
 */
package org.branchsim.core.parts;
