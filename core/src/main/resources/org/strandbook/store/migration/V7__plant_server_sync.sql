-- Strandbook workbook, schema 7: what this workbook knows of the plant server it syncs with.
-- Bookkeeping of the exchange, not user data: the audit trail records the records a sync brings in
-- or a resolution changes, not these rows (a sync that only moves its own marks changes nothing).

-- The one server and site this workbook syncs with, its own identity there, and how far its audit
-- trail has been taken by the server.
CREATE TABLE sync_state (
    id              INTEGER PRIMARY KEY CHECK (id = 1),
    workbook_id     TEXT NOT NULL CHECK (length(workbook_id) = 36),
    server          TEXT,
    site_name       TEXT,
    pushed_entry_id INTEGER NOT NULL DEFAULT 0 CHECK (pushed_entry_id >= 0),
    synced_at       TEXT
);

-- Each record as both sides last agreed on it (an editable record's fields as JSON and the server's
-- revision; an immutable record with empty fields): the common ancestor that tells an edit here
-- from an edit there, and two edits of one field from one.
CREATE TABLE sync_base (
    table_name TEXT NOT NULL,
    record_key TEXT NOT NULL,
    fields     TEXT NOT NULL,
    revision   INTEGER NOT NULL,
    PRIMARY KEY (table_name, record_key)
) WITHOUT ROWID;

-- Two edits of one field since the last sync: both values kept until a person chooses.
CREATE TABLE sync_conflict (
    id          INTEGER PRIMARY KEY,
    table_name  TEXT NOT NULL,
    record_key  TEXT NOT NULL,
    field       TEXT NOT NULL,
    mine        TEXT NOT NULL,
    theirs      TEXT NOT NULL,
    theirs_by   TEXT NOT NULL,
    found_at    TEXT NOT NULL,
    resolved_at TEXT,
    resolved_by TEXT,
    kept        TEXT CHECK (kept IN ('MINE', 'THEIRS'))
);
CREATE UNIQUE INDEX sync_conflict_open ON sync_conflict (table_name, record_key, field) WHERE resolved_at IS NULL;
