package org.branchsim.core.analysis;

import java.util.ArrayList;
import java.util.EnumSet;
import java.util.List;
import java.util.Set;
import org.branchsim.core.results.Trace;
import org.branchsim.core.units.Dimension;

/**
 * Peak, minimum and final value of every pressure, flow and position signal of a trace (SI), with the time
 * of the peak and of the minimum.
 */
public final class SignalStatistics {

    /** Dimensions summarised. */
    public static final Set<Dimension> SUMMARISED =
            EnumSet.of(Dimension.PRESSURE, Dimension.VOLUME_FLOW, Dimension.LENGTH);

    /**
     * @param name signal name
     * @param dimension its dimension
     * @param peak largest value, SI
     * @param peakTime time of the largest value, s
     * @param minimum smallest value, SI
     * @param minimumTime time of the smallest value, s
     * @param last value at the end, SI
     */
    public record Summary(String name, Dimension dimension, double peak, double peakTime, double minimum,
                          double minimumTime, double last) {
    }

    private SignalStatistics() {
    }

    /** @return one summary per pressure, flow and position signal, in trace order */
    public static List<Summary> of(Trace trace) {
        List<Summary> out = new ArrayList<>();
        for (int i = 0; i < trace.columns().size(); i++) {
            Trace.Column c = trace.columns().get(i);
            if (!SUMMARISED.contains(c.dimension()) || trace.size() == 0) {
                continue;
            }
            double[] s = trace.series(i);
            int iMax = 0;
            int iMin = 0;
            for (int k = 1; k < s.length; k++) {
                if (s[k] > s[iMax]) {
                    iMax = k;
                }
                if (s[k] < s[iMin]) {
                    iMin = k;
                }
            }
            out.add(new Summary(c.name(), c.dimension(), s[iMax], trace.time(iMax), s[iMin], trace.time(iMin),
                    s[s.length - 1]));
        }
        return out;
    }
}
