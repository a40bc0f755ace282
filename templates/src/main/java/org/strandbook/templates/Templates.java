package org.strandbook.templates;

import java.io.InputStream;
import java.io.UncheckedIOException;
import java.util.List;

/** Access to the XLSX templates and component catalogs shipped in this module. */
public final class Templates {

    /** The cable schedule a contractor fills in (sheets of analyzers, points, bands, segments, joints, catalogs). */
    public static final String CABLE_SCHEDULE = "cable-schedule.xlsx";

    /** The commissioning dossier's template, filled by core's dossier writer. */
    public static final String DOSSIER = "dossier-template.xlsx";

    /** Shipped fiber types, CSV with the columns of the schedule's 'Fiber types' sheet plus 'Basis'. */
    public static final String FIBER_TYPES = "fiber-types.csv";

    /** Shipped connector types, CSV with the columns of the schedule's 'Connector types' sheet plus 'Basis'. */
    public static final String CONNECTOR_TYPES = "connector-types.csv";

    /** Shipped probe types, CSV with the columns of the schedule's 'Probe types' sheet plus 'Basis'. */
    public static final String PROBE_TYPES = "probe-types.csv";

    /** Every XLSX template shipped here. */
    public static final List<String> XLSX_TEMPLATES = List.of(CABLE_SCHEDULE, DOSSIER);

    /** Every component catalog shipped here. */
    public static final List<String> CATALOGS = List.of(FIBER_TYPES, CONNECTOR_TYPES, PROBE_TYPES);

    private Templates() {
    }

    /** Opens a resource kept beside this class; the caller closes it. */
    public static InputStream open(String name) {
        InputStream in = Templates.class.getResourceAsStream(name);
        if (in == null) {
            throw new UncheckedIOException(new java.io.FileNotFoundException("template not found: " + name));
        }
        return in;
    }
}
