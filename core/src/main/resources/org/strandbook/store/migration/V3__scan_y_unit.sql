-- Strandbook workbook, schema 3: every scan keeps the unit of its values as the file named it
-- (JCAMP-DX ##YUNITS=, a delimited file's value header): counts, volts, arbitrary units... An empty
-- text means the file named none (and every scan stored before schema 3).
-- Additive only. The migrator records a BASELINE row for every scan after this step, so that the
-- audit trail's images of scan rows carry the new column and `audit verify` finds them unchanged.

ALTER TABLE scan ADD COLUMN y_unit TEXT NOT NULL DEFAULT '' CHECK (length(y_unit) <= 200);
