// SQL for a versioned-records table (see server/lib/versioned-records/versioned-service.ts), for
// migrations to call. The trigger functions refuse_published_change() and
// refuse_published_delete() exist since the reference-data and drafts migrations.

const identifier = (name: string) => {
  if (!/^[a-z_][a-z0-9_]*$/.test(name)) throw new Error(`"${name}" is not a plain lower-case SQL identifier`);
  return name;
};

/** The columns every versioned table has, for its CREATE TABLE (the family columns and content are the table's own). */
export const versionedColumnsSql = `
      version integer NOT NULL CHECK (version > 0),
      published_at timestamptz,
      created_by integer REFERENCES users (id) ON DELETE SET NULL,
      created_at timestamptz NOT NULL DEFAULT now(),
      updated_at timestamptz NOT NULL DEFAULT now()`;

/**
 * A published row's content is frozen and it is never deleted (visits pin it); a family (the rows
 * sharing `familyColumns`, or the whole table when there are none) has at most one draft.
 */
export function versionedTableRulesSql(table: string, familyColumns: string[]): string {
  const t = identifier(table);
  const family = familyColumns.length > 0 ? familyColumns.map(identifier).join(', ') : '(published_at IS NULL)';
  return [
    `CREATE TRIGGER ${t}_frozen BEFORE UPDATE ON ${t} FOR EACH ROW EXECUTE FUNCTION refuse_published_change();`,
    `CREATE TRIGGER ${t}_keep_published BEFORE DELETE ON ${t} FOR EACH ROW EXECUTE FUNCTION refuse_published_delete();`,
    `CREATE UNIQUE INDEX ${t}_one_draft ON ${t} (${family}) WHERE published_at IS NULL;`,
  ].join('\n');
}

/** The `down` of versionedTableRulesSql, for a migration that keeps the table. */
export function dropVersionedTableRulesSql(table: string): string {
  const t = identifier(table);
  return [`DROP INDEX IF EXISTS ${t}_one_draft;`, `DROP TRIGGER IF EXISTS ${t}_keep_published ON ${t};`, `DROP TRIGGER IF EXISTS ${t}_frozen ON ${t};`].join('\n');
}
