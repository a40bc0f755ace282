package org.strandbook.store;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.time.Instant;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.strandbook.site.ScanRecord;

/** The listing benchmark's floor must hand over exactly the rows the workbook lists, or its ratio means nothing. */
class BareScanListingTest {

    private static final Instant T0 = Instant.parse("2024-03-05T14:07:00Z");

    @TempDir
    Path dir;

    @Test
    void theFloorListsThePointsScansInTheWorkbooksOrder() {
        Path file = dir.resolve("listing.sqlite");
        long[] expected;
        try (Workbook wb = Workbook.create(file, DemoSite.site(), DemoSite.USER)) {
            DemoSite.populate(wb);
            // inserted out of time order and interleaved with another point, as weekly rounds are
            DemoSite.insertScan(wb, DemoSite.POINT_A, 1, T0.plusSeconds(3600));
            DemoSite.insertScan(wb, DemoSite.POINT_B, 2, T0);
            DemoSite.insertScan(wb, DemoSite.POINT_A, 3, T0);
            DemoSite.insertScan(wb, DemoSite.POINT_A, 4, T0.plusMillis(1));
            DemoSite.insertScan(wb, DemoSite.POINT_B, 5, T0.plusSeconds(60));
            expected = wb.scans().list(DemoSite.POINT_A).stream().mapToLong(ScanRecord::id).toArray();
        }
        BareScanListing.Timing floor = BareScanListing.bestOf(file, DemoSite.POINT_A, 3);
        assertArrayEquals(new long[] {3, 4, 1}, expected);
        assertArrayEquals(expected, floor.scanIds());
        assertTrue(floor.bestSeconds() > 0);
    }

    @Test
    void anUnknownPointIsRefusedByName() {
        Path file = dir.resolve("empty.sqlite");
        Workbook.create(file, DemoSite.site(), DemoSite.USER).close();
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> BareScanListing.bestOf(file, "AT-404", 1));
        assertEquals("no point tagged 'AT-404'", e.getMessage());
    }
}
