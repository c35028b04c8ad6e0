import type { Migration } from '../umzug';

// Versioned reference data the judgement rests on. A published version is never edited:
// a change is a new version, and visits keep the version they ran with.
export const up: Migration = async ({ context: { sequelize } }) => {
  await sequelize.query(`
    CREATE TABLE procedures (
      id serial PRIMARY KEY,
      key text NOT NULL CHECK (key ~ '^[a-z0-9][a-z0-9-]*$'),
      version integer NOT NULL CHECK (version > 0),
      title text NOT NULL,
      definition jsonb NOT NULL,
      published_at timestamptz,
      created_by integer REFERENCES users (id) ON DELETE SET NULL,
      created_at timestamptz NOT NULL DEFAULT now(),
      updated_at timestamptz NOT NULL DEFAULT now(),
      UNIQUE (key, version)
    );

    CREATE TABLE band_sets (
      id serial PRIMARY KEY,
      generation text NOT NULL CHECK (generation ~ '^[a-z0-9][a-z0-9-]*$'),
      version integer NOT NULL CHECK (version > 0),
      label text NOT NULL,
      bands jsonb NOT NULL,
      published_at timestamptz,
      created_by integer REFERENCES users (id) ON DELETE SET NULL,
      created_at timestamptz NOT NULL DEFAULT now(),
      updated_at timestamptz NOT NULL DEFAULT now(),
      UNIQUE (generation, version)
    );

    CREATE TABLE firmware_rule_sets (
      id serial PRIMARY KEY,
      version integer NOT NULL UNIQUE CHECK (version > 0),
      rules jsonb NOT NULL,
      published_at timestamptz,
      created_by integer REFERENCES users (id) ON DELETE SET NULL,
      created_at timestamptz NOT NULL DEFAULT now(),
      updated_at timestamptz NOT NULL DEFAULT now()
    );

    -- A published row's content is frozen; only its publication time may be set once.
    CREATE FUNCTION refuse_published_change() RETURNS trigger AS $$
    BEGIN
      IF OLD.published_at IS NOT NULL THEN
        RAISE EXCEPTION '% version % is published and cannot be changed; create a new version', TG_TABLE_NAME, OLD.version
          USING ERRCODE = 'check_violation';
      END IF;
      RETURN NEW;
    END;
    $$ LANGUAGE plpgsql;
    CREATE TRIGGER procedures_frozen BEFORE UPDATE ON procedures FOR EACH ROW EXECUTE FUNCTION refuse_published_change();
    CREATE TRIGGER band_sets_frozen BEFORE UPDATE ON band_sets FOR EACH ROW EXECUTE FUNCTION refuse_published_change();
    CREATE TRIGGER firmware_rule_sets_frozen BEFORE UPDATE ON firmware_rule_sets FOR EACH ROW EXECUTE FUNCTION refuse_published_change();
  `);
};

export const down: Migration = async ({ context: { sequelize } }) => {
  await sequelize.query(`
    DROP TABLE IF EXISTS firmware_rule_sets;
    DROP TABLE IF EXISTS band_sets;
    DROP TABLE IF EXISTS procedures;
    DROP FUNCTION IF EXISTS refuse_published_change();
  `);
};
