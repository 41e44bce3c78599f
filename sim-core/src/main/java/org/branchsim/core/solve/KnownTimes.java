package org.branchsim.core.solve;

import java.util.ArrayList;
import java.util.List;
import org.branchsim.core.model.Discontinuity;
import org.branchsim.core.results.EventRecord;

/**
 * The discontinuities whose times are known before the run (the corners of scheduled inputs): the implicit
 * integrator lands on these times exactly instead of searching for a sign change, and on each landing this
 * records one event per discontinuity there, with the same kind, owner and description an event detector
 * would have recorded.
 */
final class KnownTimes {
    private final List<EventRecord> log;
    private final List<Discontinuity> known = new ArrayList<>();

    KnownTimes(List<EventRecord> log) {
        this.log = log;
    }

    /** @return true when {@code d} happens at a known time; it is then kept here (and needs no detector) */
    boolean accepts(Discontinuity d) {
        if (Double.isFinite(d.knownTime())) {
            known.add(d);
            return true;
        }
        return false;
    }

    /** @return the known times, s (possibly repeated) */
    double[] times() {
        return known.stream().mapToDouble(Discontinuity::knownTime).toArray();
    }

    /** Records every discontinuity at time t, s, in the model's order. */
    void landed(double t) {
        for (Discontinuity d : known) {
            if (d.knownTime() == t) {
                log.add(new EventRecord(t, d.kind(), d.owner(), d.description()));
            }
        }
    }
}
