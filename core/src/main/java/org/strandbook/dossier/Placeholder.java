package org.strandbook.dossier;

/**
 * A value the writer puts wherever the template shows its token, e.g. {@code {site}}: in any cell
 * of the template's own rows (alone or inside a longer text) and in every page header and footer.
 * A plant may move, restyle or drop a token; the writer fills whatever it finds.
 */
public enum Placeholder {
    SITE("site", "the site's name"),
    PLANT_AREA("plant_area", "the plant area or unit"),
    ANALYZERS("analyzers", "the analyzers in scope, with their ranges and allowed losses"),
    REVISION("revision", "the dossier revision (the workbook's revision label)"),
    EARLIER_REVISIONS("earlier_revisions", "site signatures of earlier revisions, each with its standing"),
    ISSUED("issued", "date and time of issue, UTC"),
    DOCUMENT_STATUS("document_status", "FINAL: the dossier is a complete export, never a draft"),
    RESULT("result", "whether every point in scope passed, as symbol and words"),
    STATUS_COUNTS("status_counts", "points by status"),
    SCOPE_POINTS("scope_points", "which points are in scope"),
    SCOPE_DATES("scope_dates", "which scans are in scope (dates, UTC)"),
    PREPARED_NAME("prepared_name", "who prepared it, from the workbook's sign-offs"),
    PREPARED_DATE("prepared_date", "when, UTC"),
    CHECKED_NAME("checked_name", "who checked it"),
    CHECKED_DATE("checked_date", "when, UTC"),
    APPROVED_NAME("approved_name", "who approved it"),
    APPROVED_DATE("approved_date", "when, UTC"),
    SOFTWARE("software", "the software and its version"),
    WORKBOOK("workbook", "the workbook file's name"),
    AUDIT_ROWS("audit_rows", "number of rows in the audit trail"),
    AUDIT_HEAD("audit_head", "SHA-256 hash of the audit trail's last row"),
    AUDIT_CHECK("audit_check", "outcome of checking the audit trail"),
    PAIRING_RULE("pairing_rule", "the rule that paired loop, reference and dark scans"),
    DEFAULT_TOLERANCE("default_tolerance", "the site's default acceptance tolerance, dB"),
    MIN_MEASURED("min_measured", "least share of a band that must be measured, %"),
    LOCAL_FAIL("local_fail", "local excess, in tolerances, that fails a band"),
    GRID_STEP("grid_step", "step of the evaluation wavelength grid, nm"),
    DECISION_RULE("decision_rule", "the site's decision rule, in the words of ILAC-G8 and JCGM 106");

    private final String key;
    private final String meaning;

    Placeholder(String key, String meaning) {
        this.key = key;
        this.meaning = meaning;
    }

    public String key() {
        return key;
    }

    /** The token as the template shows it, e.g. {@code {site}}. */
    public String token() {
        return "{" + key + "}";
    }

    public String meaning() {
        return meaning;
    }
}
