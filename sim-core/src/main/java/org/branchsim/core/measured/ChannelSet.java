package org.branchsim.core.measured;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.function.Function;
import org.branchsim.core.error.BranchsimException;
import org.branchsim.core.error.ErrorKey;
import org.branchsim.core.units.Dimension;

/**
 * Merges the channels of several measured files (each on its own time base and rate) and picks the mapped ones.
 * Files whose time column holds timestamps share one time base: their times are counted from the earliest
 * timestamp of all of them; files with numeric times keep their own.
 */
public final class ChannelSet {

    private ChannelSet() {
    }

    /**
     * @param files the files read
     * @param mappings which column records which signal
     * @param signalDimension the dimension of each circuit signal, null for a signal the circuit lacks
     * @param signalExamples some of the circuit's signals, for messages
     * @return one measurement per mapping, in mapping order
     * @throws BranchsimException MEASURED_FILE_INVALID when a mapped column is missing or its unit does not fit
     *         the signal; UNKNOWN_SIGNAL when a signal is not the circuit's
     */
    public static List<Measurement> map(List<MeasuredFile> files, List<ChannelMapping> mappings,
                                        Function<String, Dimension> signalDimension, String signalExamples) {
        double epoch = Double.POSITIVE_INFINITY;
        for (MeasuredFile f : files) {
            if (f.timestamps()) {
                epoch = Math.min(epoch, f.channels().get(0).time()[0]);
            }
        }
        Map<String, MeasuredChannel> byName = new LinkedHashMap<>();
        Map<String, MeasuredFile> fileOf = new LinkedHashMap<>();
        for (MeasuredFile f : files) {
            for (MeasuredChannel c : f.channels()) {
                if (byName.containsKey(c.name())) {
                    throw new BranchsimException(ErrorKey.MEASURED_FILE_INVALID, f.name(), "1", "1", c.name(),
                            "each channel name in one file only", "it also in " + byName.get(c.name()).file());
                }
                byName.put(c.name(), c);
                fileOf.put(c.name(), f);
            }
        }
        List<Measurement> out = new ArrayList<>();
        for (ChannelMapping m : mappings) {
            MeasuredChannel c = byName.get(m.column());
            if (c == null) {
                MeasuredFile first = files.get(0);
                throw new BranchsimException(ErrorKey.MEASURED_FILE_INVALID, first.name(), "1", "1", m.column(),
                        "a column of that name in the measured file(s)", "only " + String.join(", ", byName.keySet()));
            }
            Dimension d = signalDimension.apply(m.signal());
            if (d == null) {
                throw new BranchsimException(ErrorKey.UNKNOWN_SIGNAL, "--map " + m.column(), signalExamples,
                        m.signal());
            }
            if (c.unit().dimension() != d) {
                throw new BranchsimException(ErrorKey.MEASURED_FILE_INVALID, c.file(), "1", "1", m.column(),
                        "a unit of " + d.humanName() + " (it is mapped to " + m.signal() + ")",
                        "\"" + c.unit().symbol() + "\", a unit of " + c.unit().dimension().humanName());
            }
            double[] t = c.time();
            if (fileOf.get(c.name()).timestamps()) {
                for (int k = 0; k < t.length; k++) {
                    t[k] -= epoch;
                }
            }
            out.add(new Measurement(m.signal(), c.name(), c.file(), t, c.values()));
        }
        return out;
    }
}
