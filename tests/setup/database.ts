import { randomBytes } from 'node:crypto';
import pg from 'pg';
import type { Sequelize } from 'sequelize';
import { afterAll, beforeAll } from 'vitest';
import { createSequelize } from '../../server/db/sequelize';
import { initModels } from '../../server/db/models';

export interface TestDatabase {
  url: string;
  sequelize: Sequelize;
}

function adminUrl(): string {
  const url = process.env.TEST_ADMIN_URL;
  if (!url) throw new Error('TEST_ADMIN_URL is not set: run the suites through `npm test`, which starts the test database.');
  return url;
}

async function admin(sql: string): Promise<void> {
  const client = new pg.Client({ connectionString: adminUrl() });
  await client.connect();
  try {
    await client.query(sql);
  } finally {
    await client.end();
  }
}

/**
 * Gives the calling test file a database of its own, copied from the migrated template,
 * and drops it afterwards: files never see each other's rows.
 */
export function useTestDatabase(): TestDatabase {
  const name = `cw_test_${randomBytes(5).toString('hex')}`;
  const template = process.env.TEST_TEMPLATE_DATABASE ?? 'crankwise_template';
  const db = {} as TestDatabase;

  beforeAll(async () => {
    await admin(`CREATE DATABASE "${name}" TEMPLATE "${template}" OWNER crankwise`);
    const u = new URL(adminUrl());
    u.username = 'crankwise';
    u.pathname = `/${name}`;
    db.url = u.toString();
    db.sequelize = createSequelize(db.url);
    initModels(db.sequelize);
  });

  afterAll(async () => {
    await db.sequelize?.close();
    await admin(`DROP DATABASE IF EXISTS "${name}" WITH (FORCE)`);
  });

  return db;
}
