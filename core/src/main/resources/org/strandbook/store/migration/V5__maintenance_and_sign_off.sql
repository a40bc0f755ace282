-- Strandbook workbook, schema 5: maintenance actions, the light path's history, what a signature
-- signed, and notes on one joint or segment.
-- Columns added to older tables are NULL on older rows, which the audit digest leaves out, so the
-- trail's images of those rows stay valid.

-- A maintenance action on a point, named by the label of the element it worked on (empty for the
-- probe or the reference), like an inspection: the record outlives a later edit of the legs.
CREATE TABLE maintenance_action (
    id            INTEGER PRIMARY KEY,
    point_id      INTEGER NOT NULL REFERENCES point (id),
    kind          TEXT NOT NULL CHECK (kind IN ('CLEAN_JOINT', 'RETERMINATE', 'REPLACE_CONNECTOR',
                      'REPLACE_SEGMENT', 'REROUTE', 'REPLACE_PROBE', 'RETAKE_REFERENCE')),
    element_label TEXT NOT NULL COLLATE NOCASE,
    performed_at  TEXT NOT NULL,
    performed_by  TEXT NOT NULL CHECK (performed_by <> ''),
    what          TEXT NOT NULL,
    why           TEXT NOT NULL
);
CREATE INDEX maintenance_by_point ON maintenance_action (point_id, performed_at);

-- The legs of a point as they were just before an action changed them, one row per element in the
-- columns of path_element but with catalog codes, so that a scan taken before the action is judged
-- against the path it went through. Bends are "radius_mm:count" pairs joined by ";".
CREATE TABLE retired_path_element (
    id          INTEGER PRIMARY KEY,
    action_id   INTEGER NOT NULL REFERENCES maintenance_action (id),
    direction   TEXT NOT NULL CHECK (direction IN ('SEND', 'RETURN')),
    position    INTEGER NOT NULL CHECK (position >= 1),
    kind        TEXT NOT NULL CHECK (kind IN ('SEGMENT', 'JOINT')),
    label       TEXT NOT NULL,
    fiber_code  TEXT,
    length_m    REAL,
    bends       TEXT,
    connector_a TEXT,
    connector_b TEXT,
    grade       TEXT,
    loss_db     REAL,
    loss_basis  TEXT,
    UNIQUE (action_id, direction, position)
);

-- What a signature signed: the digest of a point's evaluation inputs, or for the site record the
-- audit trail's head (its row and hash) when it was signed; the revision letter signed; the
-- signer's job title.
ALTER TABLE sign_off ADD COLUMN job_title TEXT;
ALTER TABLE sign_off ADD COLUMN revision TEXT;
ALTER TABLE sign_off ADD COLUMN content_sha256 TEXT;
ALTER TABLE sign_off ADD COLUMN audit_head_id INTEGER;

-- A note on one joint or cable segment of its point.
ALTER TABLE note ADD COLUMN element_label TEXT;

-- The file name of an end-face picture taken with the inspection, if any.
ALTER TABLE inspection ADD COLUMN picture_file TEXT;
