package org.branchsim.cli;

import java.util.List;
import java.util.Locale;
import java.util.TreeSet;
import org.branchsim.core.error.BranchsimException;
import org.branchsim.core.model.CircuitModel;
import org.branchsim.core.results.EventRecord;
import org.branchsim.core.results.SimulationResult;
import org.branchsim.core.results.Trace;
import org.branchsim.core.settings.SolverSettings;
import org.branchsim.core.solve.Simulator;

/**
 * The samples a few-cycles figure of an oscillation is drawn from. A run's own output grid is kept when it has at
 * least {@link #SAMPLES_PER_PERIOD} samples per period of the oscillation; a coarser one would draw a chatter's
 * waveform as a zigzag and miss its impacts, so then the same model is run again with the same settings, from
 * t = 0 to the end of the figure's window, every period / {@link #SAMPLES_PER_PERIOD} rounded down to two
 * significant digits (or, when that needs more
 * than {@link #MAX_SAMPLES} samples, the finest spacing within that many), and its event log gives the seat and
 * stop impacts. Times in s.
 *
 * @param trace the samples to draw
 * @param events the event log of the run drawn (empty when it is not known: the run's own grid kept without
 *        its log)
 * @param spacing the time between samples, s
 * @param outputInterval the output interval of the original run, s
 * @param rerun true when the samples come from a re-run
 * @param capped true when the re-run's spacing is coarser than a {@link #SAMPLES_PER_PERIOD}-th of the period
 *        because of {@link #MAX_SAMPLES}
 * @param eventsKnown true when {@code events} is the drawn run's event log
 * @param rerunFailed true when a re-run was needed but failed, so that the run's own samples are drawn
 */
record WaveformRun(Trace trace, List<EventRecord> events, double spacing, double outputInterval, boolean rerun,
                   boolean capped, boolean eventsKnown, boolean rerunFailed) {

    /** Samples per period of the oscillation that show its waveform and where a member sits on its seat. */
    static final int SAMPLES_PER_PERIOD = 40;
    /** Most samples of a re-run. */
    static final long MAX_SAMPLES = 200_000L;

    /**
     * @param model the model that was run
     * @param settings the settings it was run with
     * @param trace its samples
     * @param events its event log, or null when not at hand
     * @param frequency the oscillation's fundamental, Hz
     * @param to the end of the figure's window, s
     * @return the run's own samples when they resolve the waveform, else a re-run sampled finely enough; the
     *         run's own samples, too, when the re-run fails
     */
    static WaveformRun of(CircuitModel model, SolverSettings settings, Trace trace, List<EventRecord> events,
                          double frequency, double to) {
        double interval = settings.outputInterval();
        double wanted = 1.0 / (frequency * SAMPLES_PER_PERIOD);
        List<EventRecord> known = events == null ? List.of() : events;
        if (!(frequency > 0) || interval <= wanted * (1 + 1e-9)) {
            return new WaveformRun(trace, known, interval, interval, false, false, events != null, false);
        }
        double end = Math.min(to, settings.endTime());
        long most = Math.min(MAX_SAMPLES,
                (long) Math.floor(SolverSettings.MAX_OUTPUT_VALUES / (model.signals().size() + 1.0)));
        double dt = roundedDown(wanted);
        boolean capped = false;
        if (SolverSettings.outputSamples(end, dt) > most) {
            dt = end / (most - 2);
            capped = true;
        }
        try {
            SimulationResult fine = Simulator.run(model, settings.withEndTime(end).withOutputInterval(dt));
            return new WaveformRun(fine.trace(), fine.events(), dt, interval, true, capped, true, false);
        } catch (BranchsimException e) {
            return new WaveformRun(trace, known, interval, interval, false, false, events != null, true);
        }
    }

    /** @return the time rounded down to two significant digits (a spacing that reads well: 45 us, not 45.8 us) */
    static double roundedDown(double seconds) {
        double scale = Math.pow(10, Math.floor(Math.log10(seconds)) - 1);
        return Math.max(Math.floor(seconds / scale) * scale, scale);
    }

    /** @return the run's own samples with its event log, or a re-run sampled finely enough */
    static WaveformRun of(SimulationResult result, double frequency, double to) {
        return of(result.model(), result.description().settings(), result.trace(), result.events(), frequency, to);
    }

    /** @return true when an event is a member striking a seat or stop (not leaving it) */
    static boolean isImpact(EventRecord e) {
        return ("seat".equals(e.kind()) || "stop".equals(e.kind())) && !e.description().endsWith("(leaves)");
    }

    /** @return the times of the seat and stop impacts in [from, to], s */
    List<Double> impacts(double from, double to) {
        return events.stream().filter(WaveformRun::isImpact).map(EventRecord::time)
                .filter(t -> t >= from && t <= to).toList();
    }

    /**
     * @param run the label of the run in the figure
     * @param from window start, s
     * @param to window end, s
     * @return the legend label of the impact ticks: the run and the members that struck, with the count
     */
    String impactLabel(String run, double from, double to) {
        TreeSet<String> owners = new TreeSet<>();
        long n = 0;
        for (EventRecord e : events) {
            if (isImpact(e) && e.time() >= from && e.time() <= to) {
                owners.add(e.owner());
                n++;
            }
        }
        return String.format(Locale.ROOT, "seat/stop impacts, %s: %d of %s", run, n, String.join(", ", owners));
    }

    /** @return the subtitle saying the sample spacing drawn and where the samples come from */
    String sampling() {
        String every = String.format(Locale.ROOT, "samples every %s us", micro(spacing));
        if (!rerun) {
            return every + " (the run's output grid" + (rerunFailed ? String.format(Locale.ROOT, ", fewer than %d "
                    + "per period: the re-run on a finer grid failed", SAMPLES_PER_PERIOD) : "") + ")"
                    + (eventsKnown ? "" : "; seat and stop impacts not marked");
        }
        return every + String.format(Locale.ROOT, " from a re-run of the same model to the window's end (the run's "
                + "output interval, %s us, is coarser than a %dth of the period)%s", micro(outputInterval),
                SAMPLES_PER_PERIOD, capped ? String.format(Locale.ROOT, "; fewer than %d per period: a finer grid "
                + "would exceed %d samples", SAMPLES_PER_PERIOD, MAX_SAMPLES) : "");
    }

    private static String micro(double seconds) {
        return new java.math.BigDecimal(seconds * 1e6).round(new java.math.MathContext(3)).stripTrailingZeros()
                .toPlainString();
    }
}
