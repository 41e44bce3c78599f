package org.branchsim.cli;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.branchsim.core.analysis.OscillationFinding;
import org.branchsim.core.analysis.ReducingValveMetrics;
import org.branchsim.core.results.EventRecord;
import org.branchsim.core.results.Trace;
import org.branchsim.core.scenario.Scenario;
import org.branchsim.core.units.Dimension;
import org.branchsim.plots.CycleChart;
import org.branchsim.plots.LandingChart;
import org.branchsim.plots.SignalPanels;
import org.branchsim.plots.TraceCharts;

/**
 * Chooses and writes a run's figures (signals that stay zero throughout are left out, a signal identical to an
 * earlier one is drawn once under both names): pressures overlaid, at most eight to a panel; flows overlaid with
 * the small ones (below a tenth of the largest) on a panel of their own; positions each on its own panel (their
 * scales differ by orders of magnitude); value axes fitted to the signals after start-up (the scenario's metrics
 * window start), time axes ending at the end time. Then each plot group the scenario names (overlaid when its
 * signals share a dimension other than length, small flows apart, stacked otherwise), and the landing of each
 * reducing valve.
 */
public final class FigureSet {

    private FigureSet() {
    }

    /**
     * Writes the figures into the folder: the standard ones, each plot group, and the landing of each reducing
     * valve ({@code landing-<id>.png}); drawn side by side on the machine's cores.
     */
    public static void write(Scenario scenario, Trace trace, List<ReducingValveMetrics> valves, OutputFolder out) {
        List<OutputFolder.Pending> figures = new ArrayList<>();
        for (ReducingValveMetrics m : valves) {
            if (trace.indexOf(m.id() + ".p.out") >= 0) {
                figures.add(new OutputFolder.Pending("landing-" + slug(m.id()) + ".png",
                        p -> LandingChart.save(trace, m, scenario.name() + ": landing of reducing valve " + m.id(),
                                scenario.units(), p)));
            }
        }
        List<SignalPanels.Drawn> pressures = SignalPanels.distinct(trace,
                TraceCharts.signalsOf(trace, Dimension.PRESSURE));
        List<SignalPanels.Drawn> flows = SignalPanels.distinct(trace,
                TraceCharts.signalsOf(trace, Dimension.VOLUME_FLOW));
        List<SignalPanels.Drawn> positions = SignalPanels.distinct(trace,
                TraceCharts.signalsOf(trace, Dimension.LENGTH));
        String name = scenario.name();
        double fitFrom = scenario.metricsFrom();
        if (!pressures.isEmpty()) {
            figures.add(new OutputFolder.Pending("pressures.png", p -> TraceCharts.panels(trace,
                    SignalPanels.limited(pressures), name + ": pressures", scenario.units(), fitFrom, p)));
        }
        if (!flows.isEmpty()) {
            figures.add(new OutputFolder.Pending("flows.png", p -> TraceCharts.panels(trace,
                    SignalPanels.bySize(trace, flows, fitFrom), name + ": flows", scenario.units(), fitFrom, p)));
        }
        if (!positions.isEmpty()) {
            figures.add(new OutputFolder.Pending("positions.png", p -> TraceCharts.panels(trace,
                    SignalPanels.single(positions), name + ": positions", scenario.units(), fitFrom, p)));
        }
        int k = 1;
        for (Scenario.PlotGroup g : scenario.plots()) {
            String file = String.format(Locale.ROOT, "plot-%d-%s.png", k++, slug(g.title()));
            List<String> signals = new ArrayList<>(g.signals());
            List<Dimension> dims = signals.stream()
                    .map(s -> trace.columns().get(trace.indexOf(s)).dimension()).distinct().toList();
            // positions of different members differ by orders of magnitude: give each its own panel
            boolean oneDimension = dims.size() == 1 && dims.get(0) != Dimension.LENGTH;
            List<SignalPanels.Drawn> drawn = SignalPanels.distinct(trace, signals);
            List<List<SignalPanels.Drawn>> panels = !oneDimension ? SignalPanels.single(drawn)
                    : dims.get(0) == Dimension.VOLUME_FLOW ? SignalPanels.bySize(trace, drawn, fitFrom)
                    : SignalPanels.limited(drawn);
            figures.add(new OutputFolder.Pending(file,
                    p -> TraceCharts.panels(trace, panels, g.title(), scenario.units(), fitFrom, p)));
        }
        out.writeAll(figures);
    }

    /** Cycles shown in an oscillation figure. */
    static final int OSCILLATION_CYCLES = 6;

    /**
     * Writes one figure per oscillation found ({@code oscillation-<k>-<signal>.png}): its strongest signal over the
     * last {@link #OSCILLATION_CYCLES} cycles of the window where it is strongest, so that the waveform (and, for
     * chatter, the flat stretches where a member sits on its seat) can be seen. When the run's output grid is too
     * coarse for that, the scenario is run again to the window's end on a finer one ({@link WaveformRun}) and its
     * seat and stop impacts are marked; the subtitle says the sample spacing drawn.
     */
    public static void writeOscillations(Scenario scenario, Trace trace, List<EventRecord> events,
                                         List<OscillationFinding> findings, OutputFolder out) {
        int k = 0;
        for (OscillationFinding f : findings) {
            k++;
            CycleChart.Figure figure = oscillationFigure(scenario, trace, events, f);
            out.write(String.format(Locale.ROOT, "oscillation-%d-%s.png", k, slug(f.dominant().signal())),
                    figure::save);
        }
    }

    /**
     * @param scenario the scenario that was run
     * @param trace its samples
     * @param events its event log (for the seat and stop impacts), or null when not at hand
     * @param f an oscillation found in them
     * @return the figure of its last {@link #OSCILLATION_CYCLES} cycles, from samples that resolve its waveform
     */
    static CycleChart.Figure oscillationFigure(Scenario scenario, Trace trace, List<EventRecord> events,
                                               OscillationFinding f) {
        String signal = f.dominant().signal();
        double to = f.window().to();
        double from = Math.max(f.window().from(), to - OSCILLATION_CYCLES / f.frequency());
        String title = String.format(Locale.ROOT, "%s: %s of %s at %.1f Hz, last %d cycles before %.3f s",
                scenario.name(), f.label(), f.name(), f.frequency(), OSCILLATION_CYCLES, to);
        WaveformRun w = WaveformRun.of(scenario.circuit(), scenario.solver(), trace, events, f.frequency(), to);
        List<CycleChart.Run> runs = List.of(new CycleChart.Run(new TraceCharts.Labelled("as run", w.trace()),
                w.impacts(from, to), w.impactLabel("as run", from, to)));
        return new CycleChart.Figure(runs, signal, title, w.sampling(), scenario.units(), from, to);
    }

    /** Longest slug: with its prefix ("plot-12-", "overlay-", "histogram-") and ".png" a name stays within 60. */
    static final int MAX_SLUG = 40;

    /**
     * @return a file-name part made of a title: lower-case ASCII letters, digits and single dashes, at most
     *         {@link #MAX_SLUG} characters (cut at a dash where possible), "figure" when nothing is left
     */
    static String slug(String title) {
        String s = title.toLowerCase(Locale.ROOT).replaceAll("[^a-z0-9]+", "-").replaceAll("(^-|-$)", "");
        if (s.length() > MAX_SLUG) {
            s = s.substring(0, MAX_SLUG);
            int dash = s.lastIndexOf('-');
            s = (dash >= MAX_SLUG / 2 ? s.substring(0, dash) : s).replaceAll("-$", "");
        }
        return s.isEmpty() ? "figure" : s;
    }
}
