import pg from 'pg';

export const APP_ROLE = 'crankwise';

async function withClient<T>(url: string, work: (c: pg.Client) => Promise<T>): Promise<T> {
  const client = new pg.Client({ connectionString: url });
  await client.connect();
  try {
    return await work(client);
  } finally {
    await client.end();
  }
}

/** Creates the application role and the named database when missing (idempotent). */
export async function ensureDatabase(adminUrl: string, database: string): Promise<void> {
  await withClient(adminUrl, async (c) => {
    const role = await c.query('SELECT 1 FROM pg_roles WHERE rolname = $1', [APP_ROLE]);
    if (role.rowCount === 0) await c.query(`CREATE ROLE ${APP_ROLE} LOGIN CREATEDB`);
    const db = await c.query('SELECT 1 FROM pg_database WHERE datname = $1', [database]);
    if (db.rowCount === 0) await c.query(`CREATE DATABASE "${database}" OWNER ${APP_ROLE}`);
  });
}

export async function dropDatabase(adminUrl: string, database: string): Promise<void> {
  await withClient(adminUrl, (c) => c.query(`DROP DATABASE IF EXISTS "${database}" WITH (FORCE)`));
}

/** The app's URL for a database on the same server as `adminUrl`. */
export function appUrl(adminUrl: string, database: string): string {
  const u = new URL(adminUrl);
  u.username = APP_ROLE;
  u.password = '';
  u.pathname = `/${database}`;
  return u.toString();
}
