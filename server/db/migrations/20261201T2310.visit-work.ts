import type { Migration } from '../umzug';

// What a technician records during a visit. Step results and readings carry client-made UUIDs,
// so a retried save is the same row. Nothing is deleted: a changed answer supersedes the old one.
export const up: Migration = async ({ context: { sequelize } }) => {
  await sequelize.query(`
    ALTER TABLE visits
      ADD COLUMN procedure_id integer REFERENCES procedures (id) ON DELETE RESTRICT,
      ADD COLUMN band_set_id integer REFERENCES band_sets (id) ON DELETE RESTRICT,
      ADD COLUMN firmware_rule_set_id integer REFERENCES firmware_rule_sets (id) ON DELETE RESTRICT,
      ADD COLUMN control_firmware_left text,
      ADD COLUMN monitor_firmware_left text,
      ADD COLUMN cause_category text CHECK (cause_category IS NULL OR cause_category IN
        ('configuration', 'wiring', 'firmware', 'sensor', 'cable', 'board', 'none_found')),
      ADD COLUMN actions_taken text,
      ADD COLUMN recommendations text,
      ADD COLUMN labour_minutes integer CHECK (labour_minutes IS NULL OR labour_minutes BETWEEN 0 AND 10000),
      ADD COLUMN travel_minutes integer CHECK (travel_minutes IS NULL OR travel_minutes BETWEEN 0 AND 10000),
      ADD COLUMN return_to_service jsonb,
      ADD COLUMN contact_name text,
      ADD COLUMN contact_email text,
      ADD COLUMN signed_at timestamptz,
      ADD COLUMN review_comment text;
    CREATE INDEX visits_procedure_id_idx ON visits (procedure_id);

    CREATE TABLE step_results (
      id uuid PRIMARY KEY,
      visit_id integer NOT NULL REFERENCES visits (id) ON DELETE CASCADE,
      step_id text NOT NULL,
      outcome text,
      answer jsonb NOT NULL DEFAULT '{}'::jsonb,
      note text,
      confirmed_at timestamptz,
      created_by integer NOT NULL REFERENCES users (id) ON DELETE RESTRICT,
      created_at timestamptz NOT NULL DEFAULT now(),
      superseded_at timestamptz,
      superseded_reason text
    );
    -- One current answer per step; earlier answers stay as history.
    CREATE UNIQUE INDEX step_results_current_key ON step_results (visit_id, step_id) WHERE superseded_at IS NULL;
    CREATE INDEX step_results_visit_idx ON step_results (visit_id, created_at);

    CREATE TABLE readings (
      id uuid PRIMARY KEY,
      visit_id integer NOT NULL REFERENCES visits (id) ON DELETE CASCADE,
      step_id text NOT NULL,
      quantity text NOT NULL CHECK (quantity IN ('resistance', 'ac_voltage')),
      circuit text NOT NULL CHECK (circuit IN ('rotor', 'stator_1', 'stator_2')),
      position text NOT NULL CHECK (position IN ('control_end', 'sensor_end')),
      entry text NOT NULL CHECK (length(entry) <= 40),
      value_si double precision,
      is_open boolean NOT NULL DEFAULT false,
      winding_temp_c double precision CHECK (winding_temp_c IS NULL OR winding_temp_c BETWEEN -40 AND 200),
      cable jsonb,
      -- Null until it can be judged: no sensor generation chosen yet, or a stator output awaiting its partner.
      verdict text CHECK (verdict IS NULL OR verdict IN ('in_band', 'near_edge', 'out_of_band', 'open', 'short')),
      reason text NOT NULL,
      judgement jsonb NOT NULL,
      band_set_id integer REFERENCES band_sets (id) ON DELETE RESTRICT,
      created_by integer NOT NULL REFERENCES users (id) ON DELETE RESTRICT,
      created_at timestamptz NOT NULL DEFAULT now(),
      superseded_at timestamptz,
      CHECK (is_open OR value_si IS NOT NULL)
    );
    CREATE INDEX readings_visit_idx ON readings (visit_id, created_at);
    CREATE INDEX readings_trend_idx ON readings (circuit, quantity, position) WHERE superseded_at IS NULL;

    CREATE TABLE attachments (
      id uuid PRIMARY KEY,
      visit_id integer NOT NULL REFERENCES visits (id) ON DELETE CASCADE,
      step_id text,
      kind text NOT NULL CHECK (kind IN ('photo', 'signature')),
      caption text,
      storage_key text NOT NULL UNIQUE,
      thumb_key text UNIQUE,
      mime_type text NOT NULL CHECK (mime_type IN ('image/jpeg', 'image/png', 'image/webp')),
      bytes integer NOT NULL CHECK (bytes > 0),
      width integer,
      height integer,
      created_by integer NOT NULL REFERENCES users (id) ON DELETE RESTRICT,
      created_at timestamptz NOT NULL DEFAULT now()
    );
    CREATE INDEX attachments_visit_idx ON attachments (visit_id, created_at);

    CREATE TABLE parts_used (
      id uuid PRIMARY KEY,
      visit_id integer NOT NULL REFERENCES visits (id) ON DELETE CASCADE,
      part_number text NOT NULL CHECK (length(trim(part_number)) > 0),
      description text NOT NULL DEFAULT '',
      quantity integer NOT NULL CHECK (quantity > 0 AND quantity <= 1000),
      serial_removed text,
      serial_fitted text,
      created_at timestamptz NOT NULL DEFAULT now()
    );
    CREATE INDEX parts_used_visit_idx ON parts_used (visit_id);

    CREATE TABLE audit_events (
      id bigserial PRIMARY KEY,
      visit_id integer REFERENCES visits (id) ON DELETE CASCADE,
      actor_id integer REFERENCES users (id) ON DELETE SET NULL,
      action text NOT NULL,
      detail jsonb NOT NULL DEFAULT '{}'::jsonb,
      created_at timestamptz NOT NULL DEFAULT now()
    );
    CREATE INDEX audit_events_visit_idx ON audit_events (visit_id, created_at);

    -- A closed or approved visit is a record: its work rows cannot change (corrections are amendments).
    CREATE FUNCTION refuse_work_on_closed_visit() RETURNS trigger AS $$
    DECLARE
      visit_status text;
    BEGIN
      SELECT status INTO visit_status FROM visits WHERE id = COALESCE(NEW.visit_id, OLD.visit_id);
      IF visit_status IN ('closed', 'approved') THEN
        RAISE EXCEPTION 'visit % is %; its record cannot be changed', COALESCE(NEW.visit_id, OLD.visit_id), visit_status
          USING ERRCODE = 'check_violation';
      END IF;
      RETURN COALESCE(NEW, OLD);
    END;
    $$ LANGUAGE plpgsql;
    CREATE TRIGGER step_results_visit_open BEFORE INSERT OR UPDATE OR DELETE ON step_results FOR EACH ROW EXECUTE FUNCTION refuse_work_on_closed_visit();
    CREATE TRIGGER readings_visit_open BEFORE INSERT OR UPDATE OR DELETE ON readings FOR EACH ROW EXECUTE FUNCTION refuse_work_on_closed_visit();
    CREATE TRIGGER attachments_visit_open BEFORE INSERT OR UPDATE OR DELETE ON attachments FOR EACH ROW EXECUTE FUNCTION refuse_work_on_closed_visit();
    CREATE TRIGGER parts_used_visit_open BEFORE INSERT OR UPDATE OR DELETE ON parts_used FOR EACH ROW EXECUTE FUNCTION refuse_work_on_closed_visit();
  `);
};

export const down: Migration = async ({ context: { sequelize } }) => {
  await sequelize.query(`
    DROP FUNCTION IF EXISTS refuse_work_on_closed_visit() CASCADE;
    DROP TABLE IF EXISTS audit_events;
    DROP TABLE IF EXISTS parts_used;
    DROP TABLE IF EXISTS attachments;
    DROP TABLE IF EXISTS readings;
    DROP TABLE IF EXISTS step_results;
    ALTER TABLE visits
      DROP COLUMN procedure_id, DROP COLUMN band_set_id, DROP COLUMN firmware_rule_set_id,
      DROP COLUMN control_firmware_left, DROP COLUMN monitor_firmware_left, DROP COLUMN cause_category,
      DROP COLUMN actions_taken, DROP COLUMN recommendations, DROP COLUMN labour_minutes,
      DROP COLUMN travel_minutes, DROP COLUMN return_to_service, DROP COLUMN contact_name,
      DROP COLUMN contact_email, DROP COLUMN signed_at, DROP COLUMN review_comment;
  `);
};
