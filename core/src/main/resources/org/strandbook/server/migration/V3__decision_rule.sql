-- Strandbook plant server, schema 3: the site's decision rule (workbook schema 6) travels with the
-- site like its other editable records, so a clone judges its points by the rule the site chose
-- rather than falling back to the fixed tolerance.
CREATE TABLE decision_rule (
    site_id    bigint NOT NULL REFERENCES site (id),
    record_key text NOT NULL CHECK (record_key <> ''),
    fields     jsonb NOT NULL,
    revision   bigint NOT NULL DEFAULT 1,
    deleted    boolean NOT NULL DEFAULT false,
    changed_at timestamptz NOT NULL DEFAULT clock_timestamp(),
    changed_by name NOT NULL DEFAULT session_user,
    PRIMARY KEY (site_id, record_key)
);

CREATE TRIGGER decision_rule_audited AFTER INSERT OR UPDATE ON decision_rule FOR EACH ROW EXECUTE FUNCTION record_audited();
CREATE TRIGGER decision_rule_no_delete BEFORE DELETE ON decision_rule FOR EACH ROW EXECUTE FUNCTION refuse_change();
CREATE TRIGGER decision_rule_no_truncate BEFORE TRUNCATE ON decision_rule FOR EACH STATEMENT EXECUTE FUNCTION refuse_change();

GRANT SELECT, INSERT ON decision_rule TO strandbook_technician;
GRANT UPDATE (fields, revision, deleted, changed_at, changed_by) ON decision_rule TO strandbook_technician;

ALTER TABLE decision_rule ENABLE ROW LEVEL SECURITY;
CREATE POLICY members_only ON decision_rule USING (site_id IN (SELECT site_id FROM site_member WHERE member = session_user));
