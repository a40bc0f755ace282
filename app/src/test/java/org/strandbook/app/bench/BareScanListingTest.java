package org.strandbook.app.bench;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.time.Instant;
import java.util.List;
import java.util.OptionalDouble;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.strandbook.site.Analyzer;
import org.strandbook.site.DetectorType;
import org.strandbook.site.MeasurementPoint;
import org.strandbook.site.ProbeKind;
import org.strandbook.site.ProbeType;
import org.strandbook.site.ScanConditions;
import org.strandbook.site.ScanKind;
import org.strandbook.site.ScanRecord;
import org.strandbook.site.Site;
import org.strandbook.site.Spectrum;
import org.strandbook.site.WavelengthBand;
import org.strandbook.store.Workbook;

/** The listing benchmark's floor must hand over exactly the rows the workbook lists, or its ratio means nothing. */
class BareScanListingTest {

    private static final Instant T0 = Instant.parse("2024-03-05T14:07:00Z");
    private static final String POINT_A = "AT-101";
    private static final String POINT_B = "AT-102";

    @TempDir
    Path dir;

    @Test
    void theFloorListsThePointsScansInTheWorkbooksOrder() {
        Path file = dir.resolve("listing.strandbook");
        long[] expected;
        try (Workbook wb = twoPoints(file)) {
            // inserted out of time order and interleaved with another point, as weekly rounds are
            insert(wb, POINT_A, 1, T0.plusSeconds(3600));
            insert(wb, POINT_B, 2, T0);
            insert(wb, POINT_A, 3, T0);
            insert(wb, POINT_A, 4, T0.plusMillis(1));
            insert(wb, POINT_B, 5, T0.plusSeconds(60));
            expected = wb.scans().list(POINT_A).stream().mapToLong(ScanRecord::id).toArray();
        }
        BareScanListing.Timing floor = BareScanListing.bestOf(file, POINT_A, 3);
        assertArrayEquals(new long[] {3, 4, 1}, expected);
        assertArrayEquals(expected, floor.scanIds());
        assertTrue(floor.bestSeconds() > 0);
    }

    @Test
    void anUnknownPointIsRefusedByName() {
        Path file = dir.resolve("empty.strandbook");
        twoPoints(file).close();
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> BareScanListing.bestOf(file, "AT-404", 1));
        assertEquals("no point tagged 'AT-404'", e.getMessage());
    }

    private static Workbook twoPoints(Path file) {
        Workbook wb = Workbook.create(file, new Site("Bench Works"), "bench");
        wb.inTransaction(() -> {
            wb.site().addAnalyzer(new Analyzer("LZ-01", "", 1000, 2500, 8, 20, DetectorType.EXTENDED_INGAAS));
            wb.catalog().addProbeType(new ProbeType("PT-L", "", ProbeKind.TRANSMISSION, "SAPPHIRE", 2, 1, 1));
            for (String tag : List.of(POINT_A, POINT_B)) {
                wb.points().add(new MeasurementPoint(tag, "", "", "LZ-01", tag.equals(POINT_A) ? 1 : 2, "PT-L",
                        List.of(new WavelengthBand("b", 1500, 1600)), OptionalDouble.empty(), false, false,
                        OptionalDouble.empty()));
            }
        });
        return wb;
    }

    private static void insert(Workbook wb, String tag, int seq, Instant takenAt) {
        Spectrum s = new Spectrum(new double[] {1000, 1500, 2000}, new double[] {100 + seq, 200, 300});
        wb.scans().insert(tag, ScanKind.LOOP, takenAt, ScanConditions.unknown("k.ashdown"), s, "loop-" + seq + ".csv",
                String.format("%064x", seq));
    }
}
