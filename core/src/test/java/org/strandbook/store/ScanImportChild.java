package org.strandbook.store;

import java.nio.file.Path;
import java.time.Duration;
import java.time.Instant;
import java.util.List;
import java.util.Random;

import org.strandbook.site.CableSegment;
import org.strandbook.site.PathDirection;
import org.strandbook.site.PathLeg;
import org.strandbook.site.ScanConditions;
import org.strandbook.site.ScanKind;

/**
 * The other process of the reliability tests: imports scans into a workbook, one transaction per
 * scan, and every tenth step replaces point AT-102's legs as a whole (a multi-row transaction).
 * In mode {@code import} the scans go through a {@link ScanImport} committing every few scans instead.
 * Prints {@code ready} once the workbook is open and {@code done <inserted> <busy>} at the end.
 * Arguments: workbook, a label unique to this run, number of steps (0 = until killed), seed, mode
 * ({@code single} or {@code import}).
 */
final class ScanImportChild {

    /** Cable IDs of a leg generation: {@code G<generation>-<n>}. */
    static final String GENERATION_PREFIX = "G";

    private ScanImportChild() {
    }

    public static void main(String[] args) {
        Path file = Path.of(args[0]);
        String label = args[1];
        int steps = Integer.parseInt(args[2]);
        Random random = new Random(Long.parseLong(args[3]));
        boolean batched = args.length > 4 && args[4].equals("import");
        int inserted = 0;
        int busy = 0;
        try (Workbook wb = Workbook.open(file, "child-" + label);
             ScanImport batch = wb.scans().startImport(7, Duration.ofSeconds(1))) {
            // the check before the first write belongs to opening, not to the writes the kills interrupt
            wb.checkIntegrity();
            System.out.println("ready");
            System.out.flush();
            for (int i = 0; steps == 0 || i < steps; i++) {
                try {
                    if (i % 10 == 9) {
                        wb.paths().replaceLegs(DemoSite.POINT_B, legs(label + "x" + i));
                    } else {
                        int points = 64 + random.nextInt(960);
                        NewScan scan = new NewScan(i % 2 == 0 ? DemoSite.POINT_A : DemoSite.POINT_B, ScanKind.LOOP,
                                Instant.EPOCH.plusSeconds(i), ScanConditions.unknown(label),
                                DemoSite.spectrum(points, random.nextLong()), label + "-" + i + ".csv",
                                DemoSite.sha256Of(label + "/" + i));
                        if (batched) {
                            batch.add(scan);
                        } else {
                            wb.scans().insert(scan);
                        }
                        inserted++;
                    }
                } catch (WorkbookBusyException e) {
                    busy++;
                    System.out.println("busy: " + e.getMessage());
                }
            }
        }
        System.out.println("done " + inserted + " " + busy);
    }

    static List<PathLeg> legs(String generation) {
        return List.of(new PathLeg(DemoSite.POINT_B, PathDirection.SEND, List.of(
                        new CableSegment(GENERATION_PREFIX + generation + "-1", DemoSite.FIBER, 40, List.of()),
                        new CableSegment(GENERATION_PREFIX + generation + "-2", DemoSite.FIBER, 45, List.of()))),
                new PathLeg(DemoSite.POINT_B, PathDirection.RETURN, List.of(
                        new CableSegment(GENERATION_PREFIX + generation + "-3", DemoSite.FIBER, 85, List.of()))));
    }
}
