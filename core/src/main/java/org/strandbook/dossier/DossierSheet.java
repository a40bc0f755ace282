package org.strandbook.dossier;

import java.util.Arrays;
import java.util.List;

/**
 * The sheets of the commissioning dossier, in the order a reader meets them: the verdict first,
 * the evidence after it, the long tables last as appendices.
 *
 * <p>A {@link Layout#TABLE} sheet holds, in the template, a title row, a hidden row of field keys
 * (one {@link DossierColumn} key per column, its cell styled as that column's data) and a header
 * row; rows are added below. A {@link Layout#FORM} sheet is filled only through its
 * {@link Placeholder}s. A {@link Layout#CHARTS} sheet receives captions and charts.
 */
public enum DossierSheet {
    COVER("Cover", Layout.FORM, "Site, scope, status, sign-off block, software and audit-trail head."),
    CAUTIONS("Cautions and method", Layout.FORM,
            "Safety cautions, what was measured and how, the pairing and acceptance rules."),
    ACCEPTANCE("Acceptance", Layout.TABLE, "Status of every point and band of interest, with the numbers behind it."),
    FINDINGS("Findings and actions", Layout.TABLE,
            "What the deviation says is wrong, where to look first, and the fix recorded afterwards."),
    POINTS("Point register", Layout.TABLE, "Every measurement point with its analyzer channel, probe and bands."),
    CABLES("Cable schedule", Layout.TABLE,
            "Cable segments and joints of every leg in the order light meets them, with inspections."),
    BUDGET("Loss budget", Layout.TABLE,
            "Each element's predicted loss at the centre of every band, the total, allowed loss and margin."),
    UNCERTAINTY("Uncertainty", Layout.TABLE,
            "How sure each prediction is: per band, every input with its basis, standard uncertainty, sensitivity "
                    + "and contribution, and the coverage interval."),
    CHARTS("Measured vs predicted", Layout.CHARTS,
            "One chart per point: predicted with its coverage interval, measured and deviation against wavelength."),
    TREND("Trend", Layout.TABLE, "Loss trend per point and band: slope, confidence interval, forecast, chart."),
    SPECTRA("Spectra", Layout.TABLE,
            "Appendix: predicted loss with its coverage interval and measured loss at every wavelength of every point."),
    HISTORY("Trend history", Layout.TABLE, "Appendix: every loss reading behind the trends (highest in each band's driving range)."),
    AUDIT("Audit log", Layout.TABLE, "Appendix: the workbook's hash-chained audit trail, row by row.");

    /** How a sheet is filled. */
    public enum Layout {
        /** Fixed text with placeholders. */
        FORM,
        /** Title, hidden key row and header row in the template; data rows below. */
        TABLE,
        /** Captions and charts. */
        CHARTS
    }

    private final String title;
    private final Layout layout;
    private final String purpose;

    DossierSheet(String title, Layout layout, String purpose) {
        this.title = title;
        this.layout = layout;
        this.purpose = purpose;
    }

    /** The tab name (at most 31 characters, as spreadsheet programs require). */
    public String title() {
        return title;
    }

    public Layout layout() {
        return layout;
    }

    /** One sentence saying what the sheet holds, for the cover's contents list. */
    public String purpose() {
        return purpose;
    }

    /** The sheet's columns in template order (empty for forms and chart sheets). */
    public List<DossierColumn> columns() {
        return Arrays.stream(DossierColumn.values()).filter(c -> c.sheet() == this).toList();
    }
}
