package org.strandbook.store;

import java.nio.file.Files;
import java.nio.file.Path;
import java.sql.Connection;
import java.sql.DriverManager;
import java.sql.PreparedStatement;
import java.sql.SQLException;
import java.sql.Statement;

import org.strandbook.site.Spectrum;

/**
 * Builds the committed schema-1 workbook {@value #RESOURCE}: a small invented site written the way
 * a schema-1 Strandbook wrote it, before the audit trail existed. Run once, when schema 2 was
 * added; a released fixture is never rebuilt, it stands for files already out in plants.
 * <pre>java -cp core/target/test-classes:core/target/classes:&lt;sqlite-jdbc jar&gt; \
 *     org.strandbook.store.SchemaOneFixture core/src/test/resources/org/strandbook/store/workbook-schema1.sqlite</pre>
 */
final class SchemaOneFixture {

    static final String RESOURCE = "workbook-schema1.sqlite";

    /** The spectrum stored in the fixture's one scan. */
    static final Spectrum SPECTRUM = new Spectrum(new double[] {1100, 1200, 1300, 1400, 1500, 1600, 1700, 1800},
            new double[] {1200.5, 5400.25, 12000, 15800.75, 16100, 14000.5, 9000, 3100.125});

    private SchemaOneFixture() {
    }

    public static void main(String[] args) throws SQLException, java.io.IOException {
        Path file = Path.of(args[0]);
        Files.deleteIfExists(file);
        try (Connection c = DriverManager.getConnection("jdbc:sqlite:" + file.toAbsolutePath())) {
            try (Statement st = c.createStatement()) {
                st.execute("PRAGMA page_size = 1024");
                st.execute("PRAGMA journal_mode = WAL");
                st.execute("PRAGMA foreign_keys = ON");
            }
            Session session = new Session(c, file, "fixture");
            SchemaMigrator.migrateTo(session, new AuditLog(session), 1);
            try (Statement st = c.createStatement()) {
                st.executeUpdate("""
                        INSERT INTO site VALUES (1, 'Harrowgate Salt Flats Plant', 'Brine unit 2', 'A', 1.2);
                        INSERT INTO analyzer VALUES (1, 'QB-3', 'brine NIR', 1000, 1900, 2, 15.0, 'INGAAS');
                        INSERT INTO fiber_type VALUES (1, 'LOH-200', '200 um low-OH', 200, 220, 245, 0.22,
                            'FUSED_SILICA', 'LOW_OH', 0.4);
                        INSERT INTO fiber_attenuation VALUES (1, 1, 1, 1000, 9.0), (2, 1, 2, 1550, 5.0);
                        INSERT INTO connector_type VALUES (1, 'SMA-B', 'SMA 905 pair', 'SMA 905', 1.2, 1);
                        INSERT INTO probe_type VALUES (1, 'TF-2', 'transflectance, 2 mm', 'TRANSFLECTANCE',
                            'SAPPHIRE', 2, 4.0, 1.1);
                        INSERT INTO point VALUES (1, 'AB-201', 'brine header', 'rack 1', 1, 2, 1, NULL, 0, 0, 60.0);
                        INSERT INTO point_band VALUES (1, 1, 1, 'water', 1400, 1500), (2, 1, 2, 'C-H', 1650, 1750);
                        INSERT INTO path_element VALUES
                            (1, 1, 'SEND', 1, 'SEGMENT', 'HB-1', 1, 30.0, NULL, NULL, NULL, NULL, NULL),
                            (2, 1, 'SEND', 2, 'JOINT', 'J1', NULL, NULL, 1, 1, 'CLEAN', NULL, 'ASSUMED'),
                            (3, 1, 'RETURN', 1, 'SEGMENT', 'HB-2', 1, 30.5, NULL, NULL, NULL, NULL, NULL);
                        INSERT INTO segment_bend VALUES (1, 1, 1, 75, 2);
                        INSERT INTO inspection VALUES (1, 1, 'J1', '2023-11-02T10:15:00.000Z', 't.vane', 'CLEAN', '');
                        INSERT INTO sign_off VALUES (1, 'PREPARED', 'T. Vane', '2023-11-03T16:00:00.000Z', NULL, '');
                        INSERT INTO note VALUES (1, 1, '2023-11-02T11:00:00.000Z', 't.vane', 'probe window replaced');
                        """);
            }
            try (PreparedStatement ps = c.prepareStatement("INSERT INTO scan VALUES (1, 1, 'LOOP', "
                    + "'2023-11-02T10:30:00.000Z', 't.vane', 50.0, 16, 18.5, NULL, 8, 1100, 1800, 'ab201-loop.csv', ?)")) {
                ps.setString(1, Sha256.hex("ab201-loop.csv contents"));
                ps.executeUpdate();
            }
            try (PreparedStatement ps = c.prepareStatement("INSERT INTO scan_spectrum VALUES (1, ?)")) {
                ps.setBytes(1, SpectrumCodec.encode(SPECTRUM));
                ps.executeUpdate();
            }
            session.close();
        }
    }

    /** Copies the fixture to {@code target} so that a test never changes the committed file. */
    static Path copyTo(Path target) throws java.io.IOException {
        try (var in = SchemaOneFixture.class.getResourceAsStream(RESOURCE)) {
            if (in == null) {
                throw new IllegalStateException(RESOURCE + " missing from the test resources");
            }
            Files.copy(in, target);
        }
        return target;
    }
}
