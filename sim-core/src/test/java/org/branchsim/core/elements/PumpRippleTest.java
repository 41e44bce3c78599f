package org.branchsim.core.elements;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.branchsim.core.TestFluids;
import org.branchsim.core.laws.KinematicRipple;
import org.branchsim.core.model.CircuitBuilder;
import org.branchsim.core.model.CircuitModel;
import org.branchsim.core.model.Node;
import org.branchsim.core.results.SimulationResult;
import org.branchsim.core.settings.SolverSettings;
import org.branchsim.core.solve.Simulator;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * Kinematic flow ripple of a pump in a run: its frequency and its peak-to-peak amplitude over the mean flow against
 * the closed forms. Axial-piston pump with z pistons: delta = (pi/2z) tan(pi/4z) at 2 z n for odd z,
 * (pi/z) tan(pi/2z) at z n for even z (Ivantysyn and Ivantysynova, Hydrostatic Pumps and Motors, 2001, kinematic
 * flow pulsation; from memory, as quoted in /work/shared/REFERENCES.md). External gear pump, standard involute gears
 * of module m, z teeth, pressure angle alpha, contact ratio one: Q ~ r_a^2 - r_w^2 - s^2 with s the contact point's
 * distance from the pitch point over one base pitch p_b = pi m cos(alpha), r_w = m z/2, r_a = r_w + m, so
 * delta = (p_b^2/4) / (r_a^2 - r_w^2 - p_b^2/12) at the tooth frequency z n (Manring and Kasaragadda, "The
 * theoretical flow ripple of an external gear pump", J. Dyn. Sys. Meas. Control 125, 2003; from memory).
 */
class PumpRippleTest {

    private static final double SPEED_RPM = 1500.0;
    private static final double END = 0.2;
    private static final double SAMPLE = 2e-6;

    @ParameterizedTest
    @CsvSource({"AXIAL_PISTON, 9", "AXIAL_PISTON, 8", "AXIAL_PISTON, 7", "GEAR, 12"})
    void rippleFrequencyAndAmplitudeMatchTheKinematics(KinematicRipple.Kind kind, int z) {
        Node tank = Node.tank("tank", 0.0);
        Node out = Node.volume("out", 0.5e-3, Double.POSITIVE_INFINITY, 0.0);
        double omega = SPEED_RPM * 2.0 * Math.PI / 60.0;
        KinematicRipple ripple = new KinematicRipple(kind, z, Math.toRadians(20.0));
        CircuitModel c = new CircuitBuilder("ripple", TestFluids.referenceOil()).add(tank).add(out)
                .add(new Pump("pump", tank, out, 20e-6 / (2.0 * Math.PI), omega, 1.0, ripple))
                .add(new Orifice("load", out, tank, 1e-5, 0.61)).build();
        SimulationResult r = Simulator.run(c, SolverSettings.defaults(END, SAMPLE));
        double[] t = r.trace().times();
        double[] q = r.trace().series("pump.q");
        double max = Double.NEGATIVE_INFINITY;
        double min = Double.POSITIVE_INFINITY;
        double sum = 0.0;
        int peaks = 0;
        double firstPeak = Double.NaN;
        double lastPeak = Double.NaN;
        for (int k = 1; k < t.length - 1; k++) {
            max = Math.max(max, q[k]);
            min = Math.min(min, q[k]);
            sum += q[k];
            if (q[k] > q[k - 1] && q[k] >= q[k + 1]) {
                if (peaks == 0) {
                    firstPeak = t[k];
                }
                lastPeak = t[k];
                peaks++;
            }
        }
        double mean = sum / (t.length - 2);
        double n = SPEED_RPM / 60.0;
        double expectedFrequency;
        double expectedDelta;
        if (kind == KinematicRipple.Kind.GEAR) {
            double m = 1.0;
            double rw = m * z / 2.0;
            double ra = rw + m;
            double pb = Math.PI * m * Math.cos(Math.toRadians(20.0));
            expectedDelta = (pb * pb / 4.0) / (ra * ra - rw * rw - pb * pb / 12.0);
            expectedFrequency = z * n;
        } else if (z % 2 == 1) {
            expectedDelta = Math.PI / (2.0 * z) * Math.tan(Math.PI / (4.0 * z));
            expectedFrequency = 2.0 * z * n;
        } else {
            expectedDelta = Math.PI / z * Math.tan(Math.PI / (2.0 * z));
            expectedFrequency = z * n;
        }
        double frequency = (peaks - 1) / (lastPeak - firstPeak);
        assertEquals(expectedFrequency, frequency, 0.005 * expectedFrequency, "ripple frequency, Hz");
        assertEquals(expectedDelta, (max - min) / mean, 0.01 * expectedDelta, "peak-to-peak over mean");
        // the mean delivery stays the displaced flow D omega (Merritt, Hydraulic Control Systems, 1967)
        double qMean = 20e-6 / (2.0 * Math.PI) * omega;
        assertEquals(qMean, mean, 0.005 * qMean, "mean flow");
    }
}
