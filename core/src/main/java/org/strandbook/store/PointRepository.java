package org.strandbook.store;

import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.OptionalLong;

import org.strandbook.site.MeasurementPoint;
import org.strandbook.site.WavelengthBand;

/**
 * Measurement points with their bands of interest. A point names its analyzer and probe type,
 * which must be in the workbook first. Every change is audited.
 */
public final class PointRepository {

    private static final String SELECT_POINT = "SELECT p.id, p.tag, p.service, p.location, a.tag AS analyzer_tag, "
            + "p.channel, pt.code AS probe_code, p.tolerance_db, p.hazardous_area, p.hydrogen_service, "
            + "p.process_temperature_c FROM point p JOIN analyzer a ON a.id = p.analyzer_id "
            + "JOIN probe_type pt ON pt.id = p.probe_type_id";

    private final Session session;
    private final AuditLog audit;

    PointRepository(Session session, AuditLog audit) {
        this.session = session;
        this.audit = audit;
    }

    /**
     * Adds a point.
     *
     * @throws DuplicateEntryException when its tag is taken
     * @throws UnknownEntryException   when its analyzer or probe type is not in the workbook
     */
    public void add(MeasurementPoint point) {
        session.write(() -> {
            if (RowKeys.point(session, point.tag()).isPresent()) {
                throw new DuplicateEntryException("point tag '" + point.tag() + "' is already used in this workbook");
            }
            insert(point);
            return null;
        });
    }

    /** Adds the point, or replaces the one with its tag (bands included); its legs and scans stay. */
    public void save(MeasurementPoint point) {
        session.write(() -> {
            OptionalLong existing = RowKeys.point(session, point.tag());
            if (existing.isEmpty()) {
                insert(point);
                return null;
            }
            long id = existing.getAsLong();
            RowImage before = audit.capture(AuditedTable.POINT, id).orElseThrow();
            try (PreparedStatement ps = session.connection().prepareStatement("UPDATE point SET tag = ?, service = ?, "
                    + "location = ?, analyzer_id = ?, channel = ?, probe_type_id = ?, tolerance_db = ?, "
                    + "hazardous_area = ?, hydrogen_service = ?, process_temperature_c = ? WHERE id = ?")) {
                bindPoint(ps, point);
                ps.setLong(11, id);
                ps.executeUpdate();
            }
            audit.updated(AuditedTable.POINT, id, before);
            if (!bands(id).equals(point.bands())) {
                for (long bandId : RowKeys.children(session,
                        "SELECT id FROM point_band WHERE point_id = ? ORDER BY position", id)) {
                    audit.deleteRow(AuditedTable.POINT_BAND, bandId);
                }
                insertBands(id, point.bands());
            }
            return null;
        });
    }

    /** Fits another probe type at a point (a probe replacement, or its withdrawal), audited. */
    static void changeProbeType(Session session, AuditLog audit, long pointId, long probeTypeId) throws SQLException {
        RowImage was = audit.capture(AuditedTable.POINT, pointId).orElseThrow();
        try (PreparedStatement ps = session.connection().prepareStatement(
                "UPDATE point SET probe_type_id = ? WHERE id = ?")) {
            ps.setLong(1, probeTypeId);
            ps.setLong(2, pointId);
            ps.executeUpdate();
        }
        audit.updated(AuditedTable.POINT, pointId, was);
    }

    private void insert(MeasurementPoint point) throws SQLException {
        try (PreparedStatement ps = session.connection().prepareStatement("INSERT INTO point (tag, service, location, "
                + "analyzer_id, channel, probe_type_id, tolerance_db, hazardous_area, hydrogen_service, "
                + "process_temperature_c) VALUES (?, ?, ?, ?, ?, ?, ?, ?, ?, ?) RETURNING id")) {
            bindPoint(ps, point);
            long id = Columns.insertReturningId(ps);
            audit.inserted(AuditedTable.POINT, id);
            insertBands(id, point.bands());
        }
    }

    private void bindPoint(PreparedStatement ps, MeasurementPoint p) throws SQLException {
        long analyzerId = RowKeys.analyzer(session, p.analyzerTag()).orElseThrow(() -> new UnknownEntryException(
                "point " + p.tag() + ": unknown analyzer '" + p.analyzerTag() + "'; add the analyzer first"));
        long probeTypeId = RowKeys.probeType(session, p.probeTypeCode()).orElseThrow(() -> new UnknownEntryException(
                "point " + p.tag() + ": unknown probe type '" + p.probeTypeCode() + "'; add it to the catalog first"));
        ps.setString(1, p.tag());
        ps.setString(2, p.service());
        ps.setString(3, p.location());
        ps.setLong(4, analyzerId);
        ps.setInt(5, p.channel());
        ps.setLong(6, probeTypeId);
        Columns.setOptional(ps, 7, p.toleranceDb());
        Columns.setFlag(ps, 8, p.hazardousArea());
        Columns.setFlag(ps, 9, p.hydrogenService());
        Columns.setOptional(ps, 10, p.processTemperatureC());
    }

    private void insertBands(long pointId, List<WavelengthBand> bands) throws SQLException {
        try (PreparedStatement ps = session.connection().prepareStatement("INSERT INTO point_band (point_id, position, "
                + "name, from_nm, to_nm) VALUES (?, ?, ?, ?, ?) RETURNING id")) {
            int position = 1;
            for (WavelengthBand b : bands) {
                ps.setLong(1, pointId);
                ps.setInt(2, position++);
                ps.setString(3, b.name());
                ps.setDouble(4, b.fromNm());
                ps.setDouble(5, b.toNm());
                audit.inserted(AuditedTable.POINT_BAND, Columns.insertReturningId(ps));
            }
        }
    }

    /**
     * Removes a point that nothing else records: its bands and legs go with it.
     *
     * @throws UnknownEntryException when no point has the tag
     * @throws WorkbookException     when scans, inspections, sign-offs or notes refer to it
     */
    public void delete(String tag) {
        session.write(() -> {
            long id = RowKeys.requirePoint(session, tag);
            for (String table : List.of("scan", "inspection", "sign_off", "note")) {
                int n = count("SELECT count(*) FROM " + table + " WHERE point_id = ?", id);
                if (n > 0) {
                    throw new WorkbookException("point " + tag + " has " + n + " " + table.replace('_', '-')
                            + " record(s); a point with records cannot be deleted");
                }
            }
            PathRepository.deleteLegs(session, audit, id);
            for (long bandId : RowKeys.children(session, "SELECT id FROM point_band WHERE point_id = ?", id)) {
                audit.deleteRow(AuditedTable.POINT_BAND, bandId);
            }
            audit.deleteRow(AuditedTable.POINT, id);
            return null;
        });
    }

    /** The point with the given tag (compared without case). */
    public Optional<MeasurementPoint> get(String tag) {
        return session.read(() -> {
            try (PreparedStatement ps = session.connection().prepareStatement(SELECT_POINT + " WHERE p.tag = ?")) {
                ps.setString(1, tag == null ? "" : tag.strip());
                try (ResultSet rs = ps.executeQuery()) {
                    return rs.next() ? Optional.of(point(rs)) : Optional.empty();
                }
            }
        });
    }

    /** All points, by tag. */
    public List<MeasurementPoint> list() {
        return session.read(() -> {
            List<MeasurementPoint> out = new ArrayList<>();
            try (PreparedStatement ps = session.connection().prepareStatement(SELECT_POINT + " ORDER BY p.tag");
                 ResultSet rs = ps.executeQuery()) {
                while (rs.next()) {
                    out.add(point(rs));
                }
            }
            return out;
        });
    }

    private MeasurementPoint point(ResultSet rs) throws SQLException {
        return new MeasurementPoint(rs.getString("tag"), rs.getString("service"), rs.getString("location"),
                rs.getString("analyzer_tag"), rs.getInt("channel"), rs.getString("probe_code"), bands(rs.getLong("id")),
                Columns.optionalDouble(rs, "tolerance_db"), Columns.flag(rs, "hazardous_area"),
                Columns.flag(rs, "hydrogen_service"), Columns.optionalDouble(rs, "process_temperature_c"));
    }

    private List<WavelengthBand> bands(long pointId) throws SQLException {
        List<WavelengthBand> out = new ArrayList<>();
        try (PreparedStatement ps = session.connection().prepareStatement(
                "SELECT name, from_nm, to_nm FROM point_band WHERE point_id = ? ORDER BY position")) {
            ps.setLong(1, pointId);
            try (ResultSet rs = ps.executeQuery()) {
                while (rs.next()) {
                    out.add(new WavelengthBand(rs.getString(1), rs.getDouble(2), rs.getDouble(3)));
                }
            }
        }
        return out;
    }

    private int count(String sql, long id) throws SQLException {
        try (PreparedStatement ps = session.connection().prepareStatement(sql)) {
            ps.setLong(1, id);
            try (ResultSet rs = ps.executeQuery()) {
                rs.next();
                return rs.getInt(1);
            }
        }
    }
}
