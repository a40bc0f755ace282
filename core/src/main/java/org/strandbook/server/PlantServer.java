package org.strandbook.server;

import java.sql.Connection;
import java.sql.DriverManager;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.sql.Statement;
import java.util.ArrayList;
import java.util.List;
import java.util.Properties;
import java.util.logging.Level;
import java.util.logging.Logger;

import org.flywaydb.core.Flyway;
import org.flywaydb.core.api.FlywayException;

/**
 * A plant server: one PostgreSQL database holding many sites. Its schema is versioned by Flyway
 * migrations ({@code org/strandbook/server/migration/V<n>__<what>.sql}); unlike the SQLite workbook,
 * PostgreSQL gives Flyway the lock it needs, so two laptops reaching a new server at once migrate it
 * once.
 */
public final class PlantServer {

    /** The newest server schema this Strandbook carries: the highest V&lt;n&gt; script (a test keeps them equal). */
    static final int SCHEMA_VERSION = 5;

    /** Where the migrations live on the classpath. */
    static final String MIGRATIONS = "classpath:org/strandbook/server/migration";

    // kept here: java.util.logging holds loggers weakly, and a collected one forgets its level
    private static final Logger FLYWAY_LOG = Logger.getLogger("org.flywaydb");

    static {
        // standard output holds only results; Flyway's progress lines would mix into them
        FLYWAY_LOG.setLevel(Level.SEVERE);
    }

    private final ServerLogin login;

    public PlantServer(ServerLogin login) {
        this.login = login;
    }

    public ServerLogin login() {
        return login;
    }

    /**
     * Brings the server's schema to this Strandbook's version; a server already there is only
     * read. Run first by the server's administrator (the owner of the database); a technician then
     * finds the schema in place.
     */
    public void migrate() {
        int installed = installedVersion();
        if (installed > SCHEMA_VERSION) {
            // an older program would write as the newer schema no longer allows (schema 5 took columns away)
            throw new ServerException("the plant server " + login.displayUrl() + " is at schema " + installed
                    + ", newer than this Strandbook knows (" + SCHEMA_VERSION + "): update Strandbook on this machine"
                    + " before it syncs there");
        }
        if (installed == SCHEMA_VERSION) {
            // Flyway's own start costs a cold command about half a second; a server in date needs none of it
            return;
        }
        try {
            Flyway.configure().loggers("org.flywaydb.core.internal.logging.javautil.JavaUtilLogCreator")
                    .dataSource(login.url(), login.user(), login.password())
                    .locations(MIGRATIONS)
                    .connectRetries(0)
                    .load()
                    .migrate();
        } catch (FlywayException e) {
            // Flyway's own message names only the script; the server's reason is in the SQL error beneath it
            SQLException sql = null;
            for (Throwable t = e; t != null && sql == null; t = t.getCause()) {
                sql = t instanceof SQLException x ? x : null;
            }
            String why = ServerException.firstLine(e) + (sql == null ? "" : ": " + ServerException.firstLine(sql));
            if (sql != null && "42501".equals(sql.getSQLState())) {
                why += ". The schema is made by the first sync, clone or fleet of the database's owner, which must"
                        + " be allowed to create the role strandbook_technician (CREATEROLE) unless an administrator"
                        + " created it first (README, Plant server)";
            }
            throw new ServerException("cannot bring the plant server " + login.displayUrl() + " to this"
                    + " Strandbook's schema: " + why, e);
        }
    }

    /** The schema version the server records, 0 when it has none yet. */
    int installedVersion() {
        try (Connection c = connect(); Statement st = c.createStatement()) {
            try (ResultSet rs = st.executeQuery("SELECT max(version::int) FROM flyway_schema_history WHERE success")) {
                return rs.next() ? rs.getInt(1) : 0;
            } catch (SQLException e) {
                return 0;
            }
        } catch (SQLException e) {
            return 0;
        }
    }

    /**
     * The names of the sites this login may open, by name: a technician sees the sites it is a
     * member of (the server's row-level security decides, not this query), the owner every site.
     */
    public List<String> siteNames() {
        try (Connection c = connect(); Statement st = c.createStatement();
             ResultSet rs = st.executeQuery("SELECT name FROM site ORDER BY name")) {
            List<String> names = new ArrayList<>();
            while (rs.next()) {
                names.add(rs.getString(1));
            }
            return names;
        } catch (SQLException e) {
            throw new ServerException("cannot list the sites on " + login.displayUrl() + ": "
                    + ServerException.firstLine(e), e);
        }
    }

    /** A new connection, autocommit off. */
    public Connection connect() {
        Properties props = new Properties();
        props.setProperty("user", login.user());
        if (login.password() != null) {
            props.setProperty("password", login.password());
        }
        props.setProperty("ApplicationName", "strandbook");
        // a batch of INSERTs goes as multi-row statements: a first sync of tens of thousands of scans
        // would otherwise pay one round trip and one statement-level audit per scan
        props.setProperty("reWriteBatchedInserts", "true");
        props.setProperty("connectTimeout", "10");
        try {
            Connection c = DriverManager.getConnection(login.url(), props);
            c.setAutoCommit(false);
            return c;
        } catch (SQLException e) {
            throw new ServerException("cannot reach the plant server " + login.displayUrl() + " as "
                    + login.user() + ": " + ServerException.firstLine(e), e);
        }
    }
}
