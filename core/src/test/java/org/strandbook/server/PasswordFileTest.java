package org.strandbook.server;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.attribute.PosixFilePermissions;
import java.util.Map;
import java.util.Optional;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The password file as PostgreSQL's documentation defines it (PostgreSQL 15 manual, section 34.16
 * "The Password File"): {@code hostname:port:database:username:password}, first match wins, {@code *}
 * matches anything, {@code \:} and {@code \\} escape, ignored when group or others can read it.
 */
class PasswordFileTest {

    @TempDir
    Path dir;

    private Path file(String text, String perms) throws IOException {
        Path f = dir.resolve("pgpass");
        Files.writeString(f, text);
        Files.setPosixFilePermissions(f, PosixFilePermissions.fromString(perms));
        return f;
    }

    @Test
    void theFirstMatchingLineWinsAndStarsMatchAnything() throws IOException {
        Path f = file("""
                # plant server
                db.plant.invalid:5432:strandbook:tech1:first
                *:*:strandbook:tech1:second
                """, "rw-------");
        assertEquals(Optional.of("first"), PasswordFile.lookup(f, "db.plant.invalid", 5432, "strandbook", "tech1"));
        assertEquals(Optional.of("second"), PasswordFile.lookup(f, "other.invalid", 6543, "strandbook", "tech1"));
        assertEquals(Optional.empty(), PasswordFile.lookup(f, "db.plant.invalid", 5432, "strandbook", "tech2"));
    }

    @Test
    void escapedColonsAndBackslashesBelongToTheField() throws IOException {
        Path f = file("h:5432:d:u:pa\\:ss\\\\word\n", "rw-------");
        assertEquals(Optional.of("pa:ss\\word"), PasswordFile.lookup(f, "h", 5432, "d", "u"));
    }

    @Test
    void aFileOthersCanReadIsIgnored() throws IOException {
        Path f = file("*:*:*:*:secret\n", "rw-r--r--");
        assertEquals(Optional.empty(), PasswordFile.lookup(f, "h", 5432, "d", "u"));
    }

    @Test
    void pgPasswordComesBeforeTheFileAndTheUserFromPgUser() throws IOException {
        Path home = Files.createDirectories(dir.resolve("home"));
        Files.writeString(home.resolve(".pgpass"), "*:*:*:*:from-file\n");
        Files.setPosixFilePermissions(home.resolve(".pgpass"), PosixFilePermissions.fromString("rw-------"));
        String url = "jdbc:postgresql://db.plant.invalid:5433/strandbook?sslmode=verify-full";
        ServerLogin fromFile = ServerLogin.resolve(url, null, Map.of("PGUSER", "tech1"), home);
        assertEquals("tech1", fromFile.user());
        assertEquals("from-file", fromFile.password());
        assertEquals(5433, fromFile.port());
        assertEquals("jdbc:postgresql://db.plant.invalid:5433/strandbook", fromFile.displayUrl());
        ServerLogin fromEnv = ServerLogin.resolve(url, "tech2", Map.of("PGUSER", "tech1", "PGPASSWORD", "env"), home);
        assertEquals("tech2", fromEnv.user());
        assertEquals("env", fromEnv.password());
    }
}
