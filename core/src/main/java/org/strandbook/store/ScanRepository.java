package org.strandbook.store;

import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.time.Duration;
import java.time.Instant;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

import org.strandbook.site.ScanConditions;
import org.strandbook.site.ScanKind;
import org.strandbook.site.ScanRecord;
import org.strandbook.site.Spectrum;

/**
 * Scans and their spectra. Listing reads only the small scan rows (through the index
 * {@value #LISTING_INDEX} on point and time); a spectrum is fetched one at a time by id.
 *
 * <p>Each insert is one transaction holding the scan row, its spectrum and its audit row, so a
 * scan is wholly stored or not at all. A commit costs several page writes, so to import many files
 * use {@link #startImport()}: each scan still goes in whole (under a savepoint), but commits come
 * every 250 scans or two seconds, which brings the import close to the speed of a bare insert.
 * {@link #insertAll} stores a list all-or-nothing. The insert statements are prepared once per
 * open workbook.
 */
public final class ScanRepository {

    /** The index that serves listing by point in time order. */
    public static final String LISTING_INDEX = "scan_point_taken";

    static final String LIST_BY_POINT_SQL = "SELECT s.id, p.tag, s.kind, s.taken_at, s.operator, s.integration_ms, "
            + "s.co_added, s.ambient_temperature_c, s.process_temperature_c, s.n_points, s.min_nm, s.max_nm, "
            + "s.source_file, s.sha256, s.y_unit FROM scan s JOIN point p ON p.id = s.point_id "
            + "WHERE s.point_id = ? ORDER BY s.taken_at, s.id";
    private static final String SELECT_SCAN = "SELECT s.id, p.tag, s.kind, s.taken_at, s.operator, s.integration_ms, "
            + "s.co_added, s.ambient_temperature_c, s.process_temperature_c, s.n_points, s.min_nm, s.max_nm, "
            + "s.source_file, s.sha256, s.y_unit FROM scan s JOIN point p ON p.id = s.point_id";
    // the point's key is looked up inside the insert: no statement of its own per scan, and no key
    // kept between calls that a removed point could leave stale; an unknown tag gives a NULL key
    private static final String INSERT_SCAN = "INSERT INTO scan (point_id, kind, taken_at, operator, integration_ms, "
            + "co_added, ambient_temperature_c, process_temperature_c, n_points, min_nm, max_nm, source_file, sha256, "
            + "y_unit) VALUES ((SELECT id FROM point WHERE tag = ?), ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?) RETURNING id";
    private static final String INSERT_SPECTRUM = "INSERT INTO scan_spectrum (scan_id, data) VALUES (?, ?)";

    private final Session session;
    private final AuditLog audit;

    ScanRepository(Session session, AuditLog audit) {
        this.session = session;
        this.audit = audit;
    }

    /**
     * Stores one scan.
     *
     * @return the new scan's id
     * @throws UnknownEntryException  when no point has the tag
     * @throws DuplicateScanException when a file with the same SHA-256 is already stored
     */
    public long insert(String pointTag, ScanKind kind, Instant takenAt, ScanConditions conditions, Spectrum spectrum,
                       String sourceFile, String sha256) {
        return insert(new NewScan(pointTag, kind, takenAt, conditions, spectrum, sourceFile, sha256));
    }

    /** Stores one scan; see {@link #insert(String, ScanKind, Instant, ScanConditions, Spectrum, String, String)}. */
    public long insert(NewScan scan) {
        return insert(EncodedScan.of(scan));
    }

    /** Stores one scan whose spectrum is already encoded; see {@link #insert(NewScan)}. */
    public long insert(EncodedScan scan) {
        return session.write(() -> insertRows(scan));
    }

    /**
     * Stores all scans in one transaction: all of them or, when one is refused, none.
     *
     * @return their ids, in the order given
     */
    public List<Long> insertAll(List<NewScan> scans) {
        return session.write(() -> {
            List<Long> ids = new ArrayList<>(scans.size());
            for (NewScan scan : scans) {
                ids.add(insertRows(EncodedScan.of(scan)));
            }
            return ids;
        });
    }

    /**
     * Starts a fast import: 250 scans or 2 s per commit, whichever comes first, each scan atomic.
     * See {@link ScanImport}.
     */
    public ScanImport startImport() {
        // the log is copied into the file beside the import (WalCheckpointer), so commits are cheap
        // and frequent ones let that copy start early; the time bound keeps what a kill can undo small
        return startImport(250, Duration.ofSeconds(2));
    }

    /** Starts a fast import committing every {@code scansPerCommit} scans or {@code commitInterval}. */
    public ScanImport startImport(int scansPerCommit, Duration commitInterval) {
        return new ScanImport(session, this, scansPerCommit, commitInterval);
    }

    private long insertRows(EncodedScan encoded) throws SQLException {
        NewScan scan = encoded.scan();
        Spectrum spectrum = scan.spectrum();
        ScanConditions c = scan.conditions();
        PreparedStatement ps = session.prepared(INSERT_SCAN);
        ps.setString(1, scan.pointTag());
        ps.setString(2, scan.kind().name());
        ps.setString(3, StoredTime.format(scan.takenAt()));
        ps.setString(4, c.operator());
        ps.setDouble(5, c.integrationMs());
        ps.setInt(6, c.coAdded());
        Columns.setOptional(ps, 7, c.ambientTemperatureC());
        Columns.setOptional(ps, 8, c.processTemperatureC());
        ps.setInt(9, spectrum.size());
        ps.setDouble(10, spectrum.minNm());
        ps.setDouble(11, spectrum.maxNm());
        ps.setString(12, scan.sourceFile());
        ps.setString(13, scan.sha256());
        ps.setString(14, scan.yUnit());
        long id;
        try {
            id = Columns.insertReturningId(ps);
        } catch (SQLException e) {
            if (SqlFailures.isUniqueViolation(e)) {
                throw duplicate(scan);
            }
            if (SqlFailures.isNotNullViolation(e) && RowKeys.point(session, scan.pointTag()).isEmpty()) {
                throw new UnknownEntryException("unknown point tag '" + scan.pointTag() + "'");
            }
            throw e;
        }
        PreparedStatement insertData = session.prepared(INSERT_SPECTRUM);
        insertData.setLong(1, id);
        insertData.setBytes(2, encoded.data());
        insertData.executeUpdate();
        audit.insertedScan(id, encoded.data().length, encoded.dataSha256());
        return id;
    }

    private DuplicateScanException duplicate(NewScan scan) throws SQLException {
        ScanRecord existing = findRecord(scan.sha256()).orElseThrow(() -> new WorkbookException(
                "scan file " + scan.sourceFile() + " was refused by the workbook"));
        return new DuplicateScanException("file " + scan.sourceFile() + " is already in the workbook as scan "
                + existing.id() + " (point " + existing.pointTag() + ", " + existing.kind().word() + " scan taken "
                + existing.takenAt() + ", imported from " + existing.sourceFile() + ")", existing.id());
    }

    /** The point's scans in time order, without spectra. */
    public List<ScanRecord> list(String pointTag) {
        return session.read(() -> {
            long pointId = RowKeys.requirePoint(session, pointTag);
            PreparedStatement ps = session.prepared(LIST_BY_POINT_SQL);
            ps.setLong(1, pointId);
            return records(ps);
        });
    }

    /** Every scan, by point tag then time, without spectra. */
    public List<ScanRecord> listAll() {
        return session.read(() -> records(session.prepared(SELECT_SCAN + " ORDER BY p.tag, s.taken_at, s.id")));
    }

    public Optional<ScanRecord> get(long id) {
        return session.read(() -> {
            PreparedStatement ps = session.prepared(SELECT_SCAN + " WHERE s.id = ?");
            ps.setLong(1, id);
            return records(ps).stream().findFirst();
        });
    }

    /** The scan stored from a file with this SHA-256, if any: importers ask before reading a file twice. */
    public Optional<ScanRecord> findBySha256(String sha256) {
        String key = Sha256.normalized(sha256, "scan file");
        return session.read(() -> findRecord(key));
    }

    private Optional<ScanRecord> findRecord(String sha256) throws SQLException {
        PreparedStatement ps = session.prepared(SELECT_SCAN + " WHERE s.sha256 = ?");
        ps.setString(1, sha256);
        return records(ps).stream().findFirst();
    }

    /**
     * The spectrum of one scan.
     *
     * @throws UnknownEntryException when no scan has the id
     * @throws WorkbookException     when the stored spectrum does not match its scan row
     */
    public Spectrum spectrum(long id) {
        return session.read(() -> {
            PreparedStatement ps = session.prepared(
                    "SELECT s.n_points, d.data FROM scan s LEFT JOIN scan_spectrum d ON d.scan_id = s.id WHERE s.id = ?");
            ps.setLong(1, id);
            try (ResultSet rs = ps.executeQuery()) {
                if (!rs.next()) {
                    throw new UnknownEntryException("no scan with id " + id + " in workbook " + session.file());
                }
                return SpectrumCodec.decode(rs.getBytes(2), rs.getInt(1), id);
            }
        });
    }

    /** Number of scans stored. */
    public long count() {
        return session.read(() -> {
            try (ResultSet rs = session.prepared("SELECT count(*) FROM scan").executeQuery()) {
                rs.next();
                return rs.getLong(1);
            }
        });
    }

    /**
     * Removes a scan (a wrong import); the audit trail keeps what it was.
     *
     * @throws UnknownEntryException when no scan has the id
     */
    public void delete(long id) {
        session.write(() -> {
            RowImage before = audit.capture(AuditedTable.SCAN, id).orElseThrow(
                    () -> new UnknownEntryException("no scan with id " + id + " in workbook " + session.file()));
            try (PreparedStatement ps = session.connection().prepareStatement(
                    "DELETE FROM scan_spectrum WHERE scan_id = ?")) {
                ps.setLong(1, id);
                ps.executeUpdate();
            }
            try (PreparedStatement ps = session.connection().prepareStatement("DELETE FROM scan WHERE id = ?")) {
                ps.setLong(1, id);
                ps.executeUpdate();
            }
            audit.deleted(AuditedTable.SCAN, id, before);
            return null;
        });
    }

    private static List<ScanRecord> records(PreparedStatement ps) throws SQLException {
        List<ScanRecord> out = new ArrayList<>();
        try (ResultSet rs = ps.executeQuery()) {
            while (rs.next()) {
                ScanConditions conditions = new ScanConditions(rs.getString("operator"), rs.getDouble("integration_ms"),
                        rs.getInt("co_added"), Columns.optionalDouble(rs, "ambient_temperature_c"),
                        Columns.optionalDouble(rs, "process_temperature_c"));
                out.add(new ScanRecord(rs.getLong("id"), rs.getString("tag"), ScanKind.valueOf(rs.getString("kind")),
                        StoredTime.parse(rs.getString("taken_at")), conditions, rs.getInt("n_points"),
                        rs.getDouble("min_nm"), rs.getDouble("max_nm"), rs.getString("source_file"),
                        rs.getString("sha256"), rs.getString("y_unit")));
            }
        }
        return out;
    }
}
