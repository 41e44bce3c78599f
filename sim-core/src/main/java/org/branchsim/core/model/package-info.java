/**
 * The circuit: named nodes (lumped volumes and tanks), the {@link org.branchsim.core.model.Element} contract,
 * state slots, signals, energy accounts, scheduled inputs and discontinuities, and the evaluation of
 * dy/dt = f(t, y) through which elements add flows and forces without seeing the state array's layout.
 *
 * <p>Dependencies: {@code units}, {@code fluid}, {@code laws}; and {@code parts} through
 * {@code Element.members()}, a cycle the engine branch (issue 10, item 3) removes. Used by {@code elements},
 * {@code solve}, {@code results}, {@code scenario}, {@code analysis} and {@code study}.
 */
package org.branchsim.core.model;
