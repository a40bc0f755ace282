package org.strandbook.app.ui.workbook;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.sql.Connection;
import java.sql.DriverManager;
import java.sql.Statement;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.concurrent.CancellationException;
import java.util.stream.Stream;

import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.strandbook.app.ui.task.DirectTaskExecutor;
import org.strandbook.app.ui.task.JobProgress;
import org.strandbook.app.ui.task.TaskExecutor;
import org.strandbook.server.LocalPostgres;
import org.strandbook.server.ServerLogin;
import org.strandbook.server.SiteSync;
import org.strandbook.site.MeasurementPoint;
import org.strandbook.store.DemoSite;
import org.strandbook.store.Workbook;

/**
 * The window's plant server actions on their view model, against a real PostgreSQL started by
 * {@link LocalPostgres}: Cancel and refusals leave nothing half-written, a conflict kept "mine"
 * reaches the other laptop with the next syncs, and a workbook that fails its audit check is
 * refused with the reason. The rules are the (a clone never leaves a partial workbook; a
 * resolution is itself an audited change; a workbook that fails `audit verify` is refused).
 */
class PlantServerViewModelTest {

    private static final String TECH = "vm_crew";

    @TempDir
    Path dir;
    private String url;
    private SqliteWorkbookService service;
    private final List<String> notices = new ArrayList<>();
    private final List<LoadedSite> loaded = new ArrayList<>();

    @BeforeEach
    void server() {
        url = LocalPostgres.shared().newPlantServer(TECH);
        service = new SqliteWorkbookService("laptop user");
    }

    @AfterEach
    void close() {
        service.close();
    }

    private PlantServerViewModel vm(TaskExecutor tasks) {
        PlantServerViewModel[] vm = new PlantServerViewModel[1];
        // as the window does: every workbook read after an action refreshes the conflicts
        vm[0] = new PlantServerViewModel(service, tasks, Map.of(), dir, site -> {
            loaded.add(site);
            vm[0].workbookLoaded(site.file());
        }, notices::add);
        return vm[0];
    }

    private Workbook firstLaptop() {
        return new PlantServerFixture(url, TECH).firstLaptop(dir);
    }

    private void sync(Workbook wb) {
        new PlantServerFixture(url, TECH).sync(wb);
    }

    private List<String> filesNamedLike(String part) throws Exception {
        try (Stream<Path> files = Files.list(dir)) {
            return files.map(p -> p.getFileName().toString()).filter(n -> n.contains(part)).toList();
        }
    }

    @Test
    void aCloneCancelledAtOnceLeavesNoFileAndReportsNoFailure() throws Exception {
        firstLaptop().close();
        PlantServerViewModel vm = vm(new CancellingTaskExecutor());
        vm.cloneSite(url, TECH, DemoSite.site().name(), dir.resolve("laptop.strandbook"));
        assertEquals(List.of(), filesNamedLike("laptop"));
        assertNull(vm.clonedProperty().get());
        assertEquals("", vm.cloneProblemProperty().get(), "a cancel is not a failure");
    }

    @Test
    void aCloneCancelledAfterTheServerAnsweredStillLeavesNoFile() throws Exception {
        firstLaptop().close();
        Path target = dir.resolve("laptop.strandbook");
        // Cancel pressed while the server is read: it takes effect only once the server has answered,
        // at the stage that writes the answer into the new workbook
        JobProgress lateCancel = new JobProgress() {
            private boolean comparing;

            @Override
            public void update(double fraction, String message) {
                comparing |= message.startsWith("comparing with the server");
            }

            @Override
            public boolean isCancelled() {
                return comparing;
            }
        };
        ServerLogin login = new ServerLogin(url, TECH, null);
        assertThrows(CancellationException.class, () -> service.cloneFromServer(login, DemoSite.site().name(),
                target, lateCancel));
        assertEquals(List.of(), filesNamedLike("laptop"));
    }

    @Test
    void aSyncCancelledAtOnceSendsNothing() {
        try (Workbook a = firstLaptop()) {
            vm(new DirectTaskExecutor()).cloneSite(url, TECH, DemoSite.site().name(), dir.resolve("laptop.strandbook"));
            String before = a.points().get(DemoSite.POINT_A).orElseThrow().service();
            service.savePoints(List.of(renamed(loaded.get(0), "feed two")));
            vm(new CancellingTaskExecutor()).sync(url, TECH);
            sync(a);
            assertEquals(before, a.points().get(DemoSite.POINT_A).orElseThrow().service(),
                    "the other laptop sees nothing of a cancelled sync");
        }
    }

    @Test
    void anUnreachableServerIsSaidInOneLine() {
        PlantServerViewModel vm = vm(new DirectTaskExecutor());
        // port 1 on loopback: nothing listens there on these machines (design choice of the test)
        vm.cloneSite("jdbc:postgresql://127.0.0.1:1/plant", TECH, "Any", dir.resolve("laptop.strandbook"));
        String why = vm.cloneProblemProperty().get();
        assertTrue(why.startsWith("cannot reach the plant server jdbc:postgresql://127.0.0.1:1/plant as " + TECH), why);
        assertTrue(!why.contains("\n"), why);
    }

    @Test
    void keepingMineSendsMyValueWithTheNextSync() {
        try (Workbook a = firstLaptop()) {
            PlantServerViewModel vm = vm(new DirectTaskExecutor());
            Path laptop = dir.resolve("laptop.strandbook");
            vm.cloneSite(url, TECH, DemoSite.site().name(), laptop);
            assertEquals(laptop, vm.clonedProperty().get());
            rename(a, "feed one");
            sync(a);
            service.savePoints(List.of(renamed(loaded.get(0), "feed two")));
            vm.sync();
            assertEquals(1, vm.openConflictsProperty().get(), notices.toString());
            vm.settle(vm.conflictsProperty().get().get(0), true);
            assertEquals(0, vm.openConflictsProperty().get());
            vm.sync();
            sync(a);
            assertEquals("feed two", a.points().get(DemoSite.POINT_A).orElseThrow().service(),
                    "the other laptop takes the value kept here");
            assertTrue(a.audit().verify().intact());
        }
    }

    @Test
    void aRowSettledElsewhereMeanwhileIsRefusedAndTheListShowsWhatIsStillOpen() {
        try (Workbook a = firstLaptop()) {
            PlantServerViewModel vm = vm(new DirectTaskExecutor());
            Path laptop = dir.resolve("laptop.strandbook");
            vm.cloneSite(url, TECH, DemoSite.site().name(), laptop);
            rename(a, "feed one");
            sync(a);
            service.savePoints(List.of(renamed(loaded.get(0), "feed two")));
            vm.sync();
            ConflictRow stale = vm.conflictsProperty().get().get(0);
            // the same workbook settled from the command line while the window still lists the row
            try (Workbook other = Workbook.open(laptop, "laptop user")) {
                SiteSync.resolve(other, stale.id(), false, "laptop user");
            }
            vm.settle(stale, true);
            String last = notices.get(notices.size() - 1);
            assertTrue(last.startsWith("Not settled: no open conflict " + stale.id()), last);
            assertEquals(List.of(), vm.conflictsProperty().get());
        }
    }

    @Test
    void aWorkbookThatFailsItsAuditCheckIsRefusedWithTheReason() throws Exception {
        try (Workbook a = firstLaptop()) {
            PlantServerViewModel vm = vm(new DirectTaskExecutor());
            Path laptop = dir.resolve("laptop.strandbook");
            vm.cloneSite(url, TECH, DemoSite.site().name(), laptop);
            service.close();
            try (Connection c = DriverManager.getConnection("jdbc:sqlite:" + laptop);
                 Statement st = c.createStatement()) {
                st.executeUpdate("UPDATE point SET service = 'edited behind the trail' WHERE tag = '"
                        + DemoSite.POINT_A + "'");
            }
            service.open(laptop, new DirectJob());
            vm.workbookLoaded(laptop);
            vm.sync();
            String last = notices.get(notices.size() - 1);
            assertTrue(last.startsWith("Not synced: the workbook ") && last.contains("fails `audit verify`"), last);
            assertEquals(last, vm.lastSyncProperty().get(), "the refusal stays in view after the status line moves on");
        }
    }

    private static MeasurementPoint renamed(LoadedSite site, String service) {
        return PlantServerFixture.renamed(site.points().stream().filter(x -> x.tag().equals(DemoSite.POINT_A))
                .findFirst().orElseThrow(), service);
    }

    private static void rename(Workbook wb, String service) {
        PlantServerFixture.rename(wb, service);
    }

    /** A job's progress nobody watches or cancels. */
    private static final class DirectJob implements JobProgress {
        @Override
        public void update(double fraction, String message) {
        }

        @Override
        public boolean isCancelled() {
            return false;
        }
    }
}
