package org.strandbook.dossier;

import java.util.Arrays;
import java.util.Optional;

/**
 * Every column of every table sheet: the field key the template's hidden key row carries (which
 * is how the writer finds the column, wherever a plant moves it), the header with its unit, the
 * width the template starts with and the kind of value. Constants of one sheet appear in the
 * template's column order.
 */
public enum DossierColumn {
    ACCEPTANCE_TAG(DossierSheet.ACCEPTANCE, "tag", "Point tag", 12, Format.TEXT),
    ACCEPTANCE_SERVICE(DossierSheet.ACCEPTANCE, "service", "Service", 16, Format.WRAP),
    ACCEPTANCE_ANALYZER(DossierSheet.ACCEPTANCE, "analyzer", "Analyzer", 10, Format.TEXT),
    ACCEPTANCE_POINT_STATUS(DossierSheet.ACCEPTANCE, "point_status", "Point status", 10, Format.STATUS),
    ACCEPTANCE_BAND(DossierSheet.ACCEPTANCE, "band", "Band of interest", 16, Format.WRAP),
    ACCEPTANCE_FROM_NM(DossierSheet.ACCEPTANCE, "from_nm", "From (nm)", 7, Format.WHOLE),
    ACCEPTANCE_TO_NM(DossierSheet.ACCEPTANCE, "to_nm", "To (nm)", 7, Format.WHOLE),
    ACCEPTANCE_BAND_STATUS(DossierSheet.ACCEPTANCE, "band_status", "Band status", 10, Format.STATUS),
    ACCEPTANCE_MEAN_DEVIATION_DB(DossierSheet.ACCEPTANCE, "mean_deviation_db", "Mean deviation (dB)", 11,
            Format.DECIMAL_2),
    ACCEPTANCE_WORST_DEVIATION_DB(DossierSheet.ACCEPTANCE, "worst_deviation_db", "Worst deviation (dB)", 11,
            Format.DECIMAL_2),
    ACCEPTANCE_WORST_AT_NM(DossierSheet.ACCEPTANCE, "worst_at_nm", "Worst at (nm)", 7, Format.WHOLE),
    ACCEPTANCE_PREDICTED_DB(DossierSheet.ACCEPTANCE, "predicted_db", "Predicted band loss (dB)", 11,
            Format.DECIMAL_2),
    ACCEPTANCE_WORST_MEASURED_DB(DossierSheet.ACCEPTANCE, "worst_measured_db", "Worst measured loss (dB)", 10,
            Format.DECIMAL_2),
    ACCEPTANCE_ALLOWED_DB(DossierSheet.ACCEPTANCE, "allowed_db", "Allowed loss (dB)", 9, Format.DECIMAL_2),
    ACCEPTANCE_MARGIN_DB(DossierSheet.ACCEPTANCE, "margin_db", "Margin (dB)", 8, Format.DECIMAL_2),
    ACCEPTANCE_MEASURED_PERCENT(DossierSheet.ACCEPTANCE, "measured_percent", "Band measured (%)", 10, Format.WHOLE),
    ACCEPTANCE_TOLERANCE_DB(DossierSheet.ACCEPTANCE, "tolerance_db", "Tolerance (dB)", 11, Format.DECIMAL_2),
    ACCEPTANCE_LOOP_TAKEN(DossierSheet.ACCEPTANCE, "loop_taken", "Loop scan taken (UTC)", 16, Format.TIME),
    ACCEPTANCE_REASON(DossierSheet.ACCEPTANCE, "reason", "Reason", 34, Format.WRAP),

    FINDING_TAG(DossierSheet.FINDINGS, "tag", "Point tag", 12, Format.TEXT),
    FINDING_STATUS(DossierSheet.FINDINGS, "status", "Point status", 11, Format.STATUS),
    FINDING_SOURCE(DossierSheet.FINDINGS, "source", "Source", 11, Format.TEXT),
    FINDING_NUMBER(DossierSheet.FINDINGS, "number", "Line (no.)", 7, Format.WHOLE),
    FINDING_TEXT(DossierSheet.FINDINGS, "finding", "Finding", 40, Format.WRAP),
    FINDING_CAUSE(DossierSheet.FINDINGS, "cause", "Most likely cause", 16, Format.WRAP),
    FINDING_OTHER_CAUSES(DossierSheet.FINDINGS, "other_causes", "Other possible causes", 18, Format.WRAP),
    FINDING_AMOUNT_DB(DossierSheet.FINDINGS, "amount_db", "Size (dB)", 8, Format.DECIMAL_2),
    FINDING_AT_NM(DossierSheet.FINDINGS, "at_nm", "At (nm)", 8, Format.WHOLE),
    FINDING_SHARE_PERCENT(DossierSheet.FINDINGS, "share_percent", "Share of deviation (%)", 11, Format.WHOLE),
    FINDING_CHECK_FIRST(DossierSheet.FINDINGS, "check_first", "Check first", 12, Format.TEXT),
    FINDING_FIX_RECORDED(DossierSheet.FINDINGS, "fix_recorded", "Fix recorded (what was done)", 30, Format.WRAP),
    FINDING_FIX_WHEN(DossierSheet.FINDINGS, "fix_when", "Fix recorded on (UTC)", 16, Format.TIME),
    FINDING_FIX_BY(DossierSheet.FINDINGS, "fix_by", "Recorded by", 14, Format.TEXT),

    POINT_TAG(DossierSheet.POINTS, "tag", "Point tag", 12, Format.TEXT),
    POINT_SERVICE(DossierSheet.POINTS, "service", "Service", 22, Format.WRAP),
    POINT_LOCATION(DossierSheet.POINTS, "location", "Location", 22, Format.WRAP),
    POINT_ANALYZER(DossierSheet.POINTS, "analyzer", "Analyzer", 10, Format.TEXT),
    POINT_CHANNEL(DossierSheet.POINTS, "channel", "Channel (no.)", 9, Format.WHOLE),
    POINT_PROBE_TYPE(DossierSheet.POINTS, "probe_type", "Probe type", 10, Format.TEXT),
    POINT_PROBE_KIND(DossierSheet.POINTS, "probe_kind", "Probe kind", 14, Format.WRAP),
    POINT_BANDS(DossierSheet.POINTS, "bands", "Bands of interest (nm)", 30, Format.WRAP),
    POINT_TOLERANCE_DB(DossierSheet.POINTS, "tolerance_db", "Tolerance (dB)", 11, Format.DECIMAL_2),
    POINT_HAZARDOUS(DossierSheet.POINTS, "hazardous_area", "Hazardous area (YES/NO)", 11, Format.TEXT),
    POINT_HYDROGEN(DossierSheet.POINTS, "hydrogen_service", "Hydrogen service (YES/NO)", 10, Format.TEXT),
    POINT_PROCESS_C(DossierSheet.POINTS, "process_c", "Process temperature (°C)", 13, Format.DECIMAL_1),
    POINT_SEND_M(DossierSheet.POINTS, "send_m", "Send leg fiber (m)", 9, Format.DECIMAL_1),
    POINT_RETURN_M(DossierSheet.POINTS, "return_m", "Return leg fiber (m)", 9, Format.DECIMAL_1),
    POINT_STATUS(DossierSheet.POINTS, "status", "Status", 11, Format.STATUS),
    POINT_SIGN_OFFS(DossierSheet.POINTS, "sign_offs", "Point sign-offs (role, name, date UTC)", 30, Format.WRAP),

    CABLE_TAG(DossierSheet.CABLES, "tag", "Point tag", 12, Format.TEXT),
    CABLE_LEG(DossierSheet.CABLES, "leg", "Leg (SEND/RETURN)", 9, Format.TEXT),
    CABLE_POSITION(DossierSheet.CABLES, "position", "Position (no.)", 10, Format.WHOLE),
    CABLE_ELEMENT(DossierSheet.CABLES, "element", "Element (CABLE/JOINT)", 9, Format.TEXT),
    CABLE_LABEL(DossierSheet.CABLES, "label", "Cable ID / joint", 14, Format.TEXT),
    CABLE_TYPE(DossierSheet.CABLES, "type", "Fiber type / connectors", 16, Format.WRAP),
    CABLE_LENGTH_M(DossierSheet.CABLES, "length_m", "Length (m)", 9, Format.DECIMAL_1),
    CABLE_BENDS(DossierSheet.CABLES, "bends", "Bends (radius mm × count)", 16, Format.WRAP),
    CABLE_TIGHTEST_MM(DossierSheet.CABLES, "tightest_mm", "Tightest bend radius (mm)", 10, Format.WHOLE),
    CABLE_MIN_RADIUS_MM(DossierSheet.CABLES, "min_radius_mm", "Long-term minimum radius (mm)", 10, Format.WHOLE),
    CABLE_BEND_CHECK(DossierSheet.CABLES, "bend_check", "Bend check", 14, Format.WRAP),
    CABLE_GRADE(DossierSheet.CABLES, "grade", "End-face grade (recorded)", 12, Format.TEXT),
    CABLE_INSPECTED(DossierSheet.CABLES, "inspected", "Last inspection (UTC)", 16, Format.TIME),
    CABLE_INSPECTOR(DossierSheet.CABLES, "inspector", "Inspector", 14, Format.TEXT),
    CABLE_INSPECTED_GRADE(DossierSheet.CABLES, "inspected_grade", "Grade at last inspection", 12, Format.TEXT),
    CABLE_LOSS_DB(DossierSheet.CABLES, "loss_db", "Joint loss entered (dB)", 9, Format.DECIMAL_2),
    CABLE_LOSS_BASIS(DossierSheet.CABLES, "loss_basis", "Loss basis", 11, Format.TEXT),
    CABLE_SPREAD(DossierSheet.CABLES, "spread", "Stated spread (±m, ±mm, ±% or ±dB, u dB)", 16, Format.WRAP),
    CABLE_SPREAD_BASIS(DossierSheet.CABLES, "spread_basis", "Spread basis", 20, Format.WRAP),

    BUDGET_TAG(DossierSheet.BUDGET, "tag", "Point tag", 12, Format.TEXT),
    BUDGET_NUMBER(DossierSheet.BUDGET, "number", "Element (no.)", 9, Format.WHOLE),
    BUDGET_LEG(DossierSheet.BUDGET, "leg", "Leg", 9, Format.TEXT),
    BUDGET_ELEMENT(DossierSheet.BUDGET, "element", "Element", 30, Format.WRAP),
    BUDGET_KIND(DossierSheet.BUDGET, "kind", "Kind", 8, Format.TEXT),
    BUDGET_BAND(DossierSheet.BUDGET, "band_db", "Loss at band centre (dB), one column per band", 18,
            Format.DECIMAL_2),

    TREND_TAG(DossierSheet.TREND, "tag", "Point tag", 12, Format.TEXT),
    TREND_BAND(DossierSheet.TREND, "band", "Band of interest", 20, Format.WRAP),
    TREND_READINGS(DossierSheet.TREND, "readings", "Readings (count)", 10, Format.WHOLE),
    TREND_FIRST(DossierSheet.TREND, "first_scan", "First scan (UTC)", 16, Format.TIME),
    TREND_LAST(DossierSheet.TREND, "last_scan", "Last scan (UTC)", 16, Format.TIME),
    TREND_LATEST_DB(DossierSheet.TREND, "latest_db", "Latest loss, driving range (dB)", 9, Format.DECIMAL_2),
    TREND_SLOPE(DossierSheet.TREND, "slope", "Slope (dB/year)", 9, Format.DECIMAL_3),
    TREND_SLOPE_LOW(DossierSheet.TREND, "slope_low", "Slope, lower limit (dB/year)", 10, Format.DECIMAL_3),
    TREND_SLOPE_HIGH(DossierSheet.TREND, "slope_high", "Slope, upper limit (dB/year)", 10, Format.DECIMAL_3),
    TREND_CONFIDENCE(DossierSheet.TREND, "confidence_percent", "Confidence (%)", 12, Format.WHOLE),
    TREND_STEPS(DossierSheet.TREND, "steps", "Steps and outliers", 24, Format.WRAP),
    TREND_MARGIN_DB(DossierSheet.TREND, "margin_db", "Margin now (dB)", 9, Format.DECIMAL_2),
    TREND_OUTLOOK(DossierSheet.TREND, "outlook", "Outlook", 22, Format.WRAP),
    TREND_EXPECTED(DossierSheet.TREND, "expected", "Zero margin expected (date)", 11, Format.DATE),
    TREND_EARLIEST(DossierSheet.TREND, "earliest", "Earliest (date)", 11, Format.DATE),
    TREND_LATEST(DossierSheet.TREND, "latest", "Latest (date)", 11, Format.DATE),

    UNCERTAINTY_TAG(DossierSheet.UNCERTAINTY, "tag", "Point tag", 12, Format.TEXT),
    UNCERTAINTY_BAND(DossierSheet.UNCERTAINTY, "band", "Band of interest", 18, Format.TEXT),
    UNCERTAINTY_AT_NM(DossierSheet.UNCERTAINTY, "at_nm", "At (nm)", 8, Format.DECIMAL_1),
    UNCERTAINTY_INPUT(DossierSheet.UNCERTAINTY, "input", "Input", 28, Format.WRAP),
    UNCERTAINTY_BASIS(DossierSheet.UNCERTAINTY, "basis", "Basis", 44, Format.WRAP),
    UNCERTAINTY_DISTRIBUTION(DossierSheet.UNCERTAINTY, "distribution", "Distribution", 22, Format.WRAP),
    UNCERTAINTY_U(DossierSheet.UNCERTAINTY, "u", "Standard uncertainty (in the next column's unit)", 13,
            Format.DECIMAL_3),
    UNCERTAINTY_UNIT(DossierSheet.UNCERTAINTY, "unit", "Unit", 7, Format.TEXT),
    UNCERTAINTY_SENSITIVITY(DossierSheet.UNCERTAINTY, "sensitivity", "Sensitivity (dB per unit)", 13,
            Format.DECIMAL_3),
    UNCERTAINTY_CONTRIBUTION_DB(DossierSheet.UNCERTAINTY, "contribution_db", "Contribution (dB)", 14,
            Format.DECIMAL_3),
    UNCERTAINTY_SHARE(DossierSheet.UNCERTAINTY, "share_percent", "Share of variance (%)", 10, Format.DECIMAL_1),

    SPECTRA_TAG(DossierSheet.SPECTRA, "tag", "Point tag", 12, Format.TEXT),
    SPECTRA_WAVELENGTH_NM(DossierSheet.SPECTRA, "wavelength_nm", "Wavelength (nm)", 12, Format.DECIMAL_1),
    SPECTRA_PREDICTED_DB(DossierSheet.SPECTRA, "predicted_db", "Predicted loss (dB)", 11, Format.DECIMAL_3),
    SPECTRA_LOW_DB(DossierSheet.SPECTRA, "predicted_low_db", "Predicted, coverage interval low (dB)", 11,
            Format.DECIMAL_3),
    SPECTRA_HIGH_DB(DossierSheet.SPECTRA, "predicted_high_db", "Predicted, coverage interval high (dB)", 11,
            Format.DECIMAL_3),
    SPECTRA_MEASURED_DB(DossierSheet.SPECTRA, "measured_db", "Measured loss (dB)", 11, Format.DECIMAL_3),
    SPECTRA_DEVIATION_DB(DossierSheet.SPECTRA, "deviation_db", "Deviation, measured − predicted (dB)", 13,
            Format.DECIMAL_3),
    SPECTRA_BAND(DossierSheet.SPECTRA, "band", "Band of interest", 20, Format.TEXT),
    SPECTRA_MASKED(DossierSheet.SPECTRA, "masked", "Not measured because", 34, Format.TEXT),

    HISTORY_TAG(DossierSheet.HISTORY, "tag", "Point tag", 12, Format.TEXT),
    HISTORY_BAND(DossierSheet.HISTORY, "band", "Band of interest", 20, Format.TEXT),
    HISTORY_TAKEN(DossierSheet.HISTORY, "taken", "Loop scan taken (UTC)", 17, Format.TIME),
    HISTORY_LOSS_DB(DossierSheet.HISTORY, "loss_db", "Band-mean loss (dB)", 11, Format.DECIMAL_3),
    HISTORY_TREND_DB(DossierSheet.HISTORY, "trend_db", "Trend line (dB)", 11, Format.DECIMAL_3),
    HISTORY_EVENT(DossierSheet.HISTORY, "event", "Event", 36, Format.TEXT),

    AUDIT_ID(DossierSheet.AUDIT, "id", "Row (no.)", 7, Format.WHOLE),
    AUDIT_AT(DossierSheet.AUDIT, "at", "Time (UTC, as stored)", 24, Format.TEXT),
    AUDIT_USER(DossierSheet.AUDIT, "user", "User", 14, Format.TEXT),
    AUDIT_ACTION(DossierSheet.AUDIT, "action", "Action", 10, Format.TEXT),
    AUDIT_TABLE(DossierSheet.AUDIT, "table", "Table", 14, Format.TEXT),
    AUDIT_ROW_KEY(DossierSheet.AUDIT, "row_key", "Row key", 8, Format.TEXT),
    AUDIT_OLD_VALUES(DossierSheet.AUDIT, "old_values", "Before (JSON)", 40, Format.CODE),
    AUDIT_NEW_VALUES(DossierSheet.AUDIT, "new_values", "After (JSON)", 40, Format.CODE),
    AUDIT_ROW_SHA256(DossierSheet.AUDIT, "row_sha256", "Row SHA-256", 18, Format.CODE),
    AUDIT_PREV_HASH(DossierSheet.AUDIT, "prev_hash", "Previous hash", 18, Format.CODE),
    AUDIT_HASH(DossierSheet.AUDIT, "hash", "Hash", 18, Format.CODE);

    /** The kind of value a column holds; the template's data style for the column follows from it. */
    public enum Format {
        /** One line of text. */
        TEXT,
        /** Text that wraps within the column. */
        WRAP,
        /** Small wrapping text for hashes and JSON. */
        CODE,
        /** A whole number. */
        WHOLE,
        /** A number shown with one decimal. */
        DECIMAL_1,
        /** A number shown with two decimals. */
        DECIMAL_2,
        /** A number shown with three decimals. */
        DECIMAL_3,
        /** A date and time in UTC. */
        TIME,
        /** A calendar date in UTC. */
        DATE,
        /** An acceptance status, symbol and word (e.g. "✔ PASS"), coloured by conditional formatting. */
        STATUS
    }

    private final DossierSheet sheet;
    private final String key;
    private final String header;
    private final int widthChars;
    private final Format format;

    DossierColumn(DossierSheet sheet, String key, String header, int widthChars, Format format) {
        this.sheet = sheet;
        this.key = key;
        this.header = header;
        this.widthChars = widthChars;
        this.format = format;
    }

    public DossierSheet sheet() {
        return sheet;
    }

    /** The field key in the template's hidden key row, unique within the sheet. */
    public String key() {
        return key;
    }

    /** The header as shipped, unit in brackets. */
    public String header() {
        return header;
    }

    public int widthChars() {
        return widthChars;
    }

    public Format format() {
        return format;
    }

    /** The column of {@code sheet} with this key, if any. */
    public static Optional<DossierColumn> of(DossierSheet sheet, String key) {
        return Arrays.stream(values()).filter(c -> c.sheet == sheet && c.key.equals(key)).findFirst();
    }
}
