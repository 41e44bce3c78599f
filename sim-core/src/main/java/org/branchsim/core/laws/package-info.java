/**
 * Published physical laws, each in one place and each tested against its source: orifice flow with its laminar
 * region, annular leakage, steady flow force, poppet seat areas, continuity in a compressible volume. Pure
 * functions of SI numbers, with no state and no knowledge of circuits.
 *
 * <p>Dependencies: none inside branchsim (the architecture test keeps it so). Used by {@code elements} (which call
 * them at every evaluation) and by {@code scenario} (areas from diameters).
 */
package org.branchsim.core.laws;
