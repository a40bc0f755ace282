package org.strandbook.app.ui.workbook;

import java.time.Instant;
import java.util.List;

import org.strandbook.server.SiteSync;
import org.strandbook.store.SyncLedger;

/**
 * One open conflict as the window lists it: a field of a record edited here and on the server to
 * different values since the last sync. Values read as a person reads them: text without its JSON
 * quotes, a record removed on one side as "(removed)".
 *
 * @param id       the workbook's number of the conflict (the one {@code sync --resolve} takes)
 * @param record   the record, as table and key ({@code point AT-4101})
 * @param field    the field, or "whole record" when one side removed the record ("whole record, with
 *                 point AT-4101" when it waits with the record it belongs to, and follows its choice)
 * @param mine     this workbook's value
 * @param theirs   the server's value
 * @param theirsBy the login that changed the server's value, empty when the server does not know
 * @param foundAt  when the sync found it
 */
public record ConflictRow(long id, String record, String field, String mine, String theirs, String theirsBy,
                          Instant foundAt) {

    /** The row of {@code c}, among the {@code open} conflicts (a record held back with its owner says so). */
    static ConflictRow of(SyncLedger.Conflict c, List<SyncLedger.Conflict> open) {
        boolean whole = SiteSync.RECORD.equals(c.field());
        String field = whole ? SiteSync.waitsWith(c, open).map(o -> "whole record, with " + o).orElse("whole record")
                : c.field();
        return new ConflictRow(c.id(), c.table().workbookTable() + " " + c.key(), field, c.shown(c.mine()),
                c.shown(c.theirs()), c.theirsBy() == null ? "" : c.theirsBy(), c.foundAt());
    }
}
