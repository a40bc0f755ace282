package org.strandbook.store;

import java.util.HashSet;
import java.util.Map;
import java.util.Objects;
import java.util.Set;
import java.util.TreeMap;
import java.util.function.Predicate;

/**
 * What a signature signed, in a form every copy of the site computes alike: the digest of the
 * records in their portable form ({@link PortableTable}: natural keys, no local row ids), in key
 * order. {@link PointContent} and the audit trail's head name rows of one workbook, so a signature
 * that reaches another workbook through the plant server is judged by this digest there.
 */
final class PortableContent {

    private PortableContent() {
    }

    /** The site's records, signatures left out: a site signature covers what was recorded, not other signatures. */
    static String site(Map<PortableTable, Map<String, Map<String, Object>>> all) {
        Sha256.Fields digest = new Sha256.Fields();
        for (PortableTable t : PortableTable.values()) {
            if (t != PortableTable.SIGN_OFF) {
                add(digest, t, all.get(t), r -> true);
            }
        }
        return digest.hex();
    }

    /**
     * The records one point's evaluation reads, as {@link PointContent} chooses them: the point, its
     * bands, path and bends, its scans, inspections, actions and the path they retired, its analyzer,
     * probe type, and the catalog entries its path used, today or before.
     */
    static String point(Map<PortableTable, Map<String, Map<String, Object>>> all, String tag) {
        Map<String, Object> point = all.get(PortableTable.POINT).get(tag);
        if (point == null) {
            return "";
        }
        Predicate<Map<String, Object>> ofPoint = f -> tag.equals(f.get("point"));
        Set<String> elements = keys(all.get(PortableTable.PATH_ELEMENT), ofPoint);
        Set<String> actions = keys(all.get(PortableTable.MAINTENANCE_ACTION), ofPoint);
        Predicate<Map<String, Object>> retiredHere = f -> actions.contains((String) f.get("action"));
        Set<Object> fibers = new HashSet<>();
        Set<Object> connectors = new HashSet<>();
        for (Map<String, Object> e : all.get(PortableTable.PATH_ELEMENT).values()) {
            if (ofPoint.test(e)) {
                fibers.add(e.get("fiber_type"));
                connectors.add(e.get("connector_type_a"));
                connectors.add(e.get("connector_type_b"));
            }
        }
        for (Map<String, Object> r : all.get(PortableTable.RETIRED_PATH_ELEMENT).values()) {
            if (retiredHere.test(r)) {
                fibers.add(r.get("fiber_code"));
                connectors.add(r.get("connector_a"));
                connectors.add(r.get("connector_b"));
            }
        }
        fibers.remove(null);
        connectors.remove(null);

        Sha256.Fields digest = new Sha256.Fields();
        add(digest, PortableTable.POINT, all.get(PortableTable.POINT), f -> f == point);
        add(digest, PortableTable.POINT_BAND, all.get(PortableTable.POINT_BAND), ofPoint);
        add(digest, PortableTable.ANALYZER, all.get(PortableTable.ANALYZER),
                f -> Objects.equals(f.get("tag"), point.get("analyzer")));
        add(digest, PortableTable.PROBE_TYPE, all.get(PortableTable.PROBE_TYPE),
                f -> Objects.equals(f.get("code"), point.get("probe_type")));
        add(digest, PortableTable.PATH_ELEMENT, all.get(PortableTable.PATH_ELEMENT), ofPoint);
        add(digest, PortableTable.SEGMENT_BEND, all.get(PortableTable.SEGMENT_BEND),
                f -> elements.contains((String) f.get("element")));
        add(digest, PortableTable.FIBER_TYPE, all.get(PortableTable.FIBER_TYPE), f -> fibers.contains(f.get("code")));
        add(digest, PortableTable.FIBER_ATTENUATION, all.get(PortableTable.FIBER_ATTENUATION),
                f -> fibers.contains(f.get("fiber_type")));
        add(digest, PortableTable.CONNECTOR_TYPE, all.get(PortableTable.CONNECTOR_TYPE),
                f -> connectors.contains(f.get("code")));
        add(digest, PortableTable.SCAN, all.get(PortableTable.SCAN), ofPoint);
        add(digest, PortableTable.INSPECTION, all.get(PortableTable.INSPECTION), ofPoint);
        add(digest, PortableTable.MAINTENANCE_ACTION, all.get(PortableTable.MAINTENANCE_ACTION), ofPoint);
        add(digest, PortableTable.RETIRED_PATH_ELEMENT, all.get(PortableTable.RETIRED_PATH_ELEMENT), retiredHere);
        return digest.hex();
    }

    private static Set<String> keys(Map<String, Map<String, Object>> records, Predicate<Map<String, Object>> chosen) {
        Set<String> out = new HashSet<>();
        records.forEach((key, fields) -> {
            if (chosen.test(fields)) {
                out.add(key);
            }
        });
        return out;
    }

    /** The chosen records of one table, each as its key and the digest of its fields, in key order. */
    private static void add(Sha256.Fields digest, PortableTable table, Map<String, Map<String, Object>> records,
                            Predicate<Map<String, Object>> chosen) {
        digest.add(table.name());
        Map<String, String> sorted = new TreeMap<>();
        records.forEach((key, fields) -> {
            if (chosen.test(fields)) {
                sorted.put(key, PortableFields.sha256(fields));
            }
        });
        sorted.forEach((key, fieldsSha256) -> digest.add(key).add(fieldsSha256));
    }
}
