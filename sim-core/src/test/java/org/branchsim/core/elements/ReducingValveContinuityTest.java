package org.branchsim.core.elements;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Locale;
import org.branchsim.core.TestFluids;
import org.branchsim.core.fluid.Fluid;
import org.branchsim.core.model.CircuitBuilder;
import org.branchsim.core.model.CircuitModel;
import org.branchsim.core.model.Node;
import org.branchsim.core.results.SimulationResult;
import org.branchsim.core.results.Trace;
import org.branchsim.core.settings.SolverSettings;
import org.branchsim.core.solve.Simulator;
import org.junit.jupiter.api.Test;

/**
 * Mass conservation at a reducing valve's closed outlet: a small outlet volume (1 cm^3, nothing else on it) filled
 * through the valve from a 100 bar supply until the spool closes. The outlet node holds the fixed volume and the
 * spool end's chamber, V = V_0 + A_s y; with a constant bulk modulus the oil's density is rho_0 exp(p / beta), so
 * the mass in the outlet, rho(p) V, must change by the mass carried in by the flows through the valve's metering
 * edge and damping orifice, the integral of rho(p) (q_main - q_orifice) dt (continuity; Merritt, Hydraulic Control
 * Systems, 1967, ch. 2). Leaving the chamber's volume A_s y out of V (the old model) breaks the balance by about
 * rho A_s y p / beta: 1.1e-3 of the mass taken in here, against 9e-5 with it.
 */
class ReducingValveContinuityTest {

    private static final double OUTLET = 1e-6;
    /** Trapezoidal quadrature on a 2 us grid and the integrator tolerance, relative to the mass taken in (numerical, no source). */
    private static final double BALANCE_TOLERANCE = 3e-4;

    private static PilotReducingValve valve(Node in, Node out, Node tank, Fluid oil) {
        MeteringEdge edge = new MeteringEdge(12e-3, 4e-3, 1.5e-3, 0.4e-3, 0.3e-6, 0.61);
        PilotReducingValve.MainStage main = new PilotReducingValve.MainStage(edge, 0.015, 1.5e3, 25.0, 50.0, 3e-3,
                null);
        PoppetGeometry pilot = new PoppetGeometry(2.5e-3, Math.toRadians(60), 15e3, 0.0, 0.003, 15.0, 1e-3, 0.61);
        double preload = PilotReducingValve.pilotPreloadFor(72e5, main, 0.7e-3, 0.61, pilot, oil);
        return new PilotReducingValve("prv", in, out, tank, main, 5e-6, 0.7e-3, 0.61, pilot.withPreload(preload), 72e5);
    }

    @Test
    void theClosedOutletKeepsItsMassWithTheSpoolEndVolume() {
        Fluid oil = TestFluids.referenceOil();
        Node supply = Node.tank("supply", 100e5);
        Node tank = Node.tank("tank", 0.0);
        Node out = Node.volume("out", OUTLET, Double.POSITIVE_INFINITY, 0.0);
        CircuitModel c = new CircuitBuilder("closed outlet", oil).add(supply).add(tank).add(out)
                .add(valve(supply, out, tank, oil)).build();
        SimulationResult r = Simulator.run(c, SolverSettings.defaults(0.05, 2e-6));
        Trace t = r.trace();
        double[] p = t.series("out.p");
        double[] y = t.series("prv.spool.x");
        double[] qm = t.series("prv.q");
        double[] qo = t.series("prv.pilot.q");
        double beta = 1.6e9;
        double area = 0.25 * Math.PI * 12e-3 * 12e-3;
        double carried = 0.0;
        for (int k = 1; k < p.length; k++) {
            double a = Math.exp(p[k - 1] / beta) * (qm[k - 1] - qo[k - 1]);
            double b = Math.exp(p[k] / beta) * (qm[k] - qo[k]);
            carried += 0.5 * (a + b) * (t.time(k) - t.time(k - 1));
        }
        int n = p.length - 1;
        double held = Math.exp(p[n] / beta) * (OUTLET + area * y[n]) - Math.exp(p[0] / beta) * (OUTLET + area * y[0]);
        // the spool has moved, so the end chamber's volume matters
        assertTrue(area * y[n] > 0.1 * OUTLET, String.format(Locale.ROOT, "spool at %.3f mm", y[n] * 1e3));
        assertEquals(carried, held, BALANCE_TOLERANCE * Math.abs(carried),
                String.format(Locale.ROOT, "outlet %.2f bar, spool %.3f mm", p[n] / 1e5, y[n] * 1e3));
    }
}
