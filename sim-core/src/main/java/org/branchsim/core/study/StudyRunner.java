package org.branchsim.core.study;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.concurrent.atomic.AtomicInteger;
import java.util.function.Function;
import java.util.function.IntConsumer;
import org.branchsim.core.error.BranchsimException;
import org.branchsim.core.results.SimulationResult;
import org.branchsim.core.scenario.Located;
import org.branchsim.core.scenario.Scenario;
import org.branchsim.core.scenario.ScenarioLoader;
import org.branchsim.core.solve.Simulator;

/**
 * Runs the variants of a study on a pool of threads. Each variant changes parameter values, so it gets its own
 * copy of the scenario document and its own circuit model; results come back in variant order, so the
 * outcome does not depend on the number of threads. A variant that fails is reported with its error and
 * does not stop the others.
 */
public final class StudyRunner {

    private StudyRunner() {
    }

    /**
     * @param fileName scenario file name (for messages)
     * @param document the base document (not modified)
     * @param variants the variants
     * @param threads threads to use (at least 1)
     * @param progress called with the number of variants done after each one (from worker threads)
     * @return one outcome per variant, in variant order
     */
    public static List<VariantOutcome> run(String fileName, Located document, List<Variant> variants, int threads,
                                           IntConsumer progress) {
        return run(fileName, document, variants, threads, progress, o -> o);
    }

    /**
     * Runs the variants and reduces each outcome on its worker thread (to its metrics, say), so that large
     * studies do not keep every trace in memory.
     *
     * @param fileName scenario file name (for messages)
     * @param document the base document (not modified)
     * @param variants the variants
     * @param threads threads to use (at least 1)
     * @param progress called with the number of variants done after each one (from worker threads)
     * @param reduce what to keep of each outcome
     * @param <R> the kept type
     * @return one kept value per variant, in variant order
     */
    public static <R> List<R> run(String fileName, Located document, List<Variant> variants, int threads,
                                  IntConsumer progress, Function<VariantOutcome, R> reduce) {
        ExecutorService pool = Executors.newFixedThreadPool(Math.max(1, threads), r -> {
            Thread t = new Thread(r, "branchsim-variant");
            t.setDaemon(true);
            return t;
        });
        AtomicInteger done = new AtomicInteger();
        try {
            List<Future<R>> futures = new ArrayList<>();
            for (Variant v : variants) {
                futures.add(pool.submit(() -> {
                    R kept = reduce.apply(runOne(fileName, document, v));
                    progress.accept(done.incrementAndGet());
                    return kept;
                }));
            }
            List<R> out = new ArrayList<>();
            for (Future<R> f : futures) {
                out.add(f.get());
            }
            return out;
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw new IllegalStateException("interrupted while running variants", e);
        } catch (ExecutionException e) {
            throw new IllegalStateException("a variant failed unexpectedly", e.getCause());
        } finally {
            pool.shutdownNow();
        }
    }

    /**
     * Builds the scenario of one variant without running it.
     *
     * @param fileName scenario file name (for messages)
     * @param document the base document (not modified)
     * @param values value per parameter path, as a scenario writes them
     * @return the variant's scenario, with a fresh circuit
     * @throws BranchsimException when a path does not exist or the changed scenario is not valid
     */
    public static Scenario build(String fileName, Located document, Map<String, Object> values) {
        Located copy = document.copy();
        for (Map.Entry<String, Object> e : values.entrySet()) {
            ParameterPath.parse(e.getKey()).setOrAdd(copy, e.getValue());
        }
        return ScenarioLoader.build(fileName, copy);
    }

    /** Builds and runs one variant; any expected failure becomes the outcome's error. */
    public static VariantOutcome runOne(String fileName, Located document, Variant v) {
        Scenario scenario = null;
        try {
            scenario = build(fileName, document, v.values());
            SimulationResult r = Simulator.run(scenario.circuit(), scenario.solver());
            return new VariantOutcome(v, scenario, r, null);
        } catch (BranchsimException e) {
            return new VariantOutcome(v, scenario, null, e.fullReport().replace(System.lineSeparator(), " | "));
        } catch (RuntimeException e) {
            // a defect must not take the other variants down with it; the message says what happened
            return new VariantOutcome(v, scenario, null, "internal error: " + e);
        }
    }
}
