package org.strandbook.dossier;

import java.util.List;

import org.strandbook.store.AuditEntry;

/**
 * The audit trail as the dossier shows it: its check and, page by page, its rows (so that a trail of
 * any length is never held in memory at once).
 *
 * @param rows     number of rows in the trail
 * @param headHash hash of the last row (64 zeros for an empty trail)
 * @param intact   true when the chain is whole and every data row is as the trail last recorded it
 * @param findings what the check found wrong, in words; empty when intact
 * @param pages    the rows, page by page
 */
public record AuditAppendix(long rows, String headHash, boolean intact, List<String> findings, Pages pages) {

    /** Rows of the trail after row {@code afterId}, at most {@code limit}, in order. */
    @FunctionalInterface
    public interface Pages {
        List<AuditEntry> after(long afterId, int limit);
    }

    public AuditAppendix {
        findings = List.copyOf(findings);
    }

    /** The check in words, for the cover. */
    public String describeCheck() {
        if (intact) {
            return "checked when issued: chain whole, every data row as recorded";
        }
        return "BROKEN when issued: " + findings.size() + " finding(s), first: "
                + (findings.isEmpty() ? "unknown" : findings.get(0));
    }
}
