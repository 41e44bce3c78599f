package org.branchsim.cli;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import org.branchsim.core.model.ScheduledInput;
import org.branchsim.core.units.Dimension;
import org.branchsim.plots.ValveCharacteristic;

/**
 * Finds the stretches of a run (times in s) in which the scenario ramps its inputs: a ramp of a scheduled input
 * measured in pressure (a supply tank's pressure) is a supply ramp, a ramp of any other input (a demand valve's
 * opening, a load) a demand ramp; it rises when its target lies above the input's value at its start. Steps (ramps
 * of zero duration) are left out: they are not quasi-static. Overlapping ramps of one drive and direction (two
 * demand valves opened together) are merged into one stretch, so that no sample is taken twice.
 */
final class RampStretches {

    private RampStretches() {
    }

    /**
     * @param inputs the circuit's scheduled inputs
     * @param endTime end of the run, s
     * @return the stretches in time order, each cut at the end of the run
     */
    static List<ValveCharacteristic.Stretch> of(List<ScheduledInput> inputs, double endTime) {
        List<ValveCharacteristic.Stretch> raw = new ArrayList<>();
        for (ScheduledInput in : inputs) {
            ValveCharacteristic.Drive drive = in.dimension() == Dimension.PRESSURE
                    ? ValveCharacteristic.Drive.SUPPLY : ValveCharacteristic.Drive.DEMAND;
            for (ScheduledInput.Ramp r : in.ramps()) {
                if (r.duration() > 0.0 && r.start() < endTime) {
                    boolean rising = r.target() > in.valueAt(r.start());
                    raw.add(new ValveCharacteristic.Stretch(r.start(), Math.min(endTime, r.start() + r.duration()),
                            drive, rising));
                }
            }
        }
        raw.sort(Comparator.comparingDouble(ValveCharacteristic.Stretch::from));
        List<ValveCharacteristic.Stretch> merged = new ArrayList<>();
        for (ValveCharacteristic.Stretch s : raw) {
            int k = lastLike(merged, s);
            if (k >= 0 && s.from() <= merged.get(k).to()) {
                ValveCharacteristic.Stretch m = merged.get(k);
                merged.set(k, new ValveCharacteristic.Stretch(m.from(), Math.max(m.to(), s.to()), m.drive(), m.rising()));
            } else {
                merged.add(s);
            }
        }
        return merged;
    }

    private static int lastLike(List<ValveCharacteristic.Stretch> list, ValveCharacteristic.Stretch s) {
        for (int k = list.size() - 1; k >= 0; k--) {
            if (list.get(k).drive() == s.drive() && list.get(k).rising() == s.rising()) {
                return k;
            }
        }
        return -1;
    }
}
