import type { Migration } from '../umzug';

// Failed sign-ins, counted per account and per client address separately (the limits live in the
// app's settings). Kept in the database so every server instance sees the same counts; rows older
// than the window are pruned as new failures arrive.
export const up: Migration = async ({ context: { sequelize } }) => {
  await sequelize.query(`
    CREATE TABLE sign_in_failures (
      id bigserial PRIMARY KEY,
      account text NOT NULL CHECK (length(account) BETWEEN 1 AND 320),
      address text NOT NULL CHECK (length(address) BETWEEN 1 AND 100),
      failed_at timestamptz NOT NULL DEFAULT now()
    );
    CREATE INDEX sign_in_failures_account_idx ON sign_in_failures (account, failed_at);
    CREATE INDEX sign_in_failures_address_idx ON sign_in_failures (address, failed_at);
    CREATE INDEX sign_in_failures_age_idx ON sign_in_failures (failed_at);
  `);
};

export const down: Migration = async ({ context: { sequelize } }) => {
  await sequelize.query('DROP TABLE IF EXISTS sign_in_failures;');
};
