package org.strandbook.dossier;

import java.util.List;

import org.apache.poi.ss.usermodel.Row;
import org.strandbook.store.AuditEntry;

/**
 * The audit log appendix: every row of the workbook's audit trail, read page by page and streamed,
 * with the time exactly as stored, so that anyone can recompute the hash chain from the sheet (the
 * rule is on the Cautions and method sheet). An empty cell stands for no value.
 */
final class AuditRows {

    static final int PAGE = 1000;

    /** The longest text a spreadsheet cell holds. */
    static final int CELL_LIMIT = 32_767;

    private AuditRows() {
    }

    static long fill(TableSheet t, AuditAppendix audit, Runnable afterPage) {
        long after = 0;
        long rows = 0;
        while (true) {
            List<AuditEntry> page = audit.pages().after(after, PAGE);
            for (AuditEntry e : page) {
                Row r = t.newRow();
                t.number(r, DossierColumn.AUDIT_ID, e.id());
                t.text(r, DossierColumn.AUDIT_AT, DossierText.storedTime(e.at()));
                t.text(r, DossierColumn.AUDIT_USER, e.user());
                t.text(r, DossierColumn.AUDIT_ACTION, e.action());
                t.text(r, DossierColumn.AUDIT_TABLE, e.table());
                t.text(r, DossierColumn.AUDIT_ROW_KEY, e.rowKey());
                t.text(r, DossierColumn.AUDIT_OLD_VALUES, fit(e.oldValues()));
                t.text(r, DossierColumn.AUDIT_NEW_VALUES, fit(e.newValues()));
                t.text(r, DossierColumn.AUDIT_ROW_SHA256, e.rowSha256());
                t.text(r, DossierColumn.AUDIT_PREV_HASH, e.prevHash());
                t.text(r, DossierColumn.AUDIT_HASH, e.hash());
                after = e.id();
                rows++;
            }
            afterPage.run();
            if (page.size() < PAGE) {
                return rows;
            }
        }
    }

    /** The text, cut to what a cell holds, saying so (the hash of such a row cannot be recomputed from the sheet). */
    static String fit(String text) {
        if (text == null || text.length() <= CELL_LIMIT) {
            return text;
        }
        String mark = " … [cut: " + text.length() + " characters in the workbook]";
        return text.substring(0, CELL_LIMIT - mark.length()) + mark;
    }
}
