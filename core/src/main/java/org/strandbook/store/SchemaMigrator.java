package org.strandbook.store;

import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.sql.Statement;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * Brings a workbook to the current schema, one version per transaction, keeping the version in
 * SQLite's {@code PRAGMA user_version}. Scripts are {@code migration/V<n>__<what>.sql} beside this
 * class; a released script is never edited, a change is a new step.
 *
 * <p>Why not Flyway: tried with flyway-core 13.12.1 on SQLite, it migrates cleanly alone, but when
 * two processes migrated the same file at once both ran the same step and one failed ("Failed to
 * execute script"), as Flyway takes no lock on SQLite. Here each step takes the write lock first
 * ({@code BEGIN IMMEDIATE}) and re-reads the version inside it, so a second process finds the step
 * done and moves on. Flyway would also add about 0.7 s to every command's start and needs a Java
 * migration for the audit baseline, which here is one call.
 */
final class SchemaMigrator {

    private static final Pattern CREATE_TABLE = Pattern.compile(
            "CREATE\\s+TABLE\\s+(?:IF\\s+NOT\\s+EXISTS\\s+)?([A-Za-z_][A-Za-z0-9_]*)", Pattern.CASE_INSENSITIVE);

    /** Schema version this Strandbook writes. */
    static final int LATEST = 9;

    /** The version that created the audit trail; from it on, every step is itself audited. */
    static final int AUDIT_TRAIL = 2;

    /**
     * @param rebaselined tables whose rows the step changes in form (a column added): the audit trail
     *                    records a fresh image of each of their rows, so that verification compares
     *                    like with like
     */
    private record Step(int version, String script, List<AuditedTable> rebaselined) {
        Step(int version, String script) {
            this(version, script, List.of());
        }
    }

    private static final List<Step> STEPS = List.of(
            new Step(1, "V1__create_workbook.sql"),
            new Step(2, "V2__audit_trail.sql"),
            new Step(3, "V3__scan_y_unit.sql", List.of(AuditedTable.SCAN)),
            new Step(5, "V5__maintenance_and_sign_off.sql"),
            new Step(6, "V6__decision_rule.sql"),
            new Step(7, "V7__plant_server_sync.sql"),
            new Step(8, "V8__stated_spreads.sql"),
            new Step(9, "V9__portable_signature_digest.sql"));

    private SchemaMigrator() {
    }

    static void migrate(Session session, AuditLog audit) {
        migrateTo(session, audit, LATEST);
    }

    /** Applies the steps up to {@code target}; tests stop early to build older workbooks. */
    static void migrateTo(Session session, AuditLog audit, int target) {
        if (session.read(() -> pragma(session, "user_version")) >= target) {
            checkIdentity(session);
            return;
        }
        for (Step step : STEPS) {
            if (step.version() > target) {
                break;
            }
            session.write(() -> {
                int current = pragma(session, "user_version");
                if (current != 0 || !isEmpty(session)) {
                    checkIdentity(session);
                }
                if (current >= step.version()) {
                    return null;
                }
                try (Statement st = session.connection().createStatement()) {
                    st.executeUpdate(script(step.script()));
                } catch (SQLException e) {
                    throw mismatch(session, current, step, e);
                }
                if (step.version() == AUDIT_TRAIL) {
                    for (AuditedTable table : AuditedTable.values()) {
                        // tables of later schemas do not exist yet, and are born audited
                        if (tableExists(session, table.tableName())) {
                            audit.baseline(table);
                        }
                    }
                }
                if (step.version() >= AUDIT_TRAIL) {
                    audit.schemaChanged(current, step.version());
                }
                if (step.version() > AUDIT_TRAIL) {
                    for (AuditedTable table : step.rebaselined()) {
                        audit.baseline(table);
                    }
                }
                try (Statement st = session.connection().createStatement()) {
                    st.execute("PRAGMA user_version = " + step.version());
                }
                return null;
            });
        }
    }

    /** Checks, reading only, that the open file is a workbook of exactly this schema. */
    static void checkCurrent(Session session) {
        checkIdentity(session);
        int version = schemaVersion(session);
        if (version != LATEST) {
            throw new WorkbookException("workbook " + session.file() + " is of schema " + version + " and must be"
                    + " upgraded to schema " + LATEST + " before it is read; open it once for a change to upgrade it");
        }
    }

    static int schemaVersion(Session session) {
        return session.read(() -> pragma(session, "user_version"));
    }

    private static void checkIdentity(Session session) {
        session.read(() -> {
            int recorded = pragma(session, "user_version");
            WorkbookFile.checkIdentity(session.file(), pragma(session, "application_id"), recorded);
            checkTablesPresent(session, recorded);
            return null;
        });
    }

    /**
     * A file whose header says "workbook of schema n" but that lacks tables the steps up to n create
     * (tables dropped or emptied by another program, a header copied onto another file) would
     * otherwise fail later with SQLite's bare "no such table" in the middle of a command.
     */
    private static void checkTablesPresent(Session session, int recorded) throws SQLException {
        List<String> missing = new ArrayList<>();
        for (Step step : STEPS) {
            if (step.version() > recorded) {
                break;
            }
            for (String table : CreatedTables.BY_STEP.get(step.version())) {
                if (!tableExists(session, table)) {
                    missing.add(table);
                }
            }
        }
        if (!missing.isEmpty()) {
            throw new DamagedWorkbookException(session.file(), "it records schema " + recorded + " but lacks the"
                    + " tables " + String.join(", ", missing) + " of that schema; changed by another program?", null);
        }
    }

    /**
     * A step that fails on a file whose recorded version says it is due means the tables are not
     * what that version had (the version was reset, or tables were changed by another program).
     */
    private static WorkbookException mismatch(Session session, int recorded, Step step, SQLException e) {
        String detail = e.getMessage() == null ? "" : e.getMessage().replaceAll("\\s+", " ").replaceFirst(
                "^\\[SQLITE_[A-Z_]+\\]\\s*", "").strip();
        return new WorkbookException("workbook " + session.file() + " records schema " + recorded + " but its tables do"
                + " not match it (upgrading to schema " + step.version() + " failed: " + detail + "); nothing was"
                + " changed: restore the workbook from a backup", e);
    }

    private static boolean isEmpty(Session session) throws SQLException {
        try (Statement st = session.connection().createStatement();
             ResultSet rs = st.executeQuery("SELECT count(*) FROM sqlite_master")) {
            rs.next();
            return rs.getInt(1) == 0 && pragma(session, "application_id") == 0;
        }
    }

    private static boolean tableExists(Session session, String name) throws SQLException {
        try (java.sql.PreparedStatement ps = session.connection().prepareStatement(
                "SELECT 1 FROM sqlite_master WHERE type = 'table' AND name = ?")) {
            ps.setString(1, name);
            try (ResultSet rs = ps.executeQuery()) {
                return rs.next();
            }
        }
    }

    private static int pragma(Session session, String name) throws SQLException {
        try (Statement st = session.connection().createStatement();
             ResultSet rs = st.executeQuery("PRAGMA " + name)) {
            return rs.next() ? rs.getInt(1) : 0;
        }
    }

    private static String script(String name) {
        try (InputStream in = SchemaMigrator.class.getResourceAsStream("migration/" + name)) {
            if (in == null) {
                throw new IllegalStateException("schema script " + name + " missing from the Strandbook jar");
            }
            return new String(in.readAllBytes(), StandardCharsets.UTF_8);
        } catch (IOException e) {
            throw new IllegalStateException("cannot read schema script " + name, e);
        }
    }

    /** The tables each step's script creates, read once from the scripts themselves. */
    private static final class CreatedTables {
        static final Map<Integer, List<String>> BY_STEP = byStep();

        private static Map<Integer, List<String>> byStep() {
            Map<Integer, List<String>> byStep = new HashMap<>();
            for (Step step : STEPS) {
                List<String> tables = new ArrayList<>();
                Matcher created = CREATE_TABLE.matcher(script(step.script()));
                while (created.find()) {
                    tables.add(created.group(1));
                }
                byStep.put(step.version(), List.copyOf(tables));
            }
            return Map.copyOf(byStep);
        }
    }
}
