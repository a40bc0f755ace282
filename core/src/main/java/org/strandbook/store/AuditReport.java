package org.strandbook.store;

import java.util.List;
import java.util.Optional;

/**
 * Outcome of checking a workbook's audit trail.
 *
 * @param rows     number of audit rows read
 * @param headHash hash of the last audit row (64 zeros when the trail is empty); note it down
 *                 (e.g. in a signed record) to make later truncation of the trail evident too
 * @param chainBreak the first broken link of the hash chain, if any
 * @param unrecordedChanges data rows that differ from what the trail last recorded for them:
 *                 changed, added or removed without Strandbook
 */
public record AuditReport(long rows, String headHash, Optional<AuditFinding> chainBreak,
                          List<AuditFinding> unrecordedChanges) {

    public AuditReport {
        unrecordedChanges = List.copyOf(unrecordedChanges);
    }

    /** True when the chain is whole and every data row is as the trail last recorded it. */
    public boolean intact() {
        return chainBreak.isEmpty() && unrecordedChanges.isEmpty();
    }
}
