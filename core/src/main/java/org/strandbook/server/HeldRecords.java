package org.strandbook.server;

import java.util.EnumMap;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;

import org.strandbook.store.PortableTable;
import org.strandbook.store.SyncLedger;

/**
 * The records a sync holds back because a record they depend on is itself in question: a
 * whole-record conflict (removed on one side, changed on the other) found in this sync or still
 * open from an earlier one.
 *
 * <p>A point removed on one laptop takes its bands, path elements and bends with it; a laptop that
 * edited the point meanwhile keeps it, in conflict, until a person chooses. Its children are the
 * same on that laptop as when both sides last agreed, so a plain merge would take their removal
 * from the server (or push it there, in the mirror case) while the point's own fate is still open,
 * and whichever side the person then keeps would come back without its path. Held back instead,
 * each child waits in a whole-record conflict of its own and follows the parent's resolution. The
 * immutable records naming a record in question (a scan of that point) are neither pushed nor
 * pulled while it is open: no other workbook could take a scan of a point it no longer has.
 */
final class HeldRecords {

    /** Per table, the keys of the records in question and of those held back under them. */
    private final Map<PortableTable, Set<String>> held = new EnumMap<>(PortableTable.class);

    /** Starts with the whole-record conflicts the ledger still has open. */
    HeldRecords(List<SyncLedger.Conflict> conflicts) {
        for (SyncLedger.Conflict c : conflicts) {
            if (c.open() && SiteSync.RECORD.equals(c.field())) {
                add(c.table(), c.key());
            }
        }
    }

    void add(PortableTable table, String key) {
        held.computeIfAbsent(table, t -> new HashSet<>()).add(key);
    }

    boolean contains(PortableTable table, String key) {
        Set<String> keys = held.get(table);
        return keys != null && keys.contains(key);
    }

    /**
     * Whether an editable record with these fields (any side's version: the owner is part of its
     * key, the same on every side) belongs to a held record.
     */
    boolean ownerHeld(PortableTable table, Map<String, Object> fields) {
        return !held.isEmpty() && names(table.ownerFields(), fields);
    }

    /** Whether a record with these fields names a held record in any of its references. */
    boolean referenceHeld(PortableTable table, Map<String, Object> fields) {
        return !held.isEmpty() && names(table.referenceFields(), fields);
    }

    private boolean names(Map<String, PortableTable> fieldsToTables, Map<String, Object> fields) {
        if (fields == null) {
            return false;
        }
        for (Map.Entry<String, PortableTable> f : fieldsToTables.entrySet()) {
            Object key = fields.get(f.getKey());
            if (key != null && contains(f.getValue(), key.toString())) {
                return true;
            }
        }
        return false;
    }
}
