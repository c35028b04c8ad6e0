import type { Migration } from '../umzug';

// Each customer states press capacity in one unit, US (short) tons or metric tonnes. Presses entered
// so far were entered in tons, as the form asked, so existing customers keep US tons.
export const up: Migration = async ({ context: { sequelize } }) => {
  await sequelize.query(`
    ALTER TABLE customers ADD COLUMN capacity_unit text NOT NULL DEFAULT 'us_ton' CHECK (capacity_unit IN ('us_ton', 'tonne'));
  `);
};

export const down: Migration = async ({ context: { sequelize } }) => {
  await sequelize.query(`ALTER TABLE customers DROP COLUMN capacity_unit;`);
};
