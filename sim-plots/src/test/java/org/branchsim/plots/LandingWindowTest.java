package org.branchsim.plots;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;

/**
 * The landing window of a sweep on synthetic landings: each variant's outlet pressure is zero until its landing
 * time t0 and then follows the unit-step response of an under-damped second-order system scaled to its final
 * value (Ogata, Modern Control Engineering, 5th ed., Prentice Hall 2010, section 5-3, eq. 5-19). Its peak lies at
 * t0 + pi / omega_d (eq. 5-20), and it stays inside +-2 % of the final value once the envelope
 * 1 + e^(-zeta omega_n t) / sqrt(1 - zeta^2) of the same section has fallen to 1.02, at
 * t = -ln(0.02 sqrt(1 - zeta^2)) / (zeta omega_n): the settling lies no later than that. The rise through 90 % of
 * the setting lies between t0 and the peak. The window must contain every rise and peak and every settling.
 */
class LandingWindowTest {

    private static final double DT = 1e-4;
    private static final double END = 1.0;
    private static final double SETTING = 45e5;

    /** A second-order landing at t0 to the final value {@code fin} (Pa); optional start-up spike before it. */
    private static double[][] landing(double t0, double zeta, double hz, double fin, double spike) {
        int n = (int) Math.round(END / DT) + 1;
        double[] t = new double[n];
        double[] p = new double[n];
        double wn = 2 * Math.PI * hz;
        double wd = wn * Math.sqrt(1 - zeta * zeta);
        for (int k = 0; k < n; k++) {
            t[k] = k * DT;
            double s = t[k] - t0;
            double c = s <= 0 ? 0.0 : 1 - Math.exp(-zeta * wn * s)
                    * (Math.cos(wd * s) + zeta / Math.sqrt(1 - zeta * zeta) * Math.sin(wd * s));
            // a start-up spike: a half sine of height `spike` over the first 20 ms
            double startUp = t[k] < 0.02 ? spike * Math.sin(Math.PI * t[k] / 0.02) : 0.0;
            p[k] = fin * c + startUp;
        }
        return new double[][] {t, p};
    }

    private static double peakTime(double t0, double zeta, double hz) {
        return t0 + Math.PI / (2 * Math.PI * hz * Math.sqrt(1 - zeta * zeta));
    }

    private static double envelopeSettling(double t0, double zeta, double hz) {
        return t0 - Math.log(0.02 * Math.sqrt(1 - zeta * zeta)) / (zeta * 2 * Math.PI * hz);
    }

    @Test
    void theWindowHoldsEveryVariantsRisePeakAndSettling() {
        double[][] cases = {{0.30, 0.3, 20}, {0.33, 0.2, 25}, {0.38, 0.5, 15}};
        List<LandingWindow.Landing> landings = new ArrayList<>();
        for (double[] c : cases) {
            double[][] tp = landing(c[0], c[1], c[2], SETTING, 0.0);
            LandingWindow.Landing l = LandingWindow.of(tp[0], tp[1], SETTING, Double.NaN);
            assertEquals(peakTime(c[0], c[1], c[2]), l.peakTime(), DT, "peak time, Ogata eq. 5-20");
            assertTrue(l.riseTime() > c[0] && l.riseTime() < l.peakTime(), "rise between landing and peak");
            assertTrue(l.settles());
            assertTrue(l.settledAt() <= envelopeSettling(c[0], c[1], c[2]) + DT, "settled by the envelope's time");
            landings.add(l);
        }
        double[] w = LandingWindow.of(landings, 0.0, END);
        for (int i = 0; i < cases.length; i++) {
            LandingWindow.Landing l = landings.get(i);
            assertTrue(w[0] < l.riseTime() && l.riseTime() < w[1], "rise inside " + w[0] + ".." + w[1]);
            assertTrue(w[0] < l.peakTime() && l.peakTime() < w[1], "peak inside");
            assertTrue(l.settledAt() < w[1], "settling inside");
        }
        // zoomed: shortly before the earliest landing, well short of the whole second
        assertTrue(w[0] > 0.25 && w[0] < 0.30, "starts shortly before the earliest rise: " + w[0]);
        assertTrue(w[1] - w[0] < 0.6, "a zoom, not the whole run: " + (w[1] - w[0]));
    }

    @Test
    void aVariantThatNeverSettlesExtendsTheWindowAFewPeakWidthsPastItsPeak() {
        // final value 5 % below the setting: outside the +-2 % band at the end, so never settled
        double[][] tp = landing(0.5, 0.3, 20, 0.95 * SETTING, 0.0);
        LandingWindow.Landing l = LandingWindow.of(tp[0], tp[1], SETTING, Double.NaN);
        assertFalse(l.settles());
        assertEquals(peakTime(0.5, 0.3, 20), l.peakTime(), DT, "peak time, Ogata eq. 5-20");
        double[][] early = landing(0.3, 0.3, 20, SETTING, 0.0);
        LandingWindow.Landing settling = LandingWindow.of(early[0], early[1], SETTING, Double.NaN);
        double[] w = LandingWindow.of(List.of(settling, l), 0.0, END);
        double width = l.peakTime() - l.riseTime();
        assertTrue(w[1] >= l.peakTime() + 2 * width, "a few peak widths past the peak: " + w[1]);
        assertTrue(w[0] < settling.riseTime());
    }

    @Test
    void thePeakTheMetricsNameIsTakenOverAHigherStartUpSpike() {
        // start-up spike to 1.6 x the setting at 10 ms; the landing's peak is lower
        double[][] tp = landing(0.4, 0.3, 20, SETTING, 1.6 * SETTING);
        double expected = peakTime(0.4, 0.3, 20);
        double landingPeak = 0;
        for (int k = 0; k < tp[0].length; k++) {
            if (tp[0][k] > 0.1) {
                landingPeak = Math.max(landingPeak, tp[1][k]);
            }
        }
        LandingWindow.Landing l = LandingWindow.of(tp[0], tp[1], SETTING, landingPeak);
        assertEquals(expected, l.peakTime(), DT);
        assertTrue(l.riseTime() > 0.4 && l.riseTime() < expected, "the landing's rise, not the start-up's");
        LandingWindow.Landing largest = LandingWindow.of(tp[0], tp[1], SETTING, Double.NaN);
        assertEquals(0.01, largest.peakTime(), DT, "without the metrics' peak the largest sample is taken");
    }

    @Test
    void aWindowIsNeverShorterThanTheMinimumNorOutsideTheTrace() {
        LandingWindow.Landing flat = new LandingWindow.Landing(Double.NaN, 0.001, SETTING, 0.0);
        double[] w = LandingWindow.of(List.of(flat), 0.0, END);
        assertEquals(0.0, w[0], 0.0, "clipped at the trace's start");
        assertTrue(w[1] - w[0] >= 0.5 * LandingWindow.MINIMUM_FRACTION * END);
        assertTrue(w[1] <= END);
    }
}
