package org.strandbook.store;

import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.OptionalLong;

import org.strandbook.site.AttenuationPoint;
import org.strandbook.site.ConnectorType;
import org.strandbook.site.FiberType;
import org.strandbook.site.OhGrade;
import org.strandbook.site.ProbeKind;
import org.strandbook.site.ProbeType;
import org.strandbook.site.SpreadInput;

/**
 * The workbook's catalogs of fiber types (with their datasheet attenuation points), connector types
 * and probe types, keyed by code. {@code add...} refuses a code already present; {@code save...}
 * adds or replaces, which suits loading a catalog file twice. Every change is audited.
 */
public final class CatalogRepository {

    private static final SpreadInput[] FIBER_SPREADS = {SpreadInput.OH_CONTENT, SpreadInput.ATTENUATION};
    private static final SpreadInput[] CONNECTOR_SPREADS = {SpreadInput.CONNECTOR_LOSS};
    private static final SpreadInput[] PROBE_SPREADS = {SpreadInput.PROBE_FIXED_LOSS};

    private static final String SELECT_FIBER = "SELECT id, code, description, core_um, cladding_um, buffer_um, na, "
            + "core_material, oh_grade, oh_ppm" + SpreadColumns.list(FIBER_SPREADS) + " FROM fiber_type";
    private static final String SELECT_CONNECTOR =
            "SELECT code, description, family, typical_loss_db, air_gap" + SpreadColumns.list(CONNECTOR_SPREADS)
                    + " FROM connector_type";
    private static final String SELECT_PROBE = "SELECT code, description, kind, window_material, window_faces, "
            + "optical_path_mm, fixed_loss_db" + SpreadColumns.list(PROBE_SPREADS) + " FROM probe_type";

    private final Session session;
    private final AuditLog audit;

    CatalogRepository(Session session, AuditLog audit) {
        this.session = session;
        this.audit = audit;
    }

    /** @throws DuplicateEntryException when the code is taken */
    public void addFiberType(FiberType fiber) {
        session.write(() -> {
            if (RowKeys.fiberType(session, fiber.code()).isPresent()) {
                throw duplicate("fiber type", fiber.code());
            }
            long id = insertFiberRow(fiber);
            insertDatasheet(id, fiber.datasheet());
            return null;
        });
    }

    /** Adds the fiber type, or replaces the one with its code (datasheet points included). */
    public void saveFiberType(FiberType fiber) {
        session.write(() -> {
            OptionalLong existing = RowKeys.fiberType(session, fiber.code());
            if (existing.isEmpty()) {
                insertDatasheet(insertFiberRow(fiber), fiber.datasheet());
                return null;
            }
            long id = existing.getAsLong();
            RowImage before = audit.capture(AuditedTable.FIBER_TYPE, id).orElseThrow();
            try (PreparedStatement ps = session.connection().prepareStatement("UPDATE fiber_type SET code = ?, "
                    + "description = ?, core_um = ?, cladding_um = ?, buffer_um = ?, na = ?, core_material = ?, "
                    + "oh_grade = ?, oh_ppm = ?" + SpreadColumns.assignments(FIBER_SPREADS) + " WHERE id = ?")) {
                ps.setLong(bindFiber(ps, fiber), id);
                ps.executeUpdate();
            }
            audit.updated(AuditedTable.FIBER_TYPE, id, before);
            if (!datasheet(id).equals(fiber.datasheet())) {
                for (long pointId : RowKeys.children(session,
                        "SELECT id FROM fiber_attenuation WHERE fiber_type_id = ? ORDER BY position", id)) {
                    audit.deleteRow(AuditedTable.FIBER_ATTENUATION, pointId);
                }
                insertDatasheet(id, fiber.datasheet());
            }
            return null;
        });
    }

    private long insertFiberRow(FiberType fiber) throws SQLException {
        try (PreparedStatement ps = session.connection().prepareStatement("INSERT INTO fiber_type (code, description, "
                + "core_um, cladding_um, buffer_um, na, core_material, oh_grade, oh_ppm"
                + SpreadColumns.list(FIBER_SPREADS) + ") VALUES (?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?) RETURNING id")) {
            bindFiber(ps, fiber);
            long id = Columns.insertReturningId(ps);
            audit.inserted(AuditedTable.FIBER_TYPE, id);
            return id;
        }
    }

    /** @return the next parameter index */
    private static int bindFiber(PreparedStatement ps, FiberType f) throws SQLException {
        ps.setString(1, f.code());
        ps.setString(2, f.description());
        ps.setDouble(3, f.coreUm());
        ps.setDouble(4, f.claddingUm());
        ps.setDouble(5, f.bufferUm());
        ps.setDouble(6, f.na());
        ps.setString(7, f.coreMaterial());
        ps.setString(8, f.ohGrade().name());
        ps.setDouble(9, f.ohPpm());
        return SpreadColumns.bind(ps, 10, f.spreads(), FIBER_SPREADS);
    }

    private void insertDatasheet(long fiberId, List<AttenuationPoint> points) throws SQLException {
        try (PreparedStatement ps = session.connection().prepareStatement("INSERT INTO fiber_attenuation "
                + "(fiber_type_id, position, wavelength_nm, attenuation_db_per_km) VALUES (?, ?, ?, ?) RETURNING id")) {
            int position = 1;
            for (AttenuationPoint p : points) {
                ps.setLong(1, fiberId);
                ps.setInt(2, position++);
                ps.setDouble(3, p.wavelengthNm());
                ps.setDouble(4, p.attenuationDbPerKm());
                audit.inserted(AuditedTable.FIBER_ATTENUATION, Columns.insertReturningId(ps));
            }
        }
    }

    private List<AttenuationPoint> datasheet(long fiberId) throws SQLException {
        List<AttenuationPoint> out = new ArrayList<>();
        try (PreparedStatement ps = session.connection().prepareStatement("SELECT wavelength_nm, attenuation_db_per_km "
                + "FROM fiber_attenuation WHERE fiber_type_id = ? ORDER BY position")) {
            ps.setLong(1, fiberId);
            try (ResultSet rs = ps.executeQuery()) {
                while (rs.next()) {
                    out.add(new AttenuationPoint(rs.getDouble(1), rs.getDouble(2)));
                }
            }
        }
        return out;
    }

    public List<FiberType> fiberTypes() {
        return session.read(() -> {
            List<FiberType> out = new ArrayList<>();
            try (PreparedStatement ps = session.connection().prepareStatement(SELECT_FIBER + " ORDER BY code");
                 ResultSet rs = ps.executeQuery()) {
                while (rs.next()) {
                    out.add(fiber(rs));
                }
            }
            return out;
        });
    }

    public Optional<FiberType> fiberType(String code) {
        return session.read(() -> {
            try (PreparedStatement ps = session.connection().prepareStatement(SELECT_FIBER + " WHERE code = ?")) {
                ps.setString(1, code == null ? "" : code.strip());
                try (ResultSet rs = ps.executeQuery()) {
                    return rs.next() ? Optional.of(fiber(rs)) : Optional.empty();
                }
            }
        });
    }

    private FiberType fiber(ResultSet rs) throws SQLException {
        return new FiberType(rs.getString("code"), rs.getString("description"), rs.getDouble("core_um"),
                rs.getDouble("cladding_um"), rs.getDouble("buffer_um"), rs.getDouble("na"),
                rs.getString("core_material"), OhGrade.valueOf(rs.getString("oh_grade")), rs.getDouble("oh_ppm"),
                datasheet(rs.getLong("id")), SpreadColumns.read(rs, FIBER_SPREADS));
    }

    /** @throws DuplicateEntryException when the code is taken */
    public void addConnectorType(ConnectorType connector) {
        session.write(() -> {
            if (RowKeys.connectorType(session, connector.code()).isPresent()) {
                throw duplicate("connector type", connector.code());
            }
            insertConnector(connector);
            return null;
        });
    }

    /** Adds the connector type, or replaces the one with its code. */
    public void saveConnectorType(ConnectorType connector) {
        session.write(() -> {
            OptionalLong id = RowKeys.connectorType(session, connector.code());
            if (id.isEmpty()) {
                insertConnector(connector);
                return null;
            }
            RowImage before = audit.capture(AuditedTable.CONNECTOR_TYPE, id.getAsLong()).orElseThrow();
            try (PreparedStatement ps = session.connection().prepareStatement("UPDATE connector_type SET code = ?, "
                    + "description = ?, family = ?, typical_loss_db = ?, air_gap = ?"
                    + SpreadColumns.assignments(CONNECTOR_SPREADS) + " WHERE id = ?")) {
                ps.setLong(bindConnector(ps, connector), id.getAsLong());
                ps.executeUpdate();
            }
            audit.updated(AuditedTable.CONNECTOR_TYPE, id.getAsLong(), before);
            return null;
        });
    }

    private void insertConnector(ConnectorType connector) throws SQLException {
        try (PreparedStatement ps = session.connection().prepareStatement("INSERT INTO connector_type (code, "
                + "description, family, typical_loss_db, air_gap" + SpreadColumns.list(CONNECTOR_SPREADS)
                + ") VALUES (?, ?, ?, ?, ?, ?, ?) RETURNING id")) {
            bindConnector(ps, connector);
            audit.inserted(AuditedTable.CONNECTOR_TYPE, Columns.insertReturningId(ps));
        }
    }

    /** @return the next parameter index */
    private static int bindConnector(PreparedStatement ps, ConnectorType c) throws SQLException {
        ps.setString(1, c.code());
        ps.setString(2, c.description());
        ps.setString(3, c.family());
        ps.setDouble(4, c.typicalLossDb());
        Columns.setFlag(ps, 5, c.airGap());
        return SpreadColumns.bind(ps, 6, c.spreads(), CONNECTOR_SPREADS);
    }

    public List<ConnectorType> connectorTypes() {
        return session.read(() -> {
            List<ConnectorType> out = new ArrayList<>();
            try (PreparedStatement ps = session.connection().prepareStatement(SELECT_CONNECTOR + " ORDER BY code");
                 ResultSet rs = ps.executeQuery()) {
                while (rs.next()) {
                    out.add(connector(rs));
                }
            }
            return out;
        });
    }

    public Optional<ConnectorType> connectorType(String code) {
        return session.read(() -> {
            try (PreparedStatement ps = session.connection().prepareStatement(SELECT_CONNECTOR + " WHERE code = ?")) {
                ps.setString(1, code == null ? "" : code.strip());
                try (ResultSet rs = ps.executeQuery()) {
                    return rs.next() ? Optional.of(connector(rs)) : Optional.empty();
                }
            }
        });
    }

    private static ConnectorType connector(ResultSet rs) throws SQLException {
        return new ConnectorType(rs.getString("code"), rs.getString("description"), rs.getString("family"),
                rs.getDouble("typical_loss_db"), Columns.flag(rs, "air_gap"), SpreadColumns.read(rs, CONNECTOR_SPREADS));
    }

    /** @throws DuplicateEntryException when the code is taken */
    public void addProbeType(ProbeType probe) {
        session.write(() -> {
            if (RowKeys.probeType(session, probe.code()).isPresent()) {
                throw duplicate("probe type", probe.code());
            }
            insertProbe(probe);
            return null;
        });
    }

    /** Adds the probe type, or replaces the one with its code. */
    public void saveProbeType(ProbeType probe) {
        session.write(() -> {
            OptionalLong id = RowKeys.probeType(session, probe.code());
            if (id.isEmpty()) {
                insertProbe(probe);
                return null;
            }
            RowImage before = audit.capture(AuditedTable.PROBE_TYPE, id.getAsLong()).orElseThrow();
            try (PreparedStatement ps = session.connection().prepareStatement("UPDATE probe_type SET code = ?, "
                    + "description = ?, kind = ?, window_material = ?, window_faces = ?, optical_path_mm = ?, "
                    + "fixed_loss_db = ?" + SpreadColumns.assignments(PROBE_SPREADS) + " WHERE id = ?")) {
                ps.setLong(bindProbe(ps, probe), id.getAsLong());
                ps.executeUpdate();
            }
            audit.updated(AuditedTable.PROBE_TYPE, id.getAsLong(), before);
            return null;
        });
    }

    private void insertProbe(ProbeType probe) throws SQLException {
        try (PreparedStatement ps = session.connection().prepareStatement("INSERT INTO probe_type (code, description, "
                + "kind, window_material, window_faces, optical_path_mm, fixed_loss_db"
                + SpreadColumns.list(PROBE_SPREADS) + ") VALUES (?, ?, ?, ?, ?, ?, ?, ?, ?) RETURNING id")) {
            bindProbe(ps, probe);
            audit.inserted(AuditedTable.PROBE_TYPE, Columns.insertReturningId(ps));
        }
    }

    /** @return the next parameter index */
    private static int bindProbe(PreparedStatement ps, ProbeType p) throws SQLException {
        ps.setString(1, p.code());
        ps.setString(2, p.description());
        ps.setString(3, p.kind().name());
        ps.setString(4, p.windowMaterial());
        ps.setInt(5, p.windowFaces());
        ps.setDouble(6, p.opticalPathMm());
        ps.setDouble(7, p.fixedLossDb());
        return SpreadColumns.bind(ps, 8, p.spreads(), PROBE_SPREADS);
    }

    public List<ProbeType> probeTypes() {
        return session.read(() -> {
            List<ProbeType> out = new ArrayList<>();
            try (PreparedStatement ps = session.connection().prepareStatement(SELECT_PROBE + " ORDER BY code");
                 ResultSet rs = ps.executeQuery()) {
                while (rs.next()) {
                    out.add(probe(rs));
                }
            }
            return out;
        });
    }

    public Optional<ProbeType> probeType(String code) {
        return session.read(() -> {
            try (PreparedStatement ps = session.connection().prepareStatement(SELECT_PROBE + " WHERE code = ?")) {
                ps.setString(1, code == null ? "" : code.strip());
                try (ResultSet rs = ps.executeQuery()) {
                    return rs.next() ? Optional.of(probe(rs)) : Optional.empty();
                }
            }
        });
    }

    private static ProbeType probe(ResultSet rs) throws SQLException {
        return new ProbeType(rs.getString("code"), rs.getString("description"), ProbeKind.valueOf(rs.getString("kind")),
                rs.getString("window_material"), rs.getInt("window_faces"), rs.getDouble("optical_path_mm"),
                rs.getDouble("fixed_loss_db"), SpreadColumns.read(rs, PROBE_SPREADS));
    }

    private static DuplicateEntryException duplicate(String what, String code) {
        return new DuplicateEntryException(what + " code '" + code + "' is already used in this workbook");
    }
}
