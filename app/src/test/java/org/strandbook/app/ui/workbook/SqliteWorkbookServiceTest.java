package org.strandbook.app.ui.workbook;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.OptionalDouble;

import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.ExtendWith;
import org.junit.jupiter.api.io.TempDir;
import org.strandbook.app.ui.task.JobProgress;
import org.strandbook.evaluation.PointEvaluation;
import org.strandbook.evaluation.Status;
import org.strandbook.intake.ScanFileImporter;
import org.strandbook.intake.ScheduleImporter;
import org.strandbook.site.CableSegment;
import org.strandbook.site.ConnectorType;
import org.strandbook.site.DecisionRule;
import org.strandbook.site.MeasurementPoint;
import org.strandbook.site.PathElement;
import org.strandbook.site.PathLeg;
import org.strandbook.site.ScanKind;
import org.strandbook.site.Site;
import org.strandbook.store.AuditEntry;
import org.strandbook.store.NotAWorkbookException;
import org.strandbook.store.Workbook;

/**
 * The window's SQLite service round-trips the records the sheets edit through core's workbook,
 * audited under the user's name. Expected values are the sample site's own records (an invented
 * plant) and what the test itself wrote.
 */
@ExtendWith(SampleSite.Resolver.class)
class SqliteWorkbookServiceTest {

    private static final String USER = "technician A";
    private static final JobProgress QUIET = new JobProgress() {
        @Override
        public void update(double fraction, String message) {
        }

        @Override
        public boolean isCancelled() {
            return false;
        }
    };

    private static SampleSite sample;

    @TempDir
    Path dir;
    private Path file;
    private SqliteWorkbookService service;
    private LoadedSite loaded;

    @BeforeAll
    static void sample(SampleSite built) {
        sample = built;
    }

    @BeforeEach
    void open() {
        file = sample.workbookCopy(dir);
        service = new SqliteWorkbookService(USER);
        loaded = service.open(file, QUIET);
    }

    @AfterEach
    void close() {
        service.close();
    }

    @Test
    void openingReadsEveryPointWithBothLegs() {
        assertEquals(12, loaded.points().size());
        assertEquals(24, loaded.legs().values().stream().mapToInt(List::size).sum());
        assertEquals(Optional.of(file), service.file());
    }

    @Test
    void savedLegsAreReadBackAndAuditedUnderTheUser() {
        List<PathLeg> legs = loaded.legs().get("AT-4102");
        List<PathLeg> longer = legs.stream().map(l -> new PathLeg(l.pointTag(), l.direction(), l.elements().stream()
                .map(e -> e instanceof CableSegment s && s.label().equals("C4102-S2")
                        ? (PathElement) new CableSegment(s.label(), s.fiberTypeCode(), 186.5, s.bends()) : e).toList())).toList();
        long auditBefore = lastAuditId();

        service.saveLegs("AT-4102", longer);

        assertEquals(longer, service.reload(QUIET).legs().get("AT-4102"));
        List<AuditEntry> written = auditAfter(auditBefore);
        assertFalse(written.isEmpty());
        assertTrue(written.stream().allMatch(e -> e.user().equals(USER)), written.toString());
        assertTrue(written.stream().anyMatch(e -> e.table().equals("path_element") && e.newValues() != null
                && e.newValues().contains("186.5")), written.toString());
    }

    @Test
    void savedPointAndCatalogEntryAreReadBack() {
        MeasurementPoint p = loaded.points().stream().filter(x -> x.tag().equals("AT-4101")).findFirst().orElseThrow();
        MeasurementPoint tighter = new MeasurementPoint(p.tag(), p.service(), p.location(), p.analyzerTag(), p.channel(),
                p.probeTypeCode(), p.bands(), OptionalDouble.of(0.5), p.hazardousArea(), p.hydrogenService(),
                p.processTemperatureC());
        ConnectorType c = loaded.connectors().get(0);
        ConnectorType worse = new ConnectorType(c.code(), c.description(), c.family(), c.typicalLossDb() + 0.25, c.airGap());

        service.savePoints(List.of(tighter));
        service.saveCatalog(List.of(), List.of(worse), List.of());

        LoadedSite again = service.reload(QUIET);
        assertTrue(again.points().contains(tighter));
        assertTrue(again.connectors().contains(worse));
    }

    @Test
    void saveAsCopiesTheWorkbookAndWorksOnInTheCopy() throws Exception {
        Path copy = dir.resolve("copy").resolve("unit-41.strandbook");
        Files.createDirectories(copy.getParent());

        Path saved = service.saveAs(copy, QUIET);
        MeasurementPoint p = loaded.points().get(0);
        MeasurementPoint renamedService = new MeasurementPoint(p.tag(), "changed in the copy", p.location(),
                p.analyzerTag(), p.channel(), p.probeTypeCode(), p.bands(), p.toleranceDb(), p.hazardousArea(),
                p.hydrogenService(), p.processTemperatureC());
        service.savePoints(List.of(renamedService));
        service.close();

        assertEquals(copy.toAbsolutePath().normalize(), saved);
        try (Workbook original = Workbook.open(file, USER); Workbook copied = Workbook.open(copy, USER)) {
            assertEquals(p, original.points().get(p.tag()).orElseThrow());
            assertEquals(renamedService, copied.points().get(p.tag()).orElseThrow());
            assertEquals(original.scans().count(), copied.scans().count());
            assertTrue(copied.audit().verify().intact());
        }
    }

    @Test
    void aFileThatIsNotAWorkbookIsRefusedAndTheOpenOneStaysOpen() throws Exception {
        Path notes = dir.resolve("notes.strandbook");
        Files.writeString(notes, "shift notes, not a workbook", StandardCharsets.UTF_8);

        assertThrows(NotAWorkbookException.class, () -> service.open(notes, QUIET));

        assertEquals(Optional.of(file), service.file());
        assertEquals(12, service.reload(QUIET).points().size());
    }

    @Test
    void theWindowJudgesByTheSitesDecisionRule() {
        // the sample plant's AT-4109: 0.8 dB of dirt on a 1.5 m loop, within the fixed 1 dB, beyond the
        // prediction's coverage interval (the rule's zones: JCGM 106:2012, clause 8)
        assertEquals(Status.PASS, service.evaluatePoint("AT-4109").status());
        try (Workbook wb = Workbook.open(file, USER)) {
            wb.site().setDecisionRule(DecisionRule.interval());
        }
        assertEquals(Status.FAIL, service.evaluatePoint("AT-4109").status());
    }

    @Test
    void evaluationFindsTheSampleSitesDirtyJoint() {
        // the sample plant's AT-4102 has joint J2 graded dirty and a flat excess injected there
        PointEvaluation e = service.evaluatePoint("AT-4102");

        assertEquals(Status.FAIL, e.status());
        assertTrue(e.finding().contains("J2"), e.finding());
    }

    @Test
    void siteEvaluationStopsWhenToldTo() {
        List<Integer> told = new ArrayList<>();

        List<PointStatus> done = service.evaluatePoints(List.of("AT-4101", "AT-4102", "AT-4103"), n -> {
            told.add(n);
            return n < 2;
        });

        assertEquals(List.of(1, 2), told);
        assertEquals(List.of("AT-4101", "AT-4102"), done.stream().map(PointStatus::pointTag).toList());
        assertEquals(Optional.of(Status.PASS), done.get(0).status());
    }

    @Test
    void importedScanFileIsListedUnderItsPoint() {
        Path scan = sample.newLoopScan("AT-4202", dir, 5);
        int before = service.scans("AT-4202").size();

        ScanFileImporter.Summary summary = service.importScans(new ScanFileImporter.Request("AT-4202", ScanKind.LOOP,
                List.of(scan), Optional.empty(), USER), ScanFileImporter.Progress.NONE);

        assertEquals(1, summary.accepted().size(), summary.rejected().toString());
        assertEquals(before + 1, service.scans("AT-4202").size());
    }

    @Test
    void aNewWorkbookFilledFromACableScheduleHoldsItsPoints() {
        LoadedSite empty = service.create(dir.resolve("new-site.strandbook"), new Site("Saltmarsh Ridge Works"), QUIET);

        ScheduleImporter.Outcome outcome = service.importSchedule(sample.schedule());

        assertEquals(0, empty.points().size());
        assertTrue(outcome.written(), outcome.problems().toString());
        assertEquals(12, service.reload(QUIET).points().size());
    }

    private long lastAuditId() {
        try (Workbook wb = Workbook.open(file, USER)) {
            long last = 0;
            for (List<AuditEntry> page = wb.audit().entries(0, 10_000); !page.isEmpty();
                 page = wb.audit().entries(last, 10_000)) {
                last = page.get(page.size() - 1).id();
            }
            return last;
        }
    }

    private List<AuditEntry> auditAfter(long id) {
        try (Workbook wb = Workbook.open(file, USER)) {
            return wb.audit().entries(id, 10_000);
        }
    }
}
