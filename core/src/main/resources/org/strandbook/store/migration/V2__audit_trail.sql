-- Strandbook workbook, schema 2: the audit trail.
-- One row per change of user data, chained by SHA-256 (AuditLog documents the exact formula).
-- Java writes the rows inside the transaction of the change, because SQLite has no SHA-256 to
-- compute the chain in a trigger. After this script the migrator records a BASELINE row for every
-- row already in the workbook, so that a schema-1 workbook enters the trail complete.
-- No index beyond the key: each one would cost every change another page written, and the check
-- of the trail reads it whole anyway.

CREATE TABLE audit_entry (
    id         INTEGER PRIMARY KEY,
    at         TEXT NOT NULL,
    user_name  TEXT NOT NULL,
    action     TEXT NOT NULL CHECK (action IN ('INSERT', 'UPDATE', 'DELETE', 'BASELINE', 'SCHEMA')),
    table_name TEXT NOT NULL,
    row_key    TEXT NOT NULL,
    old_values TEXT,
    new_values TEXT,
    row_sha256 TEXT,
    prev_hash  TEXT NOT NULL CHECK (length(prev_hash) = 64),
    hash       TEXT NOT NULL CHECK (length(hash) = 64)
);

-- The chain already makes any edit evident; these triggers make an accidental one fail loudly.
CREATE TRIGGER audit_entry_append_only_update BEFORE UPDATE ON audit_entry
BEGIN
    SELECT RAISE(ABORT, 'audit entries cannot be changed');
END;

CREATE TRIGGER audit_entry_append_only_delete BEFORE DELETE ON audit_entry
BEGIN
    SELECT RAISE(ABORT, 'audit entries cannot be deleted');
END;
