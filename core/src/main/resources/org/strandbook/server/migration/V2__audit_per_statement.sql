-- Strandbook plant server, schema 2: immutable records are audited once per statement, not once per
-- row. A first sync pushes tens of thousands of scans in multi-row INSERTs (the driver's rewritten
-- batches); a row trigger paid the trigger call, the site lock and the lookup of the chain's head for
-- every row. The trail is the same: one row per record, chained per site in key order within a
-- statement, with the same audit_hash.

CREATE FUNCTION records_added_audited() RETURNS trigger
    LANGUAGE plpgsql SECURITY DEFINER SET search_path = ${flyway:defaultSchema}, pg_temp AS $$
DECLARE
    r         record;
    site      bigint;
    prev      text;
    next_id   bigint;
    stamp     timestamptz;
    row_hash  text;
BEGIN
    FOR r IN SELECT a.site_id, a.record_key, a.fields FROM added a ORDER BY a.site_id, a.record_key LOOP
        IF site IS DISTINCT FROM r.site_id THEN
            site := r.site_id;
            -- one writer per site at a time extends that site's chain
            PERFORM pg_advisory_xact_lock(site);
            SELECT hash INTO prev FROM audit_entry WHERE site_id = site ORDER BY id DESC LIMIT 1;
            prev := coalesce(prev, repeat('0', 64));
        END IF;
        next_id := nextval(pg_get_serial_sequence('audit_entry', 'id'));
        stamp := clock_timestamp();
        row_hash := audit_hash(prev, next_id, stamp, session_user, 'INSERT', TG_TABLE_NAME, r.record_key, NULL, r.fields);
        INSERT INTO audit_entry (id, site_id, at, db_user, action, table_name, record_key, old_fields, new_fields,
                                 prev_hash, hash)
        OVERRIDING SYSTEM VALUE
        VALUES (next_id, site, stamp, session_user, 'INSERT', TG_TABLE_NAME, r.record_key, NULL, r.fields, prev,
                row_hash);
        prev := row_hash;
    END LOOP;
    RETURN NULL;
END
$$;
REVOKE ALL ON FUNCTION records_added_audited() FROM PUBLIC;

DROP TRIGGER scan_audited ON scan;
CREATE TRIGGER scan_audited AFTER INSERT ON scan REFERENCING NEW TABLE AS added
    FOR EACH STATEMENT EXECUTE FUNCTION records_added_audited();
DROP TRIGGER inspection_audited ON inspection;
CREATE TRIGGER inspection_audited AFTER INSERT ON inspection REFERENCING NEW TABLE AS added
    FOR EACH STATEMENT EXECUTE FUNCTION records_added_audited();
DROP TRIGGER maintenance_action_audited ON maintenance_action;
CREATE TRIGGER maintenance_action_audited AFTER INSERT ON maintenance_action REFERENCING NEW TABLE AS added
    FOR EACH STATEMENT EXECUTE FUNCTION records_added_audited();
DROP TRIGGER note_audited ON note;
CREATE TRIGGER note_audited AFTER INSERT ON note REFERENCING NEW TABLE AS added
    FOR EACH STATEMENT EXECUTE FUNCTION records_added_audited();
DROP TRIGGER sign_off_audited ON sign_off;
CREATE TRIGGER sign_off_audited AFTER INSERT ON sign_off REFERENCING NEW TABLE AS added
    FOR EACH STATEMENT EXECUTE FUNCTION records_added_audited();
DROP TRIGGER retired_path_element_audited ON retired_path_element;
CREATE TRIGGER retired_path_element_audited AFTER INSERT ON retired_path_element REFERENCING NEW TABLE AS added
    FOR EACH STATEMENT EXECUTE FUNCTION records_added_audited();
