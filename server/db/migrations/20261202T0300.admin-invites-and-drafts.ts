import type { Migration } from '../umzug';

// Invitations by e-mail, and the rules that keep reference-data drafts honest.
// Only a SHA-256 of the invitation token is stored: a leaked table cannot be used to sign anyone up.
export const up: Migration = async ({ context: { sequelize } }) => {
  await sequelize.query(`
    CREATE TABLE user_invites (
      id serial PRIMARY KEY,
      user_id integer NOT NULL REFERENCES users (id) ON DELETE CASCADE,
      token_hash text NOT NULL UNIQUE CHECK (token_hash ~ '^[0-9a-f]{64}$'),
      expires_at timestamptz NOT NULL,
      used_at timestamptz,
      revoked_at timestamptz,
      created_by integer REFERENCES users (id) ON DELETE SET NULL,
      created_at timestamptz NOT NULL DEFAULT now(),
      CHECK (used_at IS NULL OR revoked_at IS NULL)
    );
    -- One open invitation per person: resending revokes the previous link.
    CREATE UNIQUE INDEX user_invites_one_open ON user_invites (user_id) WHERE used_at IS NULL AND revoked_at IS NULL;

    -- At most one unpublished draft per procedure key, sensor generation, and for the firmware rules.
    CREATE UNIQUE INDEX procedures_one_draft ON procedures (key) WHERE published_at IS NULL;
    CREATE UNIQUE INDEX band_sets_one_draft ON band_sets (generation) WHERE published_at IS NULL;
    CREATE UNIQUE INDEX firmware_rule_sets_one_draft ON firmware_rule_sets ((published_at IS NULL)) WHERE published_at IS NULL;

    -- A published version may be pinned by visits: it is never deleted, only drafts are discarded.
    CREATE FUNCTION refuse_published_delete() RETURNS trigger AS $$
    BEGIN
      IF OLD.published_at IS NOT NULL THEN
        RAISE EXCEPTION '% version % is published and cannot be deleted', TG_TABLE_NAME, OLD.version
          USING ERRCODE = 'check_violation';
      END IF;
      RETURN OLD;
    END;
    $$ LANGUAGE plpgsql;
    CREATE TRIGGER procedures_keep_published BEFORE DELETE ON procedures FOR EACH ROW EXECUTE FUNCTION refuse_published_delete();
    CREATE TRIGGER band_sets_keep_published BEFORE DELETE ON band_sets FOR EACH ROW EXECUTE FUNCTION refuse_published_delete();
    CREATE TRIGGER firmware_rule_sets_keep_published BEFORE DELETE ON firmware_rule_sets FOR EACH ROW EXECUTE FUNCTION refuse_published_delete();
  `);
};

export const down: Migration = async ({ context: { sequelize } }) => {
  await sequelize.query(`
    DROP TRIGGER IF EXISTS firmware_rule_sets_keep_published ON firmware_rule_sets;
    DROP TRIGGER IF EXISTS band_sets_keep_published ON band_sets;
    DROP TRIGGER IF EXISTS procedures_keep_published ON procedures;
    DROP FUNCTION IF EXISTS refuse_published_delete();
    DROP INDEX IF EXISTS firmware_rule_sets_one_draft;
    DROP INDEX IF EXISTS band_sets_one_draft;
    DROP INDEX IF EXISTS procedures_one_draft;
    DROP TABLE IF EXISTS user_invites;
  `);
};
