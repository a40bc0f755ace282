package org.strandbook.samplesite;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.OptionalDouble;

import org.strandbook.evaluation.PointInputs;
import org.strandbook.evaluation.SpectrumSource;
import org.strandbook.site.Analyzer;
import org.strandbook.site.Catalog;
import org.strandbook.site.ScanConditions;
import org.strandbook.site.ScanRecord;
import org.strandbook.site.Spectrum;

/**
 * Generated scans held in memory as if stored, for evaluating the demo plant without a workbook
 * file (tests of fault recovery over many seeds, the evaluation benchmark).
 */
public final class InMemoryScans implements SpectrumSource {

    private final Map<Long, Spectrum> spectra = new HashMap<>();
    private final Map<String, List<ScanRecord>> byPoint = new HashMap<>();

    public InMemoryScans(List<GeneratedScan> scans) {
        long id = 1;
        for (GeneratedScan g : scans) {
            Spectrum s = new Spectrum(g.wavelengthsNm(), g.counts());
            ScanConditions c = new ScanConditions(g.operator(), g.integrationMs(), 1, OptionalDouble.empty(),
                    OptionalDouble.empty());
            ScanRecord r = new ScanRecord(id, g.pointTag(), g.kind(), g.takenAt(), c, s.size(), s.minNm(), s.maxNm(),
                    "generated-" + id, "");
            spectra.put(id, s);
            byPoint.computeIfAbsent(g.pointTag(), k -> new ArrayList<>()).add(r);
            id++;
        }
    }

    @Override
    public Spectrum spectrum(long scanId) {
        Spectrum s = spectra.get(scanId);
        if (s == null) {
            throw new IllegalArgumentException("no scan with id " + scanId);
        }
        return s;
    }

    public List<ScanRecord> scansOf(String pointTag) {
        return List.copyOf(byPoint.getOrDefault(pointTag, List.of()));
    }

    /** The evaluation inputs of every demo point, in the plant's order. */
    public List<PointInputs> inputs(DemoPlant plant) {
        Catalog catalog = Catalog.of(plant.fiberTypes(), plant.connectorTypes(), plant.probeTypes());
        List<PointInputs> out = new ArrayList<>();
        for (DemoPlant.DemoPoint dp : plant.points()) {
            Analyzer analyzer = plant.analyzers().stream()
                    .filter(a -> a.tag().equals(dp.point().analyzerTag())).findFirst().orElseThrow();
            out.add(new PointInputs(plant.site(), dp.point(), analyzer, dp.send(), dp.ret(), catalog,
                    scansOf(dp.point().tag()), this));
        }
        return out;
    }
}
