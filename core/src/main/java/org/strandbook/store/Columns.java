package org.strandbook.store;

import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.sql.Types;
import java.util.OptionalDouble;

/** Nullable REAL columns to and from {@link OptionalDouble}, and booleans as the 0/1 the schema checks. */
final class Columns {

    private Columns() {
    }

    static OptionalDouble optionalDouble(ResultSet rs, String column) throws SQLException {
        double v = rs.getDouble(column);
        return rs.wasNull() ? OptionalDouble.empty() : OptionalDouble.of(v);
    }

    static void setOptional(PreparedStatement ps, int index, OptionalDouble value) throws SQLException {
        if (value.isPresent()) {
            ps.setDouble(index, value.getAsDouble());
        } else {
            ps.setNull(index, Types.REAL);
        }
    }

    static void setFlag(PreparedStatement ps, int index, boolean value) throws SQLException {
        ps.setInt(index, value ? 1 : 0);
    }

    static boolean flag(ResultSet rs, String column) throws SQLException {
        return rs.getInt(column) != 0;
    }

    /** Runs an {@code INSERT ... RETURNING id} statement and gives the new row's key. */
    static long insertReturningId(PreparedStatement ps) throws SQLException {
        try (ResultSet rs = ps.executeQuery()) {
            if (!rs.next()) {
                throw new SQLException("insert returned no key");
            }
            return rs.getLong(1);
        }
    }
}
