package org.branchsim.core.results;

/**
 * One event that happened during a run.
 *
 * @param time simulated time, s
 * @param kind category (seat, stop, contact, corner, schedule)
 * @param owner element (or element.member) it belongs to
 * @param description what happened
 */
public record EventRecord(double time, String kind, String owner, String description) {
}
