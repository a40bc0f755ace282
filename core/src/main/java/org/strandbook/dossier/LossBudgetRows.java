package org.strandbook.dossier;

import java.util.HashMap;
import java.util.List;
import java.util.Map;

import org.apache.poi.ss.usermodel.Row;
import org.strandbook.evaluation.PredictedBudget;
import org.strandbook.optics.WavelengthGrid;
import org.strandbook.optics.path.Contribution;
import org.strandbook.optics.path.ElementKind;
import org.strandbook.site.PathElement;
import org.strandbook.site.PathLeg;
import org.strandbook.site.WavelengthBand;

/**
 * The predicted loss budget, one block per point: each element of the loop in the order light
 * meets it, its loss at the centre of every band of interest (linear interpolation on the
 * evaluation grid), the total, the analyzer's allowed loss and the margin between them.
 */
final class LossBudgetRows {

    static final String TOTAL = "Total predicted loop loss";
    static final String ALLOWED = "Allowed loss of analyzer ";
    static final String MARGIN = "Predicted margin (allowed − total)";

    private LossBudgetRows() {
    }

    static void fill(TableSheet t, DossierContent content) {
        int bandColumn = t.column(DossierColumn.BUDGET_BAND);
        int mostBands = content.points().stream().mapToInt(p -> p.point().bands().size()).max().orElse(1);
        for (int b = 1; bandColumn >= 0 && b < mostBands; b++) {
            // the template styles the first band column; the others take its width
            t.sheet().setColumnWidth(bandColumn + b, t.sheet().getColumnWidth(bandColumn));
        }
        for (DossierPoint p : content.points()) {
            double allowedDb = content.analyzer(p.point().analyzerTag()).map(a -> a.allowedLossDb()).orElse(Double.NaN);
            Row title = t.newRow();
            t.text(title, DossierColumn.BUDGET_TAG, p.tag(), DossierStyles.Look.EMPHASIS);
            t.text(title, DossierColumn.BUDGET_ELEMENT, p.point().service() + " · analyzer " + p.point().analyzerTag()
                    + (Double.isNaN(allowedDb) ? "" : " · allowed " + DossierText.decimal(allowedDb, 2) + " dB"),
                    DossierStyles.Look.EMPHASIS);
            if (p.evaluation().isEmpty()) {
                Row r = t.newRow();
                t.text(r, DossierColumn.BUDGET_TAG, p.tag());
                t.text(r, DossierColumn.BUDGET_ELEMENT, "no prediction: " + String.join("; ", p.allProblems()));
                t.skipRows(1);
                continue;
            }
            block(t, p, p.evaluation().get().predicted(), allowedDb);
            t.skipRows(1);
        }
    }

    private static void block(TableSheet t, DossierPoint p, PredictedBudget budget, double allowedDb) {
        List<WavelengthBand> bands = p.point().bands();
        WavelengthGrid grid = budget.grid();
        Row head = t.newRow();
        t.headerText(head, DossierColumn.BUDGET_TAG, 0, "Point tag");
        t.headerText(head, DossierColumn.BUDGET_NUMBER, 0, "Element (no.)");
        t.headerText(head, DossierColumn.BUDGET_LEG, 0, "Leg");
        t.headerText(head, DossierColumn.BUDGET_ELEMENT, 0, "Element");
        t.headerText(head, DossierColumn.BUDGET_KIND, 0, "Kind");
        for (int b = 0; b < bands.size(); b++) {
            t.headerText(head, DossierColumn.BUDGET_BAND, b, bandHeader(bands.get(b)));
        }
        Map<String, String> legs = legOfLabel(p.legs());
        List<Contribution> parts = budget.contributions();
        for (int k = 0; k < parts.size(); k++) {
            Contribution c = parts.get(k);
            Row r = t.newRow();
            t.text(r, DossierColumn.BUDGET_TAG, p.tag());
            t.number(r, DossierColumn.BUDGET_NUMBER, k + 1);
            t.text(r, DossierColumn.BUDGET_LEG, c.kind() == ElementKind.PROBE ? "PROBE" : legs.getOrDefault(c.label(), ""));
            t.text(r, DossierColumn.BUDGET_ELEMENT, c.label());
            t.text(r, DossierColumn.BUDGET_KIND, c.kind().name());
            double[] loss = c.lossDb();
            for (int b = 0; b < bands.size(); b++) {
                t.number(r, DossierColumn.BUDGET_BAND, b, grid.interpolate(loss, bands.get(b).centreNm()),
                        DossierStyles.Look.PLAIN);
            }
        }
        double[] total = budget.totalLossDb();
        Row totalRow = summary(t, p, TOTAL);
        Row allowedRow = summary(t, p, ALLOWED + p.point().analyzerTag());
        Row marginRow = summary(t, p, MARGIN);
        for (int b = 0; b < bands.size(); b++) {
            double atCentre = grid.interpolate(total, bands.get(b).centreNm());
            t.number(totalRow, DossierColumn.BUDGET_BAND, b, atCentre, DossierStyles.Look.EMPHASIS);
            t.number(allowedRow, DossierColumn.BUDGET_BAND, b, allowedDb, DossierStyles.Look.PLAIN);
            t.number(marginRow, DossierColumn.BUDGET_BAND, b, allowedDb - atCentre, DossierStyles.Look.EMPHASIS);
        }
    }

    private static Row summary(TableSheet t, DossierPoint p, String what) {
        Row r = t.newRow();
        t.text(r, DossierColumn.BUDGET_TAG, p.tag());
        t.text(r, DossierColumn.BUDGET_ELEMENT, what, DossierStyles.Look.EMPHASIS);
        return r;
    }

    /** The band's name and centre, e.g. "C-H 1st overtone, 1715 nm (dB)". */
    static String bandHeader(WavelengthBand band) {
        return band.name() + ", " + DossierText.decimal(band.centreNm(), 0) + " nm (dB)";
    }

    private static Map<String, String> legOfLabel(List<PathLeg> legs) {
        Map<String, String> out = new HashMap<>();
        for (PathLeg leg : legs) {
            for (PathElement e : leg.elements()) {
                out.put(e.label(), leg.direction().name());
            }
        }
        return out;
    }
}
