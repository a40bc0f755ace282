package org.strandbook.server;

import java.time.Instant;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;

import org.strandbook.store.PortableFields;
import org.strandbook.store.PortableTable;
import org.strandbook.store.SyncLedger;
import org.strandbook.store.WorkbookRecords;

/**
 * A whole-record conflict and the open whole-record conflicts of the records that belong to it
 * (a point's bands and path elements, a segment's bends), resolved together with one choice: the
 * sync held those back only because their owner was in question ({@link HeldRecords}).
 *
 * <p>Keeping theirs writes the workbook in the order its references need: records removed
 * children first (with whatever else here still belongs to them), then records put back parents
 * first. Keeping mine makes each record's base the server's version, so that the next sync pushes
 * the workbook's side of every one of them. Each change is audited as any edit of the workbook.
 */
final class ConflictFamily {

    private record Member(SyncLedger.Conflict conflict, Map<String, Object> mine, Map<String, Object> theirs) {
        PortableTable table() {
            return conflict.table();
        }

        String key() {
            return conflict.key();
        }
    }

    private record Ref(PortableTable table, String key) {
    }

    private final List<Member> members = new ArrayList<>();
    /** The other open conflicts, over single fields of these records: the whole-record choice settles them too. */
    private final List<SyncLedger.Conflict> fieldConflicts;

    /** The conflict and every open whole-record conflict below it, parents first. */
    ConflictFamily(SyncLedger.Conflict head, List<SyncLedger.Conflict> all) {
        Set<Ref> in = new HashSet<>();
        members.add(member(head));
        in.add(new Ref(head.table(), head.key()));
        // the tables run parent before child, so one pass in table order finds grandchildren too
        List<SyncLedger.Conflict> open = all.stream()
                .filter(c -> c.open() && SiteSync.RECORD.equals(c.field()) && c.id() != head.id())
                .sorted(Comparator.comparing((SyncLedger.Conflict c) -> c.table().ordinal())
                        .thenComparing(SyncLedger.Conflict::id))
                .toList();
        for (SyncLedger.Conflict c : open) {
            Member m = member(c);
            Map<String, Object> fields = m.mine() != null ? m.mine() : m.theirs();
            if (fields != null && c.table().ownerFields().entrySet().stream().anyMatch(f -> fields.get(f.getKey()) != null
                    && in.contains(new Ref(f.getValue(), fields.get(f.getKey()).toString())))) {
                members.add(m);
                in.add(new Ref(c.table(), c.key()));
            }
        }
        fieldConflicts = all.stream().filter(c -> c.open() && !SiteSync.RECORD.equals(c.field())
                && in.contains(new Ref(c.table(), c.key()))).toList();
    }

    private static Member member(SyncLedger.Conflict c) {
        return new Member(c, parseRecord(c.mine()), parseRecord(c.theirs()));
    }

    private static Map<String, Object> parseRecord(String json) {
        return json.equals("null") ? null : PortableFields.parse(json);
    }

    /** Carries out the choice inside the caller's workbook transaction. */
    void resolve(WorkbookRecords records, SyncLedger ledger, boolean keepMine, String by) {
        Map<PortableTable, Map<String, SyncLedger.Base>> bases = ledger.bases();
        Set<Ref> removed = keepMine ? Set.of() : takeTheirs(records, records.readAll());
        Instant now = Instant.now();
        List<SyncLedger.Conflict> settled = new ArrayList<>(fieldConflicts);
        if (!removed.isEmpty()) {
            // a record removed with its owner leaves no field of it in question
            ledger.conflicts().stream().filter(c -> c.open() && !SiteSync.RECORD.equals(c.field())
                    && removed.contains(new Ref(c.table(), c.key())) && !settled.contains(c)).forEach(settled::add);
        }
        for (SyncLedger.Conflict c : settled) {
            ledger.resolved(c.id(), keepMine ? "MINE" : "THEIRS", by, now);
        }
        for (Member m : members) {
            SyncLedger.Base b = bases.get(m.table()).get(m.key());
            if (m.theirs() == null) {
                ledger.removeBase(m.table(), m.key());
            } else {
                ledger.putBase(m.table(), m.key(), new SyncLedger.Base(PortableFields.json(m.theirs()),
                        b == null ? 0 : b.revision()));
            }
            ledger.resolved(m.conflict().id(), keepMine ? "MINE" : "THEIRS", by, now);
        }
    }

    /** Writes the server's side of every member here; what it removed. */
    private Set<Ref> takeTheirs(WorkbookRecords records, Map<PortableTable, Map<String, Map<String, Object>>> here) {
        Set<Ref> putBack = new HashSet<>();
        Set<Ref> removed = new HashSet<>();
        for (Member m : members) {
            Ref r = new Ref(m.table(), m.key());
            if (m.theirs() != null) {
                putBack.add(r);
            } else if (here.get(m.table()).containsKey(m.key())) {
                removed.add(r);
            }
        }
        // whatever else here belongs to a record that goes, goes with it
        for (PortableTable t : PortableTable.values()) {
            for (Map.Entry<String, Map<String, Object>> r : here.get(t).entrySet()) {
                if (!putBack.contains(new Ref(t, r.getKey())) && names(t.ownerFields(), r.getValue(), removed)) {
                    removed.add(new Ref(t, r.getKey()));
                }
            }
        }
        for (PortableTable t : PortableTable.values()) {
            for (Map.Entry<String, Map<String, Object>> r : here.get(t).entrySet()) {
                if (!removed.contains(new Ref(t, r.getKey())) && names(t.referenceFields(), r.getValue(), removed)) {
                    Ref named = namedIn(t.referenceFields(), r.getValue(), removed);
                    throw new SyncRefusedException("keeping theirs would remove " + named.table().workbookTable() + " "
                            + named.key() + ", which this workbook's " + t.workbookTable() + " record " + r.getKey()
                            + " names; nothing was changed. Keep mine, or settle with the colleague who removed it"
                            + " which record stands");
                }
            }
        }
        for (Member m : members) {
            if (m.theirs() == null) {
                continue;
            }
            for (Map.Entry<String, PortableTable> f : m.table().ownerFields().entrySet()) {
                Object owner = m.theirs().get(f.getKey());
                Ref ref = owner == null ? null : new Ref(f.getValue(), owner.toString());
                if (ref != null && !putBack.contains(ref) && (removed.contains(ref)
                        || !here.get(ref.table()).containsKey(ref.key()))) {
                    throw new SyncRefusedException("keeping theirs for " + m.table().workbookTable() + " " + m.key()
                            + " needs " + ref.table().workbookTable() + " " + ref.key() + ", which this workbook does"
                            + " not hold; nothing was changed. Resolve the conflict over " + ref.table().workbookTable()
                            + " " + ref.key() + " first: keeping theirs there brings this back with it");
                }
            }
        }
        records.deferReferenceChecks();
        removed.stream().sorted(Comparator.comparing((Ref r) -> r.table().ordinal()).reversed())
                .forEach(r -> records.remove(r.table(), r.key()));
        for (Member m : members) {
            if (m.theirs() != null) {
                records.put(m.table(), m.key(), m.theirs(), null);
            }
        }
        Map<String, String> dangling = records.danglingReferences();
        if (!dangling.isEmpty()) {
            Map.Entry<String, String> first = dangling.entrySet().iterator().next();
            throw new SyncRefusedException("keeping theirs would leave this workbook's " + first.getKey()
                    + " records naming a missing " + first.getValue() + "; nothing was changed. Keep mine, or settle"
                    + " with the colleague whose change it was which record stands");
        }
        return removed;
    }

    private static boolean names(Map<String, PortableTable> references, Map<String, Object> fields, Set<Ref> refs) {
        return namedIn(references, fields, refs) != null;
    }

    private static Ref namedIn(Map<String, PortableTable> references, Map<String, Object> fields, Set<Ref> refs) {
        for (Map.Entry<String, PortableTable> f : references.entrySet()) {
            Object key = fields.get(f.getKey());
            if (key != null && refs.contains(new Ref(f.getValue(), key.toString()))) {
                return new Ref(f.getValue(), key.toString());
            }
        }
        return null;
    }
}
