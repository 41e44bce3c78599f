package org.branchsim.core.scenario;

import java.util.ArrayList;
import java.util.List;
import org.branchsim.core.error.BranchsimException;
import org.branchsim.core.error.ErrorKey;
import org.branchsim.core.error.Problem;
import org.branchsim.core.units.UnitSystem;

/** Collects the problems of one scenario so that a user sees all of them at once. */
final class Problems {
    private final String file;
    private final List<Problem> list = new ArrayList<>();
    private final List<String> notes = new ArrayList<>();
    private UnitSystem units = UnitSystem.METRIC;

    Problems(String file) {
        this.file = file;
    }

    /** @return the unit system of the scenario, whose units hints list first */
    UnitSystem units() {
        return units;
    }

    /** Sets the unit system whose units hints list first. */
    void preferUnits(UnitSystem system) {
        this.units = system;
    }

    String file() {
        return file;
    }

    void add(Located at, String path, String expected, String found) {
        list.add(new Problem(file, at == null ? 0 : at.line(), at == null ? 0 : at.column(), path, expected, found));
    }

    void addAt(int line, int column, String path, String expected, String found) {
        list.add(new Problem(file, line, column, path, expected, found));
    }

    /** Records a note that does not stop the scenario (an old spelling still accepted), located like a problem. */
    void note(Located at, String path, String text) {
        notes.add(String.format(java.util.Locale.ROOT, "%s:%d:%d: %s: %s", file, at == null ? 0 : at.line(),
                at == null ? 0 : at.column(), path, text));
    }

    /** @return the notes recorded so far */
    List<String> notes() {
        return List.copyOf(notes);
    }

    /** @return the number of problems recorded so far */
    int count() {
        return list.size();
    }

    boolean isEmpty() {
        return list.isEmpty();
    }

    void throwIfAny() {
        if (!list.isEmpty()) {
            throw new BranchsimException(ErrorKey.SCENARIO_INVALID, list, null, file, list.size());
        }
    }
}
