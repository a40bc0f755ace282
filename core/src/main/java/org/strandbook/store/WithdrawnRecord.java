package org.strandbook.store;

/**
 * A record taken back by {@link RecordWithdrawal}.
 *
 * @param description  what it was, in words ("inspection of J5 (clean) of 2026-01-12T10:30:00Z by K. Lindqvist")
 * @param pathRestored true when it was an action whose replaced path or probe was put back
 */
public record WithdrawnRecord(String description, boolean pathRestored) {
}
