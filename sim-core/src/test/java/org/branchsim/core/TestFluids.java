package org.branchsim.core;

import org.branchsim.core.fluid.Fluid;

/** Fluids used by the tests. */
public final class TestFluids {
    private TestFluids() {
    }

    /** Air-free mineral oil: 870 kg/m^3, 32 cSt, 1.6 GPa (REFERENCES: Merritt 1967 worked numbers). */
    public static Fluid referenceOil() {
        return new Fluid(870.0, 32e-6, 1.6e9, 0.0, 1.0, 313.15);
    }
}
