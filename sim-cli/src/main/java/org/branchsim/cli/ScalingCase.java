package org.branchsim.cli;

import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.PrintWriter;
import java.lang.management.ManagementFactory;
import java.lang.management.ThreadMXBean;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Locale;
import org.branchsim.core.analysis.TraceComparison;
import org.branchsim.core.model.CircuitModel;
import org.branchsim.core.model.Evaluation;
import org.branchsim.core.model.JacobianWorkspace;
import org.branchsim.core.model.Member;
import org.branchsim.core.results.SimulationResult;
import org.branchsim.core.results.SolverStatistics;
import org.branchsim.core.scenario.DocumentParser;
import org.branchsim.core.scenario.Located;
import org.branchsim.core.scenario.Scenario;
import org.branchsim.core.scenario.ScenarioLoader;
import org.branchsim.core.settings.SolverSettings;
import org.branchsim.core.solve.Simulator;
import org.branchsim.core.solve.stiff.RosenbrockScheme;
import org.branchsim.core.solve.stiff.SparsityPattern;
import org.branchsim.core.solve.stiff.StepMatrixChoice;
import org.branchsim.core.solve.stiff.StepMatrixSolver;
import org.branchsim.core.study.BranchReplica;
import org.branchsim.core.units.Dimension;

/**
 * The size-scaling case of {@code timing --scaling}: one reducing valve's branch copied 1, 2, 4, ... times onto
 * the same supply ({@link BranchReplica}), each size run with dense and with sparse LU side by side on this
 * thread. Per size and solver it records the states, steps, the thread's CPU time per run (median and least) and
 * the least per accepted step (s), and splits a step's CPU into the Jacobian (from the elements' partials), the LU work and the evaluations, each
 * measured by repeating that part alone at the run's final state; then fits the exponent of CPU per step against
 * the number of states by least squares on logarithms.
 */
final class ScalingCase {

    /** Least CPU time, s, over which a part of a step is repeated to time it. */
    private static final double PART_TIMING_CPU = 0.02;
    /** The default implicit method's scheme: its gamma (d = 1 / (h gamma)) and its solves per attempted step. */
    private static final RosenbrockScheme SCHEME = RosenbrockScheme.RODAS4;

    /** One size with one solver. */
    record Measurement(int copies, int states, int jacobianGroups, StepMatrixChoice.Kind kind, long steps,
                       long rejected, long evaluations, long jacobians, long factorisations, double cpuMedian,
                       double cpuMin, double evaluationCpu, double jacobianCpu, double factoriseCpu, double solveCpu,
                       double pressureDifference) {

        /**
         * @return least CPU per accepted step over the timed runs, s (on a shared machine the least is the steadiest
         *         estimate of the work itself; the median is in cpuMedian)
         */
        double cpuPerStep() {
            return cpuMin / steps;
        }

        /** @return CPU of the Jacobians (assembled from the elements' partials) per accepted step, s */
        double jacobianPerStep() {
            return (double) jacobians * jacobianCpu / steps;
        }

        /**
         * @return CPU of the factorisations and of each attempted step's solves (one per stage and one for the
         *         interior error check) per accepted step, s
         */
        double luPerStep() {
            return factorisations * (factoriseCpu + (SCHEME.stages() + 1) * solveCpu) / steps;
        }

        /**
         * @return CPU of every evaluation of the equations (stages, step ends, interior checks, output samples,
         *         energy midpoints: all that the run counted) per accepted step, s
         */
        double stagesPerStep() {
            return evaluations * evaluationCpu / steps;
        }
    }

    private final ThreadMXBean clock = ManagementFactory.getThreadMXBean();
    /** The last timed run of the last measurement (its trace is compared between solvers). */
    private SimulationResult lastRun;

    private ScalingCase() {
        if (clock.isCurrentThreadCpuTimeSupported() && !clock.isThreadCpuTimeEnabled()) {
            clock.setThreadCpuTimeEnabled(true);
        }
    }

    /**
     * Runs the case and writes scaling.json and scaling.csv into the folder.
     *
     * @param file the scenario whose branch is copied
     * @param valve the id of the reducing valve heading the branch
     * @param copies the numbers of copies to measure
     * @param endTime simulated time per run, s, or null for the scenario's own
     * @param runs timed runs per size and solver
     * @param warmup untimed runs of each size and solver, all before the first timed run
     * @param folder output folder (not committed here)
     * @param w where the table goes
     * @return the measurements, sizes in the given order, dense before sparse
     */
    static List<Measurement> run(Path file, String valve, List<Integer> copies, Double endTime, int runs, int warmup,
                                 OutputFolder folder, PrintWriter w) {
        ScalingCase c = new ScalingCase();
        Located base = DocumentParser.parse(file);
        List<Scenario> sizes = new ArrayList<>();
        for (int k : copies) {
            try {
                sizes.add(ScenarioLoader.build(file.toString(), BranchReplica.replicate(file.toString(), base, valve, k)));
            } catch (IllegalArgumentException e) {
                throw OptionChecks.unreadable("--scaling-valve", "the id of a reducing valve whose branch can be copied "
                        + "(" + e.getMessage() + ")", "\"" + valve + "\"");
            }
        }
        w.printf("%-7s %-6s %-6s %6s %8s %8s %10s %10s %10s %12s %11s %11s %11s %10s%n", "copies", "states", "LU",
                "groups", "steps", "rejected", "evals", "cpu med", "cpu min", "cpu/step us", "jacobian us", "LU us",
                "stages us", "dp/range");
        // the just-in-time compiler settles on the code of every size before any is timed: the warm-up runs of
        // all sizes and solvers come first, so the first size is not timed on colder code than the last
        for (Scenario s : sizes) {
            SolverSettings settings = endTime == null ? s.solver() : s.solver().withEndTime(endTime);
            for (StepMatrixChoice.Kind kind : StepMatrixChoice.Kind.values()) {
                StepMatrixChoice.forcing(kind, () -> {
                    for (int i = 0; i < warmup; i++) {
                        Simulator.run(s.circuit(), settings);
                    }
                    return null;
                });
            }
        }
        List<Measurement> out = new ArrayList<>();
        for (int i = 0; i < sizes.size(); i++) {
            Scenario s = sizes.get(i);
            SolverSettings settings = endTime == null ? s.solver() : s.solver().withEndTime(endTime);
            SimulationResult dense = null;
            for (StepMatrixChoice.Kind kind : StepMatrixChoice.Kind.values()) {
                Measurement m = c.measure(copies.get(i), s.circuit(), settings, kind, runs, dense);
                if (kind == StepMatrixChoice.Kind.DENSE) {
                    dense = c.lastRun;
                }
                out.add(m);
                w.printf(Locale.ROOT, "%-7d %-6d %-6s %6d %8d %8d %10d %10.4f %10.4f %12.2f %11.2f %11.2f %11.2f %10.2g%n",
                        m.copies(), m.states(), kind.name().toLowerCase(Locale.ROOT), m.jacobianGroups(), m.steps(),
                        m.rejected(), m.evaluations(), m.cpuMedian(), m.cpuMin(), 1e6 * m.cpuPerStep(),
                        1e6 * m.jacobianPerStep(), 1e6 * m.luPerStep(), 1e6 * m.stagesPerStep(), m.pressureDifference());
                w.flush();
            }
        }
        ObjectNode root = MetricsReport.mapper().createObjectNode();
        root.put("scenario", file.toString());
        root.put("valve", valve);
        root.put("runs", runs);
        root.put("warmup", warmup);
        root.put("sparseFromStates", StepMatrixChoice.SPARSE_FROM_STATES);
        ArrayNode rows = root.putArray("measurements");
        StringBuilder csv = new StringBuilder("copies,states,lu,jacobian_groups,accepted_steps,rejected_steps,evaluations,"
                + "jacobians,lu_factorisations,median_cpu_s,min_cpu_s,cpu_per_step_s,jacobian_per_step_s,lu_per_step_s,"
                + "stages_per_step_s,evaluation_cpu_s,factorise_cpu_s,solve_cpu_s,pressure_difference_rel_range\n");
        for (Measurement m : out) {
            ObjectNode o = rows.addObject();
            o.put("copies", m.copies());
            o.put("states", m.states());
            o.put("lu", m.kind().name().toLowerCase(Locale.ROOT));
            o.put("jacobianGroups", m.jacobianGroups());
            o.put("acceptedSteps", m.steps());
            o.put("rejectedSteps", m.rejected());
            o.put("evaluations", m.evaluations());
            o.put("jacobians", m.jacobians());
            o.put("luFactorisations", m.factorisations());
            MetricsReport.putFinite(o, "medianCpu_s", m.cpuMedian());
            MetricsReport.putFinite(o, "minCpu_s", m.cpuMin());
            MetricsReport.putFinite(o, "cpuPerStep_s", m.cpuPerStep());
            MetricsReport.putFinite(o, "jacobianPerStep_s", m.jacobianPerStep());
            MetricsReport.putFinite(o, "luPerStep_s", m.luPerStep());
            MetricsReport.putFinite(o, "stagesPerStep_s", m.stagesPerStep());
            MetricsReport.putFinite(o, "evaluationCpu_s", m.evaluationCpu());
            MetricsReport.putFinite(o, "factoriseCpu_s", m.factoriseCpu());
            MetricsReport.putFinite(o, "solveCpu_s", m.solveCpu());
            MetricsReport.putFinite(o, "pressureDifferenceOverRange", m.pressureDifference());
            csv.append(String.format(Locale.ROOT, "%d,%d,%s,%d,%d,%d,%d,%d,%d,%.6g,%.6g,%.6g,%.6g,%.6g,%.6g,%.6g,%.6g,%.6g,%s%n",
                    m.copies(), m.states(), m.kind().name().toLowerCase(Locale.ROOT), m.jacobianGroups(), m.steps(),
                    m.rejected(), m.evaluations(), m.jacobians(), m.factorisations(), m.cpuMedian(), m.cpuMin(),
                    m.cpuPerStep(), m.jacobianPerStep(), m.luPerStep(), m.stagesPerStep(), m.evaluationCpu(),
                    m.factoriseCpu(), m.solveCpu(),
                    Double.isNaN(m.pressureDifference()) ? "" : String.format(Locale.ROOT, "%.3g", m.pressureDifference())));
        }
        ObjectNode fits = root.putObject("exponentOfCpuPerStep");
        for (StepMatrixChoice.Kind kind : StepMatrixChoice.Kind.values()) {
            double e = exponent(out.stream().filter(m -> m.kind() == kind).toList());
            MetricsReport.putFinite(fits, kind.name().toLowerCase(Locale.ROOT), e);
            w.printf(Locale.ROOT, "%s LU: CPU per step grows as n^%.2f (least squares on logarithms, %d sizes)%n",
                    kind.name().toLowerCase(Locale.ROOT), e, copies.size());
        }
        List<Measurement> chosen = out.stream()
                .filter(m -> m.kind() == StepMatrixChoice.kindFor(m.states())).toList();
        double e = exponent(chosen);
        MetricsReport.putFinite(fits, "asChosen", e);
        double[] logStates = chosen.stream().mapToDouble(m -> Math.log(m.states())).toArray();
        double withoutJacobian = slope(logStates,
                chosen.stream().mapToDouble(m -> Math.log(m.cpuPerStep() - m.jacobianPerStep())).toArray());
        double lu = slope(logStates, chosen.stream().mapToDouble(m -> Math.log(m.luPerStep())).toArray());
        double jacobian = slope(logStates, chosen.stream().mapToDouble(m -> Math.log(m.jacobianPerStep())).toArray());
        MetricsReport.putFinite(fits, "asChosenWithoutJacobian", withoutJacobian);
        MetricsReport.putFinite(fits, "asChosenLuOnly", lu);
        MetricsReport.putFinite(fits, "jacobianOnly", jacobian);
        w.printf(Locale.ROOT, "as chosen (sparse from %d states): CPU per step grows as n^%.2f; without the "
                + "Jacobian n^%.2f; LU alone n^%.2f; the Jacobian alone n^%.2f%n",
                StepMatrixChoice.SPARSE_FROM_STATES, e, withoutJacobian, lu, jacobian);
        folder.writeText("scaling.json", MetricsReport.toJson(root));
        folder.writeText("scaling.csv", csv.toString());
        return out;
    }

    /**
     * @param points measurements of one solver at several sizes
     * @return the slope of ln(CPU per step) against ln(states), least squares; NaN for fewer than two sizes
     */
    static double exponent(List<Measurement> points) {
        double[] x = points.stream().mapToDouble(m -> Math.log(m.states())).toArray();
        double[] y = points.stream().mapToDouble(m -> Math.log(m.cpuPerStep())).toArray();
        return slope(x, y);
    }

    /** @return the least-squares slope of y against x (NaN for fewer than two distinct x) */
    static double slope(double[] x, double[] y) {
        int n = x.length;
        if (n < 2) {
            return Double.NaN;
        }
        double mx = Arrays.stream(x).average().orElse(Double.NaN);
        double my = Arrays.stream(y).average().orElse(Double.NaN);
        double sxy = 0.0;
        double sxx = 0.0;
        for (int i = 0; i < n; i++) {
            sxy += (x[i] - mx) * (y[i] - my);
            sxx += (x[i] - mx) * (x[i] - mx);
        }
        return sxx == 0.0 ? Double.NaN : sxy / sxx;
    }

    private Measurement measure(int copies, CircuitModel model, SolverSettings settings, StepMatrixChoice.Kind kind,
                                int runs, SimulationResult dense) {
        return StepMatrixChoice.forcing(kind, () -> {
            double[] cpus = new double[runs];
            SimulationResult last = null;
            for (int i = 0; i < runs; i++) {
                long c0 = clock.getCurrentThreadCpuTime();
                last = Simulator.run(model, settings);
                cpus[i] = (clock.getCurrentThreadCpuTime() - c0) * 1e-9;
            }
            Arrays.sort(cpus);
            lastRun = last;
            SolverStatistics st = last.statistics();
            SparsityPattern pattern = SparsityPattern.ofBlocks(model.dimension(), model.couplings());
            double[] y = last.finalState();
            double end = settings.endTime();
            double[] partCpu = partCpu(model, pattern, end, y, end / st.acceptedSteps());
            double difference = dense == null ? Double.NaN
                    : TraceComparison.maxErrorOverRange(last.trace(), dense.trace(), Dimension.PRESSURE);
            return new Measurement(copies, model.dimension(), pattern.groupCount(), kind, st.acceptedSteps(),
                    st.rejectedSteps(), st.evaluations(), st.jacobians(), st.factorisations(), cpus[cpus.length / 2],
                    cpus[0], partCpu[0], partCpu[1], partCpu[2], partCpu[3], difference);
        });
    }

    /**
     * Times the parts of a step at one state by repetition: one evaluation of the equations, one Jacobian from the
     * elements' partials, one factorisation of d I - J with d = 1 / (h gamma) for the mean step h, one solve.
     *
     * @return {evaluation, Jacobian, factorisation, solve} CPU, s each
     */
    private double[] partCpu(CircuitModel model, SparsityPattern pattern, double t, double[] y, double meanStep) {
        int n = model.dimension();
        Member.Mode[] modes = new Member.Mode[model.members().size()];
        Arrays.fill(modes, Member.Mode.FREE);
        Evaluation work = model.workspace(modes, new double[model.accounts().size()]);
        double[] f0 = new double[n];
        double evaluation = repeat(() -> model.evaluate(work, t, y, f0, null, null));
        double[][] jac = new double[n][n];
        JacobianWorkspace jacobianWork = model.jacobianWorkspace(modes, new double[model.accounts().size()]);
        double jacobian = repeat(() -> model.jacobian(jacobianWork, t, y, jac));
        StepMatrixSolver solver = StepMatrixChoice.solverFor(pattern);
        double d = 1.0 / (meanStep * SCHEME.gamma());
        double factorise = repeat(() -> solver.factorise(d, jac));
        double[] b = new double[n];
        double solve = repeat(() -> {
            Arrays.fill(b, 1.0);
            solver.solve(b);
        });
        return new double[] {evaluation, jacobian, factorise, solve};
    }

    /** @return the thread's CPU time of one call of {@code part}, s, repeated for at least PART_TIMING_CPU */
    private double repeat(Runnable part) {
        for (int i = 0; i < 200; i++) {
            part.run();
        }
        long count = 0;
        long c0 = clock.getCurrentThreadCpuTime();
        long elapsed;
        do {
            for (int i = 0; i < 100; i++) {
                part.run();
            }
            count += 100;
            elapsed = clock.getCurrentThreadCpuTime() - c0;
        } while (elapsed < PART_TIMING_CPU * 1e9);
        return elapsed * 1e-9 / count;
    }
}
