package org.strandbook.store;

import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.util.ArrayList;
import java.util.List;
import java.util.OptionalLong;

/** Tags and catalog codes to row keys; tags and codes compare without case, as the schema declares. */
final class RowKeys {

    private RowKeys() {
    }

    static OptionalLong point(Session s, String tag) throws SQLException {
        return find(s, "SELECT id FROM point WHERE tag = ?", tag);
    }

    static long requirePoint(Session s, String tag) throws SQLException {
        return point(s, tag).orElseThrow(() -> new UnknownEntryException("unknown point tag '" + tag + "'"));
    }

    static OptionalLong analyzer(Session s, String tag) throws SQLException {
        return find(s, "SELECT id FROM analyzer WHERE tag = ?", tag);
    }

    static OptionalLong fiberType(Session s, String code) throws SQLException {
        return find(s, "SELECT id FROM fiber_type WHERE code = ?", code);
    }

    static OptionalLong connectorType(Session s, String code) throws SQLException {
        return find(s, "SELECT id FROM connector_type WHERE code = ?", code);
    }

    static OptionalLong probeType(Session s, String code) throws SQLException {
        return find(s, "SELECT id FROM probe_type WHERE code = ?", code);
    }

    /** The keys {@code sql} selects for one parent key, in the order it gives. */
    static List<Long> children(Session s, String sql, long parentId) throws SQLException {
        List<Long> out = new ArrayList<>();
        try (PreparedStatement ps = s.connection().prepareStatement(sql)) {
            ps.setLong(1, parentId);
            try (ResultSet rs = ps.executeQuery()) {
                while (rs.next()) {
                    out.add(rs.getLong(1));
                }
            }
        }
        return out;
    }

    private static OptionalLong find(Session s, String sql, String value) throws SQLException {
        PreparedStatement ps = s.prepared(sql);
        ps.setString(1, value == null ? "" : value.strip());
        try (ResultSet rs = ps.executeQuery()) {
            return rs.next() ? OptionalLong.of(rs.getLong(1)) : OptionalLong.empty();
        }
    }
}
