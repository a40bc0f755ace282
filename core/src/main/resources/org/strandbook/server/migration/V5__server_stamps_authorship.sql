-- Strandbook plant server, schema 5: who added or changed a row, and when, is the server's word.
-- Up to schema 4 the columns that say so (added_by/added_at, changed_by/changed_at, pushed_by/
-- pushed_at, recorded_by) only had defaults, and a technician who wrote SQL by hand could name
-- another login or another time in them. The audit trail was never open to that (its rows are
-- written by a trigger from session_user and the server's clock); the records themselves now are
-- not either:
--   * a technician may insert only the columns that carry the record itself, so the rest take
--     their defaults (column privileges, checked by the server before any row is written);
--   * an editable record's edit may set only its fields and its removal flag; a trigger then
--     moves the revision by one and stamps the server's clock and the session's login, whoever
--     runs the statement.

REVOKE INSERT, UPDATE ON site_record, decision_rule, analyzer, fiber_type, fiber_attenuation, connector_type,
    probe_type, point, point_band, path_element, segment_bend FROM strandbook_technician;
GRANT INSERT (site_id, record_key, fields) ON site_record, decision_rule, analyzer, fiber_type, fiber_attenuation,
    connector_type, probe_type, point, point_band, path_element, segment_bend TO strandbook_technician;
GRANT UPDATE (fields, deleted) ON site_record, decision_rule, analyzer, fiber_type, fiber_attenuation,
    connector_type, probe_type, point, point_band, path_element, segment_bend TO strandbook_technician;

REVOKE INSERT ON scan, inspection, maintenance_action, note, sign_off, retired_path_element, scan_removal
    FROM strandbook_technician;
GRANT INSERT (site_id, record_key, fields, spectrum) ON scan TO strandbook_technician;
GRANT INSERT (site_id, record_key, fields) ON inspection, maintenance_action, note, sign_off, retired_path_element,
    scan_removal TO strandbook_technician;

REVOKE INSERT ON workbook_push, point_status FROM strandbook_technician;
GRANT INSERT (site_id, workbook_id, first_entry_id, last_entry_id, last_entry_hash) ON workbook_push
    TO strandbook_technician;
GRANT INSERT (site_id, tag, status, worst_band, margin_db, run_out_date, evaluated_at) ON point_status
    TO strandbook_technician;

CREATE FUNCTION record_change_stamped() RETURNS trigger
    LANGUAGE plpgsql AS $$
BEGIN
    NEW.revision := OLD.revision + 1;
    NEW.changed_at := clock_timestamp();
    NEW.changed_by := session_user;
    RETURN NEW;
END
$$;

DO $$
DECLARE
    t text;
BEGIN
    FOREACH t IN ARRAY ARRAY['site_record', 'decision_rule', 'analyzer', 'fiber_type', 'fiber_attenuation',
            'connector_type', 'probe_type', 'point', 'point_band', 'path_element', 'segment_bend'] LOOP
        EXECUTE format('CREATE TRIGGER %I BEFORE UPDATE ON %I FOR EACH ROW EXECUTE FUNCTION record_change_stamped()',
            t || '_change_stamped', t);
    END LOOP;
END
$$;
