-- Strandbook workbook, schema 1: the site, its catalogs, points, light paths, scans and records.
-- Released schema scripts are never edited: a change is a new V<n> script (see SchemaMigrator).
-- Every table has an INTEGER PRIMARY KEY so that the audit trail can name any row by one key.
-- No foreign key cascades: every row removed goes through a repository that writes its audit row.
-- Tags, codes and cable IDs compare without case: "at-101" and "AT-101" are one tag on site.
-- Times are TEXT, ISO-8601 UTC with milliseconds (uuuu-MM-ddTHH:mm:ss.SSSZ), so that they sort.

PRAGMA application_id = 1400136299; -- 0x5374626B, "Stbk": marks the file as a Strandbook workbook

CREATE TABLE site (
    id                   INTEGER PRIMARY KEY CHECK (id = 1),
    name                 TEXT NOT NULL CHECK (name <> ''),
    plant_area           TEXT NOT NULL,
    revision             TEXT NOT NULL CHECK (revision <> ''),
    default_tolerance_db REAL NOT NULL CHECK (default_tolerance_db > 0)
);

CREATE TABLE analyzer (
    id              INTEGER PRIMARY KEY,
    tag             TEXT NOT NULL COLLATE NOCASE UNIQUE CHECK (tag <> ''),
    description     TEXT NOT NULL,
    min_nm          REAL NOT NULL CHECK (min_nm > 0),
    max_nm          REAL NOT NULL CHECK (max_nm > min_nm),
    channels        INTEGER NOT NULL CHECK (channels >= 1),
    allowed_loss_db REAL NOT NULL CHECK (allowed_loss_db > 0),
    detector        TEXT NOT NULL
        CHECK (detector IN ('SILICON', 'INGAAS', 'EXTENDED_INGAAS', 'PBS', 'MCT', 'OTHER'))
);

CREATE TABLE fiber_type (
    id            INTEGER PRIMARY KEY,
    code          TEXT NOT NULL COLLATE NOCASE UNIQUE CHECK (code <> ''),
    description   TEXT NOT NULL,
    core_um       REAL NOT NULL CHECK (core_um > 0),
    cladding_um   REAL NOT NULL CHECK (cladding_um >= core_um),
    buffer_um     REAL NOT NULL CHECK (buffer_um >= 0),
    na            REAL NOT NULL CHECK (na > 0 AND na < 1),
    core_material TEXT NOT NULL,
    oh_grade      TEXT NOT NULL CHECK (oh_grade IN ('LOW_OH', 'HIGH_OH')),
    oh_ppm        REAL NOT NULL CHECK (oh_ppm >= 0)
);

CREATE TABLE fiber_attenuation (
    id                    INTEGER PRIMARY KEY,
    fiber_type_id         INTEGER NOT NULL REFERENCES fiber_type (id),
    position              INTEGER NOT NULL CHECK (position >= 1),
    wavelength_nm         REAL NOT NULL CHECK (wavelength_nm > 0),
    attenuation_db_per_km REAL NOT NULL CHECK (attenuation_db_per_km > 0),
    UNIQUE (fiber_type_id, position)
);

CREATE TABLE connector_type (
    id              INTEGER PRIMARY KEY,
    code            TEXT NOT NULL COLLATE NOCASE UNIQUE CHECK (code <> ''),
    description     TEXT NOT NULL,
    family          TEXT NOT NULL CHECK (family <> ''),
    typical_loss_db REAL NOT NULL CHECK (typical_loss_db >= 0),
    air_gap         INTEGER NOT NULL CHECK (air_gap IN (0, 1))
);

CREATE TABLE probe_type (
    id              INTEGER PRIMARY KEY,
    code            TEXT NOT NULL COLLATE NOCASE UNIQUE CHECK (code <> ''),
    description     TEXT NOT NULL,
    kind            TEXT NOT NULL
        CHECK (kind IN ('TRANSMISSION', 'TRANSFLECTANCE', 'DIFFUSE_REFLECTANCE', 'ATTENUATED_TOTAL_REFLECTANCE')),
    window_material TEXT NOT NULL,
    window_faces    INTEGER NOT NULL CHECK (window_faces >= 0),
    optical_path_mm REAL NOT NULL CHECK (optical_path_mm >= 0),
    fixed_loss_db   REAL NOT NULL CHECK (fixed_loss_db >= 0)
);

CREATE TABLE point (
    id                    INTEGER PRIMARY KEY,
    tag                   TEXT NOT NULL COLLATE NOCASE UNIQUE CHECK (tag <> ''),
    service               TEXT NOT NULL,
    location              TEXT NOT NULL,
    analyzer_id           INTEGER NOT NULL REFERENCES analyzer (id),
    channel               INTEGER NOT NULL CHECK (channel >= 1),
    probe_type_id         INTEGER NOT NULL REFERENCES probe_type (id),
    tolerance_db          REAL CHECK (tolerance_db IS NULL OR tolerance_db > 0),
    hazardous_area        INTEGER NOT NULL CHECK (hazardous_area IN (0, 1)),
    hydrogen_service      INTEGER NOT NULL CHECK (hydrogen_service IN (0, 1)),
    process_temperature_c REAL
);
CREATE INDEX point_by_analyzer ON point (analyzer_id);
CREATE INDEX point_by_probe_type ON point (probe_type_id);

CREATE TABLE point_band (
    id       INTEGER PRIMARY KEY,
    point_id INTEGER NOT NULL REFERENCES point (id),
    position INTEGER NOT NULL CHECK (position >= 1),
    name     TEXT NOT NULL,
    from_nm  REAL NOT NULL CHECK (from_nm > 0),
    to_nm    REAL NOT NULL CHECK (to_nm > from_nm),
    UNIQUE (point_id, position)
);

-- One row per element of a leg, in the order light meets it. A segment fills the fiber columns, a
-- joint the connector columns; the CHECK keeps the two kinds apart.
CREATE TABLE path_element (
    id                  INTEGER PRIMARY KEY,
    point_id            INTEGER NOT NULL REFERENCES point (id),
    direction           TEXT NOT NULL CHECK (direction IN ('SEND', 'RETURN')),
    position            INTEGER NOT NULL CHECK (position >= 1),
    kind                TEXT NOT NULL CHECK (kind IN ('SEGMENT', 'JOINT')),
    label               TEXT NOT NULL COLLATE NOCASE CHECK (label <> ''),
    fiber_type_id       INTEGER REFERENCES fiber_type (id),
    length_m            REAL,
    connector_type_a_id INTEGER REFERENCES connector_type (id),
    connector_type_b_id INTEGER REFERENCES connector_type (id),
    grade               TEXT CHECK (grade IN ('NOT_INSPECTED', 'CLEAN', 'ACCEPTABLE', 'DIRTY', 'DAMAGED')),
    loss_db             REAL CHECK (loss_db IS NULL OR loss_db >= 0),
    loss_basis          TEXT CHECK (loss_basis IN ('ASSUMED', 'MEASURED')),
    UNIQUE (point_id, direction, position),
    CHECK ((kind = 'SEGMENT' AND fiber_type_id IS NOT NULL AND length_m > 0
                AND connector_type_a_id IS NULL AND connector_type_b_id IS NULL
                AND grade IS NULL AND loss_db IS NULL AND loss_basis IS NULL)
        OR (kind = 'JOINT' AND fiber_type_id IS NULL AND length_m IS NULL
                AND connector_type_a_id IS NOT NULL AND connector_type_b_id IS NOT NULL
                AND grade IS NOT NULL AND loss_basis IS NOT NULL))
);
-- A cable ID names one run of fiber on the whole site.
CREATE UNIQUE INDEX cable_id_unique ON path_element (label) WHERE kind = 'SEGMENT';
CREATE INDEX path_element_by_fiber_type ON path_element (fiber_type_id);
CREATE INDEX path_element_by_connector_a ON path_element (connector_type_a_id);
CREATE INDEX path_element_by_connector_b ON path_element (connector_type_b_id);

CREATE TABLE segment_bend (
    id         INTEGER PRIMARY KEY,
    element_id INTEGER NOT NULL REFERENCES path_element (id),
    position   INTEGER NOT NULL CHECK (position >= 1),
    radius_mm  REAL NOT NULL CHECK (radius_mm > 0),
    count      INTEGER NOT NULL CHECK (count >= 1),
    UNIQUE (element_id, position)
);

-- The listing columns of a scan. The spectrum lives in scan_spectrum so that listing a point's
-- scans reads small, densely packed rows and never pages through spectra.
CREATE TABLE scan (
    id                    INTEGER PRIMARY KEY,
    point_id              INTEGER NOT NULL REFERENCES point (id),
    kind                  TEXT NOT NULL CHECK (kind IN ('REFERENCE', 'LOOP', 'DARK')),
    taken_at              TEXT NOT NULL,
    operator              TEXT NOT NULL,
    integration_ms        REAL NOT NULL CHECK (integration_ms >= 0),
    co_added              INTEGER NOT NULL CHECK (co_added >= 1),
    ambient_temperature_c REAL,
    process_temperature_c REAL,
    n_points              INTEGER NOT NULL CHECK (n_points >= 2),
    min_nm                REAL NOT NULL CHECK (min_nm > 0),
    max_nm                REAL NOT NULL CHECK (max_nm > min_nm),
    source_file           TEXT NOT NULL CHECK (source_file <> ''),
    sha256                TEXT NOT NULL UNIQUE CHECK (length(sha256) = 64)
);
CREATE INDEX scan_point_taken ON scan (point_id, taken_at);

-- The spectrum of a scan: n_points little-endian IEEE 754 binary64 wavelengths (nm, ascending)
-- followed by n_points little-endian binary64 values, 16 * n_points bytes in all.
CREATE TABLE scan_spectrum (
    scan_id INTEGER PRIMARY KEY REFERENCES scan (id),
    data    BLOB NOT NULL
);

-- Joints are named by label, not by path_element row: a leg replaced as a whole keeps its history.
CREATE TABLE inspection (
    id           INTEGER PRIMARY KEY,
    point_id     INTEGER NOT NULL REFERENCES point (id),
    joint_label  TEXT NOT NULL COLLATE NOCASE,
    inspected_at TEXT NOT NULL,
    inspector    TEXT NOT NULL,
    grade        TEXT NOT NULL CHECK (grade IN ('NOT_INSPECTED', 'CLEAN', 'ACCEPTABLE', 'DIRTY', 'DAMAGED')),
    remark       TEXT NOT NULL
);
CREATE INDEX inspection_by_point ON inspection (point_id, inspected_at);

CREATE TABLE sign_off (
    id        INTEGER PRIMARY KEY,
    role      TEXT NOT NULL CHECK (role IN ('PREPARED', 'CHECKED', 'APPROVED')),
    name      TEXT NOT NULL CHECK (name <> ''),
    signed_at TEXT NOT NULL,
    point_id  INTEGER REFERENCES point (id),
    remark    TEXT NOT NULL
);
CREATE INDEX sign_off_by_point ON sign_off (point_id);

CREATE TABLE note (
    id         INTEGER PRIMARY KEY,
    point_id   INTEGER REFERENCES point (id),
    written_at TEXT NOT NULL,
    author     TEXT NOT NULL,
    text       TEXT NOT NULL CHECK (text <> '')
);
CREATE INDEX note_by_point ON note (point_id);
