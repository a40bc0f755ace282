package org.strandbook.store;

import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.util.ArrayList;
import java.util.List;

import org.strandbook.site.Inspection;
import org.strandbook.site.InspectionGrade;

/**
 * End-face inspections of joints, as dated events: a joint's grade at a moment is its latest
 * inspection up to then ({@link org.strandbook.site.InspectionHistory}). They name the joint by
 * label, so a point's history of inspections outlives a replacement of its legs; the joint must be
 * on the point's path now or in its history. Every addition is audited.
 */
public final class InspectionRepository {

    private static final String SELECT = "SELECT p.tag, i.joint_label, i.inspected_at, i.inspector, i.grade, i.remark, i.picture_file "
            + "FROM inspection i JOIN point p ON p.id = i.point_id";

    private final Session session;
    private final AuditLog audit;

    InspectionRepository(Session session, AuditLog audit) {
        this.session = session;
        this.audit = audit;
    }

    /**
     * Records an inspection.
     *
     * @return its id
     * @throws UnknownEntryException when no point has the inspection's tag
     */
    public long add(Inspection inspection) {
        return session.write(() -> {
            long pointId = RowKeys.requirePoint(session, inspection.pointTag());
            String what = "inspection of " + inspection.pointTag() + " " + inspection.jointLabel();
            FieldRecordTime.require(inspection.inspectedAt(), what);
            PathHistory.requireElement(session, pointId, inspection.pointTag(), inspection.jointLabel(), "JOINT");
            try (PreparedStatement ps = session.connection().prepareStatement("INSERT INTO inspection (point_id, "
                    + "joint_label, inspected_at, inspector, grade, remark, picture_file) VALUES (?, ?, ?, ?, ?, ?, ?) RETURNING id")) {
                ps.setLong(1, pointId);
                ps.setString(2, inspection.jointLabel());
                ps.setString(3, StoredTime.format(inspection.inspectedAt()));
                ps.setString(4, inspection.inspector());
                ps.setString(5, inspection.grade().name());
                ps.setString(6, inspection.remark());
                if (inspection.pictureFile().isEmpty()) {
                    // NULL keeps the row's image as schema 2 wrote it
                    ps.setNull(7, java.sql.Types.VARCHAR);
                } else {
                    ps.setString(7, inspection.pictureFile());
                }
                long id = Columns.insertReturningId(ps);
                audit.inserted(AuditedTable.INSPECTION, id);
                return id;
            }
        });
    }

    /** The point's inspections in time order. */
    public List<Inspection> list(String pointTag) {
        return session.read(() -> {
            long pointId = RowKeys.requirePoint(session, pointTag);
            try (PreparedStatement ps = session.connection().prepareStatement(
                    SELECT + " WHERE i.point_id = ? ORDER BY i.inspected_at, i.id")) {
                ps.setLong(1, pointId);
                return inspections(ps);
            }
        });
    }

    /** Every inspection, by point tag then time. */
    public List<Inspection> listAll() {
        return session.read(() -> {
            try (PreparedStatement ps = session.connection().prepareStatement(
                    SELECT + " ORDER BY p.tag, i.inspected_at, i.id")) {
                return inspections(ps);
            }
        });
    }

    private static List<Inspection> inspections(PreparedStatement ps) throws SQLException {
        List<Inspection> out = new ArrayList<>();
        try (ResultSet rs = ps.executeQuery()) {
            while (rs.next()) {
                out.add(new Inspection(rs.getString(1), rs.getString(2), StoredTime.parse(rs.getString(3)),
                        rs.getString(4), InspectionGrade.valueOf(rs.getString(5)), rs.getString(6), rs.getString(7)));
            }
        }
        return out;
    }
}
