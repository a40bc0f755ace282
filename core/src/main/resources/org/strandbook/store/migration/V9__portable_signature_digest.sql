-- Strandbook workbook, schema 9: a signature also keeps the digest of what it signed in the form
-- every copy of the site computes alike (records by their natural keys, no local row ids), so that a
-- workbook the signature reached through the plant server can judge it. NULL for a signature given
-- before this step. Additive only: row images leave NULL columns out, so every row stored before
-- keeps the image it had and `audit verify` needs no fresh baseline.

ALTER TABLE sign_off ADD COLUMN portable_sha256 TEXT CHECK (length(portable_sha256) = 64);
