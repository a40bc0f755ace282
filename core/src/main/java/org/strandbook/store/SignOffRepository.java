package org.strandbook.store;

import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.sql.Types;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.OptionalLong;

import org.strandbook.site.RevisionLetter;
import org.strandbook.site.Site;
import org.strandbook.site.SignOff;
import org.strandbook.site.SignOffRole;

/**
 * Signatures on the site record (the dossier revision) or on one point, each tied to what it signed:
 * a point's signature keeps the SHA-256 of the point's evaluation inputs ({@link PointContent}), a
 * site signature the audit trail's head (row and hash) when it was signed. A later change makes the
 * signature superseded; a signature whose digest disagrees with the trail it names was tampered with.
 * Both name rows of the workbook where the signature was given, so each signature also keeps the
 * digest of what it signed in portable form ({@link PortableContent}): another copy of the site,
 * which the signature reached through the plant server, judges it by that.
 * A site signature given while the revision's earlier signatures are superseded opens the next
 * revision. Every addition is audited.
 */
public final class SignOffRepository {

    private static final String SELECT = "SELECT s.id, s.role, s.name, s.signed_at, p.tag, s.remark, s.job_title, "
            + "s.revision, s.content_sha256, s.audit_head_id, s.portable_sha256 FROM sign_off s LEFT JOIN point p ON p.id = s.point_id "
            + "ORDER BY s.signed_at, s.id";
    private static final String HEAD = "SELECT id, hash FROM audit_entry ORDER BY id DESC LIMIT 1";
    private static final String HASH_OF = "SELECT hash FROM audit_entry WHERE id = ?";
    /** Anything but a signature or a schema step, recorded after the signed head, changes what a site signature covers. */
    private static final String CHANGED_SINCE = "SELECT id, table_name, row_key FROM audit_entry WHERE id > ? "
            + "AND table_name NOT IN ('sign_off', '" + AuditLog.WORKBOOK_TABLE + "') ORDER BY id LIMIT 1";

    /** @param portableSha256 null for a signature given before signatures kept one (schema 8 and before) */
    private static final String ELSEWHERE = "signed in another copy of the site and brought by the plant server";

    private record Stored(long id, SignOff signOff, Long auditHeadId, String portableSha256) {
    }

    /** The workbook's records in portable form, read once per judgement and only when a signature needs them. */
    private final class PortableRecords {
        private Map<PortableTable, Map<String, Map<String, Object>>> all;

        Map<PortableTable, Map<String, Map<String, Object>>> get() {
            if (all == null) {
                all = new WorkbookRecords(session, audit).readAll();
            }
            return all;
        }
    }

    private final Session session;
    private final AuditLog audit;
    private final SiteRepository site;

    SignOffRepository(Session session, AuditLog audit, SiteRepository site) {
        this.session = session;
        this.audit = audit;
        this.site = site;
    }

    /**
     * Records a signature with what it signs (its own digest and revision fields are ignored).
     *
     * @return its id
     * @throws UnknownEntryException    when it names a point the workbook does not hold
     * @throws IllegalArgumentException for a time in the future, or a point with no loop scan to sign
     */
    public long add(SignOff signOff) {
        return session.write(() -> {
            FieldRecordTime.require(signOff.signedAt(), "sign-off by " + signOff.name());
            Long pointId = null;
            String content;
            String portable;
            Long headId = null;
            Map<PortableTable, Map<String, Map<String, Object>>> records = new WorkbookRecords(session, audit).readAll();
            if (signOff.onSite()) {
                if (anySuperseded(currentRevision())) {
                    Site s = site.get();
                    site.update(new Site(s.name(), s.plantArea(), RevisionLetter.next(s.revision()),
                            s.defaultToleranceDb()));
                }
                try (ResultSet rs = session.prepared(HEAD).executeQuery()) {
                    rs.next();
                    headId = rs.getLong(1);
                    content = rs.getString(2);
                }
                portable = PortableContent.site(records);
            } else {
                pointId = RowKeys.requirePoint(session, signOff.pointTag());
                if (!PointContent.hasLoopScan(session, pointId)) {
                    throw new IllegalArgumentException("point " + signOff.pointTag() + " has no loop scan, so there is "
                            + "no evaluation to sign; import and evaluate its scans first");
                }
                content = PointContent.sha256(session, pointId);
                portable = PortableContent.point(records, signOff.pointTag());
            }
            try (PreparedStatement ps = session.connection().prepareStatement("INSERT INTO sign_off (role, name, "
                    + "signed_at, point_id, remark, job_title, revision, content_sha256, audit_head_id, portable_sha256) "
                    + "VALUES (?, ?, ?, ?, ?, ?, ?, ?, ?, ?) RETURNING id")) {
                ps.setString(1, signOff.role().name());
                ps.setString(2, signOff.name());
                ps.setString(3, StoredTime.format(signOff.signedAt()));
                if (pointId == null) {
                    ps.setNull(4, Types.INTEGER);
                } else {
                    ps.setLong(4, pointId);
                }
                ps.setString(5, signOff.remark());
                ps.setString(6, signOff.jobTitle());
                ps.setString(7, currentRevision());
                ps.setString(8, content);
                if (headId == null) {
                    ps.setNull(9, Types.INTEGER);
                } else {
                    ps.setLong(9, headId);
                }
                ps.setString(10, portable);
                long id = Columns.insertReturningId(ps);
                audit.inserted(AuditedTable.SIGN_OFF, id);
                return id;
            }
        });
    }

    /** Every sign-off in time order; site-wide ones have an empty point tag. */
    public List<SignOff> list() {
        return session.read(() -> stored().stream().map(Stored::signOff).toList());
    }

    /** Every sign-off in time order with whether what it signed is unchanged. */
    public List<SignatureState> states() {
        return session.read(() -> {
            PortableRecords records = new PortableRecords();
            List<SignatureState> out = new ArrayList<>();
            for (Stored s : stored()) {
                out.add(state(s, records));
            }
            return out;
        });
    }

    /**
     * The revision letter the dossier carries: the site's, or the next one when the site's revision
     * was signed and has changed since.
     */
    public String dossierRevision() {
        return session.read(() -> {
            String revision = currentRevision();
            return anySuperseded(revision) ? RevisionLetter.next(revision) : revision;
        });
    }

    private String currentRevision() {
        return site.get().revision();
    }

    private boolean anySuperseded(String revision) throws SQLException {
        PortableRecords records = new PortableRecords();
        for (Stored s : stored()) {
            if (s.signOff().onSite() && s.signOff().revision().equalsIgnoreCase(revision)
                    && state(s, records).standing() == SignatureState.Standing.SUPERSEDED) {
                return true;
            }
        }
        return false;
    }

    private List<Stored> stored() throws SQLException {
        List<Stored> out = new ArrayList<>();
        try (PreparedStatement ps = session.connection().prepareStatement(SELECT);
             ResultSet rs = ps.executeQuery()) {
            while (rs.next()) {
                long head = rs.getLong(10);
                Long headId = rs.wasNull() ? null : head;
                out.add(new Stored(rs.getLong(1), new SignOff(SignOffRole.valueOf(rs.getString(2)), rs.getString(3),
                        StoredTime.parse(rs.getString(4)), rs.getString(5), rs.getString(6), rs.getString(7),
                        rs.getString(8), rs.getString(9)), headId, rs.getString(11)));
            }
        }
        return out;
    }

    private SignatureState state(Stored s, PortableRecords records) throws SQLException {
        SignOff signOff = s.signOff();
        if (signOff.contentSha256().isEmpty()) {
            return new SignatureState(s.id(), signOff, SignatureState.Standing.NO_DIGEST,
                    "signed before Strandbook recorded what a signature covers");
        }
        if (signOff.onSite()) {
            return siteState(s, records);
        }
        long pointId = RowKeys.requirePoint(session, signOff.pointTag());
        if (PointContent.sha256(session, pointId).equals(signOff.contentSha256())) {
            return new SignatureState(s.id(), signOff, SignatureState.Standing.CURRENT, "");
        }
        String changed = "point " + signOff.pointTag()
                + " changed after it was signed (its path, scans, inspections, actions or catalog entries)";
        if (arrivalThroughServer(s.id()).isPresent()) {
            if (s.portableSha256() == null) {
                return new SignatureState(s.id(), signOff, SignatureState.Standing.SIGNED_ELSEWHERE, ELSEWHERE
                        + "; it was given before signatures kept a digest that every copy computes alike, so only"
                        + " that copy can say whether it still covers the point");
            }
            boolean same = PortableContent.point(records.get(), signOff.pointTag()).equals(s.portableSha256());
            return new SignatureState(s.id(), signOff, same ? SignatureState.Standing.CURRENT
                    : SignatureState.Standing.SUPERSEDED, same ? "" : changed);
        }
        return new SignatureState(s.id(), signOff, SignatureState.Standing.SUPERSEDED, changed);
    }

    private SignatureState siteState(Stored s, PortableRecords records) throws SQLException {
        SignOff signOff = s.signOff();
        if (s.auditHeadId() == null) {
            return new SignatureState(s.id(), signOff, SignatureState.Standing.TAMPERED,
                    "it names no audit row, though it records a digest");
        }
        PreparedStatement ps = session.prepared(HASH_OF);
        ps.setLong(1, s.auditHeadId());
        try (ResultSet rs = ps.executeQuery()) {
            if (rs.next() && rs.getString(1).equals(signOff.contentSha256())) {
                return changedSince(s, s.auditHeadId(), SignatureState.Standing.CURRENT, "");
            }
        }
        // the trail it names is another copy's when the signature came through the plant server
        OptionalLong arrived = arrivalThroughServer(s.id());
        if (arrived.isEmpty()) {
            return new SignatureState(s.id(), signOff, SignatureState.Standing.TAMPERED, "the audit trail's row "
                    + s.auditHeadId() + " no longer has the hash the signature recorded");
        }
        if (s.portableSha256() == null) {
            return changedSince(s, arrived.getAsLong(), SignatureState.Standing.SIGNED_ELSEWHERE, ELSEWHERE
                    + "; it was given before signatures kept a digest that every copy computes alike, so this copy"
                    + " judges it from its arrival");
        }
        if (PortableContent.site(records.get()).equals(s.portableSha256())) {
            return new SignatureState(s.id(), signOff, SignatureState.Standing.CURRENT, "");
        }
        return new SignatureState(s.id(), signOff, SignatureState.Standing.SUPERSEDED, "the site's records differ "
                + "from those it signed in the copy where it was given");
    }

    /** Superseded when anything a site signature covers was recorded after audit row {@code headId}. */
    private SignatureState changedSince(Stored s, long headId, SignatureState.Standing otherwise, String why)
            throws SQLException {
        PreparedStatement changed = session.prepared(CHANGED_SINCE);
        changed.setLong(1, headId);
        try (ResultSet rs = changed.executeQuery()) {
            if (rs.next()) {
                return new SignatureState(s.id(), s.signOff(), SignatureState.Standing.SUPERSEDED, "the workbook "
                        + "changed after it was signed (first: " + rs.getString(2) + " row " + rs.getString(3)
                        + ", audit row " + rs.getLong(1) + ")");
            }
        }
        return new SignatureState(s.id(), s.signOff(), otherwise, why);
    }

    /**
     * The audit row that brought signature {@code id} into this copy, when it came from the plant
     * server: the server holds it as agreed (the sync ledger has its key) and this trail recorded its
     * arrival. A signature changed here would travel under another key, so it is never taken for one.
     */
    private OptionalLong arrivalThroughServer(long id) throws SQLException {
        Optional<String> key = WorkbookRecords.keyOfRow(session, PortableTable.SIGN_OFF, id);
        if (key.isEmpty()) {
            return OptionalLong.empty();
        }
        PreparedStatement base = session.prepared(
                "SELECT 1 FROM sync_base WHERE table_name = ? AND record_key = ?");
        base.setString(1, PortableTable.SIGN_OFF.name());
        base.setString(2, key.get());
        try (ResultSet rs = base.executeQuery()) {
            if (!rs.next()) {
                return OptionalLong.empty();
            }
        }
        PreparedStatement inserted = session.prepared("SELECT id FROM audit_entry WHERE table_name = 'sign_off' "
                + "AND action = 'INSERT' AND row_key = ? ORDER BY id DESC LIMIT 1");
        inserted.setString(1, Long.toString(id));
        try (ResultSet rs = inserted.executeQuery()) {
            return rs.next() ? OptionalLong.of(rs.getLong(1)) : OptionalLong.empty();
        }
    }
}
