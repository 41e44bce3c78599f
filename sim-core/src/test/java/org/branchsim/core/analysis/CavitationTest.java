package org.branchsim.core.analysis;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Locale;
import org.branchsim.core.TestFluids;
import org.branchsim.core.elements.Cylinder;
import org.branchsim.core.fluid.Fluid;
import org.branchsim.core.model.CircuitBuilder;
import org.branchsim.core.model.CircuitModel;
import org.branchsim.core.model.Node;
import org.branchsim.core.model.ScheduledInput;
import org.branchsim.core.results.SimulationResult;
import org.branchsim.core.results.Trace;
import org.branchsim.core.settings.SolverSettings;
import org.branchsim.core.solve.Simulator;
import org.branchsim.core.units.Units;
import org.junit.jupiter.api.Test;

/**
 * Gaseous cavitation on a circuit that pulls a vacuum: an overrunning load pulls a piston out of a closed cap-end
 * chamber (rod end on the tank). Above the air-release pressure the trapped oil holds the load; as the pull passes
 * atmospheric pressure times the piston area no pressure can hold it, the released air expands and the piston runs
 * out. Checks: the chamber's volume and pressure obey the equation of state of oil with free air at every sample
 * (continuity with Boyle's law for the air, n = 1: Merritt, Hydraulic Control Systems, 1967, ch. 2; the released
 * amount X(p) = X_r (1 - p/p_r)^2 below p_r, docs/theory.md 7.4), the absolute pressure stays above zero, and
 * the cavitation report names the chamber with the time it crossed the threshold.
 */
class CavitationTest {

    private static final double BORE = 50e-3;
    private static final double AREA = 0.25 * Math.PI * BORE * BORE;
    private static final double CAP_VOLUME = 50e-6;
    private static final double PULL = 250.0;
    private static final double RAMP = 1.0;
    /** Equation-of-state tolerance on the chamber volume, relative: the oil's own compressibility, ~1e-4, neglected. */
    private static final double VOLUME_TOLERANCE = 2e-3;

    private static SimulationResult pull() {
        Node tank = Node.tank("tank", 0.0);
        Node cap = Node.volume("cap", CAP_VOLUME, Double.POSITIVE_INFINITY, 0.0);
        Cylinder.Parameters p = new Cylinder.Parameters(BORE, 28e-3, 0.2, 2.0, 0.0, 0.0, 0.0, 500.0, 1e-3, 0.0);
        Cylinder cyl = new Cylinder("cyl", cap, tank, p, null, null, null, 0.0);
        cyl.load().addRamp(new ScheduledInput.Ramp(0.0, RAMP, -PULL));
        CircuitModel c = new CircuitBuilder("vacuum", TestFluids.referenceOil()).add(tank).add(cap).add(cyl).build();
        return Simulator.run(c, SolverSettings.defaults(1.2, 1e-4));
    }

    /**
     * @return the volume, per unit volume at atmospheric pressure, of oil with the fluid's free air at absolute
     *         pressure p: 1 - a_0 + X(p) p_atm / p (isothermal air, incompressible oil)
     */
    private static double volumeRatio(Fluid f, double pAbs) {
        double release = f.releasePressure() + Units.ATMOSPHERE;
        double below = Math.max(0.0, 1.0 - pAbs / release);
        return 1.0 + f.releasableAir() * below * below * Units.ATMOSPHERE / pAbs;
    }

    @Test
    void theChamberFollowsTheEquationOfStateAndStaysAboveVacuum() {
        SimulationResult r = pull();
        Fluid f = r.model().fluid();
        Trace t = r.trace();
        double[] p = t.series("cap.p");
        double[] x = t.series("cyl.piston.x");
        double lowest = Double.POSITIVE_INFINITY;
        int checked = 0;
        for (int k = 0; k < p.length; k++) {
            double pAbs = p[k] + Units.ATMOSPHERE;
            lowest = Math.min(lowest, pAbs);
            if (pAbs < f.releasePressure() + Units.ATMOSPHERE && x[k] < 0.19) {
                double volume = CAP_VOLUME + AREA * x[k];
                assertEquals(CAP_VOLUME * volumeRatio(f, pAbs), volume, VOLUME_TOLERANCE * volume,
                        String.format(Locale.ROOT, "t = %.4f s, p = %.1f Pa abs", t.time(k), pAbs));
                checked++;
            }
        }
        assertTrue(checked > 100, "samples below the release pressure: " + checked);
        // the pull exceeds p_atm A = 199 N, yet the chamber never reaches absolute vacuum
        assertTrue(PULL > Units.ATMOSPHERE * AREA);
        assertTrue(lowest > 0.0, "lowest absolute pressure " + lowest + " Pa");
    }

    @Test
    void theReportNamesTheNodeWhenAndHowLowAndOnlyThatNode() {
        SimulationResult r = pull();
        List<CavitationFinding> found = CavitationFinding.of(r);
        assertEquals(1, found.size(), found.toString());
        CavitationFinding c = found.get(0);
        assertEquals("cap", c.node());
        // before the release the trapped oil barely moves, so p A = load (statics): the cap falls through the
        // threshold p_r when the ramp's pull reaches -p_r A, at t = RAMP (-p_r A) / PULL
        double expected = RAMP * (-c.threshold() * AREA) / PULL;
        assertEquals(expected, c.firstTime(), 2e-3, "first time below");
        assertEquals(1.2 - c.firstTime(), c.duration(), 2e-3, "it stays below to the end of the run");
        assertTrue(c.minimumAbsolute() > 0.0 && c.minimumAbsolute() < 0.05 * Units.ATMOSPHERE,
                "minimum " + c.minimumAbsolute());
    }

    @Test
    void theScanInterpolatesCrossingsOnTheOutputGrid() {
        // a pressure that dips linearly below the threshold between samples: the time below is the interval
        // between the interpolated crossings (linear interpolation)
        double[] t = {0.0, 1.0, 2.0, 3.0};
        double[] p = {0.0, -2.0, -2.0, 0.0};
        CavitationFinding f = CavitationFinding.scan("n", t, p, -1.0);
        assertEquals(0.5, f.firstTime(), 1e-12);
        assertEquals(2.0, f.duration(), 1e-12);
        assertEquals(Units.ATMOSPHERE - 2.0, f.minimumAbsolute(), 1e-9);
        assertNull(CavitationFinding.scan("n", t, new double[] {0, 0, 0, 0}, -1.0));
    }
}
