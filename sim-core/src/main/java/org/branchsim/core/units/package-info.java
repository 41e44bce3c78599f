/**
 * Physical quantities at the edges: parses values written with their unit ("60 bar", "12 L/min", "0.8 mm",
 * "25 degC", with a tolerance such as "0.8 mm ± 0.02 mm") into SI, and formats SI back into the scenario's unit
 * system (metric or US customary). Exact factors from NIST SP 811. Everything inside branchsim is SI.
 *
 * <p>Dependencies: none inside branchsim; every other package may use this one.
 */
package org.branchsim.core.units;
