package org.strandbook.evaluation;

import java.time.Duration;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.function.Function;

import org.strandbook.optics.WavelengthGrid;
import org.strandbook.site.ScanKind;
import org.strandbook.site.ScanRecord;
import org.strandbook.site.WavelengthBand;
import org.strandbook.throughput.ThroughputResult;
import org.strandbook.uncertainty.PooledRepeatability;

/**
 * The repeatability of a point's reference, from references of the same cord taken more than once
 * in one visit: each later reference of a visit is measured against the visit's first by the same
 * one-cord method as a loop (so with its own dark and integration time), and the band's mean loss
 * between them is the change re-taking the reference made. A visit's readings are its first (0 dB)
 * and those changes; {@link PooledRepeatability} pools them over visits, so lamp ageing between
 * visits is no part of it.
 */
final class ReferenceRepeats {

    private ReferenceRepeats() {
    }

    /**
     * @param scans every scan of the point
     * @param window how far apart two references of one visit may be (the pairing window)
     * @param measure the throughput of a pair, as the evaluation measures a loop
     * @param pairing the evaluation's pairing, to find each repeat its dark
     * @return one entry per band, null where no visit holds two comparable references
     */
    static List<PooledRepeatability> of(List<ScanRecord> scans, ScanPairing pairing,
            Function<ScanPair, ThroughputResult> measure, WavelengthGrid grid, List<WavelengthBand> bands) {
        List<ScanRecord> refs = scans.stream().filter(s -> s.kind() == ScanKind.REFERENCE)
                .sorted(Comparator.comparing(ScanRecord::takenAt)).toList();
        List<ScanRecord> darks = scans.stream().filter(s -> s.kind() == ScanKind.DARK).toList();
        List<List<double[]>> perBand = new ArrayList<>();
        bands.forEach(b -> perBand.add(new ArrayList<>()));
        int i = 0;
        while (i < refs.size()) {
            ScanRecord first = refs.get(i);
            List<ScanRecord> group = new ArrayList<>();
            int j = i + 1;
            while (j < refs.size() && Duration.between(first.takenAt(), refs.get(j).takenAt())
                    .compareTo(pairing.window()) <= 0) {
                if (ScanExposure.match(first.conditions(), refs.get(j).conditions()) == ScanExposure.Match.SAME) {
                    group.add(refs.get(j));
                }
                j++;
            }
            i = j;
            if (group.isEmpty()) {
                continue;
            }
            List<double[]> levels = new ArrayList<>();
            bands.forEach(b -> {
                double[] l = new double[group.size() + 1];
                levels.add(l);
            });
            for (int g = 0; g < group.size(); g++) {
                ScanRecord repeat = group.get(g);
                ScanRecord asLoop = new ScanRecord(repeat.id(), repeat.pointTag(), ScanKind.LOOP, repeat.takenAt(),
                        repeat.conditions(), repeat.nPoints(), repeat.minNm(), repeat.maxNm(), repeat.sourceFile(),
                        repeat.sha256(), repeat.yUnit());
                List<ScanRecord> two = new ArrayList<>(darks);
                two.add(first);
                two.add(asLoop);
                ScanPairing.Pairings paired = pairing.pair(two);
                double[] loss = paired.latest().filter(p -> p.exposure().judgeable())
                        .map(p -> measure.apply(p).lossDb()).orElse(null);
                for (int b = 0; b < bands.size(); b++) {
                    levels.get(b)[g + 1] = loss == null ? Double.NaN : -BandHistory.bandMean(bands.get(b), grid, loss);
                }
            }
            for (int b = 0; b < bands.size(); b++) {
                perBand.get(b).add(levels.get(b));
            }
        }
        List<PooledRepeatability> out = new ArrayList<>();
        for (List<double[]> groups : perBand) {
            out.add(PooledRepeatability.of(groups));
        }
        return out;
    }
}
