package org.strandbook.store;

import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.SQLException;

/**
 * The digest of everything a point's evaluation reads: the point and its bands, its path today and
 * in its history, its scans (each row carries its file's SHA-256), inspections and maintenance
 * actions, its analyzer, and the catalog entries its path and probe use. A signature keeps it; a
 * change to any of these rows changes it. The digest chains each row's {@link RowImage} digest in
 * a fixed order, so it depends on the stored values only.
 */
final class PointContent {

    private static final String FIBERS = "(SELECT fiber_type_id FROM path_element WHERE point_id = ?1 "
            + "UNION SELECT f.id FROM fiber_type f JOIN retired_path_element r ON r.fiber_code = f.code "
            + "JOIN maintenance_action a ON a.id = r.action_id WHERE a.point_id = ?1)";
    private static final String CONNECTORS = "(SELECT connector_type_a_id FROM path_element WHERE point_id = ?1 "
            + "UNION SELECT connector_type_b_id FROM path_element WHERE point_id = ?1 "
            + "UNION SELECT c.id FROM connector_type c JOIN retired_path_element r "
            + "ON r.connector_a = c.code OR r.connector_b = c.code "
            + "JOIN maintenance_action a ON a.id = r.action_id WHERE a.point_id = ?1)";

    private static final String[] PARTS = {
        "SELECT * FROM point WHERE id = ?1",
        "SELECT * FROM point_band WHERE point_id = ?1 ORDER BY id",
        "SELECT * FROM analyzer WHERE id = (SELECT analyzer_id FROM point WHERE id = ?1)",
        "SELECT * FROM probe_type WHERE id = (SELECT probe_type_id FROM point WHERE id = ?1)",
        "SELECT * FROM path_element WHERE point_id = ?1 ORDER BY id",
        "SELECT b.* FROM segment_bend b JOIN path_element e ON e.id = b.element_id WHERE e.point_id = ?1 ORDER BY b.id",
        "SELECT * FROM fiber_type WHERE id IN " + FIBERS + " ORDER BY id",
        "SELECT * FROM fiber_attenuation WHERE fiber_type_id IN " + FIBERS + " ORDER BY id",
        "SELECT * FROM connector_type WHERE id IN " + CONNECTORS + " ORDER BY id",
        "SELECT * FROM scan WHERE point_id = ?1 ORDER BY id",
        "SELECT * FROM inspection WHERE point_id = ?1 ORDER BY id",
        "SELECT * FROM maintenance_action WHERE point_id = ?1 ORDER BY id",
        "SELECT r.* FROM retired_path_element r JOIN maintenance_action a ON a.id = r.action_id "
                + "WHERE a.point_id = ?1 ORDER BY r.id",
    };

    private PointContent() {
    }

    static String sha256(Session session, long pointId) throws SQLException {
        Sha256.Fields fields = new Sha256.Fields();
        for (int i = 0; i < PARTS.length; i++) {
            fields.add(Integer.toString(i));
            try (PreparedStatement ps = session.connection().prepareStatement(PARTS[i])) {
                ps.setLong(1, pointId);
                try (ResultSet rs = ps.executeQuery()) {
                    while (rs.next()) {
                        fields.add(RowImage.of(rs).sha256());
                    }
                }
            }
        }
        return fields.hex();
    }

    static boolean hasLoopScan(Session session, long pointId) throws SQLException {
        try (PreparedStatement ps = session.connection().prepareStatement(
                "SELECT 1 FROM scan WHERE point_id = ? AND kind = 'LOOP' LIMIT 1")) {
            ps.setLong(1, pointId);
            try (ResultSet rs = ps.executeQuery()) {
                return rs.next();
            }
        }
    }
}
