package org.strandbook.store;

import java.time.Instant;

/**
 * One row of the audit trail.
 *
 * @param id        position in the trail, from 1
 * @param at        when the change was written (UTC, millisecond)
 * @param user      who made it: the name given when the workbook was opened
 * @param action    INSERT, UPDATE, DELETE, BASELINE (a row found when the trail began) or SCHEMA
 * @param table     the table changed ({@code workbook} for SCHEMA rows)
 * @param rowKey    the row's key in that table
 * @param oldValues the row before, as JSON; null for INSERT and BASELINE
 * @param newValues the row after, as JSON; null for DELETE
 * @param rowSha256 digest of the row after the change (see {@link AuditLog}); null for DELETE and SCHEMA
 * @param prevHash  the previous row's hash (64 zeros for the first row)
 * @param hash      SHA-256 over {@code prevHash} and this row's content
 */
public record AuditEntry(long id, Instant at, String user, String action, String table, String rowKey,
                         String oldValues, String newValues, String rowSha256, String prevHash, String hash) {
}
