package org.strandbook.app.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.sql.Connection;
import java.sql.DriverManager;
import java.sql.Statement;
import java.time.Duration;
import java.time.Instant;
import java.util.Comparator;
import java.util.List;

import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.strandbook.site.ScanRecord;
import org.strandbook.store.Workbook;

/**
 * The maintenance and handover commands: inspect, maintain, note, sign, history, and what audit
 * verify says of signatures. Exit codes and one-line errors are the project's command convention
 * (design choice); the inspection grades follow IEC 61300-3-35:2015.
 */
class HandoverCommandsTest {

    private static final String HEALTHY = "AT-4101";
    private static final String HAZARDOUS = "AT-4103";

    @TempDir
    Path dir;

    private String site;
    private Instant afterScans;

    @BeforeEach
    void create() {
        Path file = DemoWorkbook.create(dir.resolve("saltmarsh.sqlite"), List.of(HEALTHY, HAZARDOUS), 2);
        site = file.toString();
        try (Workbook wb = Workbook.open(file, DemoWorkbook.USER)) {
            afterScans = wb.scans().listAll().stream().map(ScanRecord::takenAt).max(Comparator.naturalOrder())
                    .orElseThrow().plus(Duration.ofDays(1));
        }
    }

    private CliRun run(String... args) {
        return CliRun.of(args);
    }

    @Test
    void anInspectionIsRecordedAndShowsInThePointsHistory() {
        CliRun inspect = run("inspect", site, "--point", HEALTHY, "--joint", "J2", "--grade", "dirty", "--by",
                "k.ashdown", "--at", afterScans.toString(), "--remark", "film on the core", "--picture", "j2.png");
        assertEquals(0, inspect.exitCode(), inspect.err());
        assertTrue(inspect.out().contains("graded dirty"), inspect.out());

        CliRun history = run("history", site, "--point", HEALTHY, "--json");
        assertEquals(0, history.exitCode(), history.err());
        assertTrue(history.out().contains("\"kind\":\"inspection\",\"subject\":\"J2\",\"who\":\"k.ashdown\","
                + "\"text\":\"graded dirty: film on the core [picture j2.png]\""), history.out());
    }

    @Test
    void anInspectionOfAnUnknownJointIsRejectedInOneLine() {
        CliRun r = run("inspect", site, "--point", HEALTHY, "--joint", "J9", "--grade", "clean", "--by", "k.ashdown");
        assertEquals(1, r.exitCode());
        assertEquals("strandbook: point AT-4101 has no joint 'J9' on its path\n", r.err());
    }

    @Test
    void aDateInTheFutureIsRejected() {
        CliRun r = run("note", site, "--point", HEALTHY, "--by", "k.ashdown", "--at",
                Instant.now().plus(Duration.ofDays(400)).toString().substring(0, 10), "dust cap refitted");
        assertEquals(1, r.exitCode());
        assertTrue(r.err().contains("in the future"), r.err());
        assertEquals(1, r.err().lines().count());
    }

    @Test
    void anUnknownGradeIsWrongUsage() {
        CliRun r = run("inspect", site, "--point", HEALTHY, "--joint", "J2", "--grade", "smudged", "--by", "k");
        assertEquals(2, r.exitCode());
    }

    @Test
    void aSegmentReplacementChangesThePathAndIsInTheHistory() {
        CliRun r = run("maintain", site, "--point", HEALTHY, "--action", "replace-segment", "--element", "C4101-R2",
                "--new-length-m", "31.5", "--by", "t.okonjo", "--at", afterScans.toString(), "--why", "crushed");
        assertEquals(0, r.exitCode(), r.err());
        assertTrue(r.out().contains("the path changes from this date on"), r.out());
        CliRun history = run("history", site, "--point", HEALTHY);
        assertTrue(history.out().contains("replace segment"), history.out());
        assertTrue(history.out().contains("31.5 m"), history.out());
        assertEquals(0, run("audit", "verify", site).exitCode());
    }

    @Test
    void aProbeReplacementRecordsTheNewTypeWhichThePointThenCarries() {
        // the demo's catalog holds PT-TX5 (AT-4101's probe) and PT-TF2 (invented demo data)
        CliRun r = run("maintain", site, "--point", HEALTHY, "--action", "replace-probe", "--probe-type", "PT-TF2",
                "--by", "t.okonjo", "--at", afterScans.toString(), "--why", "window etched");
        assertEquals(0, r.exitCode(), r.err());
        assertTrue(r.out().contains("probe type PT-TF2 is predicted from this date on"), r.out());
        CliRun history = run("history", site, "--point", HEALTHY);
        assertTrue(history.out().contains("before: probe PT-TX5; after: probe PT-TF2"), history.out());
        try (Workbook wb = Workbook.open(Path.of(site), DemoWorkbook.USER)) {
            assertEquals("PT-TF2", wb.points().get(HEALTHY).orElseThrow().probeTypeCode());
        }
        assertEquals(0, run("audit", "verify", site).exitCode());
    }

    @Test
    void aProbeReplacementWithAnUnknownTypeIsRejectedInOneLine() {
        CliRun r = run("maintain", site, "--point", HEALTHY, "--action", "replace-probe", "--probe-type", "PT-ZZ",
                "--by", "t.okonjo", "--at", afterScans.toString());
        assertEquals(1, r.exitCode());
        assertTrue(r.err().contains("unknown probe type 'PT-ZZ'"), r.err());
        assertEquals(1, r.err().lines().count());
    }

    @Test
    void aProbeReplacementDatedInTheFutureIsRejected() {
        CliRun r = run("maintain", site, "--point", HEALTHY, "--action", "replace-probe", "--probe-type", "PT-TF2",
                "--by", "t.okonjo", "--at", Instant.now().plus(Duration.ofDays(400)).toString().substring(0, 10));
        assertEquals(1, r.exitCode());
        assertTrue(r.err().contains("in the future"), r.err());
    }

    @Test
    void aProbeTypeOnAnotherActionIsWrongUsage() {
        CliRun r = run("maintain", site, "--point", HEALTHY, "--action", "clean-joint", "--element", "J2",
                "--probe-type", "PT-TF2", "--by", "t.okonjo", "--at", afterScans.toString());
        assertEquals(2, r.exitCode());
        assertTrue(r.err().contains("--probe-type applies to replace-probe"), r.err());
    }

    @Test
    void theLatestRecordIsWithdrawnAndTheTrailStillVerifies() {
        assertEquals(0, run("maintain", site, "--point", HEALTHY, "--action", "replace-segment", "--element", "C4101-R2",
                "--new-length-m", "31.5", "--by", "t.okonjo", "--at", afterScans.toString()).exitCode());

        CliRun r = run("withdraw", site, "--point", HEALTHY, "--user", "m.okonedo");
        assertEquals(0, r.exitCode(), r.err());
        assertTrue(r.out().startsWith("withdrawn: replace segment C4101-R2 of "), r.out());
        assertTrue(r.out().contains("the path and probe are as they were before it"), r.out());
        CliRun history = run("history", site, "--point", HEALTHY);
        assertFalse(history.out().contains("31.5 m"), history.out());
        assertEquals(0, run("audit", "verify", site).exitCode());
    }

    @Test
    void withdrawingWithNothingRecordedIsRejectedInOneLine() {
        CliRun r = run("withdraw", site, "--point", HEALTHY);
        assertEquals(1, r.exitCode());
        assertEquals("strandbook: point AT-4101 has no inspection, maintenance action or note to withdraw\n", r.err());
    }

    @Test
    void signingWithoutANameIsWrongUsageAndAnUnevaluatedPointIsRefused() {
        assertEquals(2, run("sign", site, "--point", HEALTHY, "--role", "approved").exitCode());
        CliRun blank = run("sign", site, "--point", HEALTHY, "--role", "approved", "--name", " ");
        assertEquals(1, blank.exitCode());
        assertEquals("strandbook: a sign-off needs the signer's name\n", blank.err());
    }

    @Test
    void aSignedPointChangedLaterIsReportedAsSupersededByAuditVerify() {
        CliRun sign = run("sign", site, "--point", HEALTHY, "--role", "checked", "--name", "M. Okonedo",
                "--title", "commissioning lead", "--at", afterScans.toString());
        assertEquals(0, sign.exitCode(), sign.err());
        CliRun before = run("audit", "verify", site);
        assertEquals(0, before.exitCode());
        assertFalse(before.out().contains("superseded"), before.out());

        run("inspect", site, "--point", HEALTHY, "--joint", "J5", "--grade", "acceptable", "--by", "k.ashdown",
                "--at", afterScans.plusSeconds(3600).toString());
        CliRun after = run("audit", "verify", site);
        assertEquals(0, after.exitCode(), after.err());
        assertTrue(after.out().contains("signature CHECKED by M. Okonedo (commissioning lead)"), after.out());
        assertTrue(after.out().contains("superseded, point AT-4101 changed after it was signed"), after.out());
    }

    @Test
    void aTamperedSiteSignatureFailsAuditVerify() throws Exception {
        assertEquals(0, run("sign", site, "--role", "approved", "--name", "R. Inglenook").exitCode());
        try (Connection c = DriverManager.getConnection("jdbc:sqlite:" + site); Statement st = c.createStatement()) {
            st.executeUpdate("UPDATE sign_off SET audit_head_id = 1");
        }
        CliRun r = run("audit", "verify", site);
        assertEquals(1, r.exitCode());
        assertTrue(r.out().contains("tampered"), r.out());
    }

    @Test
    void importingScansAtAHazardousPointPrintsTheCautionOnce() {
        CliRun r = run("import-scans", site, "--point", HAZARDOUS, "--kind", "loop",
                dir.resolve("missing.csv").toString());
        String caution = "CAUTION: Point " + HAZARDOUS + " lies in a classified hazardous area.";
        assertEquals(1, r.err().split(java.util.regex.Pattern.quote(caution), -1).length - 1, r.err());
        assertTrue(r.err().contains("IEC 60079-28"), r.err());
        assertTrue(r.err().contains("Local codes"), r.err());
        CliRun healthy = run("import-scans", site, "--point", HEALTHY, "--kind", "loop",
                dir.resolve("missing.csv").toString());
        assertFalse(healthy.err().contains("CAUTION"), healthy.err());
    }

    @Test
    void anEvaluationThatSendsSomeoneToAHazardousPointCautionsOnce() {
        // the demo's AT-4103 has a crushed trunk (ScanGenerator) and lies in a classified area
        CliRun r = run("evaluate", site, "--json");
        assertEquals(0, r.exitCode(), r.err());
        assertEquals(1, r.err().split("CAUTION:", -1).length - 1, r.err());
        assertTrue(r.err().contains("AT-4103 lies in a classified hazardous area"), r.err());
        assertTrue(r.out().startsWith("{"), "the JSON on standard output stays clean");
        CliRun healthy = run("evaluate", site, "--point", HEALTHY);
        assertFalse(healthy.err().contains("CAUTION"), healthy.err());
    }

    @Test
    void helpPointsToTheSafetySection() {
        assertTrue(run("--help").out().contains("README's Safety section"));
    }
}
