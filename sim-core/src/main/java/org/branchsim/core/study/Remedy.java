package org.branchsim.core.study;

/**
 * A candidate change to a scenario that may cure an oscillation.
 *
 * @param part element or node it changes
 * @param what plain-language description of the change and of its usual cost
 * @param path parameter path
 * @param from value before (as written, or the default in words)
 * @param to value after, as it will be written into the scenario
 */
public record Remedy(String part, String what, String path, String from, Object to) {

    /** @return "path: from -> to" */
    public String change() {
        return path + ": " + from + " -> " + to;
    }
}
