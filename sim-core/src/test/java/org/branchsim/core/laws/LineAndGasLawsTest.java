package org.branchsim.core.laws;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/**
 * The line and gas laws against the worked numbers of REFERENCES.md, each computed from the published formula:
 * Korteweg's wave speed and Joukowsky's surge (Wylie and Streeter, Fluid Transients in Systems, Prentice Hall
 * 1993, ch. 2), Hagen-Poiseuille and Blasius friction (White, Fluid Mechanics, ch. 6), Boyle's and Poisson's
 * laws for the accumulator's gas.
 */
class LineAndGasLawsTest {

    private static final double RHO = 870.0;

    @Test
    void korteweg() {
        // Given oil K = 1.5 GPa, rho = 870 in a steel tube d = 10 mm, t = 1.5 mm, E = 206 GPa
        double wall = WaveSpeed.thinWallTubeModulus(206e9, 1.5e-3, 10e-3);
        // Then c = sqrt(K/rho)/sqrt(1 + K d/(E t)) = 1282 m/s (Korteweg 1878; Wylie and Streeter 1993; REFERENCES.md)
        double series = 1.0 / (1.0 / 1.5e9 + 1.0 / wall);
        assertEquals(1282.0, WaveSpeed.speed(series, RHO), 1.0);
        // and a hose of wall bulk modulus 0.5 GPa gives 657 m/s (same source)
        assertEquals(657.0, WaveSpeed.speed(1.0 / (1.0 / 1.5e9 + 1.0 / 0.5e9), RHO), 1.0);
        // and a rigid line sqrt(1.6 GPa / 870) = 1356 m/s (Wylie and Streeter 1993; REFERENCES.md)
        assertEquals(1356.0, WaveSpeed.speed(1.6e9, RHO), 1.0);
    }

    @Test
    void joukowsky() {
        // Joukowsky rho c dv: 20 L/min stopped in the 10 mm tube at c = 1282 m/s gives 47.3 bar (REFERENCES.md)
        assertEquals(47.3e5, WaveSpeed.joukowsky(RHO, 1282.0, 4.244), 0.05e5);
        // and 5 m/s stopped at c = 1356 m/s gives 59.0 bar (same)
        assertEquals(59.0e5, WaveSpeed.joukowsky(RHO, 1356.0, 5.0), 0.05e5);
    }

    @Test
    void laminarFrictionIsHagenPoiseuille() {
        // Given d = 10 mm, v = 4.244 m/s, nu = 46 cSt: Re = 923 and dp/L = 0.544 bar/m (Hagen-Poiseuille,
        // White, Fluid Mechanics; worked in REFERENCES.md)
        double q = 4.244 * 0.25 * Math.PI * 1e-4;
        assertEquals(923.0, PipeFriction.reynolds(4.244, 10e-3, 46e-6), 1.0);
        assertEquals(0.544e5, PipeFriction.pressureDrop(q, 10e-3, 1.0, RHO, 46e-6), 0.001e5);
        assertEquals(-0.544e5, PipeFriction.pressureDrop(-q, 10e-3, 1.0, RHO, 46e-6), 0.001e5);
    }

    @Test
    void turbulentFrictionIsBlasius() {
        // Blasius lambda = 0.3164 Re^-0.25 (White, Fluid Mechanics): at Re = 1e4, lambda = 0.03164
        assertEquals(0.03164, PipeFriction.darcyFactor(1e4), 1e-5);
        // and the transition band joins the two laws without a jump (common practice, no source)
        assertEquals(64.0 / 2000.0, PipeFriction.darcyFactor(2000.0 + 1e-9), 1e-9);
        assertEquals(0.3164 / Math.pow(4000.0, 0.25), PipeFriction.darcyFactor(4000.0 - 1e-9), 1e-9);
        double previous = PipeFriction.pressureDrop(1e-6, 10e-3, 1.0, RHO, 1e-6);
        for (double q = 2e-6; q < 1e-3; q *= 1.1) {
            double drop = PipeFriction.pressureDrop(q, 10e-3, 1.0, RHO, 1e-6);
            assertTrue(drop > previous, "the drop rises with the flow at " + q);
            previous = drop;
        }
    }

    /**
     * The slope of the drop with the flow: the Hagen-Poiseuille resistance 128 rho nu L/(pi d^4) while laminar
     * (White, Fluid Mechanics, the laminar pipe flow solution: the drop is linear in the flow, slope = drop/flow), 7/4
     * of drop/flow in the Blasius range (lambda ~ Re^-1/4, so the drop goes as q^(7/4)), and, through the transition
     * band (common practice, no source), the limit of the drop's own difference quotient on both sides of each flow.
     */
    @Test
    void frictionSlopeFollowsTheLaws() {
        double d = 10e-3;
        double nu = 46e-6;
        double area = 0.25 * Math.PI * d * d;
        double laminarFlow = 500 * nu / d * area;
        double resistance = 128.0 * RHO * nu / (Math.PI * Math.pow(d, 4));
        assertEquals(PipeFriction.pressureDrop(laminarFlow, d, 1.0, RHO, nu) / laminarFlow,
                PipeFriction.pressureDropSlope(laminarFlow, d, 1.0, RHO, nu), 1e-12 * resistance);
        assertEquals(resistance, PipeFriction.pressureDropSlope(-laminarFlow, d, 1.0, RHO, nu), 1e-12 * resistance);
        for (double re : new double[] {5e3, 2e4, 8e4}) {
            double q = re * nu / d * area;
            double drop = PipeFriction.pressureDrop(q, d, 1.0, RHO, nu);
            assertEquals(1.75 * drop / q, PipeFriction.pressureDropSlope(q, d, 1.0, RHO, nu), 1e-12 * drop / q,
                    "Blasius at Re = " + re);
            assertEquals(1.75 * drop / q, PipeFriction.pressureDropSlope(-q, d, 1.0, RHO, nu), 1e-12 * drop / q);
        }
        for (double re = 2050; re < 4000; re += 150) {
            double q = re * nu / d * area;
            double h = 1e-7 * q;
            double quotient = (PipeFriction.pressureDrop(q + h, d, 1.0, RHO, nu)
                    - PipeFriction.pressureDrop(q - h, d, 1.0, RHO, nu)) / (2 * h);
            assertEquals(quotient, PipeFriction.pressureDropSlope(q, d, 1.0, RHO, nu), 1e-6 * quotient,
                    "transition at Re = " + re);
        }
    }

    @Test
    void boyleAndPoisson() {
        // Given 0.5 L precharged to 50 bar(g), charged to 140 bar(g): V_gas = 0.1809 L isothermal (Boyle),
        // 0.2419 L adiabatic (Poisson, n = 1.4) (REFERENCES.md worked numbers, absolute pressures)
        double p0 = 50e5 + 101325.0;
        double p = 140e5 + 101325.0;
        assertEquals(0.1809e-3, GasSpring.polytropicVolume(p0, 0.5e-3, p, 1.0), 0.0001e-3);
        assertEquals(0.2419e-3, GasSpring.polytropicVolume(p0, 0.5e-3, p, 1.4), 0.0001e-3);
        assertEquals(p, GasSpring.polytropicPressure(p0, 0.5e-3, 0.2419e-3, 1.4), p * 1e-3); // V rounded to 4 digits
        // and the gas spring n p A^2 / V on the neck's fluid mass rho A L of a 4 mm x 50 mm neck rings at 24.4 Hz
        // (Helmholtz resonator, from memory; REFERENCES.md worked number)
        double area = 0.25 * Math.PI * 16e-6;
        double k = GasSpring.stiffness(1.4, p, area, 0.2419e-3);
        assertEquals(24.4, Math.sqrt(k / (RHO * area * 0.05)) / (2 * Math.PI), 0.05);
        // and the ideal gas law p V / T = const (Boyle, Gay-Lussac): twice the temperature, twice the pressure
        assertEquals(2 * p0, GasSpring.idealGasPressure(p0, 0.5e-3, 300.0, 0.5e-3, 600.0), 1e-6);
    }
}
