package org.strandbook.app;

import static com.tngtech.archunit.lang.syntax.ArchRuleDefinition.classes;
import static com.tngtech.archunit.lang.syntax.ArchRuleDefinition.noClasses;
import static com.tngtech.archunit.library.dependencies.SlicesRuleDefinition.slices;

import com.tngtech.archunit.core.domain.JavaClasses;
import com.tngtech.archunit.core.importer.ClassFileImporter;
import com.tngtech.archunit.core.importer.ImportOption;
import com.tngtech.archunit.lang.ArchRule;
import com.tngtech.archunit.library.GeneralCodingRules;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;

/**
 * The boundaries of the design, enforced on the compiled classes of every module: the model and
 * the physics know nothing of the window, the database or the spreadsheet library, and only the
 * command line talks to the console.
 */
class ArchitectureTest {

    private static final String BENCH = "org.strandbook.app.bench..";

    private static JavaClasses classes;

    /**
     * Strandbook's own modules, whether they come as class folders ({@code mvn test}) or as the jars
     * a reactor build packages first ({@code mvn verify}); never third-party jars, and never core's
     * test-jar (the test server and child programs the app's tests borrow are test code).
     */
    private static final ImportOption OWN_MODULES = location -> !location.contains("-tests.jar")
            && (!location.isJar() || location.contains("strandbook-core")
                    || location.contains("strandbook-sample-site") || location.contains("strandbook-templates"));

    @BeforeAll
    static void importClasses() {
        classes = new ClassFileImporter()
                .withImportOption(ImportOption.Predefined.DO_NOT_INCLUDE_TESTS)
                .withImportOption(OWN_MODULES)
                .importPackages("org.strandbook");
    }

    @Test
    void coreAndSampleSiteNeverTouchJavaFx() {
        ArchRule rule = noClasses().that().resideOutsideOfPackage("org.strandbook.app..")
                .should().dependOnClassesThat().resideInAnyPackage("javafx..")
                .because("core has no JavaFX dependency at all; the window is one client among others");
        rule.check(classes);
    }

    @Test
    void jdbcStaysInTheStore() {
        // a benchmark's floor is the bare library doing the same work, so the bench package may call it;
        // the plant server's package speaks SQL to PostgreSQL, never to the workbook file
        ArchRule rule = noClasses().that().resideOutsideOfPackages("org.strandbook.store..", "org.strandbook.server..", BENCH)
                .should().dependOnClassesThat().resideInAnyPackage("java.sql..", "org.sqlite..")
                .because("explicit SQL lives in small repository classes of one package");
        rule.check(classes);
    }

    @Test
    void thePlantServerReachesTheWorkbookOnlyThroughTheStore() {
        ArchRule rule = noClasses().that().resideInAPackage("org.strandbook.server..")
                .should().dependOnClassesThat().resideInAnyPackage("org.sqlite..", "org.postgresql..")
                .because("the workbook is the store's; the server is reached through plain JDBC and its URL");
        rule.check(classes);
    }

    @Test
    void spreadsheetLibraryStaysInImportAndDossier() {
        ArchRule rule = noClasses().that()
                .resideOutsideOfPackages("org.strandbook.schedule..", "org.strandbook.dossier..", BENCH)
                .should().dependOnClassesThat().resideInAnyPackage("org.apache.poi..", "org.openxmlformats..")
                .because("POI is confined to the cable-schedule import and the dossier export");
        rule.check(classes);
    }

    @Test
    void physicsAndNumericsAreFreeOfStorageAndFiles() {
        ArchRule rule = noClasses().that()
                .resideInAnyPackage("org.strandbook.optics..", "org.strandbook.fit..", "org.strandbook.trend..",
                        "org.strandbook.throughput..", "org.strandbook.diagnosis..", "org.strandbook.uncertainty..")
                .should().dependOnClassesThat().resideInAnyPackage("java.sql..", "java.nio.file..",
                        "org.strandbook.store..", "org.apache.poi..")
                .because("physics and numerics are pure functions of their arguments");
        rule.check(classes);
    }

    @Test
    void onlyTheCommandLineWritesToTheConsole() {
        // the app's root package holds only the launcher, the process's entry point
        ArchRule rule = noClasses().that().resideOutsideOfPackages("org.strandbook.app.cli..", "org.strandbook.app")
                .should(GeneralCodingRules.ACCESS_STANDARD_STREAMS)
                .because("results reach the user through the command line or the window, never stray prints");
        rule.check(classes);
    }

    @Test
    void benchmarksStayOutOfTheProduct() {
        // the product never runs a benchmark; only the command line registers the bench command
        ArchRule rule = noClasses().that().resideOutsideOfPackages(BENCH, "org.strandbook.app.cli..")
                .should().dependOnClassesThat().resideInAnyPackage(BENCH)
                .because("core holds only what the product runs, and the floors live with their benches");
        rule.check(classes);
    }

    @Test
    void benchmarksAndTheirFloorsLiveInOnePackage() {
        ArchRule rule = classes().that().haveSimpleNameEndingWith("BenchCommand")
                .or().haveSimpleNameStartingWith("Bare").or().haveSimpleNameEndingWith("Floor")
                .should().resideInAPackage(BENCH)
                .because("a benchmark and the floor it is measured against are read together, apart from the product");
        rule.check(classes);
    }

    @Test
    void benchmarksDoNotDependOnTheCommandLine() {
        ArchRule rule = noClasses().that().resideInAPackage(BENCH)
                .should().dependOnClassesThat().resideInAPackage("org.strandbook.app.cli..")
                .because("the command line registers the bench command; the benches only use the product");
        rule.check(classes);
    }

    @Test
    void packagesFormNoCycles() {
        slices().matching("org.strandbook.(*)..").should().beFreeOfCycles().check(classes);
    }
}
