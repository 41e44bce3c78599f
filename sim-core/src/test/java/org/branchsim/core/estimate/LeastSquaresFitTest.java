package org.branchsim.core.estimate;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Random;
import org.branchsim.core.measured.Measurement;
import org.branchsim.core.results.SimulationResult;
import org.branchsim.core.results.Trace;
import org.branchsim.core.scenario.DocumentParser;
import org.branchsim.core.scenario.Located;
import org.branchsim.core.scenario.Scenario;
import org.branchsim.core.solve.Simulator;
import org.branchsim.core.study.StudyRunner;
import org.junit.jupiter.api.Test;

/**
 * The fit recovers parameters from synthetic measurements the model itself made with known values and added
 * Gaussian noise, within its approximate 95 % confidence intervals, and the intervals shrink as 1/sqrt(N)
 * with the number of samples, as the linearised least-squares covariance s^2 (J^T J)^-1 implies (Bates and Watts,
 * Nonlinear Regression Analysis and Its Applications, 1988, sect. 2.3: J^T J grows in proportion to N for samples
 * drawn densely from the same curves, s^2 stays the noise variance).
 */
class LeastSquaresFitTest {

    static final Path SCENARIO = Path.of("src", "test", "resources", "estimate", "clamp-branch.json");
    /** Noise added to the synthetic measurements, Pa (0.2 bar). */
    static final double NOISE = 0.2e5;
    static final double FROM = 0.1;
    static final double TO = 0.35;

    static final List<FreeParameter> FREE = List.of(
            new FreeParameter("fluid.airContent", 0.05, 1.0, "%", 0.01),
            new FreeParameter("elements.reducer.dampingOrifice.diameter", 0.4, 1.0, "mm", 1e-3),
            new FreeParameter("elements.reducer.spool.damping", 20, 150, "N*s/m", 1.0));
    /** The values the synthetic measurements are made with, in the bounds' units. */
    static final double[] TRUTH = {0.4, 0.6, 80};
    static final List<String> NAMES = FREE.stream().map(FreeParameter::path).toList();

    static Map<String, Object> truthValues(String outputInterval) {
        Map<String, Object> v = new LinkedHashMap<>();
        for (int k = 0; k < FREE.size(); k++) {
            v.put(FREE.get(k).path(), FREE.get(k).text(FREE.get(k).scaled(TRUTH[k])));
        }
        v.put("solver.outputInterval", outputInterval);
        return v;
    }

    /** The model's clamp line and spring chamber pressures at the true values, with seeded Gaussian noise. */
    static List<Measurement> synthetic(Located doc, String outputInterval, long seed) {
        Scenario s = StudyRunner.build(SCENARIO.toString(), doc, truthValues(outputInterval));
        SimulationResult r = Simulator.run(s.circuit(), s.solver());
        Trace trace = r.trace();
        Random noise = new Random(seed);
        List<Measurement> out = new ArrayList<>();
        for (String signal : List.of("clampLine.p", "reducer.chamber.p")) {
            double[] x = trace.series(signal);
            for (int k = 0; k < x.length; k++) {
                x[k] += NOISE * noise.nextGaussian();
            }
            out.add(new Measurement(signal, signal, "synthetic", trace.times(), x));
        }
        return out;
    }

    static TraceResiduals residuals(Located doc, List<Measurement> measured, String outputInterval, boolean known) {
        double[] sigma = new double[measured.size()];
        for (int c = 0; c < sigma.length; c++) {
            sigma[c] = known ? NOISE : NoiseEstimate.sigma(measured.get(c).values());
        }
        return new TraceResiduals(SCENARIO.toString(), doc, FREE, Map.of("solver.outputInterval", outputInterval),
                measured, sigma, FROM, TO, 2);
    }

    @Test
    void recoversAirContentDampingOrificeAndSpoolDampingWithinTheirConfidenceIntervals() {
        Located doc = DocumentParser.parse(SCENARIO);
        List<Measurement> measured = synthetic(doc, "0.5 ms", 11);
        // von Neumann 1941 / Hampel 1974: the successive-difference estimate of the added noise
        assertEquals(NOISE, NoiseEstimate.sigma(measured.get(0).values()), 0.1 * NOISE);
        TraceResiduals model = residuals(doc, measured, "0.5 ms", false);
        // the scenario's own values (0.1 % air, 0.7 mm, 50 N*s/m) and 11 Halton points screened, one descent
        double[] scenario = {FREE.get(0).scaled(0.1), FREE.get(1).scaled(0.7), FREE.get(2).scaled(50)};
        FitResult fit = LeastSquaresFit.fit(model, LeastSquaresFit.starts(FREE.size(), 12, scenario), 1, 20, NAMES);
        String all = "";
        for (int k = 0; k < FREE.size(); k++) {
            all += " " + FREE.get(k).value(fit.optimum()[k]) + " +- " + fit.halfWidth()[k] * FREE.get(k).range();
        }
        double[] tu = new double[FREE.size()];
        for (int k = 0; k < tu.length; k++) {
            tu[k] = FREE.get(k).scaled(TRUTH[k]);
        }
        double atTruth = LeastSquaresFit.at(model, tu, NAMES).costAfter();
        all += "; cost at truth " + atTruth;
        all += "; cost " + fit.costBefore() + " -> " + fit.costAfter() + ", " + fit.iterations() + " iterations, "
                + fit.modelRuns() + " runs";
        for (int k = 0; k < FREE.size(); k++) {
            double estimate = FREE.get(k).value(fit.optimum()[k]);
            double half = fit.halfWidth()[k] * FREE.get(k).range();
            assertTrue(Double.isFinite(half) && half > 0, NAMES.get(k) + " half-width " + half);
            // Bates and Watts 1988, sect. 2.3: the truth lies within the approximate 95 % interval
            assertEquals(TRUTH[k], estimate, half, NAMES.get(k) + " = " + estimate + " +- " + half + all);
            assertNull(fit.identifiability().get(k), fit.identifiability().toString());
        }
        assertTrue(fit.costAfter() < fit.costBefore(), "the fit lowered the cost");
        // a least-squares optimum is no worse than the truth (by definition), up to the solver's tolerance
        assertTrue(fit.costAfter() <= 1.01 * atTruth, all);
        // with the noise weights right, s^2 is about 1 (chi-square / (n - p); Seber and Wild 1989, sect. 2.2)
        assertEquals(1.0, fit.variance(), 0.2);
    }

    @Test
    void confidenceIntervalsShrinkAsOneOverTheRootOfTheSampleCount() {
        Located doc = DocumentParser.parse(SCENARIO);
        double[] truth = new double[FREE.size()];
        for (int k = 0; k < truth.length; k++) {
            truth[k] = FREE.get(k).scaled(TRUTH[k]);
        }
        // one simulated record, sampled every 31.25 us (4N samples) and every 0.125 ms (N samples, every 4th): dense
        // enough that the sums in J^T J over the landing ringing are proportional to the sample count
        List<Measurement> dense = synthetic(doc, "0.03125 ms", 6);
        List<Measurement> sparse = new ArrayList<>();
        for (Measurement m : dense) {
            double[] t = m.time();
            double[] x = m.values();
            int n = (t.length + 3) / 4;
            double[] st = new double[n];
            double[] sx = new double[n];
            for (int k = 0; k < n; k++) {
                st[k] = t[4 * k];
                sx[k] = x[4 * k];
            }
            sparse.add(new Measurement(m.signal(), m.channel(), m.file(), st, sx));
        }
        FitResult coarse = LeastSquaresFit.at(residuals(doc, sparse, "0.03125 ms", true), truth, NAMES);
        FitResult fine = LeastSquaresFit.at(residuals(doc, dense, "0.03125 ms", true), truth, NAMES);
        String ratios = "";
        for (int k = 0; k < truth.length; k++) {
            ratios += " " + fine.halfWidth()[k] / coarse.halfWidth()[k];
        }
        ratios += " s2 " + coarse.variance() + " " + fine.variance();
        assertEquals(4.0, (double) fine.observations() / coarse.observations(), 0.05);
        for (int k = 0; k < truth.length; k++) {
            // Bates and Watts 1988: four times the samples, half the interval (within 20 %)
            assertEquals(0.5, fine.halfWidth()[k] / coarse.halfWidth()[k], 0.1, NAMES.get(k) + ratios);
        }
    }

    @Test
    void aModelThatFailsEverywhereIsReported() {
        ResidualModel broken = new ResidualModel() {
            @Override
            public int parameters() {
                return 2;
            }

            @Override
            public List<double[]> residuals(List<double[]> points) {
                return java.util.Collections.nCopies(points.size(), null);
            }
        };
        org.branchsim.core.error.BranchsimException e = org.junit.jupiter.api.Assertions.assertThrows(
                org.branchsim.core.error.BranchsimException.class,
                () -> LeastSquaresFit.fit(broken, LeastSquaresFit.starts(2, 3, null), 1, 5, List.of("a", "b")));
        assertEquals(org.branchsim.core.error.ErrorKey.ESTIMATION_FAILED, e.key());
    }

    @Test
    void aParameterWithoutEffectIsNotIdentifiable() {
        // Belsley, Kuh and Welsch 1980, ch. 3: a zero column of J (the parameter changes nothing) leaves
        // J^T J singular; two equal columns make it singular too
        org.hipparchus.linear.RealMatrix j = new org.hipparchus.linear.Array2DRowRealMatrix(new double[][] {
            {1, 2, 0, 2}, {2, 1, 0, 1}, {3, 5, 0, 5}, {1, 0, 0, 0}});
        List<String> notes = new ArrayList<>();
        double index = LeastSquaresFit.identifiability(j, List.of("a", "b", "c", "d"), notes);
        assertNull(notes.get(0));
        assertTrue(notes.get(2).contains("no effect"), notes.toString());
        assertTrue(notes.get(1).contains("only a combination with d"), notes.toString());
        assertTrue(notes.get(3).contains("only a combination with b"), notes.toString());
        assertTrue(index > LeastSquaresFit.CONDITION_LIMIT);
    }
}
