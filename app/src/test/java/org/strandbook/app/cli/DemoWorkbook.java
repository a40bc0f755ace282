package org.strandbook.app.cli;

import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.HexFormat;
import java.util.List;
import java.util.OptionalDouble;

import org.strandbook.samplesite.DemoPlant;
import org.strandbook.samplesite.GeneratedScan;
import org.strandbook.samplesite.ScanGenerator;
import org.strandbook.site.ScanConditions;
import org.strandbook.site.Spectrum;
import org.strandbook.store.NewScan;
import org.strandbook.store.Workbook;

/**
 * A small workbook of the invented demo plant for command tests: a few of its points with their
 * legs and the generator's scans of a few visits, stored through the workbook's own API.
 */
final class DemoWorkbook {

    static final String USER = "i.marsh";
    static final long SEED = ScanGenerator.DEMO_SEED + 7;

    private DemoWorkbook() {
    }

    static Path create(Path file, List<String> tags, int visits) {
        DemoPlant plant = new DemoPlant();
        try (Workbook wb = Workbook.create(file, plant.site(), USER)) {
            wb.inTransaction(() -> {
                plant.analyzers().forEach(wb.site()::addAnalyzer);
                plant.fiberTypes().forEach(wb.catalog()::addFiberType);
                plant.connectorTypes().forEach(wb.catalog()::addConnectorType);
                plant.probeTypes().forEach(wb.catalog()::addProbeType);
                for (DemoPlant.DemoPoint p : plant.points()) {
                    if (tags.contains(p.point().tag())) {
                        wb.points().add(p.point());
                        wb.paths().replaceLegs(p.point().tag(), List.of(p.send(), p.ret()));
                    }
                }
            });
            List<NewScan> scans = new ScanGenerator(plant, SEED, visits).generate().stream()
                    .filter(g -> tags.contains(g.pointTag())).map(DemoWorkbook::scan).toList();
            wb.scans().insertAll(scans);
        }
        return file;
    }

    private static NewScan scan(GeneratedScan g) {
        String name = g.pointTag() + "-" + g.kind().word() + "-" + g.takenAt().toEpochMilli() + ".csv";
        return new NewScan(g.pointTag(), g.kind(), g.takenAt(), new ScanConditions(g.operator(), g.integrationMs(), 1,
                OptionalDouble.empty(), OptionalDouble.empty()), new Spectrum(g.wavelengthsNm(), g.counts()), name,
                sha256(name));
    }

    private static String sha256(String text) {
        try {
            return HexFormat.of().formatHex(MessageDigest.getInstance("SHA-256")
                    .digest(text.getBytes(StandardCharsets.UTF_8)));
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException(e);
        }
    }
}
