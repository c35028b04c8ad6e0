import type { Migration } from '../umzug';

// When a visit was first closed. A return and reopen clears closed_at and the corrected close sets it
// again; time to repair ends at the first close (the review round-trip is not repair time). Earlier
// visits get it from their first "visit_closed" audit event.
export const up: Migration = async ({ context: { sequelize } }) => {
  await sequelize.query(`
    ALTER TABLE visits ADD COLUMN first_closed_at timestamptz;
    UPDATE visits v SET first_closed_at = COALESCE(
      (SELECT min(a.created_at) FROM audit_events a WHERE a.visit_id = v.id AND a.action = 'visit_closed'),
      v.closed_at);
  `);
};

export const down: Migration = async ({ context: { sequelize } }) => {
  await sequelize.query('ALTER TABLE visits DROP COLUMN IF EXISTS first_closed_at;');
};
