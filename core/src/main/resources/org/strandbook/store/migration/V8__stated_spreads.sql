-- Strandbook workbook, schema 8: the spreads a site states for the inputs of a loss budget, on a
-- catalog row or a single path element, each with its basis in the site's words. A spread is the
-- text a person writes ("±0.3 dB", "u 0.05 dB", "5..40 ppm"); NULL means "not stated": the element
-- falls back to its catalog row, the catalog row to the shipped default.
-- Additive only. The audit trail's row images leave NULL columns out, so every row stored before
-- this step keeps the image it had and `audit verify` needs no fresh baseline.

ALTER TABLE connector_type ADD COLUMN loss_spread TEXT CHECK (length(loss_spread) BETWEEN 1 AND 100);
ALTER TABLE connector_type ADD COLUMN spread_basis TEXT CHECK (length(spread_basis) BETWEEN 1 AND 500);

ALTER TABLE fiber_type ADD COLUMN oh_spread TEXT CHECK (length(oh_spread) BETWEEN 1 AND 100);
ALTER TABLE fiber_type ADD COLUMN attenuation_spread TEXT CHECK (length(attenuation_spread) BETWEEN 1 AND 100);
ALTER TABLE fiber_type ADD COLUMN spread_basis TEXT CHECK (length(spread_basis) BETWEEN 1 AND 500);

ALTER TABLE probe_type ADD COLUMN fixed_loss_spread TEXT CHECK (length(fixed_loss_spread) BETWEEN 1 AND 100);
ALTER TABLE probe_type ADD COLUMN spread_basis TEXT CHECK (length(spread_basis) BETWEEN 1 AND 500);

-- A joint fills loss_spread; a segment length_spread and bend_spread.
ALTER TABLE path_element ADD COLUMN loss_spread TEXT
    CHECK (loss_spread IS NULL OR (length(loss_spread) BETWEEN 1 AND 100 AND kind = 'JOINT'));
ALTER TABLE path_element ADD COLUMN length_spread TEXT
    CHECK (length_spread IS NULL OR (length(length_spread) BETWEEN 1 AND 100 AND kind = 'SEGMENT'));
ALTER TABLE path_element ADD COLUMN bend_spread TEXT
    CHECK (bend_spread IS NULL OR (length(bend_spread) BETWEEN 1 AND 100 AND kind = 'SEGMENT'));
ALTER TABLE path_element ADD COLUMN spread_basis TEXT CHECK (length(spread_basis) BETWEEN 1 AND 500);

-- A path copied before a maintenance action keeps the spreads it was judged with.
ALTER TABLE retired_path_element ADD COLUMN loss_spread TEXT;
ALTER TABLE retired_path_element ADD COLUMN length_spread TEXT;
ALTER TABLE retired_path_element ADD COLUMN bend_spread TEXT;
ALTER TABLE retired_path_element ADD COLUMN spread_basis TEXT;
