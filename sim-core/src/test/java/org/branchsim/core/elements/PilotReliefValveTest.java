package org.branchsim.core.elements;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.branchsim.core.TestFluids;
import org.branchsim.core.model.CircuitBuilder;
import org.branchsim.core.model.CircuitModel;
import org.branchsim.core.model.Node;
import org.branchsim.core.model.ScheduledInput;
import org.branchsim.core.results.Trace;
import org.branchsim.core.settings.SolverSettings;
import org.branchsim.core.solve.Simulator;
import org.junit.jupiter.api.Test;

/**
 * A pilot-operated relief valve's steady characteristic (ISO 6403 describes the test): nothing passes below the
 * pilot's setting, the pilot cracks at it, and with full pump flow the inlet settles a little above it; its
 * override is far smaller than that of a direct-acting relief valve with the same main poppet at the same flow
 * (the reason two-stage valves exist: Merritt, Hydraulic Control Systems, 1967, ch. 8 on pressure controls,
 * from memory; the size of a pilot-operated valve's override, a few percent at most, is common practice, no source).
 */
class PilotReliefValveTest {

    private static final double SETTING = 100e5;
    private static final double FLOW = 100e-3 / 60.0;
    private static final double SEAT = 16e-3;
    /**
     * Rate of the direct-acting valve's spring: its preload (about 2 kN at 100 bar on a 16 mm seat) at 5 mm of
     * compression, 400 N/mm (common practice, no source: a compact spring compressed a few millimetres).
     */
    private static final double DIRECT_SPRING_RATE = SETTING * 0.25 * Math.PI * SEAT * SEAT / 5e-3;
    private static final double MAX_OVERRIDE = 0.03;

    private static PoppetGeometry mainPoppet(double preload, double springRate) {
        // a flat-faced main poppet: the jet leaves radially, so no axial steady flow force (Merritt 1967: the force
        // is rho Q v cos(theta), theta = 90 deg here)
        return new PoppetGeometry(SEAT, Math.PI, springRate, preload, 0.025, 150.0, 2e-3, 0.61);
    }

    private static Trace run(boolean pilotOperated) {
        Node tank = Node.tank("tank", 0.0);
        Node line = Node.volume("line", 0.5e-3, Double.POSITIVE_INFINITY, 0.0);
        // the pump's speed rises from 0 over 0.2 s, so the pressure rises as in a slow test (ISO 6403)
        Pump pump = new Pump("pump", tank, line, FLOW / 150.0, 0.0, 1.0);
        pump.speed().addRamp(new ScheduledInput.Ramp(0.0, 0.2, 150.0));
        CircuitBuilder b = new CircuitBuilder("relief", TestFluids.referenceOil()).add(tank).add(line).add(pump);
        if (pilotOperated) {
            double pilotSeat = 2e-3;
            PoppetGeometry pilot = new PoppetGeometry(pilotSeat, Math.toRadians(90), 20e3,
                    SETTING * 0.25 * Math.PI * pilotSeat * pilotSeat, 0.002, 5.0, 0.5e-3, 0.61);
            b.add(new PilotReliefValve("relief", line, tank, tank, mainPoppet(10.0, 2e3), 2e-6, 0.5e-3, 0.61, pilot));
        } else {
            b.add(new ReliefValve("relief", line, tank, mainPoppet(SETTING * 0.25 * Math.PI * SEAT * SEAT, DIRECT_SPRING_RATE)));
        }
        CircuitModel c = b.build();
        return Simulator.run(c, SolverSettings.defaults(0.5, 1e-4)).trace();
    }

    private static double last(Trace t, String signal) {
        double[] s = t.series(signal);
        return s[s.length - 1];
    }

    @Test
    void cracksAtThePilotSettingAndHoldsASmallOverride() {
        // Given 100 L/min into 0.5 L guarded by a pilot-operated relief valve set to 100 bar
        Trace t = run(true);
        double[] p = t.series("line.p");
        double[] pilot = t.series("relief.pilot.x");
        double[] main = t.series("relief.poppet.x");
        // Then below the setting the pilot and the main poppet stay on their seats ...
        for (int k = 0; k < p.length && p[k] < 0.999 * SETTING; k++) {
            assertEquals(0.0, pilot[k], 0.0, "pilot lifted at t = " + t.time(k) + " below the setting");
            assertEquals(0.0, main[k], 0.0, "main poppet lifted at t = " + t.time(k) + " below the setting");
        }
        // ... and the pilot is the first to lift, at the setting (its cracking pressure F_p0 / A_p)
        int firstLift = 0;
        while (pilot[firstLift] == 0.0) {
            firstLift++;
        }
        double[] chamber = t.series("relief.chamber.p");
        assertTrue(chamber[firstLift - 1] < SETTING && chamber[firstLift] >= SETTING, "pilot lifted between "
                + chamber[firstLift - 1] + " and " + chamber[firstLift] + " Pa in its chamber");
        assertEquals(0.0, main[firstLift], 0.0);
        // and with all the flow passing, the inlet settles above the setting by a small override
        double pEnd = p[p.length - 1];
        assertTrue(pEnd > SETTING && pEnd < SETTING * (1 + MAX_OVERRIDE), "override " + (pEnd / SETTING - 1));
        assertEquals(FLOW, last(t, "relief.q") + last(t, "relief.drain.q"), FLOW * 0.01);
    }

    @Test
    void overrideIsFarSmallerThanADirectActingValvesAtEqualFlow() {
        // Given the same flow through the pilot-operated valve and a direct-acting valve with its main poppet and a
        // spring able to hold 100 bar alone (400 N/mm)
        double pilotOperated = last(run(true), "line.p") - SETTING;
        double direct = last(run(false), "line.p") - SETTING;
        // Then the two-stage valve's override is under a fifth of the direct-acting valve's (Merritt 1967, from
        // memory: the pilot stage's small spring sets the pressure, the main spring only has to be light)
        assertTrue(direct > 0 && pilotOperated > 0, "both override: " + direct + ", " + pilotOperated);
        assertTrue(pilotOperated < 0.2 * direct, "pilot-operated " + pilotOperated / 1e5 + " bar vs direct "
                + direct / 1e5 + " bar");
    }
}
