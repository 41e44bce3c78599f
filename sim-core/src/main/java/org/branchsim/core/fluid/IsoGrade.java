package org.branchsim.core.fluid;

import java.util.Arrays;
import java.util.Locale;

/**
 * ISO 3448 viscosity grades of mineral hydraulic oil. The grade number is the mid-point kinematic
 * viscosity at 40 degC in cSt (ISO 3448). The 100 degC values are typical of a mineral oil with a
 * viscosity index near 100 (from memory, not from the standard, which fixes only the 40 degC band);
 * a scenario can give its oil's own two viscosities instead.
 */
public enum IsoGrade {
    VG10(10, 2.6),
    VG15(15, 3.4),
    VG22(22, 4.3),
    VG32(32, 5.4),
    VG46(46, 6.8),
    VG68(68, 8.7),
    VG100(100, 11.1),
    VG150(150, 14.7);

    private final double nu40Cst;
    private final double nu100Cst;

    IsoGrade(double nu40Cst, double nu100Cst) {
        this.nu40Cst = nu40Cst;
        this.nu100Cst = nu100Cst;
    }

    /** @return kinematic viscosity at 40 degC, m^2/s */
    public double nu40() {
        return nu40Cst * 1e-6;
    }

    /** @return typical kinematic viscosity at 100 degC, m^2/s */
    public double nu100() {
        return nu100Cst * 1e-6;
    }

    /** @return the grade named by text such as "VG46", "VG 46" or "ISO VG 46", or null */
    public static IsoGrade parse(String text) {
        String t = text.toUpperCase(Locale.ROOT).replace("ISO", "").replace(" ", "").replace("-", "");
        return Arrays.stream(values()).filter(g -> g.name().equals(t)).findFirst().orElse(null);
    }

    /** @return the list of grade names for messages */
    public static String names() {
        return String.join(", ", Arrays.stream(values()).map(Enum::name).toArray(String[]::new));
    }
}
