package org.strandbook.dossier;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Optional;

import org.apache.poi.ss.usermodel.Row;
import org.strandbook.evaluation.PointEvaluation;
import org.strandbook.site.WavelengthBand;
import org.strandbook.throughput.MaskedRange;
import org.strandbook.throughput.ThroughputResult;

/**
 * The Spectra appendix: for every evaluated point, one row per wavelength of the evaluation grid
 * with predicted loss and its coverage interval, measured and deviation loss, the band of interest it lies in and, where nothing
 * could be measured, why. Streams row by row; a point's rows stay on one sheet (a long site
 * continues on "Spectra (2)" and so on); tells where each point's rows went, for its chart.
 */
final class SpectraRows {

    static final String NOT_MEASURED = "no paired loop scan";

    /** Where a point's table went: the cell ranges of its columns. */
    record Block(DossierPoint point, PointEvaluation evaluation, SpectrumColumns columns, String wavelengthRange,
                 String predictedRange, String lowRange, String highRange, String measuredRange, String deviationRange) {
    }

    private SpectraRows() {
    }

    static List<Block> fill(TableSheet t, DossierContent content, Map<String, PointUncertainty> uncertainties,
                            Runnable afterPoint) {
        List<Block> blocks = new ArrayList<>();
        for (DossierPoint p : content.points()) {
            if (p.evaluation().isEmpty()) {
                afterPoint.run();
                continue;
            }
            PointEvaluation e = p.evaluation().get();
            PointUncertainty u = uncertainties.get(p.tag());
            SpectrumColumns s = SpectrumColumns.of(e, u == null ? Optional.empty() : u.spread());
            List<WavelengthBand> bands = p.point().bands();
            List<MaskedRange> masked = s.measured().map(ThroughputResult::maskedRanges).orElse(List.of());
            t.ensureRoom(s.size());
            int first = t.nextRowIndex();
            int m = 0;
            for (int i = 0; i < s.size(); i++) {
                double w = s.wavelengthNm()[i];
                Row r = t.newRow();
                t.text(r, DossierColumn.SPECTRA_TAG, p.tag());
                t.number(r, DossierColumn.SPECTRA_WAVELENGTH_NM, w);
                t.number(r, DossierColumn.SPECTRA_PREDICTED_DB, s.predictedDb()[i]);
                t.number(r, DossierColumn.SPECTRA_LOW_DB, s.lowDb()[i]);
                t.number(r, DossierColumn.SPECTRA_HIGH_DB, s.highDb()[i]);
                t.number(r, DossierColumn.SPECTRA_MEASURED_DB, s.measuredDb()[i]);
                t.number(r, DossierColumn.SPECTRA_DEVIATION_DB, s.deviationDb()[i]);
                for (WavelengthBand b : bands) {
                    if (b.contains(w)) {
                        t.text(r, DossierColumn.SPECTRA_BAND, b.name());
                        break;
                    }
                }
                if (Double.isNaN(s.measuredDb()[i])) {
                    while (m < masked.size() && masked.get(m).toNm() < w) {
                        m++;
                    }
                    boolean inRange = m < masked.size() && masked.get(m).fromNm() <= w;
                    t.text(r, DossierColumn.SPECTRA_MASKED, s.measured().isEmpty() ? NOT_MEASURED
                            : inRange ? masked.get(m).description() : "not measured");
                }
            }
            int last = t.nextRowIndex() - 1;
            blocks.add(new Block(p, e, s, t.range(DossierColumn.SPECTRA_WAVELENGTH_NM, first, last),
                    t.range(DossierColumn.SPECTRA_PREDICTED_DB, first, last),
                    t.range(DossierColumn.SPECTRA_LOW_DB, first, last),
                    t.range(DossierColumn.SPECTRA_HIGH_DB, first, last),
                    t.range(DossierColumn.SPECTRA_MEASURED_DB, first, last),
                    t.range(DossierColumn.SPECTRA_DEVIATION_DB, first, last)));
            afterPoint.run();
        }
        return blocks;
    }
}
