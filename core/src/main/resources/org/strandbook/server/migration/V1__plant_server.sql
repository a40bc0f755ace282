-- Strandbook plant server, schema 1: many sites, each with the records of its workbook, and an
-- append-only audit trail per site. Applied by Flyway (org/strandbook/server/migration); a released
-- script is never edited.
--
-- A workbook row travels as its natural key (a tag, a code, a tag/direction/position, a scan's
-- SHA-256, a record's content digest) and its fields as JSON, with references to other rows named by
-- their natural keys too: each laptop numbers its own rows, so local ids mean nothing here.
--
-- Who may do what is the server's business, not only the program's:
--   * the role that runs this script owns everything (the plant's server administrator);
--   * strandbook_technician (granted to each technician's login role) reads and adds records and
--     edits the fields of editable ones, only on sites it is a member of (row-level security);
--   * nobody, the owner included, changes or deletes an audit row or an immutable record: triggers
--     refuse it, and the technician holds no UPDATE, DELETE or TRUNCATE privilege on them anyway.

DO $$
BEGIN
    IF NOT EXISTS (SELECT 1 FROM pg_roles WHERE rolname = 'strandbook_technician') THEN
        CREATE ROLE strandbook_technician NOLOGIN;
    END IF;
END
$$;

REVOKE ALL ON SCHEMA ${flyway:defaultSchema} FROM PUBLIC;
GRANT USAGE ON SCHEMA ${flyway:defaultSchema} TO strandbook_technician;
GRANT SELECT ON ${flyway:table} TO strandbook_technician;

CREATE TABLE site (
    id         bigint GENERATED ALWAYS AS IDENTITY PRIMARY KEY,
    name       text NOT NULL UNIQUE CHECK (name <> ''),
    created_at timestamptz NOT NULL DEFAULT now(),
    created_by name NOT NULL DEFAULT session_user
);

-- Which login roles work on which site.
CREATE TABLE site_member (
    site_id bigint NOT NULL REFERENCES site (id),
    member  name NOT NULL,
    PRIMARY KEY (site_id, member)
);

-- The site's audit trail: one row per record added or changed, written by triggers, chained per
-- site by SHA-256 over the previous hash and this row (see audit_hash).
CREATE TABLE audit_entry (
    id          bigint GENERATED ALWAYS AS IDENTITY PRIMARY KEY,
    site_id     bigint NOT NULL REFERENCES site (id),
    at          timestamptz NOT NULL DEFAULT clock_timestamp(),
    db_user     name NOT NULL,
    action      text NOT NULL CHECK (action IN ('INSERT', 'UPDATE')),
    table_name  text NOT NULL,
    record_key  text NOT NULL,
    old_fields  jsonb,
    new_fields  jsonb,
    prev_hash   text NOT NULL CHECK (length(prev_hash) = 64),
    hash        text NOT NULL CHECK (length(hash) = 64)
);
CREATE INDEX audit_entry_by_site ON audit_entry (site_id, id);

-- Which entries of which workbook's own audit trail the server took at each push.
CREATE TABLE workbook_push (
    id              bigint GENERATED ALWAYS AS IDENTITY PRIMARY KEY,
    site_id         bigint NOT NULL REFERENCES site (id),
    workbook_id     text NOT NULL,
    first_entry_id  bigint NOT NULL,
    last_entry_id   bigint NOT NULL CHECK (last_entry_id >= first_entry_id),
    last_entry_hash text NOT NULL CHECK (length(last_entry_hash) = 64),
    pushed_at       timestamptz NOT NULL DEFAULT clock_timestamp(),
    pushed_by       name NOT NULL DEFAULT session_user
);
CREATE INDEX workbook_push_by_site ON workbook_push (site_id, workbook_id, last_entry_id);

-- Each point's verdict as a laptop evaluated it at a sync: the fleet view reads these.
CREATE TABLE point_status (
    id           bigint GENERATED ALWAYS AS IDENTITY PRIMARY KEY,
    site_id      bigint NOT NULL REFERENCES site (id),
    tag          text NOT NULL,
    status       text NOT NULL CHECK (status IN ('PASS', 'REVIEW', 'FAIL', 'NOT_EVALUATED')),
    worst_band   text,
    margin_db    double precision,
    run_out_date date,
    evaluated_at timestamptz NOT NULL,
    recorded_by  name NOT NULL DEFAULT session_user
);
CREATE INDEX point_status_by_site ON point_status (site_id, tag, evaluated_at);

-- Editable records: the latest fields, a revision that moves at every change (a push names the
-- revision it started from, so two laptops never overwrite each other unseen), and deletion as a
-- flag, so that no row ever leaves the server.
CREATE TABLE site_record (
    site_id    bigint NOT NULL REFERENCES site (id),
    record_key text NOT NULL CHECK (record_key <> ''),
    fields     jsonb NOT NULL,
    revision   bigint NOT NULL DEFAULT 1,
    deleted    boolean NOT NULL DEFAULT false,
    changed_at timestamptz NOT NULL DEFAULT clock_timestamp(),
    changed_by name NOT NULL DEFAULT session_user,
    PRIMARY KEY (site_id, record_key)
);

CREATE TABLE analyzer (
    site_id    bigint NOT NULL REFERENCES site (id),
    record_key text NOT NULL CHECK (record_key <> ''),
    fields     jsonb NOT NULL,
    revision   bigint NOT NULL DEFAULT 1,
    deleted    boolean NOT NULL DEFAULT false,
    changed_at timestamptz NOT NULL DEFAULT clock_timestamp(),
    changed_by name NOT NULL DEFAULT session_user,
    PRIMARY KEY (site_id, record_key)
);

CREATE TABLE fiber_type (
    site_id    bigint NOT NULL REFERENCES site (id),
    record_key text NOT NULL CHECK (record_key <> ''),
    fields     jsonb NOT NULL,
    revision   bigint NOT NULL DEFAULT 1,
    deleted    boolean NOT NULL DEFAULT false,
    changed_at timestamptz NOT NULL DEFAULT clock_timestamp(),
    changed_by name NOT NULL DEFAULT session_user,
    PRIMARY KEY (site_id, record_key)
);

CREATE TABLE fiber_attenuation (
    site_id    bigint NOT NULL REFERENCES site (id),
    record_key text NOT NULL CHECK (record_key <> ''),
    fields     jsonb NOT NULL,
    revision   bigint NOT NULL DEFAULT 1,
    deleted    boolean NOT NULL DEFAULT false,
    changed_at timestamptz NOT NULL DEFAULT clock_timestamp(),
    changed_by name NOT NULL DEFAULT session_user,
    PRIMARY KEY (site_id, record_key)
);

CREATE TABLE connector_type (
    site_id    bigint NOT NULL REFERENCES site (id),
    record_key text NOT NULL CHECK (record_key <> ''),
    fields     jsonb NOT NULL,
    revision   bigint NOT NULL DEFAULT 1,
    deleted    boolean NOT NULL DEFAULT false,
    changed_at timestamptz NOT NULL DEFAULT clock_timestamp(),
    changed_by name NOT NULL DEFAULT session_user,
    PRIMARY KEY (site_id, record_key)
);

CREATE TABLE probe_type (
    site_id    bigint NOT NULL REFERENCES site (id),
    record_key text NOT NULL CHECK (record_key <> ''),
    fields     jsonb NOT NULL,
    revision   bigint NOT NULL DEFAULT 1,
    deleted    boolean NOT NULL DEFAULT false,
    changed_at timestamptz NOT NULL DEFAULT clock_timestamp(),
    changed_by name NOT NULL DEFAULT session_user,
    PRIMARY KEY (site_id, record_key)
);

CREATE TABLE point (
    site_id    bigint NOT NULL REFERENCES site (id),
    record_key text NOT NULL CHECK (record_key <> ''),
    fields     jsonb NOT NULL,
    revision   bigint NOT NULL DEFAULT 1,
    deleted    boolean NOT NULL DEFAULT false,
    changed_at timestamptz NOT NULL DEFAULT clock_timestamp(),
    changed_by name NOT NULL DEFAULT session_user,
    PRIMARY KEY (site_id, record_key)
);

CREATE TABLE point_band (
    site_id    bigint NOT NULL REFERENCES site (id),
    record_key text NOT NULL CHECK (record_key <> ''),
    fields     jsonb NOT NULL,
    revision   bigint NOT NULL DEFAULT 1,
    deleted    boolean NOT NULL DEFAULT false,
    changed_at timestamptz NOT NULL DEFAULT clock_timestamp(),
    changed_by name NOT NULL DEFAULT session_user,
    PRIMARY KEY (site_id, record_key)
);

CREATE TABLE path_element (
    site_id    bigint NOT NULL REFERENCES site (id),
    record_key text NOT NULL CHECK (record_key <> ''),
    fields     jsonb NOT NULL,
    revision   bigint NOT NULL DEFAULT 1,
    deleted    boolean NOT NULL DEFAULT false,
    changed_at timestamptz NOT NULL DEFAULT clock_timestamp(),
    changed_by name NOT NULL DEFAULT session_user,
    PRIMARY KEY (site_id, record_key)
);

CREATE TABLE segment_bend (
    site_id    bigint NOT NULL REFERENCES site (id),
    record_key text NOT NULL CHECK (record_key <> ''),
    fields     jsonb NOT NULL,
    revision   bigint NOT NULL DEFAULT 1,
    deleted    boolean NOT NULL DEFAULT false,
    changed_at timestamptz NOT NULL DEFAULT clock_timestamp(),
    changed_by name NOT NULL DEFAULT session_user,
    PRIMARY KEY (site_id, record_key)
);

-- Immutable records: written once, never changed. A scan's spectrum is the workbook's BLOB as is
-- (n little-endian binary64 wavelengths in nm, then n values).
CREATE TABLE scan (
    site_id    bigint NOT NULL REFERENCES site (id),
    record_key text NOT NULL CHECK (record_key <> ''),
    fields     jsonb NOT NULL,
    spectrum   bytea NOT NULL,
    added_at   timestamptz NOT NULL DEFAULT clock_timestamp(),
    added_by   name NOT NULL DEFAULT session_user,
    PRIMARY KEY (site_id, record_key)
);

CREATE TABLE inspection (
    site_id    bigint NOT NULL REFERENCES site (id),
    record_key text NOT NULL CHECK (record_key <> ''),
    fields     jsonb NOT NULL,
    added_at   timestamptz NOT NULL DEFAULT clock_timestamp(),
    added_by   name NOT NULL DEFAULT session_user,
    PRIMARY KEY (site_id, record_key)
);

CREATE TABLE maintenance_action (
    site_id    bigint NOT NULL REFERENCES site (id),
    record_key text NOT NULL CHECK (record_key <> ''),
    fields     jsonb NOT NULL,
    added_at   timestamptz NOT NULL DEFAULT clock_timestamp(),
    added_by   name NOT NULL DEFAULT session_user,
    PRIMARY KEY (site_id, record_key)
);

CREATE TABLE note (
    site_id    bigint NOT NULL REFERENCES site (id),
    record_key text NOT NULL CHECK (record_key <> ''),
    fields     jsonb NOT NULL,
    added_at   timestamptz NOT NULL DEFAULT clock_timestamp(),
    added_by   name NOT NULL DEFAULT session_user,
    PRIMARY KEY (site_id, record_key)
);

CREATE TABLE sign_off (
    site_id    bigint NOT NULL REFERENCES site (id),
    record_key text NOT NULL CHECK (record_key <> ''),
    fields     jsonb NOT NULL,
    added_at   timestamptz NOT NULL DEFAULT clock_timestamp(),
    added_by   name NOT NULL DEFAULT session_user,
    PRIMARY KEY (site_id, record_key)
);

CREATE TABLE retired_path_element (
    site_id    bigint NOT NULL REFERENCES site (id),
    record_key text NOT NULL CHECK (record_key <> ''),
    fields     jsonb NOT NULL,
    added_at   timestamptz NOT NULL DEFAULT clock_timestamp(),
    added_by   name NOT NULL DEFAULT session_user,
    PRIMARY KEY (site_id, record_key)
);

CREATE FUNCTION audit_hash(prev text, id bigint, at timestamptz, db_user name, action text, table_name text,
                           record_key text, old_fields jsonb, new_fields jsonb) RETURNS text
    LANGUAGE sql IMMUTABLE AS $$
    SELECT encode(sha256(convert_to(concat_ws(E'\n', prev, id::text,
        to_char(at AT TIME ZONE 'UTC', 'YYYY-MM-DD"T"HH24:MI:SS.US"Z"'), db_user::text, action, table_name,
        record_key, coalesce(old_fields::text, '-'), coalesce(new_fields::text, '-')), 'UTF8')), 'hex')
$$;

-- Runs as the owner, so that a technician can add audit rows only through a change of a record.
CREATE FUNCTION record_audited() RETURNS trigger
    LANGUAGE plpgsql SECURITY DEFINER SET search_path = ${flyway:defaultSchema}, pg_temp AS $$
DECLARE
    prev      text;
    next_id   bigint;
    stamp     timestamptz := clock_timestamp();
    old_value jsonb;
    new_value jsonb := NEW.fields;
BEGIN
    -- to_jsonb: immutable records have no deleted column, and plpgsql cannot name one it lacks
    IF (to_jsonb(NEW) ->> 'deleted') = 'true' THEN
        new_value := jsonb_build_object('deleted', true);
    END IF;
    IF TG_OP = 'UPDATE' THEN
        old_value := OLD.fields;
        IF (to_jsonb(OLD) ->> 'deleted') = 'true' THEN
            old_value := jsonb_build_object('deleted', true);
        END IF;
        IF new_value IS NOT DISTINCT FROM old_value THEN
            RETURN NEW;
        END IF;
    END IF;
    -- one writer per site at a time extends that site's chain
    PERFORM pg_advisory_xact_lock(NEW.site_id);
    SELECT hash INTO prev FROM audit_entry WHERE site_id = NEW.site_id ORDER BY id DESC LIMIT 1;
    prev := coalesce(prev, repeat('0', 64));
    next_id := nextval(pg_get_serial_sequence('audit_entry', 'id'));
    INSERT INTO audit_entry (id, site_id, at, db_user, action, table_name, record_key, old_fields, new_fields,
                             prev_hash, hash)
    OVERRIDING SYSTEM VALUE
    VALUES (next_id, NEW.site_id, stamp, session_user, TG_OP, TG_TABLE_NAME, NEW.record_key, old_value, new_value,
            prev, audit_hash(prev, next_id, stamp, session_user, TG_OP, TG_TABLE_NAME, NEW.record_key, old_value,
                             new_value));
    RETURN NEW;
END
$$;

CREATE FUNCTION refuse_change() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
    RAISE EXCEPTION '% rows are append-only: they cannot be changed or deleted', TG_TABLE_NAME
        USING ERRCODE = 'insufficient_privilege';
END
$$;

CREATE TRIGGER audit_entry_append_only BEFORE UPDATE OR DELETE ON audit_entry FOR EACH ROW EXECUTE FUNCTION refuse_change();
CREATE TRIGGER audit_entry_no_truncate BEFORE TRUNCATE ON audit_entry FOR EACH STATEMENT EXECUTE FUNCTION refuse_change();
CREATE TRIGGER workbook_push_append_only BEFORE UPDATE OR DELETE ON workbook_push FOR EACH ROW EXECUTE FUNCTION refuse_change();
CREATE TRIGGER workbook_push_no_truncate BEFORE TRUNCATE ON workbook_push FOR EACH STATEMENT EXECUTE FUNCTION refuse_change();
CREATE TRIGGER point_status_append_only BEFORE UPDATE OR DELETE ON point_status FOR EACH ROW EXECUTE FUNCTION refuse_change();
CREATE TRIGGER point_status_no_truncate BEFORE TRUNCATE ON point_status FOR EACH STATEMENT EXECUTE FUNCTION refuse_change();
CREATE TRIGGER scan_append_only BEFORE UPDATE OR DELETE ON scan FOR EACH ROW EXECUTE FUNCTION refuse_change();
CREATE TRIGGER scan_no_truncate BEFORE TRUNCATE ON scan FOR EACH STATEMENT EXECUTE FUNCTION refuse_change();
CREATE TRIGGER inspection_append_only BEFORE UPDATE OR DELETE ON inspection FOR EACH ROW EXECUTE FUNCTION refuse_change();
CREATE TRIGGER inspection_no_truncate BEFORE TRUNCATE ON inspection FOR EACH STATEMENT EXECUTE FUNCTION refuse_change();
CREATE TRIGGER maintenance_action_append_only BEFORE UPDATE OR DELETE ON maintenance_action FOR EACH ROW EXECUTE FUNCTION refuse_change();
CREATE TRIGGER maintenance_action_no_truncate BEFORE TRUNCATE ON maintenance_action FOR EACH STATEMENT EXECUTE FUNCTION refuse_change();
CREATE TRIGGER note_append_only BEFORE UPDATE OR DELETE ON note FOR EACH ROW EXECUTE FUNCTION refuse_change();
CREATE TRIGGER note_no_truncate BEFORE TRUNCATE ON note FOR EACH STATEMENT EXECUTE FUNCTION refuse_change();
CREATE TRIGGER sign_off_append_only BEFORE UPDATE OR DELETE ON sign_off FOR EACH ROW EXECUTE FUNCTION refuse_change();
CREATE TRIGGER sign_off_no_truncate BEFORE TRUNCATE ON sign_off FOR EACH STATEMENT EXECUTE FUNCTION refuse_change();
CREATE TRIGGER retired_path_element_append_only BEFORE UPDATE OR DELETE ON retired_path_element FOR EACH ROW EXECUTE FUNCTION refuse_change();
CREATE TRIGGER retired_path_element_no_truncate BEFORE TRUNCATE ON retired_path_element FOR EACH STATEMENT EXECUTE FUNCTION refuse_change();

CREATE TRIGGER site_record_audited AFTER INSERT OR UPDATE ON site_record FOR EACH ROW EXECUTE FUNCTION record_audited();
CREATE TRIGGER site_record_no_delete BEFORE DELETE ON site_record FOR EACH ROW EXECUTE FUNCTION refuse_change();
CREATE TRIGGER site_record_no_truncate BEFORE TRUNCATE ON site_record FOR EACH STATEMENT EXECUTE FUNCTION refuse_change();
CREATE TRIGGER analyzer_audited AFTER INSERT OR UPDATE ON analyzer FOR EACH ROW EXECUTE FUNCTION record_audited();
CREATE TRIGGER analyzer_no_delete BEFORE DELETE ON analyzer FOR EACH ROW EXECUTE FUNCTION refuse_change();
CREATE TRIGGER analyzer_no_truncate BEFORE TRUNCATE ON analyzer FOR EACH STATEMENT EXECUTE FUNCTION refuse_change();
CREATE TRIGGER fiber_type_audited AFTER INSERT OR UPDATE ON fiber_type FOR EACH ROW EXECUTE FUNCTION record_audited();
CREATE TRIGGER fiber_type_no_delete BEFORE DELETE ON fiber_type FOR EACH ROW EXECUTE FUNCTION refuse_change();
CREATE TRIGGER fiber_type_no_truncate BEFORE TRUNCATE ON fiber_type FOR EACH STATEMENT EXECUTE FUNCTION refuse_change();
CREATE TRIGGER fiber_attenuation_audited AFTER INSERT OR UPDATE ON fiber_attenuation FOR EACH ROW EXECUTE FUNCTION record_audited();
CREATE TRIGGER fiber_attenuation_no_delete BEFORE DELETE ON fiber_attenuation FOR EACH ROW EXECUTE FUNCTION refuse_change();
CREATE TRIGGER fiber_attenuation_no_truncate BEFORE TRUNCATE ON fiber_attenuation FOR EACH STATEMENT EXECUTE FUNCTION refuse_change();
CREATE TRIGGER connector_type_audited AFTER INSERT OR UPDATE ON connector_type FOR EACH ROW EXECUTE FUNCTION record_audited();
CREATE TRIGGER connector_type_no_delete BEFORE DELETE ON connector_type FOR EACH ROW EXECUTE FUNCTION refuse_change();
CREATE TRIGGER connector_type_no_truncate BEFORE TRUNCATE ON connector_type FOR EACH STATEMENT EXECUTE FUNCTION refuse_change();
CREATE TRIGGER probe_type_audited AFTER INSERT OR UPDATE ON probe_type FOR EACH ROW EXECUTE FUNCTION record_audited();
CREATE TRIGGER probe_type_no_delete BEFORE DELETE ON probe_type FOR EACH ROW EXECUTE FUNCTION refuse_change();
CREATE TRIGGER probe_type_no_truncate BEFORE TRUNCATE ON probe_type FOR EACH STATEMENT EXECUTE FUNCTION refuse_change();
CREATE TRIGGER point_audited AFTER INSERT OR UPDATE ON point FOR EACH ROW EXECUTE FUNCTION record_audited();
CREATE TRIGGER point_no_delete BEFORE DELETE ON point FOR EACH ROW EXECUTE FUNCTION refuse_change();
CREATE TRIGGER point_no_truncate BEFORE TRUNCATE ON point FOR EACH STATEMENT EXECUTE FUNCTION refuse_change();
CREATE TRIGGER point_band_audited AFTER INSERT OR UPDATE ON point_band FOR EACH ROW EXECUTE FUNCTION record_audited();
CREATE TRIGGER point_band_no_delete BEFORE DELETE ON point_band FOR EACH ROW EXECUTE FUNCTION refuse_change();
CREATE TRIGGER point_band_no_truncate BEFORE TRUNCATE ON point_band FOR EACH STATEMENT EXECUTE FUNCTION refuse_change();
CREATE TRIGGER path_element_audited AFTER INSERT OR UPDATE ON path_element FOR EACH ROW EXECUTE FUNCTION record_audited();
CREATE TRIGGER path_element_no_delete BEFORE DELETE ON path_element FOR EACH ROW EXECUTE FUNCTION refuse_change();
CREATE TRIGGER path_element_no_truncate BEFORE TRUNCATE ON path_element FOR EACH STATEMENT EXECUTE FUNCTION refuse_change();
CREATE TRIGGER segment_bend_audited AFTER INSERT OR UPDATE ON segment_bend FOR EACH ROW EXECUTE FUNCTION record_audited();
CREATE TRIGGER segment_bend_no_delete BEFORE DELETE ON segment_bend FOR EACH ROW EXECUTE FUNCTION refuse_change();
CREATE TRIGGER segment_bend_no_truncate BEFORE TRUNCATE ON segment_bend FOR EACH STATEMENT EXECUTE FUNCTION refuse_change();
CREATE TRIGGER scan_audited AFTER INSERT ON scan FOR EACH ROW EXECUTE FUNCTION record_audited();
CREATE TRIGGER inspection_audited AFTER INSERT ON inspection FOR EACH ROW EXECUTE FUNCTION record_audited();
CREATE TRIGGER maintenance_action_audited AFTER INSERT ON maintenance_action FOR EACH ROW EXECUTE FUNCTION record_audited();
CREATE TRIGGER note_audited AFTER INSERT ON note FOR EACH ROW EXECUTE FUNCTION record_audited();
CREATE TRIGGER sign_off_audited AFTER INSERT ON sign_off FOR EACH ROW EXECUTE FUNCTION record_audited();
CREATE TRIGGER retired_path_element_audited AFTER INSERT ON retired_path_element FOR EACH ROW EXECUTE FUNCTION record_audited();

-- A technician opens a site by name: a new site is created with the caller as its first member; an
-- existing one only for its members.
CREATE FUNCTION open_site(site_name text) RETURNS bigint
    LANGUAGE plpgsql SECURITY DEFINER SET search_path = ${flyway:defaultSchema}, pg_temp AS $$
DECLARE
    found bigint;
BEGIN
    PERFORM pg_advisory_xact_lock(hashtext('strandbook site ' || site_name));
    SELECT id INTO found FROM site WHERE name = site_name;
    IF found IS NULL THEN
        INSERT INTO site (name) VALUES (site_name) RETURNING id INTO found;
        INSERT INTO site_member (site_id, member) VALUES (found, session_user);
        RETURN found;
    END IF;
    IF NOT EXISTS (SELECT 1 FROM site_member WHERE site_id = found AND member = session_user)
            AND NOT EXISTS (SELECT 1 FROM site WHERE id = found AND created_by = session_user)
            AND pg_has_role(session_user, 'strandbook_technician', 'MEMBER')
            AND NOT (SELECT rolsuper FROM pg_roles WHERE rolname = session_user) THEN
        RAISE EXCEPTION 'site "%" exists and % is not one of its members', site_name, session_user
            USING ERRCODE = 'insufficient_privilege';
    END IF;
    RETURN found;
END
$$;
REVOKE ALL ON FUNCTION open_site(text) FROM PUBLIC;
GRANT EXECUTE ON FUNCTION open_site(text) TO strandbook_technician;
REVOKE ALL ON FUNCTION record_audited() FROM PUBLIC;

GRANT SELECT ON site, site_member, audit_entry TO strandbook_technician;
GRANT SELECT, INSERT ON workbook_push, point_status TO strandbook_technician;
GRANT SELECT, INSERT ON site_record, analyzer, fiber_type, fiber_attenuation, connector_type, probe_type, point, point_band, path_element, segment_bend, scan, inspection, maintenance_action, note, sign_off, retired_path_element TO strandbook_technician;
GRANT UPDATE (fields, revision, deleted, changed_at, changed_by) ON site_record, analyzer, fiber_type, fiber_attenuation, connector_type, probe_type, point, point_band, path_element, segment_bend TO strandbook_technician;

-- Row-level security: a technician sees and writes only the sites it is a member of. The owner is
-- not subject to it (it administers every site).
ALTER TABLE site ENABLE ROW LEVEL SECURITY;
CREATE POLICY members_only ON site USING (id IN (SELECT site_id FROM site_member WHERE member = session_user));
ALTER TABLE site_member ENABLE ROW LEVEL SECURITY;
CREATE POLICY own_memberships ON site_member USING (member = session_user);
ALTER TABLE audit_entry ENABLE ROW LEVEL SECURITY;
CREATE POLICY members_only ON audit_entry USING (site_id IN (SELECT site_id FROM site_member WHERE member = session_user));
ALTER TABLE workbook_push ENABLE ROW LEVEL SECURITY;
CREATE POLICY members_only ON workbook_push USING (site_id IN (SELECT site_id FROM site_member WHERE member = session_user));
ALTER TABLE point_status ENABLE ROW LEVEL SECURITY;
CREATE POLICY members_only ON point_status USING (site_id IN (SELECT site_id FROM site_member WHERE member = session_user));
ALTER TABLE site_record ENABLE ROW LEVEL SECURITY;
CREATE POLICY members_only ON site_record USING (site_id IN (SELECT site_id FROM site_member WHERE member = session_user));
ALTER TABLE analyzer ENABLE ROW LEVEL SECURITY;
CREATE POLICY members_only ON analyzer USING (site_id IN (SELECT site_id FROM site_member WHERE member = session_user));
ALTER TABLE fiber_type ENABLE ROW LEVEL SECURITY;
CREATE POLICY members_only ON fiber_type USING (site_id IN (SELECT site_id FROM site_member WHERE member = session_user));
ALTER TABLE fiber_attenuation ENABLE ROW LEVEL SECURITY;
CREATE POLICY members_only ON fiber_attenuation USING (site_id IN (SELECT site_id FROM site_member WHERE member = session_user));
ALTER TABLE connector_type ENABLE ROW LEVEL SECURITY;
CREATE POLICY members_only ON connector_type USING (site_id IN (SELECT site_id FROM site_member WHERE member = session_user));
ALTER TABLE probe_type ENABLE ROW LEVEL SECURITY;
CREATE POLICY members_only ON probe_type USING (site_id IN (SELECT site_id FROM site_member WHERE member = session_user));
ALTER TABLE point ENABLE ROW LEVEL SECURITY;
CREATE POLICY members_only ON point USING (site_id IN (SELECT site_id FROM site_member WHERE member = session_user));
ALTER TABLE point_band ENABLE ROW LEVEL SECURITY;
CREATE POLICY members_only ON point_band USING (site_id IN (SELECT site_id FROM site_member WHERE member = session_user));
ALTER TABLE path_element ENABLE ROW LEVEL SECURITY;
CREATE POLICY members_only ON path_element USING (site_id IN (SELECT site_id FROM site_member WHERE member = session_user));
ALTER TABLE segment_bend ENABLE ROW LEVEL SECURITY;
CREATE POLICY members_only ON segment_bend USING (site_id IN (SELECT site_id FROM site_member WHERE member = session_user));
ALTER TABLE scan ENABLE ROW LEVEL SECURITY;
CREATE POLICY members_only ON scan USING (site_id IN (SELECT site_id FROM site_member WHERE member = session_user));
ALTER TABLE inspection ENABLE ROW LEVEL SECURITY;
CREATE POLICY members_only ON inspection USING (site_id IN (SELECT site_id FROM site_member WHERE member = session_user));
ALTER TABLE maintenance_action ENABLE ROW LEVEL SECURITY;
CREATE POLICY members_only ON maintenance_action USING (site_id IN (SELECT site_id FROM site_member WHERE member = session_user));
ALTER TABLE note ENABLE ROW LEVEL SECURITY;
CREATE POLICY members_only ON note USING (site_id IN (SELECT site_id FROM site_member WHERE member = session_user));
ALTER TABLE sign_off ENABLE ROW LEVEL SECURITY;
CREATE POLICY members_only ON sign_off USING (site_id IN (SELECT site_id FROM site_member WHERE member = session_user));
ALTER TABLE retired_path_element ENABLE ROW LEVEL SECURITY;
CREATE POLICY members_only ON retired_path_element USING (site_id IN (SELECT site_id FROM site_member WHERE member = session_user));
