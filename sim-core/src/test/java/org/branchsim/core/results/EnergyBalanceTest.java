package org.branchsim.core.results;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Locale;
import java.util.Map;
import org.branchsim.core.TestFluids;
import org.branchsim.core.elements.PoppetGeometry;
import org.branchsim.core.elements.Pump;
import org.branchsim.core.elements.ReliefValve;
import org.branchsim.core.model.CircuitModel;
import org.branchsim.core.model.CircuitBuilder;
import org.branchsim.core.model.EnergyAccount;
import org.branchsim.core.model.Node;
import org.branchsim.core.settings.Method;
import org.branchsim.core.solve.Simulator;
import org.branchsim.core.settings.SolverSettings;
import org.junit.jupiter.api.Test;

/**
 * What the energy balance proves and what can show integration error, on a pump (20 L/min) filling a fixed 0.2 L
 * volume of air-free oil (1.6 GPa, rigid walls) guarded by a poppet relief valve set to 80 bar, run for 0.1 s: the
 * poppet cracks, rings and settles. Here the stored energy is a function of the state (Merritt, Hydraulic Control
 * Systems, 1967, ch. 2: a fixed volume V at constant bulk modulus stores V p^2 / (2 beta); a spring with preload
 * F0 and rate k stores F0 x + k x^2 / 2; a mass m v^2 / 2), so it can be recomputed from the final state and set
 * against the stored side of the books, which integrates the powers over the run.
 */
class EnergyBalanceTest {

    private static final double VOLUME = 0.2e-3;
    private static final double BULK_MODULUS = 1.6e9;
    private static final double SEAT = 6e-3;
    private static final double RATE = 50e3;
    private static final double MASS = 0.02;
    private static final double PRELOAD = 80e5 * Math.PI * SEAT * SEAT / 4;
    private static final double END = 0.1;
    /** Round-off bound of a complete set of books, relative to the supplied energy. */
    private static final double ROUND_OFF = 1e-12;

    private static CircuitModel circuit() {
        Node tank = Node.tank("tank", 0.0);
        Node line = Node.volume("line", VOLUME, Double.POSITIVE_INFINITY, 0.0);
        PoppetGeometry g = new PoppetGeometry(SEAT, Math.toRadians(90), RATE, PRELOAD, MASS, 30.0, 2e-3, 0.61);
        return new CircuitBuilder("relief", TestFluids.referenceOil()).add(tank).add(line)
                .add(new Pump("pump", tank, line, 20e-3 / 60 / 150, 150.0, 1.0))
                .add(new ReliefValve("relief", line, tank, g)).build();
    }

    private static SimulationResult run(Method method, double rtol) {
        return Simulator.run(circuit(), SolverSettings.defaults(END, 1e-3).withMethod(method).withRelativeTolerance(rtol));
    }

    private static double state(SimulationResult r, String name) {
        Trace t = r.trace();
        return t.value(t.size() - 1, t.indexOf(name));
    }

    /** |stored energy recomputed from the final state - stored side of the books| / supplied energy. */
    private static double storedDiscrepancy(SimulationResult r) {
        double p = state(r, "line.p");
        double x = state(r, "relief.poppet.x");
        double v = state(r, "relief.poppet.v");
        double stored = VOLUME * p * p / (2 * BULK_MODULUS) + PRELOAD * x + 0.5 * RATE * x * x + 0.5 * MASS * v * v;
        return Math.abs(stored - r.energy().total(EnergyAccount.Kind.STORED))
                / r.energy().total(EnergyAccount.Kind.SUPPLY);
    }

    @Test
    void theResidualClosesToRoundOffAtAnyToleranceSoItProvesCompleteBooksNotAccuracy() {
        for (double rtol : new double[] {1e-2, 1e-7}) {
            SimulationResult r = run(Method.IMPLICIT, rtol);
            assertTrue(r.energy().relativeResidual() < ROUND_OFF, "rtol " + rtol + ": " + r.energy().relativeResidual());
        }
        // and a book left out shows at once: without the relief's loss the residual is that loss
        SimulationResult r = run(Method.IMPLICIT, 1e-6);
        Map<String, Double> accounts = new java.util.LinkedHashMap<>(r.energy().accounts());
        double loss = accounts.remove("relief.loss");
        EnergyBalance incomplete = new EnergyBalance(accounts, r.energy().kinds());
        assertEquals(loss, incomplete.residual(), 1e-9 * loss);
    }

    @Test
    void storedEnergyFromTheFinalStateAgreesWithTheBooksAsTheToleranceTightens() {
        double loose = storedDiscrepancy(run(Method.IMPLICIT, 1e-3));
        double tight = storedDiscrepancy(run(Method.IMPLICIT, 1e-7));
        String report = String.format(Locale.ROOT, "loose %.3g, tight %.3g of the supplied energy", loose, tight);
        assertTrue(tight < 1e-6, report);
        assertTrue(loose > 10 * tight, report);
    }

    /**
     * The reference is the implicit method at 1e-9: its steps are short, so its one-point quadrature of the powers is
     * accurate too (Dormand-Prince 8(5,3) at 1e-10 takes steps so long that its energy figures carry a quadrature
     * error near 3e-5 of the supply; docs/theory.md section 9).
     */
    @Test
    void aCoarseRunIsDetectedAgainstATightReference() {
        SimulationResult reference = run(Method.IMPLICIT, 1e-9);
        double coarse = run(Method.EXPLICIT, 1e-2).energy().discrepancyFrom(reference.energy());
        double loose = run(Method.IMPLICIT, 1e-3).energy().discrepancyFrom(reference.energy());
        double tight = run(Method.IMPLICIT, 1e-7).energy().discrepancyFrom(reference.energy());
        String report = String.format(Locale.ROOT, "coarse %.3g, loose %.3g, tight %.3g of the supplied energy", coarse,
                loose, tight);
        assertTrue(tight < 1e-6, report);
        assertTrue(loose > 10 * tight, report);
        assertTrue(coarse > 1e-4, report);
        // the same coarse run's residual still closes: it could not have told
        assertTrue(run(Method.EXPLICIT, 1e-2).energy().relativeResidual() < ROUND_OFF);
        assertEquals(0.0, reference.energy().discrepancyFrom(reference.energy()), 0.0);
        // and the stored energy recomputed from its final state shows the coarse run's error too
        assertTrue(storedDiscrepancy(run(Method.EXPLICIT, 1e-2)) > 1e-4, report);
    }
}
