package org.strandbook.server;

import java.sql.Connection;
import java.sql.DriverManager;
import java.sql.SQLException;
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
        try {
            Flyway.configure().loggers("org.flywaydb.core.internal.logging.javautil.JavaUtilLogCreator")
                    .dataSource(login.url(), login.user(), login.password())
                    .locations(MIGRATIONS)
                    .connectRetries(0)
                    .load()
                    .migrate();
        } catch (FlywayException e) {
            throw new ServerException("cannot bring the plant server " + login.displayUrl() + " to this"
                    + " Strandbook's schema: " + ServerException.firstLine(e), e);
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
