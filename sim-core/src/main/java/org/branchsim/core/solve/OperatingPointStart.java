package org.branchsim.core.solve;

import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.TreeMap;
import org.branchsim.core.error.BranchsimException;
import org.branchsim.core.error.ErrorKey;
import org.branchsim.core.model.CircuitModel;
import org.branchsim.core.model.Member;
import org.branchsim.core.model.Member.Mode;
import org.branchsim.core.model.StateSlot;
import org.branchsim.core.results.SimulationResult;
import org.branchsim.core.results.Trace;

/**
 * Where an operating-point Newton solve starts: a state, the members held at a stop, and the members in
 * transit (moving in one direction, like a cylinder mid-stroke), which the solve will not bring to
 * rest at a stop: an equilibrium there is where their motion ends, not the circuit's state at this time.
 *
 * @param state start state vector, SI, in the order of the model's states
 * @param held members held at a stop at the start: member id ({@code <element>.<member>}) to its stop
 * @param moving members in transit: member id to its mean speed, m/s
 */
public record OperatingPointStart(double[] state, Map<String, Mode> held, Map<String, Double> moving) {

    /**
     * A member is in transit over a window when it travels more than this fraction of its travel and its
     * velocity never reverses (a chattering or settling member does).
     */
    public static final double TRANSIT_FRACTION = 0.01;

    /** Copies the state and the maps (sorted by id); entries of {@code held} that say FREE are dropped. */
    public OperatingPointStart {
        state = state.clone();
        Map<String, Mode> stops = new TreeMap<>(held);
        stops.values().removeIf(m -> m == Mode.FREE);
        held = Collections.unmodifiableMap(stops);
        moving = Collections.unmodifiableMap(new TreeMap<>(moving));
    }

    /** @return a copy of the start state, SI */
    @Override
    public double[] state() {
        return state.clone();
    }

    /**
     * A start from a run: each state's same-named trace column averaged over [from, to] (the mean over the
     * last cycles when the run oscillates there); a state without a column (e.g. a motor's shaft speed, whose
     * signal has another name) takes its value at the end of the run. Members are held the way the run left
     * them; a free member is in transit when over the window it travels more than
     * {@link #TRANSIT_FRACTION} of its travel and its velocity never takes the opposite sign.
     *
     * @param result a finished run
     * @param from start of the averaging window, s
     * @param to end of the averaging window, s
     * @return the start
     * @throws BranchsimException NO_SAMPLES_IN_WINDOW when the window holds no sample
     */
    public static OperatingPointStart fromRun(SimulationResult result, double from, double to) {
        Trace trace = result.trace();
        List<Integer> rows = new ArrayList<>();
        for (int k = 0; k < trace.size(); k++) {
            if (trace.time(k) >= from && trace.time(k) <= to) {
                rows.add(k);
            }
        }
        if (rows.isEmpty()) {
            throw new BranchsimException(ErrorKey.NO_SAMPLES_IN_WINDOW, String.format(Locale.ROOT, "%.6g", from),
                    String.format(Locale.ROOT, "%.6g", to));
        }
        CircuitModel circuit = result.model();
        Map<StateSlot, Integer> positions = RunEngine.positions(circuit);
        double[] y = result.finalState();
        for (StateSlot s : circuit.states()) {
            int column = trace.indexOf(s.name());
            if (column >= 0) {
                double sum = 0.0;
                for (int k : rows) {
                    sum += trace.value(k, column);
                }
                y[positions.get(s)] = sum / rows.size();
            }
        }
        Map<String, Mode> held = result.description().finalModes();
        Map<String, Double> moving = new TreeMap<>();
        for (Member m : circuit.members()) {
            int x = trace.indexOf(m.positionSlot().name());
            int v = trace.indexOf(m.velocitySlot().name());
            if (held.containsKey(m.id()) || x < 0 || v < 0 || rows.size() < 2) {
                continue;
            }
            int first = rows.get(0);
            int last = rows.get(rows.size() - 1);
            double travel = trace.value(last, x) - trace.value(first, x);
            boolean oneSign = true;
            for (int k : rows) {
                double speed = trace.value(k, v);
                oneSign &= speed == 0.0 || Math.signum(speed) == Math.signum(travel);
            }
            if (oneSign && Math.abs(travel) > TRANSIT_FRACTION * (m.upper() - m.lower())) {
                moving.put(m.id(), travel / (trace.time(last) - trace.time(first)));
            }
        }
        return new OperatingPointStart(y, held, moving);
    }

    /**
     * A start from a given state (e.g. another circuit's operating point of the same topology): a free member
     * is taken as in transit when its speed exceeds {@link OperatingPointSolver#MOVING_FRACTION} of its velocity
     * state's typical magnitude.
     *
     * @param circuit the model to solve
     * @param state start state, SI, in the order of the model's states
     * @param held members held at the start: member id to its stop
     * @return the start
     */
    public static OperatingPointStart fromState(CircuitModel circuit, double[] state, Map<String, Mode> held) {
        Map<String, Double> moving = new TreeMap<>();
        Map<StateSlot, Integer> positions = RunEngine.positions(circuit);
        for (Member m : circuit.members()) {
            StateSlot v = m.velocitySlot();
            int position = positions.get(v);
            double speed = position < state.length ? state[position] : 0.0;
            if (held.getOrDefault(m.id(), Mode.FREE) == Mode.FREE
                    && Math.abs(speed) > OperatingPointSolver.MOVING_FRACTION * v.absoluteScale()) {
                moving.put(m.id(), speed);
            }
        }
        return new OperatingPointStart(state, held, moving);
    }
}
