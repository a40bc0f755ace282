package org.strandbook.server;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.sql.Connection;
import java.sql.DriverManager;
import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.sql.Statement;

import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;

/**
 * The plant server's rules are the server's, not only the program's: every refusal here comes from
 * PostgreSQL itself (privileges, row-level security, triggers), tried by a plain JDBC connection
 * that skips Strandbook's code entirely.
 */
class ServerSchemaTest {

    private static String url;

    @BeforeAll
    static void migratedServer() throws SQLException {
        LocalPostgres pg = LocalPostgres.shared();
        url = pg.newDatabase();
        new PlantServer(new ServerLogin(url, LocalPostgres.SUPERUSER, null)).migrate();
        try (Connection c = pg.superuser(url); Statement st = c.createStatement()) {
            for (String tech : new String[] {"schema_tech_a", "schema_tech_b"}) {
                st.execute("DO $$ BEGIN IF NOT EXISTS (SELECT 1 FROM pg_roles WHERE rolname = '" + tech + "') THEN"
                        + " CREATE ROLE " + tech + " LOGIN IN ROLE strandbook_technician; END IF; END $$");
            }
        }
        try (Connection a = as("schema_tech_a"); Statement st = a.createStatement()) {
            st.execute("SELECT open_site('Site A')");
            st.execute("INSERT INTO point (site_id, record_key, fields) SELECT id, 'AT-4101', '{\"service\":\"x\"}'"
                    + " FROM site WHERE name = 'Site A'");
            st.execute("INSERT INTO note (site_id, record_key, fields) SELECT id, 'n1', '{\"text\":\"ok\"}'"
                    + " FROM site WHERE name = 'Site A'");
        }
    }

    private static Connection as(String user) throws SQLException {
        return DriverManager.getConnection(url, user, "");
    }

    private static SQLException refused(Connection c, String sql) {
        return assertThrows(SQLException.class, () -> {
            try (Statement st = c.createStatement()) {
                st.execute(sql);
            }
        }, sql);
    }

    @Test
    void aMigrationIsRecordedOnceAndASecondRunChangesNothing() throws SQLException {
        new PlantServer(new ServerLogin(url, LocalPostgres.SUPERUSER, null)).migrate();
        try (Connection c = as(LocalPostgres.SUPERUSER); Statement st = c.createStatement();
             ResultSet rs = st.executeQuery("SELECT count(*) FROM flyway_schema_history WHERE success")) {
            rs.next();
            assertEquals(PlantServer.SCHEMA_VERSION, rs.getInt(1));
        }
    }

    @Test
    void aServerNewerThanTheProgramIsRefusedBeforeAnythingIsWritten() throws SQLException {
        // design choice: an older laptop would write as a newer schema no longer allows
        String newer = LocalPostgres.shared().newPlantServer();
        try (Connection c = LocalPostgres.shared().superuser(newer); Statement st = c.createStatement()) {
            st.execute("INSERT INTO flyway_schema_history (installed_rank, version, description, type, script,"
                    + " installed_by, execution_time, success) VALUES (99, '99', 'from the future', 'SQL', 'V99.sql',"
                    + " 'x', 0, true)");
        }
        ServerException e = assertThrows(ServerException.class,
                () -> new PlantServer(new ServerLogin(newer, LocalPostgres.SUPERUSER, null)).migrate());
        assertTrue(e.getMessage().contains("is at schema 99, newer than this Strandbook knows"), e.getMessage());
    }

    @Test
    void theSchemaVersionTheProgramKnowsIsItsNewestScript() throws SQLException {
        try (Connection c = as(LocalPostgres.SUPERUSER); Statement st = c.createStatement();
             ResultSet rs = st.executeQuery("SELECT max(version::int) FROM flyway_schema_history")) {
            rs.next();
            assertEquals(PlantServer.SCHEMA_VERSION, rs.getInt(1));
        }
    }

    @Test
    void everyRecordAddedLeavesAChainedAuditRow() throws SQLException {
        try (Connection a = as("schema_tech_a"); Statement st = a.createStatement();
             ResultSet rs = st.executeQuery("SELECT table_name, db_user, prev_hash, hash,"
                     + " hash = audit_hash(prev_hash, id, at, db_user, action, table_name, record_key, old_fields,"
                     + " new_fields) FROM audit_entry ORDER BY id")) {
            assertTrue(rs.next());
            assertEquals("point", rs.getString(1));
            assertEquals("schema_tech_a", rs.getString(2));
            assertEquals("0".repeat(64), rs.getString(3));
            assertTrue(rs.getBoolean(5), "the row's hash is recomputable");
            String first = rs.getString(4);
            assertTrue(rs.next());
            assertEquals(first, rs.getString(3), "the second row names the first");
        }
    }

    @Test
    void aMultiRowInsertLeavesOneChainedAuditRowThatNamesAndHashesItsRecords() throws SQLException {
        try (Connection a = as("schema_tech_a"); Statement st = a.createStatement()) {
            st.execute("INSERT INTO inspection (site_id, record_key, fields) SELECT id, k, '{}' FROM site,"
                    + " (VALUES ('i2'), ('i1'), ('i3')) v(k) WHERE name = 'Site A'");
        }
        try (Connection a = as("schema_tech_a"); Statement st = a.createStatement();
             ResultSet rs = st.executeQuery("SELECT table_name, prev_hash, hash, hash = audit_hash(prev_hash, id, at,"
                     + " db_user, action, table_name, record_key, old_fields, new_fields), new_fields::text,"
                     + " new_fields ->> 'sha256' = records_digest(table_name, site_id,"
                     + " ARRAY(SELECT jsonb_array_elements_text(new_fields -> 'keys')))"
                     + " FROM audit_entry ORDER BY id")) {
            String previous = "0".repeat(64);
            int batches = 0;
            while (rs.next()) {
                assertEquals(previous, rs.getString(2), "each row names the one before it");
                assertTrue(rs.getBoolean(4), "each row's hash recomputes");
                previous = rs.getString(3);
                if (rs.getString(1).equals("inspection")) {
                    batches++;
                    assertTrue(rs.getString(5).contains("\"keys\": [\"i1\", \"i2\", \"i3\"]"), rs.getString(5));
                    assertTrue(rs.getString(5).contains("\"records\": 3"), rs.getString(5));
                    assertTrue(rs.getBoolean(6), "the records' digest recomputes from the rows as stored");
                }
            }
            assertEquals(1, batches, "one audit row for the statement's three records (design choice: a first sync"
                    + " of tens of thousands of scans would otherwise pay a chained row per scan)");
        }
    }

    @Test
    void aTechnicianCannotChangeOrDeleteAuditRows() throws SQLException {
        try (Connection a = as("schema_tech_a")) {
            assertEquals("42501", refused(a, "UPDATE audit_entry SET db_user = 'someone'").getSQLState());
            assertEquals("42501", refused(a, "DELETE FROM audit_entry").getSQLState());
            assertEquals("42501", refused(a, "TRUNCATE audit_entry").getSQLState());
            assertEquals("42501", refused(a, "INSERT INTO audit_entry (site_id, db_user, action, table_name,"
                    + " record_key, prev_hash, hash) SELECT id, 'x', 'INSERT', 'point', 'k', repeat('0', 64),"
                    + " repeat('0', 64) FROM site").getSQLState());
        }
    }

    @Test
    void evenTheOwnerCannotRewriteTheAuditTrail() throws SQLException {
        try (Connection owner = as(LocalPostgres.SUPERUSER)) {
            assertTrue(refused(owner, "UPDATE audit_entry SET db_user = 'someone'").getMessage().contains("append-only"));
            assertTrue(refused(owner, "DELETE FROM audit_entry").getMessage().contains("append-only"));
        }
    }

    @Test
    void aTechnicianCannotNameAnotherLoginOrAnotherTimeAsTheAuthorOfARecord() throws SQLException {
        // column privileges refuse the statement before any row is written (PostgreSQL 15 documentation,
        // SQL command GRANT: "column privileges"); who and when are the server's word (issue 15: the audit
        // trail is append-only on the server, not only in application code)
        long site = siteId("Site A");
        try (Connection a = as("schema_tech_a")) {
            for (String forged : new String[] {
                    "INSERT INTO note (site_id, record_key, fields, added_by) VALUES (" + site + ", 'n-x', '{}', 'schema_tech_b')",
                    "INSERT INTO note (site_id, record_key, fields, added_at) VALUES (" + site + ", 'n-y', '{}', '2020-01-01Z')",
                    "INSERT INTO scan (site_id, record_key, fields, spectrum, added_by) VALUES (" + site
                            + ", 's-x', '{}', '\\x00', 'schema_tech_b')",
                    "INSERT INTO point (site_id, record_key, fields, changed_by) VALUES (" + site + ", 'AT-4998', '{}', 'x')",
                    "INSERT INTO point (site_id, record_key, fields, revision) VALUES (" + site + ", 'AT-4997', '{}', 42)",
                    "INSERT INTO workbook_push (site_id, workbook_id, first_entry_id, last_entry_id, last_entry_hash,"
                            + " pushed_by) VALUES (" + site + ", 'w', 1, 1, repeat('0', 64), 'schema_tech_b')",
                    "INSERT INTO point_status (site_id, tag, status, evaluated_at, recorded_by) VALUES (" + site
                            + ", 'AT-4101', 'PASS', now(), 'schema_tech_b')"}) {
                assertEquals("42501", refused(a, forged).getSQLState(), forged);
            }
        }
    }

    @Test
    void anEditCarriesTheEditorsLoginTheServersClockAndTheNextRevisionWhateverTheStatementSays() throws SQLException {
        // design choice (schema 5): an edit may set only a record's fields and its removal flag; a
        // trigger stamps the rest, so the revision another laptop compares against always moves
        try (Connection a = as("schema_tech_a"); Statement st = a.createStatement()) {
            st.execute("INSERT INTO point (site_id, record_key, fields) SELECT id, 'AT-4102', '{\"service\":\"x\"}'"
                    + " FROM site WHERE name = 'Site A'");
            assertEquals("42501", refused(a, "UPDATE point SET changed_by = 'schema_tech_b'"
                    + " WHERE record_key = 'AT-4102'").getSQLState());
            assertEquals("42501", refused(a, "UPDATE point SET changed_at = '2020-01-01Z'"
                    + " WHERE record_key = 'AT-4102'").getSQLState());
            assertEquals("42501", refused(a, "UPDATE point SET revision = 1 WHERE record_key = 'AT-4102'").getSQLState());
            st.execute("UPDATE point SET fields = '{\"service\":\"y\"}' WHERE record_key = 'AT-4102'");
            try (ResultSet rs = st.executeQuery("SELECT revision, changed_by, changed_at <= clock_timestamp()"
                    + " AND changed_at > clock_timestamp() - interval '1 minute' FROM point WHERE record_key = 'AT-4102'")) {
                assertTrue(rs.next());
                assertEquals(2, rs.getLong(1), "the revision moved by one");
                assertEquals("schema_tech_a", rs.getString(2));
                assertTrue(rs.getBoolean(3), "stamped by the server's clock just now");
            }
        }
        try (Connection owner = as(LocalPostgres.SUPERUSER); Statement st = owner.createStatement()) {
            st.execute("UPDATE point SET fields = '{\"service\":\"z\"}', changed_by = 'schema_tech_b', revision = 1"
                    + " WHERE record_key = 'AT-4102'");
            try (ResultSet rs = st.executeQuery("SELECT revision, changed_by FROM point WHERE record_key = 'AT-4102'")) {
                assertTrue(rs.next());
                assertEquals(3, rs.getLong(1), "even the owner's edit moves the revision");
                assertEquals(LocalPostgres.SUPERUSER, rs.getString(2), "and names the owner's own login");
            }
        }
    }

    @Test
    void immutableRecordsAndEditableRecordsCannotBeDeleted() throws SQLException {
        try (Connection a = as("schema_tech_a")) {
            assertEquals("42501", refused(a, "UPDATE note SET fields = '{}'").getSQLState());
            assertEquals("42501", refused(a, "DELETE FROM note").getSQLState());
            assertEquals("42501", refused(a, "DELETE FROM point").getSQLState());
        }
    }

    @Test
    void aScanRemovalIsAnAuditedRecordThatNobodyTakesBackAndOnlyTheSitesMembersWrite() throws SQLException {
        try (Connection a = as("schema_tech_a"); Statement st = a.createStatement()) {
            st.execute("INSERT INTO scan_removal (site_id, record_key, fields) SELECT id, 'removed-scan',"
                    + " '{\"removed_by\":\"k.ashdown\"}' FROM site WHERE name = 'Site A'");
            try (ResultSet rs = st.executeQuery("SELECT count(*) FROM audit_entry WHERE table_name = 'scan_removal'"
                    + " AND record_key = 'removed-scan'")) {
                rs.next();
                assertEquals(1, rs.getInt(1), "the removal left its audit row");
            }
            assertEquals("42501", refused(a, "DELETE FROM scan_removal").getSQLState());
            assertEquals("42501", refused(a, "UPDATE scan_removal SET fields = '{}'").getSQLState());
        }
        try (Connection b = as("schema_tech_b");
             PreparedStatement ps = b.prepareStatement("INSERT INTO scan_removal (site_id, record_key, fields)"
                     + " VALUES (?, 'another', '{}')")) {
            ps.setLong(1, siteId("Site A"));
            SQLException e = assertThrows(SQLException.class, ps::executeUpdate);
            assertTrue(e.getMessage().contains("row-level security"), e.getMessage());
        }
    }

    @Test
    void anotherSitesTechnicianNeitherSeesNorWritesIt() throws SQLException {
        try (Connection b = as("schema_tech_b"); Statement st = b.createStatement()) {
            try (ResultSet rs = st.executeQuery("SELECT count(*) FROM point")) {
                rs.next();
                assertEquals(0, rs.getInt(1), "row-level security hides site A");
            }
            assertEquals(0, st.executeUpdate("UPDATE point SET fields = '{}'"), "nothing of site A to update");
            assertTrue(refused(b, "SELECT open_site('Site A')").getMessage().contains("not one of its members"));
            try (PreparedStatement ps = b.prepareStatement(
                    "INSERT INTO point (site_id, record_key, fields) VALUES (?, 'AT-4999', '{}')")) {
                ps.setLong(1, siteId("Site A"));
                SQLException e = assertThrows(SQLException.class, ps::executeUpdate);
                assertTrue(e.getMessage().contains("row-level security"), e.getMessage());
            }
        }
    }

    private static long siteId(String name) throws SQLException {
        try (Connection owner = as(LocalPostgres.SUPERUSER);
             PreparedStatement ps = owner.prepareStatement("SELECT id FROM site WHERE name = ?")) {
            ps.setString(1, name);
            try (ResultSet rs = ps.executeQuery()) {
                rs.next();
                return rs.getLong(1);
            }
        }
    }
}
