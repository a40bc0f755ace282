package org.strandbook.app.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.sql.Connection;
import java.sql.DriverManager;
import java.sql.Statement;
import java.time.Instant;

import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.strandbook.server.LocalPostgres;
import org.strandbook.site.MeasurementPoint;
import org.strandbook.store.DemoSite;
import org.strandbook.store.Workbook;

/** `strandbook sync` and `strandbook clone` against a real PostgreSQL started for the tests. */
class SyncCommandTest {

    private static final String TECH = "cli_tech";

    @TempDir
    Path dir;

    private String url;
    private Path laptop;

    @BeforeEach
    void serverAndLaptop() {
        url = LocalPostgres.shared().newPlantServer(TECH);
        laptop = dir.resolve("site.strandbook");
        try (Workbook wb = Workbook.create(laptop, DemoSite.site(), "k.ashdown")) {
            DemoSite.populate(wb);
            DemoSite.insertScan(wb, DemoSite.POINT_A, 1, Instant.parse("2026-03-01T09:00:00Z"));
        }
    }

    private CliRun sync(Path file, String... more) {
        String[] base = {"sync", file.toString(), "--server", url, "--server-user", TECH};
        String[] args = new String[base.length + more.length];
        System.arraycopy(base, 0, args, 0, base.length);
        System.arraycopy(more, 0, args, base.length, more.length);
        return CliRun.of(args);
    }

    @Test
    void theSitesTrailOnTheServerVerifiesFromTheCommandLineAndATamperedOneExitsOne() throws Exception {
        assertEquals(0, sync(laptop).exitCode());
        String[] verify = {"audit", "verify-server", "--server", url, "--server-user", TECH, "--site",
            DemoSite.site().name()};
        CliRun ok = CliRun.of(verify);
        assertEquals(0, ok.exitCode(), ok.err());
        assertTrue(ok.out().startsWith("server audit trail of site \"" + DemoSite.site().name() + "\" OK: "), ok.out());
        // what only the database's owner can do, past the triggers
        try (Connection c = LocalPostgres.shared().superuser(url); Statement st = c.createStatement()) {
            st.execute("ALTER TABLE point DISABLE TRIGGER USER");
            st.execute("UPDATE point SET fields = fields || '{\"service\":\"x\"}'");
            st.execute("ALTER TABLE point ENABLE TRIGGER USER");
        }
        CliRun broken = CliRun.of(verify);
        assertEquals(1, broken.exitCode(), broken.out());
        assertTrue(broken.out().contains("it was changed past the server's triggers"), broken.out());
    }

    @Test
    void syncPushesThenFindsNothingNew() {
        CliRun first = sync(laptop);
        assertEquals(0, first.exitCode(), first.err());
        assertTrue(first.out().contains("record(s) pushed"), first.out());
        CliRun second = sync(laptop, "--json");
        assertEquals(0, second.exitCode(), second.err());
        assertTrue(second.out().startsWith("{\"pushed\":0,\"pulled\":0,\"changed_on_server\":0,\"changed_here\":0"),
                second.out());
    }

    @Test
    void cloneThenAConflictListedAndResolvedFromTheCommandLine() {
        assertEquals(0, sync(laptop).exitCode());
        Path second = dir.resolve("second.strandbook");
        CliRun clone = CliRun.of("clone", "--server", url, "--server-user", TECH, "--site", DemoSite.site().name(),
                second.toString());
        assertEquals(0, clone.exitCode(), clone.err());
        CliRun again = CliRun.of("clone", "--server", url, "--server-user", TECH, "--site", DemoSite.site().name(),
                second.toString());
        assertEquals(1, again.exitCode(), "a clone never overwrites");
        assertTrue(again.err().contains("never overwrites"), again.err());

        editService(laptop, "feed, laptop one");
        editService(second, "feed, laptop two");
        assertEquals(0, sync(laptop).exitCode());
        CliRun conflicted = sync(second);
        assertEquals(0, conflicted.exitCode(), conflicted.err());
        assertTrue(conflicted.out().contains("conflict 1: point AT-101 service: mine \"feed, laptop two\", theirs"
                + " \"feed, laptop one\""), conflicted.out());
        assertTrue(conflicted.out().contains("1 conflict(s) wait for a choice"), conflicted.out());

        CliRun resolved = sync(second, "--resolve", "1", "--keep", "mine");
        assertEquals(0, resolved.exitCode(), resolved.err());
        assertFalse(resolved.out().contains("conflict 1:"), resolved.out());
        assertEquals(0, sync(laptop).exitCode());
        try (Workbook wb = Workbook.open(laptop, "k.ashdown")) {
            assertEquals("feed, laptop two", wb.points().get(DemoSite.POINT_A).orElseThrow().service());
        }
        CliRun unknown = sync(second, "--resolve", "1", "--keep", "theirs");
        assertEquals(1, unknown.exitCode());
        assertTrue(unknown.err().contains("no open conflict 1"), unknown.err());
    }

    @Test
    void aPointRemovedThereAndEditedHereListsWhatWaitsWithItAndOneChoiceResolvesThemAll() {
        assertEquals(0, sync(laptop).exitCode());
        Path second = dir.resolve("second.strandbook");
        assertEquals(0, CliRun.of("clone", "--server", url, "--server-user", TECH, "--site", DemoSite.site().name(),
                second.toString()).exitCode());
        try (Workbook wb = Workbook.open(laptop, "k.ashdown")) {
            wb.points().delete(DemoSite.POINT_B);
        }
        editService(second, DemoSite.POINT_B, "feed, second train");
        assertEquals(0, sync(laptop).exitCode());
        CliRun conflicted = sync(second);
        // design choice: the point's 2 bands, 6 path elements and 3 bends wait with it, each listed
        assertTrue(conflicted.out().contains("conflict 1: point AT-102 (record): mine {"), conflicted.out());
        assertTrue(conflicted.out().contains("12 conflict(s) wait for a choice"), conflicted.out());
        CliRun resolved = sync(second, "--resolve", "1", "--keep", "mine");
        assertEquals(0, resolved.exitCode(), resolved.err());
        assertTrue(resolved.err().contains("with the 11 conflict(s) of the records belonging to it"), resolved.err());
        assertFalse(resolved.out().contains("wait for a choice"), resolved.out());
        assertEquals(0, sync(laptop).exitCode());
        try (Workbook wb = Workbook.open(laptop, "k.ashdown")) {
            assertEquals(DemoSite.legs(DemoSite.POINT_B, "C102"), wb.paths().legs(DemoSite.POINT_B),
                    "nothing silently overwritten: the kept point comes back with its whole path");
        }
    }

    @Test
    void aCloneOfASignedSiteVerifiesAndItsSiteSignatureStillStands() {
        // the issue: "each side's audit trail stays verifiable"; a site signature pins a row of the
        // trail it was given in, which a clone does not have, and that is not tampering
        assertEquals(0, CliRun.of("sign", laptop.toString(), "--role", "approved", "--name", "R. Fairbairn",
                "--title", "site engineer").exitCode());
        assertEquals(0, sync(laptop).exitCode());
        Path second = dir.resolve("second.strandbook");
        assertEquals(0, CliRun.of("clone", "--server", url, "--server-user", TECH, "--site", DemoSite.site().name(),
                second.toString()).exitCode());
        CliRun verify = CliRun.of("audit", "verify", second.toString());
        assertEquals(0, verify.exitCode(), verify.out() + verify.err());
        assertTrue(verify.out().startsWith("audit trail OK"), "no signature is listed as superseded or tampered: "
                + verify.out());
    }

    @Test
    void aTamperedWorkbookIsRefusedWithExitOne() throws Exception {
        try (Connection c = DriverManager.getConnection("jdbc:sqlite:" + laptop); Statement st = c.createStatement()) {
            st.executeUpdate("UPDATE point SET location = 'elsewhere' WHERE tag = 'AT-101'");
        }
        CliRun run = sync(laptop);
        assertEquals(1, run.exitCode());
        assertTrue(run.err().contains("\nstrandbook: the workbook") && run.err().contains("audit verify"), run.err());
    }

    @Test
    void wrongAddressesAndAPasswordOptionAreUsageErrors() {
        CliRun notPostgres = CliRun.of("sync", laptop.toString(), "--server", "http://example.invalid/db",
                "--server-user", TECH);
        assertEquals(2, notPostgres.exitCode());
        assertTrue(notPostgres.err().contains("not a PostgreSQL address"), notPostgres.err());
        // never a password on the command line: it would show in the process list (common practice)
        CliRun password = CliRun.of("sync", laptop.toString(), "--server", url, "--server-user", TECH,
                "--server-password", "x");
        assertEquals(2, password.exitCode());
    }

    @Test
    void aServerThatDoesNotAnswerIsOneLineAndExitOne() {
        CliRun run = CliRun.of("sync", laptop.toString(), "--server", "jdbc:postgresql://127.0.0.1:1/none",
                "--server-user", TECH);
        assertEquals(1, run.exitCode());
        assertEquals(1, run.err().strip().lines().count(), run.err());
    }

    private static void editService(Path file, String service) {
        editService(file, DemoSite.POINT_A, service);
    }

    private static void editService(Path file, String tag, String service) {
        try (Workbook wb = Workbook.open(file, "k.ashdown")) {
            MeasurementPoint p = wb.points().get(tag).orElseThrow();
            wb.points().save(new MeasurementPoint(p.tag(), service, p.location(), p.analyzerTag(), p.channel(),
                    p.probeTypeCode(), p.bands(), p.toleranceDb(), p.hazardousArea(), p.hydrogenService(),
                    p.processTemperatureC()));
        }
    }
}
