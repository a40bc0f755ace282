package org.strandbook.store;

import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.sql.Types;
import java.util.ArrayList;
import java.util.List;

import org.strandbook.site.Note;

/** Free notes on the site, on one point, or on one joint or cable segment of a point. Every addition is audited. */
public final class NoteRepository {

    private static final String SELECT = "SELECT p.tag, n.element_label, n.written_at, n.author, n.text FROM note n "
            + "LEFT JOIN point p ON p.id = n.point_id";

    private final Session session;
    private final AuditLog audit;

    NoteRepository(Session session, AuditLog audit) {
        this.session = session;
        this.audit = audit;
    }

    /**
     * Records a note.
     *
     * @return its id
     * @throws UnknownEntryException when it names a point the workbook does not hold
     */
    public long add(Note note) {
        return session.write(() -> {
            FieldRecordTime.require(note.writtenAt(), "note on " + note.subject());
            try (PreparedStatement ps = session.connection().prepareStatement("INSERT INTO note (point_id, written_at, "
                    + "author, text, element_label) VALUES (?, ?, ?, ?, ?) RETURNING id")) {
                if (note.pointTag().isEmpty()) {
                    ps.setNull(1, Types.INTEGER);
                } else {
                    ps.setLong(1, RowKeys.requirePoint(session, note.pointTag()));
                }
                if (note.elementLabel().isEmpty()) {
                    // NULL, not '', so that a note on the whole point keeps its schema-2 image
                    ps.setNull(5, Types.VARCHAR);
                } else {
                    requireElement(note);
                    ps.setString(5, note.elementLabel());
                }
                ps.setString(2, StoredTime.format(note.writtenAt()));
                ps.setString(3, note.author());
                ps.setString(4, note.text());
                long id = Columns.insertReturningId(ps);
                audit.inserted(AuditedTable.NOTE, id);
                return id;
            }
        });
    }

    /** Every note in time order; site-wide ones have an empty point tag. */
    public List<Note> list() {
        return session.read(() -> {
            try (PreparedStatement ps = session.connection().prepareStatement(SELECT + " ORDER BY n.written_at, n.id")) {
                return notes(ps);
            }
        });
    }

    /** The point's notes in time order. */
    public List<Note> list(String pointTag) {
        return session.read(() -> {
            long pointId = RowKeys.requirePoint(session, pointTag);
            try (PreparedStatement ps = session.connection().prepareStatement(
                    SELECT + " WHERE n.point_id = ? ORDER BY n.written_at, n.id")) {
                ps.setLong(1, pointId);
                return notes(ps);
            }
        });
    }

    private void requireElement(Note note) throws java.sql.SQLException {
        long pointId = RowKeys.requirePoint(session, note.pointTag());
        try {
            PathHistory.requireElement(session, pointId, note.pointTag(), note.elementLabel(), "JOINT");
        } catch (UnknownEntryException notAJoint) {
            try {
                PathHistory.requireElement(session, pointId, note.pointTag(), note.elementLabel(), "SEGMENT");
            } catch (UnknownEntryException e) {
                throw new UnknownEntryException("point " + note.pointTag() + " has no joint or cable '"
                        + note.elementLabel() + "' on its path");
            }
        }
    }

    private static List<Note> notes(PreparedStatement ps) throws SQLException {
        List<Note> out = new ArrayList<>();
        try (ResultSet rs = ps.executeQuery()) {
            while (rs.next()) {
                out.add(new Note(rs.getString(1), rs.getString(2), StoredTime.parse(rs.getString(3)), rs.getString(4),
                        rs.getString(5)));
            }
        }
        return out;
    }
}
