package org.strandbook.server;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.sql.Connection;
import java.sql.SQLException;
import java.sql.Statement;

import org.junit.jupiter.api.Test;

/**
 * The README's recipe for one plant server, run on a cluster of its own (roles belong to the whole
 * cluster, so the shared test server, where the technician role already exists, cannot show it): a
 * database owner with no right to create roles, and the role technicians join made beforehand by
 * the administrator.
 */
class PlantServerSetupTest {

    @Test
    void anOwnerWithoutCreateroleIsToldWhyAndTheReadmesRecipeThenMakesTheSchema() throws SQLException {
        try (LocalPostgres pg = LocalPostgres.start()) {
            String url = pg.url("plant");
            try (Connection c = pg.superuser(pg.url("postgres")); Statement st = c.createStatement()) {
                st.execute("CREATE ROLE plant_owner LOGIN");
                st.execute("CREATE DATABASE plant OWNER plant_owner");
            }
            PlantServer server = new PlantServer(new ServerLogin(url, "plant_owner", null));
            // the refusal is the server's (PostgreSQL 15 documentation, CREATE ROLE: "You must have
            // CREATEROLE privilege or be a database superuser to use this command")
            ServerException e = assertThrows(ServerException.class, server::migrate);
            assertTrue(e.getMessage().contains("permission denied to create role"), e.getMessage());
            assertTrue(e.getMessage().contains("CREATEROLE"), "the message says what to do: " + e.getMessage());
            try (Connection c = pg.superuser(url); Statement st = c.createStatement()) {
                st.execute("CREATE ROLE strandbook_technician NOLOGIN");
            }
            server.migrate();
            assertEquals(PlantServer.SCHEMA_VERSION, server.installedVersion(),
                    "with the role made first, the owner's first run makes the whole schema");
        }
    }
}
