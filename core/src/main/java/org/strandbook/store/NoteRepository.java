package org.strandbook.store;

import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.sql.Types;
import java.util.ArrayList;
import java.util.List;

import org.strandbook.site.Note;

/** Free notes on the site or on one point. Every addition is audited. */
public final class NoteRepository {

    private static final String SELECT = "SELECT p.tag, n.written_at, n.author, n.text FROM note n "
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
            if (note.writtenAt() == null) {
                throw new IllegalArgumentException("note by " + note.author() + ": time missing");
            }
            try (PreparedStatement ps = session.connection().prepareStatement(
                    "INSERT INTO note (point_id, written_at, author, text) VALUES (?, ?, ?, ?) RETURNING id")) {
                if (note.pointTag().isEmpty()) {
                    ps.setNull(1, Types.INTEGER);
                } else {
                    ps.setLong(1, RowKeys.requirePoint(session, note.pointTag()));
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

    private static List<Note> notes(PreparedStatement ps) throws SQLException {
        List<Note> out = new ArrayList<>();
        try (ResultSet rs = ps.executeQuery()) {
            while (rs.next()) {
                out.add(new Note(rs.getString(1), StoredTime.parse(rs.getString(2)), rs.getString(3), rs.getString(4)));
            }
        }
        return out;
    }
}
