package org.branchsim.cli;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.branchsim.core.analysis.ReducingValveMetrics;
import org.branchsim.core.results.Trace;
import org.branchsim.core.scenario.Scenario;
import org.branchsim.core.units.Dimension;
import org.branchsim.plots.LandingChart;
import org.branchsim.plots.TraceCharts;

/**
 * Chooses and writes a run's figures (signals that stay zero throughout are left out): pressures and flows
 * overlaid, positions stacked (their scales differ by orders of magnitude), then each plot group the
 * scenario names (overlaid when its signals share a dimension other than length, stacked otherwise).
 */
public final class FigureSet {

    private FigureSet() {
    }

    /**
     * Writes the figures into the folder: the standard ones, each plot group, and the landing of each reducing
     * valve ({@code landing-<id>.png}).
     */
    public static void write(Scenario scenario, Trace trace, List<ReducingValveMetrics> valves, OutputFolder out) {
        for (ReducingValveMetrics m : valves) {
            if (trace.indexOf(m.id() + ".p.out") >= 0) {
                out.write("landing-" + slug(m.id()) + ".png", p -> LandingChart.save(trace, m,
                        scenario.name() + ": landing of reducing valve " + m.id(), scenario.units(), p));
            }
        }
        List<String> pressures = TraceCharts.signalsOf(trace, Dimension.PRESSURE);
        List<String> flows = TraceCharts.signalsOf(trace, Dimension.VOLUME_FLOW);
        List<String> positions = TraceCharts.signalsOf(trace, Dimension.LENGTH);
        String name = scenario.name();
        if (!pressures.isEmpty()) {
            out.write("pressures.png", p -> TraceCharts.overlay(trace, pressures, name + ": pressures",
                    scenario.units(), p));
        }
        if (!flows.isEmpty()) {
            out.write("flows.png", p -> TraceCharts.overlay(trace, flows, name + ": flows", scenario.units(), p));
        }
        if (!positions.isEmpty()) {
            out.write("positions.png", p -> TraceCharts.stacked(trace, positions, name + ": positions",
                    scenario.units(), p));
        }
        int k = 1;
        for (Scenario.PlotGroup g : scenario.plots()) {
            String file = String.format(Locale.ROOT, "plot-%d-%s.png", k++, slug(g.title()));
            List<String> signals = new ArrayList<>(g.signals());
            List<Dimension> dims = signals.stream()
                    .map(s -> trace.columns().get(trace.indexOf(s)).dimension()).distinct().toList();
            // positions of different members differ by orders of magnitude: give each its own panel
            boolean oneDimension = dims.size() == 1 && dims.get(0) != Dimension.LENGTH;
            out.write(file, p -> {
                if (oneDimension) {
                    TraceCharts.overlay(trace, signals, g.title(), scenario.units(), p);
                } else {
                    TraceCharts.stacked(trace, signals, g.title(), scenario.units(), p);
                }
            });
        }
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
