package org.strandbook.dossier;

import java.util.Locale;
import java.util.Map;

import org.apache.poi.ss.usermodel.Row;
import org.strandbook.evaluation.BandUncertainty;
import org.strandbook.uncertainty.BudgetRow;
import org.strandbook.uncertainty.CoverageInterval;
import org.strandbook.uncertainty.LossUncertainty;

/**
 * The Uncertainty sheet: per point and band, the prediction's uncertainty budget in the form of
 * JCGM 100:2008 (input, basis, distribution, standard uncertainty, sensitivity coefficient,
 * contribution, share of the combined variance), largest contribution first, then the combined
 * standard uncertainty and the Monte Carlo coverage interval (JCGM 101:2008). Relative inputs are
 * shown in per cent, their sensitivity in dB per per cent.
 */
final class UncertaintyRows {

    static final String COMBINED = "Combined standard uncertainty of the prediction";
    static final String INTERVAL = "Predicted loss and its coverage interval";

    private UncertaintyRows() {
    }

    static void fill(TableSheet t, DossierContent content, Map<String, PointUncertainty> uncertainties) {
        for (DossierPoint p : content.points()) {
            PointUncertainty u = uncertainties.get(p.tag());
            if (u == null || u.bands().isEmpty()) {
                Row r = t.newRow();
                t.text(r, DossierColumn.UNCERTAINTY_TAG, p.tag());
                t.text(r, DossierColumn.UNCERTAINTY_INPUT, "no uncertainty budget: " + (u == null
                        ? String.join("; ", p.allProblems()) : u.problem().isEmpty()
                        ? "no band centre inside the analyzer's range" : u.problem()));
                continue;
            }
            for (BandUncertainty b : u.bands()) {
                band(t, p.tag(), b);
            }
        }
    }

    private static void band(TableSheet t, String tag, BandUncertainty b) {
        LossUncertainty at = b.atCentre();
        for (BudgetRow in : at.budget().rowsByContribution()) {
            boolean relative = "relative".equals(in.unit());
            Row r = start(t, tag, b);
            t.text(r, DossierColumn.UNCERTAINTY_INPUT, in.input());
            t.text(r, DossierColumn.UNCERTAINTY_BASIS, in.basisText() + " (" + in.basis().name()
                    .toLowerCase(Locale.ROOT).replace('_', ' ') + ")");
            t.text(r, DossierColumn.UNCERTAINTY_DISTRIBUTION, in.distribution());
            t.number(r, DossierColumn.UNCERTAINTY_U, relative ? 100 * in.standardUncertainty()
                    : in.standardUncertainty());
            t.text(r, DossierColumn.UNCERTAINTY_UNIT, relative ? "%" : in.unit());
            t.number(r, DossierColumn.UNCERTAINTY_SENSITIVITY, relative ? in.sensitivity() / 100 : in.sensitivity());
            t.number(r, DossierColumn.UNCERTAINTY_CONTRIBUTION_DB, in.contribution());
            t.number(r, DossierColumn.UNCERTAINTY_SHARE, 100 * in.share());
        }
        Row combined = start(t, tag, b);
        t.text(combined, DossierColumn.UNCERTAINTY_INPUT, COMBINED, DossierStyles.Look.EMPHASIS);
        t.text(combined, DossierColumn.UNCERTAINTY_BASIS, "law of propagation, inputs independent (JCGM 100:2008, 5.1.2)");
        t.number(combined, DossierColumn.UNCERTAINTY_CONTRIBUTION_DB, at.budget().combinedStandardUncertainty());
        t.number(combined, DossierColumn.UNCERTAINTY_SHARE, 100);
        CoverageInterval ci = at.budget().interval();
        Row interval = start(t, tag, b);
        t.text(interval, DossierColumn.UNCERTAINTY_INPUT, INTERVAL, DossierStyles.Look.EMPHASIS);
        t.text(interval, DossierColumn.UNCERTAINTY_BASIS, String.format(Locale.ROOT,
                "predicted %.2f dB; %.0f %% coverage interval %.2f to %.2f dB, by Monte Carlo (JCGM 101:2008, 7.7)",
                at.predictedLossDb(), 100 * ci.probability(), ci.low(), ci.high()), DossierStyles.Look.EMPHASIS);
        t.text(interval, DossierColumn.UNCERTAINTY_UNIT, "dB");
        t.skipRows(1);
    }

    private static Row start(TableSheet t, String tag, BandUncertainty b) {
        Row r = t.newRow();
        t.text(r, DossierColumn.UNCERTAINTY_TAG, tag);
        t.text(r, DossierColumn.UNCERTAINTY_BAND, b.band().name());
        t.number(r, DossierColumn.UNCERTAINTY_AT_NM, b.atCentre().wavelengthNm());
        return r;
    }
}
