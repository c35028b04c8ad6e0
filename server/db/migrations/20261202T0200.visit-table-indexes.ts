import type { Migration } from '../umzug';

// Indexes for the manager's all-visits table, its export and the figures, sized for 100,000 visits.
// Each names the query it serves; scripts/bench-visit-table.ts shows the plans.
export const up: Migration = async ({ context: { sequelize } }) => {
  await sequelize.query(`
    -- Default sort (newest first, never-started drafts last, ties by number) and the start-date filter.
    -- The column order and NULLS LAST match the ORDER BY exactly, so the page is read off the index.
    CREATE INDEX visits_started_idx ON visits (started_at DESC NULLS LAST, id DESC);
    -- Review queue (closed, oldest closed first) and figures over closed/approved visits by closing date.
    CREATE INDEX visits_status_closed_idx ON visits (status, closed_at, id);
    -- Technician filter in the default order; press history, repeat visits and first-time-fix look-ups.
    CREATE INDEX visits_technician_started_idx ON visits (technician_id, started_at DESC NULLS LAST, id DESC);
    CREATE INDEX visits_press_started_idx ON visits (press_id, started_at);
    -- Cause filter and the cause mix per month.
    CREATE INDEX visits_cause_closed_idx ON visits (cause_category, closed_at) WHERE cause_category IS NOT NULL;
  `);
  // Free text uses ILIKE '%…%', which a b-tree cannot serve; trigram GIN indexes can. pg_trgm is a
  // trusted contrib extension (PostgreSQL 13+), so the database owner may create it without being
  // superuser. Where it is unavailable the search still works, only without these two indexes.
  await sequelize.query(`
    DO $$
    BEGIN
      CREATE EXTENSION IF NOT EXISTS pg_trgm;
      CREATE INDEX visits_fault_trgm_idx ON visits USING gin (fault_displayed gin_trgm_ops);
      CREATE INDEX visits_actions_trgm_idx ON visits USING gin (actions_taken gin_trgm_ops);
    EXCEPTION WHEN insufficient_privilege OR undefined_file OR feature_not_supported THEN
      RAISE NOTICE 'pg_trgm is not available (%); free-text search on visits runs without trigram indexes', SQLERRM;
    END
    $$;
  `);
};

export const down: Migration = async ({ context: { sequelize } }) => {
  await sequelize.query(`
    DROP INDEX IF EXISTS visits_actions_trgm_idx;
    DROP INDEX IF EXISTS visits_fault_trgm_idx;
    DROP INDEX IF EXISTS visits_cause_closed_idx;
    DROP INDEX IF EXISTS visits_press_started_idx;
    DROP INDEX IF EXISTS visits_technician_started_idx;
    DROP INDEX IF EXISTS visits_status_closed_idx;
    DROP INDEX IF EXISTS visits_started_idx;
  `);
  // Leave the extension if anything else came to use it.
  await sequelize.query(`
    DO $$
    BEGIN
      DROP EXTENSION IF EXISTS pg_trgm;
    EXCEPTION WHEN dependent_objects_still_exist THEN
      RAISE NOTICE 'pg_trgm is still in use; kept';
    END
    $$;
  `);
};
