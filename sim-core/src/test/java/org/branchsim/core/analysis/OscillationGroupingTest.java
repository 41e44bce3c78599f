package org.branchsim.core.analysis;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.List;
import java.util.function.DoubleUnaryOperator;
import org.branchsim.core.units.Dimension;
import org.junit.jupiter.api.Test;

/**
 * Grouping of oscillation components across signals, on synthetic signals whose frequencies and harmonic
 * content are known in closed form.
 */
class OscillationGroupingTest {

    /** Frequency accuracy the detector promises on clean sines with at least 8 cycles in the window. */
    private static final double FREQUENCY_ACCURACY = 0.005;
    private static final double DT = 1e-4;
    private static final double[] T = times(1.0);

    private static double[] times(double end) {
        int n = (int) Math.round(end / DT) + 1;
        double[] t = new double[n];
        for (int k = 0; k < n; k++) {
            t[k] = k * DT;
        }
        return t;
    }

    private static SignalSamples signal(String name, Dimension d, double threshold, DoubleUnaryOperator f) {
        double[] x = new double[T.length];
        for (int k = 0; k < T.length; k++) {
            x[k] = f.applyAsDouble(T[k]);
        }
        return new SignalSamples(name, d, x, threshold);
    }

    private static double sin(double f, double t, double phase) {
        return Math.sin(2 * Math.PI * f * t + phase);
    }

    @Test
    void twoUnrelatedOscillationsInTwoSignalsAreTwoGroups() {
        // 37 Hz and 263 Hz: 263 is 4 Hz from 7 x 37, far outside 2 % of 37 Hz, so they are unrelated
        List<OscillationGroup> groups = OscillationDetector.detect(T, List.of(
                signal("a.p", Dimension.PRESSURE, 1e3, t -> 50e5 + 1e5 * sin(37.0, t, 0.0)),
                signal("b.x", Dimension.LENGTH, 1e-6, t -> 2e-4 + 2e-5 * sin(263.0, t, 0.3))), 0.0, 1.0);
        assertEquals(2, groups.size(), groups.toString());
        // strongest first: a.p 1e5 / 1e3 = 100 against b.x 2e-5 / 1e-6 = 20
        assertEquals(37.0, groups.get(0).frequency(), FREQUENCY_ACCURACY * 37.0);
        assertEquals("a.p", groups.get(0).dominant().signal());
        assertEquals(263.0, groups.get(1).frequency(), FREQUENCY_ACCURACY * 263.0);
        assertEquals(Dimension.LENGTH, groups.get(1).dominant().dimension());
    }

    @Test
    void oneOscillationSeenInThreeSignalsOneOnlyAtItsSecondHarmonicIsOneGroup() {
        double f0 = 263.0;
        List<OscillationGroup> groups = OscillationDetector.detect(T, List.of(
                // poppet position: the fundamental, decaying slowly (e^{-2 t}: growth rate -2 1/s, analytic)
                signal("pilot.x", Dimension.LENGTH, 1e-6, t -> 1e-4 * Math.exp(-2 * t) * sin(f0, t, 0.0)),
                // chamber pressure: mainly the 2nd harmonic, with a weaker fundamental
                signal("pilot.p", Dimension.PRESSURE, 2e3, t -> 40e5 + 0.2e5 * sin(f0, t, 1.0) + 1.5e5 * sin(2 * f0, t, 0.2)),
                // drain pressure: only the 2nd harmonic of the same motion (two pulses per poppet cycle)
                signal("drain.p", Dimension.PRESSURE, 2e3, t -> 1e5 + 0.1e5 * sin(2 * f0, t, 0.7))), 0.0, 1.0);
        assertEquals(1, groups.size(), groups.toString());
        OscillationGroup g = groups.get(0);
        assertEquals(f0, g.frequency(), FREQUENCY_ACCURACY * f0);
        // strengths: pilot.x 1e-4 e^{-2} / 1e-6 = 13.5, pilot.p 0.2e5 / 2e3 = 10, drain.p 0.1e5 / 2e3 = 5
        assertEquals(List.of("pilot.x", "pilot.p", "drain.p"),
                g.members().stream().map(m -> m.oscillation().signal()).toList());
        assertEquals(List.of(1, 1, 2), g.members().stream().map(OscillationGroup.Member::multiple).toList());
        assertEquals(List.of(2), g.members().get(1).oscillation().multiples());
        assertEquals(2 * f0, g.members().get(2).oscillation().frequency(), FREQUENCY_ACCURACY * 2 * f0);
        // the group's trend is that of its strongest member
        assertEquals(Oscillation.Trend.DECAYING, g.trend());
        assertEquals(-2.0, g.growthRate(), 0.05 * 2.0);
    }

    @Test
    void twoOscillationsAcrossFourSignalsStaySeparate() {
        List<OscillationGroup> groups = OscillationDetector.detect(T, List.of(
                signal("a.p", Dimension.PRESSURE, 1e3, t -> 1e4 * sin(37.0, t, 0.0) + 3e4 * sin(263.0, t, 0.0)),
                signal("b.p", Dimension.PRESSURE, 1e3, t -> 2e4 * sin(37.0, t, 0.5)),
                signal("c.x", Dimension.LENGTH, 1e-6, t -> 5e-5 * sin(526.0, t, 0.1)),
                signal("d.x", Dimension.LENGTH, 1e-6, t -> 1e-5 * sin(263.0, t, 0.1))), 0.0, 1.0);
        assertEquals(2, groups.size(), groups.toString());
        // 263 Hz group: c.x (strength 50, at 2 x 263 Hz), a.p (30), d.x (10); 37 Hz group: b.p (20), a.p (10)
        assertEquals(263.0, groups.get(0).frequency(), FREQUENCY_ACCURACY * 263.0);
        assertEquals(List.of("c.x", "a.p", "d.x"),
                groups.get(0).members().stream().map(m -> m.oscillation().signal()).toList());
        assertEquals(37.0, groups.get(1).frequency(), FREQUENCY_ACCURACY * 37.0);
        assertEquals(List.of("b.p", "a.p"),
                groups.get(1).members().stream().map(m -> m.oscillation().signal()).toList());
    }

    private static SignalOscillation component(String name, double frequency, double endAmplitude) {
        return new SignalOscillation(name, Dimension.PRESSURE, frequency, endAmplitude, endAmplitude, List.of(),
                endAmplitude, endAmplitude, 0.0, Oscillation.Trend.LIMIT_CYCLE, 10, 1.0, 100.0);
    }

    @Test
    void groupFrequencyIsTheStrengthWeightedFundamentalAndOrderIsDeterministic() {
        // by the rule: f = sum(s_i f_i / m_i) / sum(s_i) = (5 x 100 + 10 x 200.8 / 2) / 15 = 100.2667 Hz;
        // 151 Hz is 1.51 times and 713 Hz 7.11 times 100 Hz (11 Hz off, over 2 % of 100 Hz): no multiples, so
        // groups of their own; equal strengths sort by name
        List<OscillationGroup> groups = OscillationGrouping.group(List.of(
                component("z.p", 151.0, 15.0), component("b.p", 200.8, 10.0), component("a.p", 100.0, 5.0),
                component("y.p", 713.0, 15.0)));
        assertEquals(3, groups.size(), groups.toString());
        assertEquals("y.p", groups.get(0).dominant().signal());
        assertEquals("z.p", groups.get(1).dominant().signal());
        assertEquals(List.of("b.p", "a.p"), groups.get(2).members().stream().map(m -> m.oscillation().signal()).toList());
        assertEquals((5 * 100.0 + 10 * 200.8 / 2) / 15, groups.get(2).frequency(), 1e-9);
        assertEquals(List.of(2, 1), groups.get(2).members().stream().map(OscillationGroup.Member::multiple).toList());
    }
}
