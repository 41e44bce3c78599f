package org.branchsim.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.branchsim.core.analysis.OscillationFinding;
import org.branchsim.core.analysis.OscillationScan;
import org.branchsim.core.results.SimulationResult;
import org.branchsim.core.scenario.Scenario;
import org.branchsim.core.scenario.ScenarioLoader;
import org.branchsim.core.solve.Simulator;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.title.TextTitle;
import org.jfree.data.Range;
import org.jfree.data.xy.XYDataset;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The few-cycles figure of the chattering gripper demo (its description: the reducing valve's pilot poppet chatters
 * on its seat), run to 0.6 s to keep the test short. The demo's output interval (0.2 ms) gives under ten samples a
 * period of its chatter (about 0.55 kHz), so the figure must come from a re-run with at least 40 samples a period
 * (common practice, no source: a few tens of points a cycle draw a waveform smoothly), and mark the impacts
 * where the poppet is on its seat (lift 0).
 */
class OscillationFigureTest {

    @TempDir
    static Path dir;

    private static Scenario scenario;
    private static SimulationResult result;
    private static OscillationFinding finding;

    @BeforeAll
    static void runTheDemoTo600ms() throws IOException {
        String text = Files.readString(RunCommandTest.SCENARIOS.resolve("gripper-chatter.json"));
        assertTrue(text.contains("\"endTime\": \"1.5 s\""), "the demo's end time is where this test expects it");
        Path file = Files.writeString(dir.resolve("gripper-short.json"),
                text.replace("\"endTime\": \"1.5 s\"", "\"endTime\": \"0.6 s\""));
        scenario = ScenarioLoader.load(file);
        result = Simulator.run(scenario.circuit(), scenario.solver());
        List<OscillationFinding> findings = OscillationScan.scan(result);
        assertFalse(findings.isEmpty(), "the demo chatters");
        finding = findings.get(0);
    }

    @Test
    void theFigureResolvesTheWaveformAndMarksTheSeatImpacts() {
        JFreeChart chart = FigureSet.oscillationFigure(scenario, result.trace(), result.events(), finding).chart();
        XYPlot plot = chart.getXYPlot();
        Range time = plot.getDomainAxis().getRange();
        assertTrue(time.getLowerBound() >= finding.window().from() - 1e-12
                && time.getUpperBound() <= finding.window().to() + 1e-12, time + " inside " + finding.window());
        assertEquals(FigureSet.OSCILLATION_CYCLES / finding.frequency(), time.getLength(), 1e-9,
                "six cycles long");
        XYDataset data = plot.getDataset(0);
        assertEquals(1, data.getSeriesCount());
        double perPeriod = data.getItemCount(0) / (time.getLength() * finding.frequency());
        assertTrue(perPeriod >= WaveformRun.SAMPLES_PER_PERIOD, perPeriod + " samples a period");
        assertTrue(scenario.solver().outputInterval() * finding.frequency() > 1.0 / WaveformRun.SAMPLES_PER_PERIOD,
                "the demo's own grid is coarser: the samples come from the re-run");
        // the dominant signal is the pilot's lift: at each impact it is on its seat
        assertEquals("reducer.pilot.x", finding.dominant().signal());
        XYDataset ticks = plot.getDataset(1);
        assertTrue(ticks.getItemCount(0) >= 1, "impacts marked");
        double top = 0;
        for (int i = 0; i < data.getItemCount(0); i++) {
            top = Math.max(top, data.getYValue(0, i));
        }
        for (int i = 0; i < ticks.getItemCount(0); i++) {
            assertTrue(time.contains(ticks.getXValue(0, i)));
            assertTrue(ticks.getYValue(0, i) < 0.05 * top, "on the seat: " + ticks.getYValue(0, i) + " of " + top);
        }
        boolean said = false;
        for (int i = 0; i < chart.getSubtitleCount(); i++) {
            said |= chart.getSubtitle(i) instanceof TextTitle t && t.getText().startsWith("samples every ");
        }
        assertTrue(said, "the sample spacing is stated");
    }

    @Test
    void aFineEnoughGridIsKeptAndAHugeOneIsCapped() {
        double to = finding.window().to();
        WaveformRun kept = WaveformRun.of(result, 10.0, to);
        assertFalse(kept.rerun(), "0.2 ms is a 500th of a 10 Hz period");
        assertEquals(scenario.solver().outputInterval(), kept.spacing(), 0.0);
        assertTrue(kept.sampling().contains("the run's output grid"), kept.sampling());
        // 40 samples a period of 1 MHz over 10 ms would be 400 000 samples
        WaveformRun capped = WaveformRun.of(result.model(), scenario.solver(), result.trace(), result.events(), 1e6,
                0.01);
        assertTrue(capped.rerun() && capped.capped());
        assertTrue(capped.trace().size() <= WaveformRun.MAX_SAMPLES, capped.trace().size() + " samples");
        assertTrue(capped.sampling().contains("fewer than 40 per period"), capped.sampling());
        // a 40th of the period of 545.6 Hz is 45.8 us, drawn every 45 us (two digits, rounded down)
        assertEquals(45e-6, WaveformRun.roundedDown(1 / (545.6 * 40)), 1e-15);
        assertEquals(1e-3, WaveformRun.roundedDown(1e-3), 1e-18);
    }
}
