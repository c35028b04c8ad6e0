import type { Migration } from '../umzug';

// How the press was left at close-out (returned to production, or left locked out and tagged not fit
// for production with the reason and what it waits for), and the cancelling of a visit started by
// mistake (kept for the record, with who, when and why). Visits closed before this migration were
// all returned to production: the close-out could not record anything else.
export const up: Migration = async ({ context: { sequelize } }) => {
  await sequelize.query(`
    ALTER TABLE visits
      ADD COLUMN as_left_state text CHECK (as_left_state IN ('returned_to_production', 'locked_out')),
      ADD COLUMN locked_out jsonb,
      ADD COLUMN cancelled_at timestamptz,
      ADD COLUMN cancel_reason text,
      ADD COLUMN cancelled_by integer REFERENCES users (id) ON DELETE RESTRICT;
    UPDATE visits SET as_left_state = 'returned_to_production'
     WHERE return_to_service IS NOT NULL OR status IN ('closed', 'approved', 'returned');
    ALTER TABLE visits
      ADD CONSTRAINT visits_locked_out_detail CHECK (as_left_state IS DISTINCT FROM 'locked_out' OR locked_out IS NOT NULL),
      ADD CONSTRAINT visits_cancel_detail CHECK (status <> 'cancelled' OR (cancelled_at IS NOT NULL AND cancel_reason IS NOT NULL AND cancelled_by IS NOT NULL)),
      DROP CONSTRAINT visits_status_check,
      ADD CONSTRAINT visits_status_check CHECK (status IN ('draft', 'in_progress', 'closed', 'approved', 'returned', 'cancelled'));

    -- The status machine gains one way out: an open visit (draft or in progress) may be cancelled.
    CREATE OR REPLACE FUNCTION visits_check_status_change() RETURNS trigger AS $$
    BEGIN
      IF NEW.status IS DISTINCT FROM OLD.status AND NOT (
        (OLD.status = 'draft' AND NEW.status IN ('in_progress', 'cancelled')) OR
        (OLD.status = 'in_progress' AND NEW.status IN ('closed', 'cancelled')) OR
        (OLD.status = 'closed' AND NEW.status IN ('approved', 'returned')) OR
        (OLD.status = 'returned' AND NEW.status = 'in_progress')
      ) THEN
        RAISE EXCEPTION 'visit status cannot change from % to %', OLD.status, NEW.status
          USING ERRCODE = 'check_violation';
      END IF;
      RETURN NEW;
    END;
    $$ LANGUAGE plpgsql;

    -- A cancelled visit is kept as it was: its work rows are frozen like a closed visit's.
    CREATE OR REPLACE FUNCTION refuse_work_on_closed_visit() RETURNS trigger AS $$
    DECLARE
      visit_status text;
    BEGIN
      SELECT status INTO visit_status FROM visits WHERE id = COALESCE(NEW.visit_id, OLD.visit_id);
      IF visit_status IN ('closed', 'approved', 'cancelled') THEN
        RAISE EXCEPTION 'visit % is %; its record cannot be changed', COALESCE(NEW.visit_id, OLD.visit_id), visit_status
          USING ERRCODE = 'check_violation';
      END IF;
      RETURN COALESCE(NEW, OLD);
    END;
    $$ LANGUAGE plpgsql;
  `);
};

export const down: Migration = async ({ context: { sequelize } }) => {
  await sequelize.query(`
    CREATE OR REPLACE FUNCTION refuse_work_on_closed_visit() RETURNS trigger AS $$
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
    CREATE OR REPLACE FUNCTION visits_check_status_change() RETURNS trigger AS $$
    BEGIN
      IF NEW.status IS DISTINCT FROM OLD.status AND NOT (
        (OLD.status = 'draft' AND NEW.status = 'in_progress') OR
        (OLD.status = 'in_progress' AND NEW.status = 'closed') OR
        (OLD.status = 'closed' AND NEW.status IN ('approved', 'returned')) OR
        (OLD.status = 'returned' AND NEW.status = 'in_progress')
      ) THEN
        RAISE EXCEPTION 'visit status cannot change from % to %', OLD.status, NEW.status
          USING ERRCODE = 'check_violation';
      END IF;
      RETURN NEW;
    END;
    $$ LANGUAGE plpgsql;
    -- Cancelled visits have no place in the older status machine, and a record is never deleted to fit it.
    DO $$
    BEGIN
      IF EXISTS (SELECT 1 FROM visits WHERE status = 'cancelled') THEN
        RAISE EXCEPTION 'cancelled visits exist; they cannot be kept by the older schema';
      END IF;
    END
    $$;
    ALTER TABLE visits
      DROP CONSTRAINT visits_status_check,
      ADD CONSTRAINT visits_status_check CHECK (status IN ('draft', 'in_progress', 'closed', 'approved', 'returned')),
      DROP CONSTRAINT visits_cancel_detail,
      DROP CONSTRAINT visits_locked_out_detail,
      DROP COLUMN cancelled_by,
      DROP COLUMN cancel_reason,
      DROP COLUMN cancelled_at,
      DROP COLUMN locked_out,
      DROP COLUMN as_left_state;
  `);
};
