/**
 * One class per physical device: pump, orifice, metering path, check valve, relief valve, pilot-operated and
 * direct-acting reducing valves, cylinder, motor. Each declares its states, signals, energy accounts and
 * discontinuities when bound, and adds its flows and forces through the evaluation; the laws it uses come from
 * {@code laws}. SI units inside; every flow's sign convention is in its class comment.
 *
 * <p>Dependencies: {@code model}, {@code parts}, {@code laws}, {@code fluid}, {@code units}; never {@code solve}
 * nor the state array's positions (the architecture test checks both). Used by {@code scenario}, {@code analysis}
 * and {@code study}.
 */
package org.branchsim.core.elements;
