package org.strandbook.store;

/**
 * One thing the audit check found wrong.
 *
 * @param auditRowId the audit row concerned, or 0 when the finding is about a data row the trail lacks
 * @param message    one line: which row, what differs
 */
public record AuditFinding(long auditRowId, String message) {
}
