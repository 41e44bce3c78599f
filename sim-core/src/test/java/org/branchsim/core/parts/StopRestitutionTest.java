package org.branchsim.core.parts;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.branchsim.core.TestFluids;
import org.branchsim.core.elements.Cylinder;
import org.branchsim.core.model.CircuitBuilder;
import org.branchsim.core.model.CircuitModel;
import org.branchsim.core.model.EnergyAccount;
import org.branchsim.core.model.Node;
import org.branchsim.core.results.SimulationResult;
import org.branchsim.core.results.Trace;
import org.branchsim.core.settings.SolverSettings;
import org.branchsim.core.solve.Simulator;
import org.junit.jupiter.api.Test;

/**
 * A ball drop on a member's stop: a piston of mass m (both cylinder ports on the tank, no friction) released at
 * rest from height h above its retracted stop under a constant load m g. Newton's experimental law of impact
 * (Goldsmith, Impact, 1960, ch. 1): it leaves the stop with e times its impact speed, so with energy conserved
 * in flight each bounce rises to e^2 times the height of the one before, h_k = e^(2k) h, and the kinetic energy
 * lost at the k-th impact is (1 - e^2) m g h_(k-1). e = 0 is today's dead stop.
 */
class StopRestitutionTest {

    private static final double G = 9.80665;
    private static final double MASS = 1.0;
    private static final double HEIGHT = 0.1;
    /** Bounce-height tolerance, relative: the output grid (10 us) and event location; numerical, no source. */
    private static final double HEIGHT_TOLERANCE = 1e-3;
    /**
     * Impact-loss tolerance, relative to m g h: an impact is detected up to the stop events' slack
     * (1e-6 of the travel, 0.2 um) past the stop, each one adding up to m g times that (numerical, no source).
     */
    private static final double SLACK_TOLERANCE = 1e-4;
    /** Books' round-off bound, relative to the supplied (load) work. */
    private static final double ROUND_OFF = 1e-9;

    private static SimulationResult drop(double e, double end) {
        Node tank = Node.tank("tank", 0.0);
        Cylinder.Parameters p = new Cylinder.Parameters(20e-3, 10e-3, 0.2, MASS, 0.0, 0.0, 0.0, 0.0, 1e-3, HEIGHT);
        Cylinder ball = new Cylinder("ball", tank, tank, p, null, null, null, MASS * G).withEndStopRestitution(e);
        CircuitModel c = new CircuitBuilder("drop", TestFluids.referenceOil()).add(tank).add(ball).build();
        return Simulator.run(c, SolverSettings.defaults(end, 1e-5));
    }

    /** @return the heights of the local maxima of the position after the first impact, m */
    private static List<Double> bounceHeights(Trace t) {
        double[] x = t.series("ball.piston.x");
        List<Double> peaks = new ArrayList<>();
        for (int k = 1; k < x.length - 1; k++) {
            if (x[k] > 1e-6 && x[k] >= x[k - 1] && x[k] > x[k + 1]) {
                peaks.add(x[k]);
            }
        }
        return peaks;
    }

    @Test
    void bounceHeightsScaleWithTheSquareOfTheCoefficient() {
        for (double e : new double[] {0.5, 0.8}) {
            // 3 bounces: the fall takes sqrt(2h/g) = 0.143 s, the k-th bounce 2 e^k sqrt(2h/g)
            double fall = Math.sqrt(2 * HEIGHT / G);
            double end = fall * (1 + 2 * e + 2 * e * e + 1.5 * e * e * e);
            List<Double> peaks = bounceHeights(drop(e, end).trace());
            assertTrue(peaks.size() >= 3, "peaks " + peaks);
            for (int k = 1; k <= 3; k++) {
                double expected = Math.pow(e, 2 * k) * HEIGHT; // Newton's law of impact (Goldsmith 1960)
                assertEquals(expected, peaks.get(k - 1), HEIGHT_TOLERANCE * expected,
                        String.format(Locale.ROOT, "e = %.1f, bounce %d", e, k));
            }
        }
    }

    @Test
    void theLostEnergyIsBookedAsImpactLossAndTheBooksClose() {
        double e = 0.8;
        double fall = Math.sqrt(2 * HEIGHT / G);
        // between the 2nd and 3rd impact, two impacts have taken (1 - e^4) m g h
        SimulationResult r = drop(e, fall * (1 + 2 * e + e * e));
        double impacts = r.energy().accounts().get("ball.piston.impacts");
        assertEquals((1 - Math.pow(e, 4)) * MASS * G * HEIGHT, impacts, 2e-3 * MASS * G * HEIGHT);
        assertTrue(r.energy().relativeResidual() < ROUND_OFF, "residual " + r.energy().relativeResidual());
        // and the mechanical energy left, m g x + m v^2 / 2 from the final state, is what the impacts did not take
        Trace t = r.trace();
        double x = t.value(t.size() - 1, t.indexOf("ball.piston.x"));
        double v = t.value(t.size() - 1, t.indexOf("ball.piston.v"));
        assertEquals(MASS * G * HEIGHT - impacts, MASS * G * x + 0.5 * MASS * v * v, 1e-4 * MASS * G * HEIGHT);
    }

    @Test
    void theBouncesEndHeldOnTheStopWithAllTheEnergyLost() {
        // e = 0.5: the bounce heights fall as 4^-k; the flights sum to sqrt(2h/g) (1 + 2e / (1 - e)) = 0.43 s
        SimulationResult r = drop(0.5, 0.6);
        Trace t = r.trace();
        assertEquals(0.0, t.value(t.size() - 1, t.indexOf("ball.piston.x")), 0.0);
        assertEquals(0.0, t.value(t.size() - 1, t.indexOf("ball.piston.v")), 0.0);
        assertEquals(MASS * G * HEIGHT, r.energy().accounts().get("ball.piston.impacts"),
                SLACK_TOLERANCE * MASS * G * HEIGHT);
        assertTrue(r.energy().relativeResidual() < ROUND_OFF);
    }

    @Test
    void aDeadStopIsTheDefaultAndNoBounceFollows() {
        SimulationResult r = drop(0.0, 0.3);
        assertTrue(bounceHeights(r.trace()).isEmpty(), "no rebound with e = 0");
        // all the fall's energy m g h is lost at the one impact (plastic impact)
        assertEquals(MASS * G * HEIGHT, r.energy().accounts().get("ball.piston.impacts"),
                SLACK_TOLERANCE * MASS * G * HEIGHT);
        assertEquals(1, r.statistics().events().getOrDefault("stop", 0).intValue() + r.statistics().events().getOrDefault("seat", 0).intValue(), r.statistics().events().toString());
        assertThrows(IllegalArgumentException.class,
                () -> new TravelLimitedMass("x", "m", 1, 0, 1, 0, "a", "b").withRestitution(1.5));
    }
}
