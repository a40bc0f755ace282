package org.strandbook.store;

import java.util.List;

/**
 * Every table of user data, as the audit trail sees it: its key column and the query that gives a
 * row's image. A scan's image carries its spectrum (as SHA-256 and size), so one audit row covers
 * both {@code scan} and {@code scan_spectrum}, which halves the audit work of an import.
 * A table added by a later schema must be listed here; a test compares the list with the workbook.
 * The order is parent before child, the order in which a baseline records them.
 */
enum AuditedTable {
    SITE("site"),
    ANALYZER("analyzer"),
    FIBER_TYPE("fiber_type"),
    FIBER_ATTENUATION("fiber_attenuation"),
    CONNECTOR_TYPE("connector_type"),
    PROBE_TYPE("probe_type"),
    POINT("point"),
    POINT_BAND("point_band"),
    PATH_ELEMENT("path_element"),
    SEGMENT_BEND("segment_bend"),
    SCAN("scan", "SELECT s.*, d.data AS " + AuditedTable.SCAN_SPECTRUM_COLUMN
            + " FROM scan s LEFT JOIN scan_spectrum d ON d.scan_id = s.id", "s.id", List.of("scan_spectrum")),
    INSPECTION("inspection"),
    SIGN_OFF("sign_off"),
    NOTE("note"),
    MAINTENANCE_ACTION("maintenance_action"),
    RETIRED_PATH_ELEMENT("retired_path_element"),
    DECISION_RULE("decision_rule");

    /**
     * The last column of a scan's image, its spectrum: {@link AuditLog} builds the image of a new
     * scan from the scan row and the bytes just written under this name (see RowImage#withBlob).
     */
    static final String SCAN_SPECTRUM_COLUMN = "spectrum";

    private final String tableName;
    private final String imageSql;
    private final String keyExpression;
    private final List<String> coveredTables;

    AuditedTable(String tableName) {
        this(tableName, "SELECT * FROM " + tableName, "id", List.of());
    }

    AuditedTable(String tableName, String imageSql, String keyExpression, List<String> coveredTables) {
        this.tableName = tableName;
        this.imageSql = imageSql;
        this.keyExpression = keyExpression;
        this.coveredTables = coveredTables;
    }

    String tableName() {
        return tableName;
    }

    /** Child tables whose rows appear inside this table's row images. */
    List<String> coveredTables() {
        return coveredTables;
    }

    String selectRowSql() {
        return imageSql + " WHERE " + keyExpression + " = ?";
    }

    /** Every row's image; the key is the first column. */
    String selectAllSql() {
        return imageSql + " ORDER BY " + keyExpression;
    }

    String deleteRowSql() {
        return "DELETE FROM " + tableName + " WHERE id = ?";
    }
}
