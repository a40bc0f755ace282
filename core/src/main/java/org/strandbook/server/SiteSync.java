package org.strandbook.server;

import java.sql.Array;
import java.sql.Connection;
import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.time.Instant;
import java.util.ArrayList;
import java.util.EnumMap;
import java.util.HashMap;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.Optional;
import java.util.Set;
import java.util.concurrent.CompletableFuture;
import java.util.concurrent.CompletionException;

import org.strandbook.store.AuditEntry;
import org.strandbook.store.AuditReport;
import org.strandbook.store.PortableFields;
import org.strandbook.store.PortableTable;
import org.strandbook.store.SyncLedger;
import org.strandbook.store.Workbook;
import org.strandbook.store.WorkbookException;
import org.strandbook.store.WorkbookRecords;

/**
 * One sync of a workbook with its site on a plant server: push what is new here, pull what others
 * recorded, and find two edits of one field since the last sync.
 *
 * <p>The server's side runs in one transaction, under a lock per site so that two laptops syncing
 * the same site take turns; the workbook's side runs in one transaction after the server's commit.
 * A sync cut off anywhere (killed, server stopped) leaves either nothing or the server ahead of the
 * workbook, and the next sync finds the records it pushed already there (the same values on both
 * sides are agreement, not a conflict) and pulls what it missed.
 *
 * <p>Editable records merge field by field against the last agreed version (the base): a field
 * changed on one side only takes that side's value; a field changed on both sides to different
 * values is a conflict, each side keeps its own value, and a person chooses ({@link #resolve}).
 */
public final class SiteSync {

    /** What a refused sync tells the technician to do. */
    private static final String UNTANGLE = "agree with the colleague whose change it was which record stands,"
            + " make this workbook match it (or undo the change there and sync that), then sync again";
    /** Records fetched from the server per query when pulling. */
    private static final int PULL_CHUNK = 500;
    /**
     * Immutable records per INSERT when pushing: the server audits each statement once, and a
     * scan batch (~2 kB a row) stays well inside one message (design choice).
     */
    private static final int PUSH_BATCH = 500;
    /** The lock class of a site's sync (pg_advisory_xact_lock's first key), our own number. */
    private static final int SYNC_LOCK_CLASS = 0x5342;

    /** What one sync did. */
    public record Outcome(int pushed, int pulled, int changedThere, int changedHere,
                          List<SyncLedger.Conflict> openConflicts, long serverAuditHead) {
    }

    /** The field name a conflict over a whole record (removed on one side, changed on the other) carries. */
    public static final String RECORD = SyncLedger.WHOLE_RECORD;

    private final PlantServer server;
    private final Workbook workbook;
    private final String siteName;
    private final SyncProgress progress;

    public SiteSync(PlantServer server, Workbook workbook, String siteName, SyncProgress progress) {
        this.server = server;
        this.workbook = workbook;
        this.siteName = siteName;
        this.progress = progress;
    }

    private record ServerRow(Map<String, Object> fields, long revision, boolean deleted, String changedBy) {
    }

    /** A change to make in the workbook after the server's commit. */
    private record LocalChange(PortableTable table, String key, Map<String, Object> fields, byte[] spectrum) {
    }

    private record NewConflict(PortableTable table, String key, String field, String mine, String theirs,
                               String theirsBy) {
    }

    /** Everything the workbook's transaction must write once the server has committed. */
    private static final class Plan {
        final List<LocalChange> puts = new ArrayList<>();
        final List<LocalChange> removals = new ArrayList<>();
        final Map<PortableTable, Map<String, SyncLedger.Base>> bases = new EnumMap<>(PortableTable.class);
        final Map<PortableTable, Set<String>> droppedBases = new EnumMap<>(PortableTable.class);
        final List<NewConflict> conflicts = new ArrayList<>();
        final HeldRecords held;
        int pushed;
        int pulled;
        int changedThere;
        int changedHere;

        Plan(HeldRecords held) {
            this.held = held;
        }

        void base(PortableTable t, String key, SyncLedger.Base base) {
            bases.computeIfAbsent(t, x -> new LinkedHashMap<>()).put(key, base);
        }

        void conflict(NewConflict c) {
            conflicts.add(c);
            if (c.field().equals(RECORD)) {
                held.add(c.table(), c.key());
            }
        }
    }

    public Outcome run() {
        progress.step("checking the workbook's audit trail");
        // the file's structural check and the audit trail's are made on a connection of their own
        // while the workbook is read and the exchange runs, which commits only once both have
        // passed: a refused workbook leaves nothing on the server, and a sound one does not wait for
        // the checks before its records start moving
        CompletableFuture<Void> fileChecked = new CompletableFuture<>();
        CompletableFuture<AuditReport> verification = CompletableFuture.supplyAsync(() -> {
            try (Workbook reader = Workbook.openForReading(workbook.file(), workbook.user())) {
                reader.checkIntegrity();
                workbook.acceptIntegrityCheck(reader);
                fileChecked.complete(null);
                return reader.audit().verify();
            } catch (RuntimeException e) {
                fileChecked.completeExceptionally(e);
                throw e;
            }
        });
        SyncLedger ledger = workbook.syncLedger();
        Optional<SyncLedger.State> known = ledger.peek();
        String syncedSite = known.map(SyncLedger.State::siteName).orElse(null);
        if (syncedSite != null && !syncedSite.equals(siteName)) {
            verification.cancel(false);
            throw new SyncRefusedException("this workbook syncs with site \"" + syncedSite + "\", not \""
                    + siteName + "\"");
        }
        AuditEntry head = workbook.audit().head().orElse(null);
        progress.step("reading the workbook");
        WorkbookRecords records = workbook.records();
        Map<PortableTable, Map<String, Map<String, Object>>> local = records.readAll();
        Map<PortableTable, Map<String, SyncLedger.Base>> bases = ledger.bases();
        SyncLedger.State state = known.orElseGet(() -> {
            // the workbook's first write (its identity for the server, made once) waits for the file check
            joined(fileChecked);
            return workbook.inTransaction(ledger::state);
        });

        Plan plan = new Plan(new HeldRecords(ledger.conflicts()));
        long serverHead;
        try (Connection c = server.connect()) {
            try {
                long siteId = openSite(c);
                progress.step("comparing with the server");
                for (PortableTable t : PortableTable.values()) {
                    if (t.editable()) {
                        mergeEditable(c, siteId, t, local.get(t), bases.get(t), plan);
                    } else {
                        exchangeImmutable(c, siteId, t, local.get(t), bases.get(t), records, plan);
                    }
                }
                if (head != null && head.id() > state.pushedEntryId()) {
                    recordTaken(c, siteId, state, head);
                }
                serverHead = auditHead(c, siteId);
                requireVerified(verification);
                progress.step("writing what others recorded into the workbook");
                // the workbook takes the server's side before the server commits, and commits after it:
                // what the workbook cannot take leaves nothing on either side, instead of a server that
                // holds this push and a workbook that can never write what it pulled
                workbook.inTransaction(() -> {
                    applyHere(plan, records, ledger);
                    try {
                        c.commit();
                    } catch (SQLException e) {
                        throw new ServerException("the sync with " + server.login().displayUrl()
                                + " failed and changed nothing there: " + ServerException.firstLine(e), e);
                    }
                });
            } catch (SQLException | RuntimeException e) {
                rollbackQuietly(c);
                throw e instanceof SQLException sql ? new ServerException("the sync with "
                        + server.login().displayUrl() + " failed and changed nothing there: "
                        + ServerException.firstLine(sql), sql) : (RuntimeException) e;
            }
        } catch (SQLException e) {
            throw new ServerException("cannot close the connection to " + server.login().displayUrl(), e);
        }
        List<SyncLedger.Conflict> open = ledger.conflicts().stream().filter(SyncLedger.Conflict::open).toList();
        return new Outcome(plan.pushed, plan.pulled, plan.changedThere, plan.changedHere, open, serverHead);
    }

    /**
     * Writes the server's side into the workbook, inside the caller's transaction: removals first
     * (children before parents), then new and changed records (parents first), references checked
     * once all is written. A record the workbook's rules refuse stops the sync with its name.
     */
    private void applyHere(Plan plan, WorkbookRecords records, SyncLedger ledger) {
        records.deferReferenceChecks();
        for (int i = plan.removals.size() - 1; i >= 0; i--) {
            records.remove(plan.removals.get(i).table(), plan.removals.get(i).key());
        }
        for (LocalChange ch : plan.puts) {
            try {
                records.put(ch.table(), ch.key(), ch.fields(), ch.spectrum());
            } catch (WorkbookException e) {
                throw new SyncRefusedException("the server's " + ch.table().workbookTable() + " record " + ch.key()
                        + " cannot be written into this workbook (" + e.getMessage() + "): another workbook changed"
                        + " it in a way this one cannot take as it stands. Nothing was changed on the server or"
                        + " here; " + UNTANGLE);
            }
        }
        Map<String, String> dangling = records.danglingReferences();
        if (!dangling.isEmpty()) {
            Map.Entry<String, String> first = dangling.entrySet().iterator().next();
            List<String> removed = plan.removals.stream()
                    .filter(r -> r.table().workbookTable().equals(first.getValue())).map(LocalChange::key).toList();
            throw new SyncRefusedException("this workbook's " + first.getKey() + " records name a "
                    + first.getValue() + (removed.isEmpty() ? " that is missing" : " that another workbook removed ("
                    + String.join(", ", removed) + ")") + ". Nothing was changed on the server or here; " + UNTANGLE);
        }
        plan.bases.forEach(ledger::putBases);
        plan.droppedBases.forEach((t, keys) -> keys.forEach(k -> ledger.removeBase(t, k)));
        Instant now = Instant.now();
        for (NewConflict nc : plan.conflicts) {
            ledger.conflict(nc.table(), nc.key(), nc.field(), nc.mine(), nc.theirs(), nc.theirsBy(), now);
        }
        // entries this sync wrote came from the server: nothing of them is left to push
        ledger.synced(server.login().displayUrl(), siteName, workbook.audit().head().map(AuditEntry::id).orElse(0L),
                now);
    }

    private void requireVerified(CompletableFuture<AuditReport> verification) {
        AuditReport report = joined(verification);
        if (!report.intact()) {
            throw new SyncRefusedException("the workbook " + workbook.file() + " fails `audit verify` ("
                    + report.chainBreak().map(f -> "chain broken").orElse(report.unrecordedChanges().size()
                    + " change(s) made outside Strandbook") + "); the server takes only a verifiable workbook");
        }
    }

    /** The future's value, or what it failed with, thrown as it was. */
    private static <T> T joined(CompletableFuture<T> future) {
        try {
            return future.join();
        } catch (CompletionException e) {
            throw e.getCause() instanceof RuntimeException r ? r : e;
        }
    }

    private long openSite(Connection c) throws SQLException {
        long siteId = siteId(c, siteName);
        try (PreparedStatement ps = c.prepareStatement("SELECT pg_advisory_xact_lock(?, ?)")) {
            ps.setInt(1, SYNC_LOCK_CLASS);
            ps.setInt(2, (int) siteId);
            ps.execute();
        }
        return siteId;
    }

    /**
     * The server's id of the named site, created with the caller as its first member if new; a
     * site the caller is not a member of is refused by the server.
     */
    static long siteId(Connection c, String siteName) throws SQLException {
        try (PreparedStatement ps = c.prepareStatement("SELECT open_site(?)")) {
            ps.setString(1, siteName);
            try (ResultSet rs = ps.executeQuery()) {
                rs.next();
                return rs.getLong(1);
            }
        } catch (SQLException e) {
            if ("42501".equals(e.getSQLState())) {
                throw new SyncRefusedException("the server refused: " + ServerException.firstLine(e));
            }
            throw e;
        }
    }

    private void mergeEditable(Connection c, long siteId, PortableTable t, Map<String, Map<String, Object>> mine,
                               Map<String, SyncLedger.Base> base, Plan plan) throws SQLException {
        Map<String, ServerRow> theirs = new HashMap<>();
        try (PreparedStatement ps = c.prepareStatement("SELECT record_key, fields::text, revision, deleted, changed_by"
                + " FROM " + t.serverTable() + " WHERE site_id = ?")) {
            ps.setLong(1, siteId);
            try (ResultSet rs = ps.executeQuery()) {
                while (rs.next()) {
                    theirs.put(rs.getString(1), new ServerRow(PortableFields.parse(rs.getString(2)), rs.getLong(3),
                            rs.getBoolean(4), rs.getString(5)));
                }
            }
        }
        Set<String> keys = new LinkedHashSet<>(mine.keySet());
        keys.addAll(theirs.keySet());
        keys.addAll(base.keySet());
        for (String key : keys) {
            Map<String, Object> m = mine.get(key);
            ServerRow row = theirs.get(key);
            Map<String, Object> th = row == null || row.deleted() ? null : row.fields();
            SyncLedger.Base b = base.get(key);
            Map<String, Object> bf = b == null ? null : PortableFields.parse(b.fieldsJson());
            long revision = row == null ? 0 : row.revision();
            if (!Objects.equals(m, th) && plan.held.ownerHeld(t, m != null ? m : th != null ? th : bf)) {
                // what it belongs to is in question: neither side's version travels until a person
                // chooses, and the base stays as it was
                plan.conflict(new NewConflict(t, key, RECORD, m == null ? "null" : PortableFields.json(m),
                        th == null ? "null" : PortableFields.json(th), row == null ? "" : row.changedBy()));
            } else if (Objects.equals(m, th)) {
                agree(t, key, m, revision, b, plan);
            } else if (b != null && Objects.equals(th, bf)) {
                revision = pushRecord(c, siteId, t, key, m, row);
                agree(t, key, m, revision, b, plan);
                plan.changedThere++;
            } else if (b != null && Objects.equals(m, bf) || m == null && b == null) {
                pullRecord(t, key, th, plan);
                agree(t, key, th, revision, b, plan);
            } else if (th == null && b == null) {
                revision = pushRecord(c, siteId, t, key, m, row);
                agree(t, key, m, revision, b, plan);
                plan.changedThere++;
            } else {
                mergeFields(c, siteId, t, key, m, row, th, bf, plan);
            }
        }
    }

    /** Both sides hold {@code fields} (null: neither holds the record); it becomes the base. */
    private static void agree(PortableTable t, String key, Map<String, Object> fields, long revision,
                              SyncLedger.Base old, Plan plan) {
        if (fields == null) {
            if (old != null) {
                plan.droppedBases.computeIfAbsent(t, x -> new HashSet<>()).add(key);
            }
            return;
        }
        SyncLedger.Base now = new SyncLedger.Base(PortableFields.json(fields), revision);
        if (!now.equals(old)) {
            plan.base(t, key, now);
        }
    }

    private static void pullRecord(PortableTable t, String key, Map<String, Object> fields, Plan plan) {
        if (fields == null) {
            plan.removals.add(new LocalChange(t, key, null, null));
        } else {
            plan.puts.add(new LocalChange(t, key, fields, null));
        }
        plan.changedHere++;
    }

    /** Writes {@code fields} (null: marks the record removed) on the server; the new revision. */
    private static long pushRecord(Connection c, long siteId, PortableTable t, String key, Map<String, Object> fields,
                                   ServerRow row) throws SQLException {
        if (row == null) {
            if (fields == null) {
                return 0;
            }
            try (PreparedStatement ps = c.prepareStatement("INSERT INTO " + t.serverTable()
                    + " (site_id, record_key, fields) VALUES (?, ?, ?::jsonb)")) {
                ps.setLong(1, siteId);
                ps.setString(2, key);
                ps.setString(3, PortableFields.json(fields));
                ps.executeUpdate();
            }
            return 1;
        }
        // the server moves the revision and stamps who and when (schema 5): a technician may set only these two
        try (PreparedStatement ps = c.prepareStatement("UPDATE " + t.serverTable() + " SET fields = ?::jsonb,"
                + " deleted = ? WHERE site_id = ? AND record_key = ? AND revision = ?")) {
            ps.setString(1, PortableFields.json(fields == null ? row.fields() : fields));
            ps.setBoolean(2, fields == null);
            ps.setLong(3, siteId);
            ps.setString(4, key);
            ps.setLong(5, row.revision());
            if (ps.executeUpdate() != 1) {
                throw new ServerException(t.workbookTable() + " " + key + " changed on the server during this sync;"
                        + " nothing was changed: sync again");
            }
        }
        return row.revision() + 1;
    }

    /**
     * Both sides changed the record since the base: field by field, a field changed on one side
     * takes that value, a field changed on both sides to different values is a conflict.
     */
    private static void mergeFields(Connection c, long siteId, PortableTable t, String key, Map<String, Object> m,
                                    ServerRow row, Map<String, Object> th, Map<String, Object> bf, Plan plan)
            throws SQLException {
        String theirsBy = row == null ? "" : row.changedBy();
        if (m == null || th == null || t.identityFields().stream().anyMatch(f -> !Objects.equals(m.get(f), th.get(f)))) {
            // removed on one side, changed on the other, or two different things under one key: the
            // whole record is the question
            plan.conflict(new NewConflict(t, key, RECORD, m == null ? "null" : PortableFields.json(m),
                    th == null ? "null" : PortableFields.json(th), theirsBy));
            return;
        }
        Map<String, Object> b = bf == null ? Map.of() : bf;
        Set<String> fields = new LinkedHashSet<>(m.keySet());
        fields.addAll(th.keySet());
        Map<String, Object> forServer = new LinkedHashMap<>(th);
        Map<String, Object> forHere = new LinkedHashMap<>(m);
        Map<String, Object> agreed = new LinkedHashMap<>(b);
        boolean conflicted = false;
        for (String f : fields) {
            Object mv = m.get(f);
            Object tv = th.get(f);
            Object bv = b.get(f);
            if (Objects.equals(mv, tv)) {
                agreed.put(f, mv);
            } else if (bf != null && Objects.equals(mv, bv)) {
                forHere.put(f, tv);
                agreed.put(f, tv);
            } else if (bf != null && Objects.equals(tv, bv)) {
                forServer.put(f, mv);
                agreed.put(f, mv);
            } else {
                conflicted = true;
                plan.conflict(new NewConflict(t, key, f, PortableFields.value(mv), PortableFields.value(tv),
                        theirsBy));
            }
        }
        long revision = row.revision();
        if (!forServer.equals(th)) {
            revision = pushRecord(c, siteId, t, key, forServer, row);
            plan.changedThere++;
        }
        if (!forHere.equals(m)) {
            pullRecord(t, key, forHere, plan);
        }
        if (!conflicted) {
            agree(t, key, agreed, revision, null, plan);
        } else if (bf != null) {
            plan.base(t, key, new SyncLedger.Base(PortableFields.json(agreed), revision));
        }
    }

    private void exchangeImmutable(Connection c, long siteId, PortableTable t, Map<String, Map<String, Object>> mine,
                                   Map<String, SyncLedger.Base> base, WorkbookRecords records, Plan plan)
            throws SQLException {
        Set<String> theirs = new HashSet<>();
        try (PreparedStatement ps = c.prepareStatement("SELECT record_key FROM " + t.serverTable()
                + " WHERE site_id = ?")) {
            ps.setLong(1, siteId);
            ps.setFetchSize(10_000);
            try (ResultSet rs = ps.executeQuery()) {
                while (rs.next()) {
                    theirs.add(rs.getString(1));
                }
            }
        }
        // a record naming one in question waits here until a person has chosen
        Set<String> heldHere = new HashSet<>();
        for (Map.Entry<String, Map<String, Object>> r : mine.entrySet()) {
            if (plan.held.referenceHeld(t, r.getValue())) {
                heldHere.add(r.getKey());
                plan.held.add(t, r.getKey());
            }
        }
        List<String> toPush = mine.keySet().stream().filter(k -> !theirs.contains(k) && !heldHere.contains(k))
                .toList();
        if (!toPush.isEmpty()) {
            progress.step("pushing " + toPush.size() + " " + t.workbookTable() + " record(s)");
            boolean scan = t == PortableTable.SCAN;
            String row = scan ? "(?, ?, ?::jsonb, ?)" : "(?, ?, ?::jsonb)";
            String insert = "INSERT INTO " + t.serverTable() + " (site_id, record_key, fields" + (scan ? ", spectrum" : "")
                    + ") VALUES ";
            List<OutgoingRecords.Row> batch = new ArrayList<>(PUSH_BATCH);
            // one multi-row statement per batch: the server plans and audits a statement once. No ON
            // CONFLICT clause: the keys the server holds were read under the site's lock, so none of
            // these is there, and a duplicate all the same would fail the whole transaction, not half of it
            try (PreparedStatement full = c.prepareStatement(insert + (row + ", ").repeat(PUSH_BATCH - 1) + row);
                 OutgoingRecords outgoing = new OutgoingRecords(records, t, mine, toPush)) {
                int n = 0;
                for (OutgoingRecords.Row r = outgoing.next(); r != null; r = outgoing.next()) {
                    batch.add(r);
                    if (batch.size() == PUSH_BATCH) {
                        insertRows(full, siteId, batch, scan);
                        n += batch.size();
                        batch.clear();
                        progress.done(n, toPush.size());
                    }
                }
                if (!batch.isEmpty()) {
                    try (PreparedStatement tail = c.prepareStatement(insert + (row + ", ").repeat(batch.size() - 1)
                            + row)) {
                        insertRows(tail, siteId, batch, scan);
                    }
                    n += batch.size();
                }
                progress.done(n, toPush.size());
            }
            plan.pushed += toPush.size();
        }
        Set<String> removed = t == PortableTable.SCAN ? exchangeRemovals(c, siteId, mine, base, theirs, plan) : Set.of();
        List<String> toPull = theirs.stream().filter(k -> !mine.containsKey(k) && !base.containsKey(k)
                && !removed.contains(k)).sorted().toList();
        List<String> pulled = List.of();
        if (!toPull.isEmpty()) {
            progress.step("pulling " + toPull.size() + " " + t.workbookTable() + " record(s)");
            pulled = pullImmutable(c, siteId, t, toPull, plan);
        }
        SyncLedger.Base seen = new SyncLedger.Base("", 0);
        for (String key : mine.keySet()) {
            if (!base.containsKey(key) && !heldHere.contains(key)) {
                plan.base(t, key, seen);
            }
        }
        for (String key : pulled) {
            plan.base(t, key, seen);
        }
    }

    /**
     * Scans removed from a workbook (a wrong import) stay on the server, immutable, and a removal
     * record names each: one removed here since the last sync (agreed on before, gone now) is
     * recorded on the server; one another workbook removed is removed here too (audited). A removal is
     * final for that SHA-256: the same file imported again is removed again at the next sync.
     *
     * @return every scan the site has removed, which no workbook pulls again
     */
    private Set<String> exchangeRemovals(Connection c, long siteId, Map<String, Map<String, Object>> mine,
                                         Map<String, SyncLedger.Base> base, Set<String> theirs, Plan plan)
            throws SQLException {
        Set<String> removed = new HashSet<>();
        try (PreparedStatement ps = c.prepareStatement("SELECT record_key FROM scan_removal WHERE site_id = ?")) {
            ps.setLong(1, siteId);
            ps.setFetchSize(10_000);
            try (ResultSet rs = ps.executeQuery()) {
                while (rs.next()) {
                    removed.add(rs.getString(1));
                }
            }
        }
        List<String> removedHere = base.keySet().stream()
                .filter(k -> !mine.containsKey(k) && theirs.contains(k) && !removed.contains(k)).sorted().toList();
        if (!removedHere.isEmpty()) {
            progress.step("recording " + removedHere.size() + " scan removal(s) on the server");
            String fields = PortableFields.json(Map.of("removed_by", workbook.user()));
            try (PreparedStatement ps = c.prepareStatement("INSERT INTO scan_removal (site_id, record_key, fields)"
                    + " SELECT ?, k, ?::jsonb FROM unnest(?::text[]) k")) {
                ps.setLong(1, siteId);
                ps.setString(2, fields);
                ps.setArray(3, c.createArrayOf("text", removedHere.toArray()));
                ps.executeUpdate();
            }
            removed.addAll(removedHere);
            plan.droppedBases.computeIfAbsent(PortableTable.SCAN, x -> new HashSet<>()).addAll(removedHere);
            plan.changedThere += removedHere.size();
        }
        for (String key : mine.keySet()) {
            if (removed.contains(key)) {
                plan.removals.add(new LocalChange(PortableTable.SCAN, key, null, null));
                plan.droppedBases.computeIfAbsent(PortableTable.SCAN, x -> new HashSet<>()).add(key);
                plan.changedHere++;
            }
        }
        return removed;
    }

    private static void insertRows(PreparedStatement ps, long siteId, List<OutgoingRecords.Row> rows, boolean scan)
            throws SQLException {
        int p = 0;
        for (OutgoingRecords.Row r : rows) {
            ps.setLong(++p, siteId);
            ps.setString(++p, r.key());
            ps.setString(++p, r.fieldsJson());
            if (scan) {
                ps.setBytes(++p, r.spectrum());
            }
        }
        ps.executeUpdate();
    }

    /** Pulls the records with these keys, except those naming a record in question; the keys pulled. */
    private List<String> pullImmutable(Connection c, long siteId, PortableTable t, List<String> keys, Plan plan)
            throws SQLException {
        boolean scan = t == PortableTable.SCAN;
        String sql = "SELECT record_key, fields::text" + (scan ? ", spectrum" : "") + " FROM " + t.serverTable()
                + " WHERE site_id = ? AND record_key = ANY (?)";
        List<LocalChange> pulled = new ArrayList<>();
        for (int from = 0; from < keys.size(); from += PULL_CHUNK) {
            List<String> chunk = keys.subList(from, Math.min(keys.size(), from + PULL_CHUNK));
            try (PreparedStatement ps = c.prepareStatement(sql)) {
                Array array = c.createArrayOf("text", chunk.toArray());
                ps.setLong(1, siteId);
                ps.setArray(2, array);
                try (ResultSet rs = ps.executeQuery()) {
                    while (rs.next()) {
                        Map<String, Object> fields = PortableFields.parse(rs.getString(2));
                        if (plan.held.referenceHeld(t, fields)) {
                            plan.held.add(t, rs.getString(1));
                        } else {
                            pulled.add(new LocalChange(t, rs.getString(1), fields, scan ? rs.getBytes(3) : null));
                        }
                    }
                }
            }
            progress.done(Math.min(keys.size(), from + PULL_CHUNK), keys.size());
        }
        plan.puts.addAll(pulled);
        plan.pulled += pulled.size();
        return pulled.stream().map(LocalChange::key).toList();
    }

    /** Notes on the server which of this workbook's audit entries it has now taken. */
    private static void recordTaken(Connection c, long siteId, SyncLedger.State state, AuditEntry head)
            throws SQLException {
        long taken = state.pushedEntryId();
        try (PreparedStatement ps = c.prepareStatement("SELECT max(last_entry_id) FROM workbook_push"
                + " WHERE site_id = ? AND workbook_id = ?")) {
            ps.setLong(1, siteId);
            ps.setString(2, state.workbookId());
            try (ResultSet rs = ps.executeQuery()) {
                rs.next();
                taken = Math.max(taken, rs.getLong(1));
            }
        }
        if (head.id() <= taken) {
            return;
        }
        try (PreparedStatement ps = c.prepareStatement("INSERT INTO workbook_push (site_id, workbook_id,"
                + " first_entry_id, last_entry_id, last_entry_hash) VALUES (?, ?, ?, ?, ?)")) {
            ps.setLong(1, siteId);
            ps.setString(2, state.workbookId());
            ps.setLong(3, taken + 1);
            ps.setLong(4, head.id());
            ps.setString(5, head.hash());
            ps.executeUpdate();
        }
    }

    private static long auditHead(Connection c, long siteId) throws SQLException {
        try (PreparedStatement ps = c.prepareStatement("SELECT coalesce(max(id), 0) FROM audit_entry WHERE site_id = ?")) {
            ps.setLong(1, siteId);
            try (ResultSet rs = ps.executeQuery()) {
                rs.next();
                return rs.getLong(1);
            }
        }
    }

    private static void rollbackQuietly(Connection c) {
        try {
            c.rollback();
        } catch (SQLException e) {
            // the connection is gone; the server rolls back on its own
        }
    }

    /**
     * The record ("point AT-4101") whose open whole-record conflict this whole-record conflict waits
     * with, as a sync held it back; empty for one that stands on its own. Resolving that one resolves
     * this too.
     */
    public static Optional<String> waitsWith(SyncLedger.Conflict c, List<SyncLedger.Conflict> conflicts) {
        if (!c.field().equals(RECORD)) {
            return Optional.empty();
        }
        Map<String, Object> fields = PortableFields.parse(c.mine().equals("null") ? c.theirs() : c.mine());
        for (Map.Entry<String, PortableTable> owner : c.table().ownerFields().entrySet()) {
            Object key = fields.get(owner.getKey());
            if (key != null && conflicts.stream().anyMatch(x -> x.open() && x.field().equals(RECORD)
                    && x.table() == owner.getValue() && x.key().equals(key.toString()))) {
                return Optional.of(owner.getValue().workbookTable() + " " + key);
            }
        }
        return Optional.empty();
    }

    /**
     * A person's choice for an open conflict, made in the workbook before the next sync carries it
     * out: keeping theirs changes the workbook now (an audited update); keeping mine makes the base
     * the server's value, so that the sync that follows pushes mine as an edit made here (an
     * audited update on the server). A conflict over a whole record resolves the open whole-record
     * conflicts of the records belonging to it with the same choice ({@link ConflictFamily}).
     */
    public static SyncLedger.Conflict resolve(Workbook workbook, long conflictId, boolean keepMine, String by) {
        SyncLedger ledger = workbook.syncLedger();
        List<SyncLedger.Conflict> all = ledger.conflicts();
        SyncLedger.Conflict cf = all.stream().filter(x -> x.id() == conflictId && x.open()).findFirst()
                .orElseThrow(() -> new SyncRefusedException("no open conflict " + conflictId
                        + "; `sync` lists the open ones"));
        WorkbookRecords records = workbook.records();
        workbook.inTransaction(() -> {
            if (cf.field().equals(RECORD)) {
                new ConflictFamily(cf, all).resolve(records, ledger, keepMine, by);
                return;
            }
            PortableTable t = cf.table();
            Map<String, Object> m = records.readAll().get(t).get(cf.key());
            SyncLedger.Base b = ledger.bases().get(t).get(cf.key());
            long revision = b == null ? 0 : b.revision();
            Object theirs = PortableFields.parseValue(cf.theirs());
            Map<String, Object> base = new LinkedHashMap<>(b == null ? m : PortableFields.parse(b.fieldsJson()));
            if (b == null) {
                // never agreed: other fields still in question must not look agreed on my value
                all.stream().filter(x -> x.open() && x.table() == t && x.key().equals(cf.key())
                        && x.id() != cf.id()).forEach(x -> base.put(x.field(), null));
            }
            base.put(cf.field(), theirs);
            if (!keepMine && m != null) {
                Map<String, Object> here = new LinkedHashMap<>(m);
                here.put(cf.field(), theirs);
                records.put(t, cf.key(), here, null);
            }
            ledger.putBase(t, cf.key(), new SyncLedger.Base(PortableFields.json(base), revision));
            ledger.resolved(cf.id(), keepMine ? "MINE" : "THEIRS", by, Instant.now());
        });
        return cf;
    }
}
