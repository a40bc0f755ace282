package org.strandbook.app.ui.workbook;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.time.Instant;
import java.util.List;
import java.util.Optional;

import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.ExtendWith;
import org.junit.jupiter.api.io.TempDir;
import org.strandbook.app.ui.MemoryPreferences;
import org.strandbook.app.ui.plot.PlotAxes;
import org.strandbook.app.ui.task.DirectTaskExecutor;
import org.strandbook.evaluation.PointEvaluation;
import org.strandbook.evaluation.SiteEvaluator;
import org.strandbook.evaluation.Status;
import org.strandbook.site.MaintenanceAction;
import org.strandbook.site.MaintenanceKind;
import org.strandbook.store.Workbook;

/**
 * The site's attention view over the real SQLite service on a copy of the sample site, jobs run
 * synchronously. The ranking is the {@code trend} command's (failing first, then by margin run-out
 * date: design choice); what the demo's points carry is its own invented scenario.
 */
@ExtendWith(SampleSite.Resolver.class)
class AttentionViewModelTest {

    private static SampleSite sample;

    @TempDir
    Path dir;
    private Path file;
    private SqliteWorkbookService service;
    private WorkbookViewModel vm;

    @BeforeAll
    static void sample(SampleSite built) {
        sample = built;
    }

    @BeforeEach
    void open() {
        file = sample.workbookCopy(dir);
        service = new SqliteWorkbookService("technician E");
        MemoryPreferences preferences = new MemoryPreferences();
        vm = new WorkbookViewModel(service, new DirectTaskExecutor(), new PlotAxes(preferences),
                new RecentFiles(preferences), dir.resolve("sample"), Optional.empty());
        vm.setEvaluateOnOpen(false);
        vm.open(file);
    }

    @AfterEach
    void close() {
        service.close();
    }

    private List<String> trendCommandRanking() {
        try (Workbook wb = Workbook.openForReading(file, "technician E")) {
            return SiteEvaluator.withDefaults().evaluate(wb, List.of(), SiteEvaluator.Progress.NONE).points().stream()
                    .map(PointEvaluation::point).map(p -> p.tag()).toList();
        }
    }

    private AttentionRow row(String tag) {
        return vm.attention().ranking().stream().filter(r -> r.pointTag().equals(tag)).findFirst().orElseThrow();
    }

    @Test
    void everyPointIsRankedAsTheTrendCommandRanksThem() {
        AttentionViewModel attention = vm.attention();
        assertTrue(attention.staleProperty().get());

        attention.refresh();

        List<String> shown = attention.ranking().stream().map(AttentionRow::pointTag).toList();
        assertEquals(trendCommandRanking(), shown);
        assertEquals(1, attention.ranking().get(0).rank());
        assertTrue(!attention.staleProperty().get());
    }

    @Test
    void failingAndReviewPointsAreListedWithTheirFindingsAndOpenFollowUps() {
        vm.attention().refresh();

        List<String> needing = vm.attention().needing().stream().map(AttentionRow::pointTag).toList();
        List<String> notPassing;
        try (Workbook wb = Workbook.openForReading(file, "technician E")) {
            notPassing = SiteEvaluator.withDefaults().evaluate(wb, List.of(), SiteEvaluator.Progress.NONE).points()
                    .stream().filter(e -> e.status() != Status.PASS).map(e -> e.point().tag()).toList();
        }
        assertEquals(notPassing, needing);
        // the demo's five injected faults fail; AT-4104, cleaned, passes
        assertTrue(needing.containsAll(List.of("AT-4102", "AT-4103", "AT-4105", "AT-4106", "AT-4108")), needing.toString());
        AttentionRow dirty = row("AT-4102");
        assertTrue(dirty.finding().contains("dirty or misaligned connector"), dirty.finding());
        assertTrue(dirty.followUpText().startsWith("open: check J2"), dirty.followUpText());
        assertEquals("", row("AT-4104").followUpText());
    }

    @Test
    void aCleaningRecordedAfterTheScanTurnsTheFollowUpIntoARemeasurement() {
        vm.selectPoint("AT-4102");
        vm.point().history().recordMaintenance(new MaintenanceAction("AT-4102", MaintenanceKind.CLEAN_JOINT, "J2",
                Instant.parse("2026-11-20T09:00:00Z"), "K. Lindqvist", "dry reel cleaner", "finding: J2 dirty",
                Optional.empty()));
        assertTrue(vm.attention().staleProperty().get(), "a record makes the ranking stale");

        vm.attention().refresh();

        assertEquals("done: J2 was cleaned on 2026-11-20: re-measure", row("AT-4102").followUpText());
    }

    @Test
    void openingARowShowsThatPoint() {
        vm.attention().refresh();
        AttentionRow first = vm.attention().ranking().get(0);

        vm.attention().open(first);

        assertEquals(first.pointTag(), vm.selectedTagProperty().get());
    }

    @Test
    void aCancelledRankingLeavesTheListsAsTheyWere() {
        AttentionViewModel attention = new AttentionViewModel(service, new CancellingTaskExecutor(), tag -> { });

        attention.refresh();

        assertTrue(attention.ranking().isEmpty());
        assertTrue(attention.staleProperty().get());
    }
}
