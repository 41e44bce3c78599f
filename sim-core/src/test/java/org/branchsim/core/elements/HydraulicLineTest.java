package org.branchsim.core.elements;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.branchsim.core.fluid.Fluid;
import org.branchsim.core.model.CircuitBuilder;
import org.branchsim.core.model.CircuitModel;
import org.branchsim.core.model.Node;
import org.branchsim.core.model.ScheduledInput;
import org.branchsim.core.results.Trace;
import org.branchsim.core.settings.SolverSettings;
import org.branchsim.core.solve.Simulator;
import org.junit.jupiter.api.Test;

/**
 * A segmented hydraulic line against the classical results of waves in liquid lines (Wylie and Streeter, Fluid
 * Transients in Systems, Prentice Hall 1993; Merritt, Hydraulic Control Systems, 1967, ch. 4): the wave speed
 * with Korteweg's wall correction, Joukowsky's surge on a sudden closure, the quarter-wave resonance of a line
 * closed at one end, and the steady pressure drop of Hagen-Poiseuille and Blasius friction.
 */
class HydraulicLineTest {

    private static final double RHO = 870.0;
    /** Oil of REFERENCES.md's surge example: K = 1.5 GPa; thin (1 cSt) so that friction barely disturbs waves. */
    private static final Fluid THIN_OIL = new Fluid(RHO, 1e-6, 1.5e9, 0.0, 1.0, 313.15);
    /** Steel tube of REFERENCES.md: d = 10 mm, t = 1.5 mm, E = 206 GPa: wall bulk modulus E t / d. */
    private static final double D = 10e-3;
    private static final double TUBE_WALL = 206e9 * 1.5e-3 / D;
    /** Korteweg c = sqrt(K/rho)/sqrt(1 + K d/(E t)), computed here from the published formula (1282 m/s). */
    private static final double C = Math.sqrt(1.5e9 / RHO) / Math.sqrt(1 + 1.5e9 * D / (206e9 * 1.5e-3));
    private static final double AREA = 0.25 * Math.PI * D * D;
    /** Tolerance the issue sets for surge and resonance: 2 %. */
    private static final double WAVE_TOLERANCE = 0.02;

    @Test
    void waveSpeedHasKortewegsWallCorrection() {
        HydraulicLine line = new HydraulicLine("l", Node.tank("a", 0), Node.tank("b", 0), 1.0, D, TUBE_WALL, 1);
        // Korteweg 1878, Wylie and Streeter 1993: 1282 m/s for this tube and oil (REFERENCES.md)
        assertEquals(1282.0, line.waveSpeed(THIN_OIL, 50e5), 1.0);
        assertEquals(C, line.waveSpeed(THIN_OIL, 50e5), 1e-6 * C);
    }

    @Test
    void suddenClosureRaisesThePressureByJoukowsky() {
        // Given 2 m of the tube from a 50 bar supply to a valve that passes about 20 L/min to tank
        Node supply = Node.tank("supply", 50e5);
        Node tank = Node.tank("tank", 0.0);
        Node end = Node.volume("end", 0.01e-6, Double.POSITIVE_INFINITY, 50e5);
        double length = 2.0;
        HydraulicLine line = new HydraulicLine("line", supply, end, length, D, TUBE_WALL, 40);
        MeteringPath valve = new MeteringPath("valve", end, tank, 4.85e-6, 0.61, 1.0);
        double closing = 0.02;
        valve.opening().addRamp(new ScheduledInput.Ramp(closing, 0.0, 0.0));
        CircuitModel c = new CircuitBuilder("surge", THIN_OIL).add(supply).add(tank).add(end).add(line).add(valve)
                .build();

        // When the valve shuts at once after the flow has settled
        double roundTrip = 2 * length / C;
        Trace t = Simulator.run(c, SolverSettings.defaults(closing + roundTrip, 1e-5)).trace();

        // Then, for the first round trip 2L/c, the pressure at the valve stands rho c v above its value before the
        // closure (Joukowsky; Wylie and Streeter 1993, eq. 2.1), averaged over the lumped line's ringing
        int before = indexAt(t, closing - 1e-5);
        double v = t.series("line.q.b")[before] / AREA;
        double pBefore = t.series("end.p")[before];
        double plateau = mean(t, "end.p", closing + 0.25 * roundTrip, closing + 0.85 * roundTrip);
        double surge = RHO * C * v;
        assertEquals(surge, plateau - pBefore, surge * WAVE_TOLERANCE);
        assertEquals(4.0, v, 0.5); // the flow was about 20 L/min (4.2 m/s) as intended
    }

    @Test
    void lineClosedAtOneEndResonatesAtAQuarterWave() {
        // Given 2 m of the tube from a supply to a closed end
        Node supply = Node.tank("supply", 50e5);
        supply.tankPressure().addRamp(new ScheduledInput.Ramp(0.001, 0.0005, 51e5, ScheduledInput.Shape.S_CURVE));
        Node end = Node.volume("end", 0.01e-6, Double.POSITIVE_INFINITY, 50e5);
        double length = 2.0;
        HydraulicLine line = new HydraulicLine("line", supply, end, length, D, TUBE_WALL, 20);
        CircuitModel c = new CircuitBuilder("quarter", THIN_OIL).add(supply).add(end).add(line).build();

        // When the supply rises by 1 bar
        Trace t = Simulator.run(c, SolverSettings.defaults(0.05, 1e-5)).trace();

        // Then the closed end rings at c / (4 L) (Wylie and Streeter 1993, ch. 7; Merritt 1967): 160 Hz
        double expected = C / (4 * length);
        double measured = Crossings.frequency(t, "end.p", 51e5, 0.001);
        assertEquals(expected, measured, expected * WAVE_TOLERANCE);
    }

    @Test
    void steadyDropIsHagenPoiseuilleWhenLaminar() {
        // Given 1 m of 10 mm line in VG 46-like oil (46 cSt) with 0.544 bar across it
        Fluid oil = new Fluid(RHO, 46e-6, 1.6e9, 0.0, 1.0, 313.15);
        double v = steadySpeed(oil, 0.544e5, 1.0, 4);
        // Then the mean speed is 4.244 m/s: Hagen-Poiseuille, dp/L = (64/Re) rho v^2 / (2 d) at Re = 923
        // (White, Fluid Mechanics; worked in REFERENCES.md)
        assertEquals(4.244, v, 4.244 * 0.002);
    }

    @Test
    void steadyDropIsBlasiusWhenTurbulent() {
        // Given 1 m of 10 mm line in a 1 cSt fluid with 0.5 bar across it
        double v = steadySpeed(THIN_OIL, 0.5e5, 1.0, 1);
        // Then the drop is Blasius's: lambda = 0.3164 Re^-0.25, dp = lambda (L/d) rho v^2 / 2 (White, Fluid
        // Mechanics), at the Reynolds number of the speed found
        double re = v * D / 1e-6;
        double lambda = 0.3164 * Math.pow(re, -0.25);
        assertEquals(0.5e5, lambda * (1.0 / D) * 0.5 * RHO * v * v, 0.5e5 * 0.002);
        assertEquals(true, re > 4000 && re < 1e5, "Re = " + re + " within Blasius's range");
    }

    private static double steadySpeed(Fluid fluid, double dp, double length, int segments) {
        Node a = Node.tank("a", dp);
        Node b = Node.tank("b", 0.0);
        HydraulicLine line = new HydraulicLine("line", a, b, length, D, TUBE_WALL, segments);
        CircuitModel c = new CircuitBuilder("steady", fluid).add(a).add(b).add(line).build();
        Trace t = Simulator.run(c, SolverSettings.defaults(2.0, 0.01)).trace();
        double[] qa = t.series("line.q.a");
        double[] qb = t.series("line.q.b");
        assertEquals(qa[qa.length - 1], qb[qb.length - 1], 1e-6 * Math.abs(qa[qa.length - 1]), "not steady");
        return qb[qb.length - 1] / AREA;
    }

    private static int indexAt(Trace t, double time) {
        int k = 0;
        while (k + 1 < t.size() && t.time(k + 1) <= time) {
            k++;
        }
        return k;
    }

    private static double mean(Trace t, String signal, double from, double to) {
        double[] s = t.series(signal);
        double sum = 0;
        int n = 0;
        for (int k = 0; k < s.length; k++) {
            if (t.time(k) >= from && t.time(k) <= to) {
                sum += s[k];
                n++;
            }
        }
        return sum / n;
    }
}
