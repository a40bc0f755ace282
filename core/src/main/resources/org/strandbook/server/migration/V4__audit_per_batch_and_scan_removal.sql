-- Strandbook plant server, schema 4.
--
-- 1. Immutable records added by one statement leave ONE audit row, not one per record. A first sync
--    pushes tens of thousands of scans; a row per scan cost most of the push (a plpgsql INSERT, a
--    sequence step and a SHA-256 per record) and 877 bytes per scan. The row names every record it
--    covers (new_fields.keys, in key order), how many (new_fields.records), and the SHA-256 of those
--    records as stored (new_fields.sha256, see records_digest), so the entry is still chained,
--    append-only and checkable against the rows it speaks for: records_digest recomputes it.
--    Edits of editable records keep their row per change (old and new fields).
-- 2. A scan removed from a workbook (a wrong import) travels as a removal record: the scan stays on
--    the server, immutable, and the removal (its own immutable, audited record, keyed by the scan's
--    SHA-256) tells every workbook to drop it and the fleet and clones to leave it out.

-- The SHA-256 (hex) of the records of one table with these keys, as the batch audit row hashes them:
-- per record in key order its key, its fields as text and, for a scan, the SHA-256 of its spectrum,
-- tab-separated, one record per line.
CREATE FUNCTION records_digest(table_name text, site bigint, keys text[]) RETURNS text
    LANGUAGE plpgsql STABLE AS $$
DECLARE
    digest text;
BEGIN
    EXECUTE format('SELECT encode(sha256(convert_to(string_agg(concat_ws(E''\t'', r.record_key, r.fields::text, %s),'
        || ' E''\n'' ORDER BY r.record_key), ''UTF8'')), ''hex'') FROM %I r WHERE r.site_id = $1'
        || ' AND r.record_key = ANY ($2)',
        CASE WHEN table_name = 'scan' THEN 'encode(sha256(r.spectrum), ''hex'')' ELSE 'NULL' END, table_name)
        INTO digest USING site, keys;
    RETURN digest;
END
$$;

CREATE FUNCTION records_added_in_batch() RETURNS trigger
    LANGUAGE plpgsql SECURITY DEFINER SET search_path = ${flyway:defaultSchema}, pg_temp AS $$
DECLARE
    r         record;
    prev      text;
    next_id   bigint;
    stamp     timestamptz;
    summary   jsonb;
    covers    text;
BEGIN
    FOR r IN EXECUTE format('SELECT a.site_id, count(*) AS n, jsonb_agg(a.record_key ORDER BY a.record_key) AS keys,'
        || ' encode(sha256(convert_to(string_agg(concat_ws(E''\t'', a.record_key, a.fields::text, %s), E''\n'''
        || ' ORDER BY a.record_key), ''UTF8'')), ''hex'') AS digest FROM added a GROUP BY a.site_id'
        || ' ORDER BY a.site_id',
        CASE WHEN TG_TABLE_NAME = 'scan' THEN 'encode(sha256(a.spectrum), ''hex'')' ELSE 'NULL' END) LOOP
        -- one writer per site at a time extends that site's chain
        PERFORM pg_advisory_xact_lock(r.site_id);
        SELECT hash INTO prev FROM audit_entry WHERE site_id = r.site_id ORDER BY id DESC LIMIT 1;
        prev := coalesce(prev, repeat('0', 64));
        next_id := nextval(pg_get_serial_sequence('audit_entry', 'id'));
        stamp := clock_timestamp();
        summary := jsonb_build_object('records', r.n, 'keys', r.keys, 'sha256', r.digest);
        -- a batch of one is named by its record, as a row trigger named it
        covers := CASE WHEN r.n = 1 THEN r.keys ->> 0 ELSE r.n || ' records' END;
        INSERT INTO audit_entry (id, site_id, at, db_user, action, table_name, record_key, old_fields, new_fields,
                                 prev_hash, hash)
        OVERRIDING SYSTEM VALUE
        VALUES (next_id, r.site_id, stamp, session_user, 'INSERT', TG_TABLE_NAME, covers, NULL, summary, prev,
                audit_hash(prev, next_id, stamp, session_user, 'INSERT', TG_TABLE_NAME, covers, NULL, summary));
    END LOOP;
    RETURN NULL;
END
$$;
REVOKE ALL ON FUNCTION records_added_in_batch() FROM PUBLIC;

DO $$
DECLARE
    t text;
BEGIN
    FOREACH t IN ARRAY ARRAY['scan', 'inspection', 'maintenance_action', 'note', 'sign_off', 'retired_path_element'] LOOP
        EXECUTE format('DROP TRIGGER %I ON %I', t || '_audited', t);
        EXECUTE format('CREATE TRIGGER %I AFTER INSERT ON %I REFERENCING NEW TABLE AS added'
            || ' FOR EACH STATEMENT EXECUTE FUNCTION records_added_in_batch()', t || '_audited', t);
    END LOOP;
END
$$;

-- A scan removed from a workbook: keyed by the scan's SHA-256; fields name the workbook user who removed
-- it, added_at and added_by when and through which login the removal reached the server.
CREATE TABLE scan_removal (
    site_id    bigint NOT NULL REFERENCES site (id),
    record_key text NOT NULL CHECK (record_key <> ''),
    fields     jsonb NOT NULL,
    added_at   timestamptz NOT NULL DEFAULT clock_timestamp(),
    added_by   name NOT NULL DEFAULT session_user,
    PRIMARY KEY (site_id, record_key)
);
CREATE TRIGGER scan_removal_append_only BEFORE UPDATE OR DELETE ON scan_removal FOR EACH ROW EXECUTE FUNCTION refuse_change();
CREATE TRIGGER scan_removal_no_truncate BEFORE TRUNCATE ON scan_removal FOR EACH STATEMENT EXECUTE FUNCTION refuse_change();
CREATE TRIGGER scan_removal_audited AFTER INSERT ON scan_removal REFERENCING NEW TABLE AS added
    FOR EACH STATEMENT EXECUTE FUNCTION records_added_in_batch();

GRANT SELECT, INSERT ON scan_removal TO strandbook_technician;
ALTER TABLE scan_removal ENABLE ROW LEVEL SECURITY;
CREATE POLICY members_only ON scan_removal USING (site_id IN (SELECT site_id FROM site_member WHERE member = session_user));
