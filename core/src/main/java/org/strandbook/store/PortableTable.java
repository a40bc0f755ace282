package org.strandbook.store;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * The workbook's tables as they travel to a plant server: each row named by a natural key instead
 * of its local id (every laptop numbers its own rows), and each reference to another row by that
 * row's natural key. The order is parent before child.
 *
 * <p>Editable records (the site and its decision rule, catalogs, analyzers, points, their bands and paths) may change and
 * so may conflict; the others are records of something that happened (a scan, an inspection, an
 * action, a note, a signature) and never change, so they never conflict.
 */
public enum PortableTable {
    SITE("site", "site_record", true, Map.of(), List.of()),
    DECISION_RULE("decision_rule", "decision_rule", true, Map.of(), List.of()),
    ANALYZER("analyzer", "analyzer", true, Map.of(), List.of("tag")),
    FIBER_TYPE("fiber_type", "fiber_type", true, Map.of(), List.of("code")),
    FIBER_ATTENUATION("fiber_attenuation", "fiber_attenuation", true, Map.of("fiber_type_id", "FIBER_TYPE"),
            List.of("fiber_type", "position")),
    CONNECTOR_TYPE("connector_type", "connector_type", true, Map.of(), List.of("code")),
    PROBE_TYPE("probe_type", "probe_type", true, Map.of(), List.of("code")),
    POINT("point", "point", true, Map.of("analyzer_id", "ANALYZER", "probe_type_id", "PROBE_TYPE"), List.of("tag")),
    POINT_BAND("point_band", "point_band", true, Map.of("point_id", "POINT"), List.of("point", "position")),
    PATH_ELEMENT("path_element", "path_element", true, Map.of("point_id", "POINT", "fiber_type_id", "FIBER_TYPE",
            "connector_type_a_id", "CONNECTOR_TYPE", "connector_type_b_id", "CONNECTOR_TYPE"),
            List.of("point", "direction", "position")),
    SEGMENT_BEND("segment_bend", "segment_bend", true, Map.of("element_id", "PATH_ELEMENT"),
            List.of("element", "position")),
    SCAN("scan", "scan", false, Map.of("point_id", "POINT"), List.of("sha256")),
    INSPECTION("inspection", "inspection", false, Map.of("point_id", "POINT"), null),
    MAINTENANCE_ACTION("maintenance_action", "maintenance_action", false, Map.of("point_id", "POINT"), null),
    RETIRED_PATH_ELEMENT("retired_path_element", "retired_path_element", false,
            Map.of("action_id", "MAINTENANCE_ACTION"), List.of("action", "direction", "position")),
    NOTE("note", "note", false, Map.of("point_id", "POINT"), null),
    SIGN_OFF("sign_off", "sign_off", false, Map.of("point_id", "POINT"), null);

    private final String workbookTable;
    private final String serverTable;
    private final boolean editable;
    private final Map<String, String> references;
    private final List<String> keyFields;

    /**
     * @param references local id column → the table it points into; the portable field is the
     *                   column's name without {@code _id} ({@code connector_type_a_id} →
     *                   {@code connector_type_a})
     * @param keyFields  portable fields that make the natural key, joined by {@code /}; null: the
     *                   SHA-256 of all the record's portable fields (a record of an event has no
     *                   shorter name that two laptops could not both give to different events)
     */
    PortableTable(String workbookTable, String serverTable, boolean editable, Map<String, String> references,
                  List<String> keyFields) {
        this.workbookTable = workbookTable;
        this.serverTable = serverTable;
        this.editable = editable;
        this.references = new LinkedHashMap<>(references);
        this.keyFields = keyFields;
    }

    public String workbookTable() {
        return workbookTable;
    }

    /** The table of the same records on the plant server. */
    public String serverTable() {
        return serverTable;
    }

    /** Whether its records may be edited (and so conflict); the others are immutable. */
    public boolean editable() {
        return editable;
    }

    Map<String, PortableTable> references() {
        Map<String, PortableTable> out = new LinkedHashMap<>();
        references.forEach((column, table) -> out.put(column, valueOf(table)));
        return out;
    }

    /** Each portable field that names another record, with the table that record is in. */
    public Map<String, PortableTable> referenceFields() {
        Map<String, PortableTable> out = new LinkedHashMap<>();
        references.forEach((column, table) -> out.put(portableName(column), valueOf(table)));
        return out;
    }

    /**
     * The fields naming the record this one belongs to (a band its point, a path element its
     * point, a bend its segment): part of its natural key, so it cannot outlive that record.
     */
    public Map<String, PortableTable> ownerFields() {
        Map<String, PortableTable> out = new LinkedHashMap<>(referenceFields());
        out.keySet().removeIf(f -> keyFields == null || !keyFields.contains(f));
        return out;
    }

    static String portableName(String idColumn) {
        return idColumn.substring(0, idColumn.length() - "_id".length());
    }

    /**
     * The fields that say which thing a record is: two workbooks whose records under one key differ
     * in them hold two different things (a joint here, a segment there, after a leg was renumbered),
     * which a sync never merges field by field.
     */
    public List<String> identityFields() {
        return this == PATH_ELEMENT ? List.of("kind", "label") : List.of();
    }

    /** The natural key of a record with these portable fields. */
    String key(Map<String, Object> fields) {
        if (keyFields != null && keyFields.isEmpty()) {
            // one record per site (the site itself, its decision rule): named by its table
            return workbookTable;
        }
        if (keyFields == null) {
            return PortableFields.sha256(fields);
        }
        StringBuilder sb = new StringBuilder();
        for (String f : keyFields) {
            if (sb.length() > 0) {
                sb.append('/');
            }
            Object v = fields.get(f);
            sb.append(v == null ? "" : v.toString().replace("/", "//"));
        }
        return sb.toString();
    }
}
