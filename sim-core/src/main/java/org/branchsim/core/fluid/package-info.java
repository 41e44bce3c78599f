/**
 * The hydraulic fluid: density against temperature, kinematic viscosity against temperature (ASTM D341, Walther;
 * ISO 3448 grades) and the effective bulk modulus of oil with entrained air and compliant walls (Merritt 1967).
 * SI units: kg/m^3, m^2/s, Pa, K.
 *
 * <p>Dependencies: {@code units} only. Used by {@code model}, {@code elements}, {@code scenario} and {@code solve}.
 */
package org.branchsim.core.fluid;
