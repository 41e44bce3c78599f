/**
 * Reads a scenario file (JSON or YAML) into a tree that keeps the line and column of every value, checks it
 * field by field with located messages, converts units to SI and builds the circuit. The only package of sim-core
 * that touches files.
 *
 * <p>Dependencies: {@code model}, {@code elements}, {@code laws}, {@code fluid}, {@code units}, {@code error}, and
 * today {@code solve} for the solver settings (to be removed by the engine branch of issue 10). Used by
 * {@code study}, sim-cli and the tests.
 */
package org.branchsim.core.scenario;
