package org.strandbook.store;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;

import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.io.TempDir;

/**
 * Tests of one repository on the demo workbook: each test gets the workbook new and populated, and
 * after it the audit trail must still verify, whatever the test changed.
 */
abstract class PopulatedWorkbookTest {

    @TempDir
    Path dir;

    Workbook wb;

    private final String fileName;

    PopulatedWorkbookTest(String fileName) {
        this.fileName = fileName;
    }

    @BeforeEach
    void createPopulatedWorkbook() {
        wb = Workbook.create(dir.resolve(fileName), DemoSite.site(), DemoSite.USER);
        DemoSite.populate(wb);
    }

    @AfterEach
    void checkTrailAndClose() {
        AuditReport report = wb.audit().verify();
        wb.close();
        assertTrue(report.intact(), report::toString);
    }
}
