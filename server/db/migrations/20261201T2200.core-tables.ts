import type { Migration } from '../umzug';

// Core tables of the foundation: who signs in, whom we serve, which presses, which visits.
// Constraints live here as well as in the code, so a bad row cannot be written by any path.
export const up: Migration = async ({ context: { sequelize } }) => {
  await sequelize.query(`
    CREATE TABLE users (
      id serial PRIMARY KEY,
      email text NOT NULL CHECK (email = lower(email) AND position('@' in email) > 1),
      name text NOT NULL CHECK (length(trim(name)) > 0),
      role text NOT NULL CHECK (role IN ('technician', 'manager', 'admin')),
      password_hash text NOT NULL,
      active boolean NOT NULL DEFAULT true,
      created_at timestamptz NOT NULL DEFAULT now(),
      updated_at timestamptz NOT NULL DEFAULT now()
    );
    CREATE UNIQUE INDEX users_email_key ON users (email);
    CREATE INDEX users_role_idx ON users (role);

    CREATE TABLE customers (
      id serial PRIMARY KEY,
      name text NOT NULL CHECK (length(trim(name)) >= 2),
      contact_name text,
      contact_email text CHECK (contact_email IS NULL OR position('@' in contact_email) > 1),
      contact_phone text,
      notes text,
      created_at timestamptz NOT NULL DEFAULT now(),
      updated_at timestamptz NOT NULL DEFAULT now()
    );
    CREATE UNIQUE INDEX customers_name_key ON customers (lower(name));

    CREATE TABLE sites (
      id serial PRIMARY KEY,
      customer_id integer NOT NULL REFERENCES customers (id) ON DELETE RESTRICT,
      name text NOT NULL CHECK (length(trim(name)) >= 2),
      address text,
      city text,
      created_at timestamptz NOT NULL DEFAULT now(),
      updated_at timestamptz NOT NULL DEFAULT now()
    );
    CREATE UNIQUE INDEX sites_customer_name_key ON sites (customer_id, lower(name));
    CREATE INDEX sites_customer_id_idx ON sites (customer_id);

    CREATE TABLE presses (
      id serial PRIMARY KEY,
      site_id integer NOT NULL REFERENCES sites (id) ON DELETE RESTRICT,
      asset_tag text NOT NULL CHECK (length(trim(asset_tag)) > 0),
      model text NOT NULL,
      tonnage integer NOT NULL CHECK (tonnage > 0 AND tonnage <= 10000),
      control_model text,
      sensor_generation text,
      control_firmware text CHECK (control_firmware IS NULL OR control_firmware ~ '^[0-9]+(\\.[0-9]+){0,3}$'),
      monitor_firmware text CHECK (monitor_firmware IS NULL OR monitor_firmware ~ '^[0-9]+(\\.[0-9]+){0,3}$'),
      notes text,
      created_at timestamptz NOT NULL DEFAULT now(),
      updated_at timestamptz NOT NULL DEFAULT now()
    );
    CREATE UNIQUE INDEX presses_site_asset_tag_key ON presses (site_id, lower(asset_tag));
    CREATE INDEX presses_site_id_idx ON presses (site_id);
    CREATE INDEX presses_asset_tag_idx ON presses (lower(asset_tag) text_pattern_ops);

    CREATE TABLE visits (
      id serial PRIMARY KEY,
      press_id integer NOT NULL REFERENCES presses (id) ON DELETE RESTRICT,
      technician_id integer NOT NULL REFERENCES users (id) ON DELETE RESTRICT,
      status text NOT NULL DEFAULT 'draft'
        CHECK (status IN ('draft', 'in_progress', 'closed', 'approved', 'returned')),
      fault_displayed text NOT NULL DEFAULT '',
      control_firmware_found text,
      monitor_firmware_found text,
      started_at timestamptz,
      closed_at timestamptz,
      created_at timestamptz NOT NULL DEFAULT now(),
      updated_at timestamptz NOT NULL DEFAULT now(),
      CHECK (status NOT IN ('closed', 'approved') OR closed_at IS NOT NULL)
    );
    CREATE INDEX visits_press_id_idx ON visits (press_id);
    CREATE INDEX visits_technician_status_idx ON visits (technician_id, status);
    CREATE INDEX visits_status_created_idx ON visits (status, created_at DESC);

    -- The visit status machine, enforced for every writer.
    CREATE FUNCTION visits_check_status_change() RETURNS trigger AS $$
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
    CREATE TRIGGER visits_status_change BEFORE UPDATE OF status ON visits
      FOR EACH ROW EXECUTE FUNCTION visits_check_status_change();

    -- Sessions for connect-pg-simple (its documented table layout).
    CREATE TABLE session (
      sid varchar NOT NULL PRIMARY KEY,
      sess json NOT NULL,
      expire timestamp(6) NOT NULL
    );
    CREATE INDEX session_expire_idx ON session (expire);
  `);
};

export const down: Migration = async ({ context: { sequelize } }) => {
  await sequelize.query(`
    DROP TABLE IF EXISTS session;
    DROP TRIGGER IF EXISTS visits_status_change ON visits;
    DROP FUNCTION IF EXISTS visits_check_status_change();
    DROP TABLE IF EXISTS visits;
    DROP TABLE IF EXISTS presses;
    DROP TABLE IF EXISTS sites;
    DROP TABLE IF EXISTS customers;
    DROP TABLE IF EXISTS users;
  `);
};
