package org.strandbook.dossier;

import java.time.Instant;
import java.util.Optional;

import org.apache.poi.ss.usermodel.Row;
import org.strandbook.evaluation.BandVerdict;
import org.strandbook.evaluation.PointEvaluation;
import org.strandbook.evaluation.Status;
import org.strandbook.site.WavelengthBand;

/**
 * The acceptance summary: one row per point and band of interest, status as symbol and word (the
 * template colours it by the symbol), with the numbers the verdict rests on. A point that could
 * not be judged shows every band as REVIEW with the reason.
 */
final class AcceptanceRows {

    private AcceptanceRows() {
    }

    static void fill(TableSheet t, DossierContent content) {
        for (DossierPoint p : content.points()) {
            double allowedDb = content.analyzer(p.point().analyzerTag()).map(a -> a.allowedLossDb()).orElse(Double.NaN);
            double toleranceDb = p.point().effectiveToleranceDb(content.site());
            Optional<PointEvaluation> e = p.evaluation();
            Optional<Instant> loopTaken = e.flatMap(PointEvaluation::latest).map(pair -> pair.loop().takenAt());
            if (e.isPresent() && !e.get().verdicts().isEmpty()) {
                for (BandVerdict v : e.get().verdicts()) {
                    Row r = start(t, p, v.band(), allowedDb, toleranceDb, loopTaken);
                    t.text(r, DossierColumn.ACCEPTANCE_BAND_STATUS, v.status().label());
                    t.number(r, DossierColumn.ACCEPTANCE_MEAN_DEVIATION_DB, v.meanDeviationDb());
                    t.number(r, DossierColumn.ACCEPTANCE_WORST_DEVIATION_DB, v.worstDeviationDb());
                    if (!Double.isNaN(v.worstDeviationDb())) {
                        t.number(r, DossierColumn.ACCEPTANCE_WORST_AT_NM, v.worstAtNm());
                    }
                    t.number(r, DossierColumn.ACCEPTANCE_PREDICTED_DB, v.predictedLossDb());
                    t.number(r, DossierColumn.ACCEPTANCE_WORST_MEASURED_DB, v.worstMeasuredLossDb());
                    t.number(r, DossierColumn.ACCEPTANCE_MARGIN_DB, v.marginDb());
                    t.number(r, DossierColumn.ACCEPTANCE_MEASURED_PERCENT, 100 * v.measuredFraction());
                    t.text(r, DossierColumn.ACCEPTANCE_REASON, v.reason());
                }
            } else {
                String reason = p.allProblems().isEmpty() ? "not measured yet" : String.join("; ", p.allProblems());
                for (WavelengthBand band : p.point().bands()) {
                    Row r = start(t, p, band, allowedDb, toleranceDb, loopTaken);
                    t.text(r, DossierColumn.ACCEPTANCE_BAND_STATUS, Status.REVIEW.label());
                    t.text(r, DossierColumn.ACCEPTANCE_REASON, reason);
                }
            }
        }
    }

    private static Row start(TableSheet t, DossierPoint p, WavelengthBand band, double allowedDb, double toleranceDb,
                             Optional<Instant> loopTaken) {
        Row r = t.newRowStyled();
        t.text(r, DossierColumn.ACCEPTANCE_TAG, p.tag());
        t.text(r, DossierColumn.ACCEPTANCE_SERVICE, p.point().service());
        t.text(r, DossierColumn.ACCEPTANCE_ANALYZER, p.point().analyzerTag());
        t.text(r, DossierColumn.ACCEPTANCE_POINT_STATUS, p.status().label());
        t.text(r, DossierColumn.ACCEPTANCE_BAND, band.name());
        t.number(r, DossierColumn.ACCEPTANCE_FROM_NM, band.fromNm());
        t.number(r, DossierColumn.ACCEPTANCE_TO_NM, band.toNm());
        t.number(r, DossierColumn.ACCEPTANCE_ALLOWED_DB, allowedDb);
        t.number(r, DossierColumn.ACCEPTANCE_TOLERANCE_DB, toleranceDb);
        loopTaken.ifPresent(time -> t.time(r, DossierColumn.ACCEPTANCE_LOOP_TAKEN, time));
        return r;
    }
}
