-- Strandbook workbook, schema 6: the site's decision rule, how a measured loss is accepted against
-- its prediction. One row at most; a workbook without one keeps the fixed tolerance, the rule of
-- every workbook before this schema.
CREATE TABLE decision_rule (
    id            INTEGER PRIMARY KEY CHECK (id = 1),
    kind          TEXT NOT NULL CHECK (kind IN ('FIXED_TOLERANCE', 'COVERAGE_INTERVAL')),
    coverage      REAL NOT NULL CHECK (coverage > 0.5 AND coverage < 1),
    guard_band_db REAL NOT NULL CHECK (guard_band_db >= 0 AND guard_band_db <= 10)
);
