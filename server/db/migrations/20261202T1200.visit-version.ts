import type { Migration } from '../umzug';

// A visit's version: bumped in the same transaction as every write to the visit (step answers,
// readings, close, reopen, review), so a device that saw an older version can be told its view is stale.
export const up: Migration = async ({ context: { sequelize } }) => {
  await sequelize.query(`ALTER TABLE visits ADD COLUMN version integer NOT NULL DEFAULT 1 CHECK (version >= 1);`);
};

export const down: Migration = async ({ context: { sequelize } }) => {
  await sequelize.query('ALTER TABLE visits DROP COLUMN IF EXISTS version;');
};
