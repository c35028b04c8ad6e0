import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import pg from 'pg';
import { afterAll, describe, expect, it } from 'vitest';
import { resolveClusterDir, startCluster, stopClusterIn, type Cluster } from './pg-cluster';

// A newcomer clones into a private folder (mode 0700, as `mktemp -d` and a home folder are), often
// with a space somewhere in the path. The private cluster must start there, whoever runs it.
describe('private PostgreSQL cluster in a checkout inside a 0700 folder', () => {
  const parent = fs.mkdtempSync(path.join(os.tmpdir(), 'crankwise private '));
  fs.chmodSync(parent, 0o700);
  const checkout = path.join(parent, 'my app');
  fs.mkdirSync(checkout);
  const wanted = path.join(checkout, '.data', 'test-pg', 'run-check');
  let cluster: Cluster | undefined;

  afterAll(() => {
    cluster?.stop();
    if (cluster) {
      fs.rmSync(cluster.dir, { recursive: true, force: true });
      // The per-checkout folder outside the checkout, now empty.
      if (!cluster.dir.startsWith(parent)) fs.rmdirSync(path.dirname(cluster.dir));
    }
    fs.rmSync(parent, { recursive: true, force: true });
  });

  it('starts, answers queries, is found again by its checkout path, and stops', async () => {
    cluster = await startCluster(wanted, { preferredPort: 54390, throwaway: true });
    const isRoot = process.getuid?.() === 0;
    // As root the postgres user cannot enter the 0700 folder, so the data must live outside it.
    expect(cluster.dir.startsWith(parent)).toBe(!isRoot);
    if (isRoot) expect((fs.statSync(path.dirname(cluster.dir)).mode & 0o777).toString(8)).toBe('700');

    const client = new pg.Client({ connectionString: cluster.adminUrl() });
    await client.connect();
    const { rows } = await client.query<{ one: number }>('SELECT 1 AS one');
    await client.end();
    expect(rows[0]?.one).toBe(1);

    // db:down and a second start resolve the same folder from the checkout-side name.
    expect(resolveClusterDir(wanted).dir).toBe(cluster.dir);
    expect(stopClusterIn(wanted)).toBe(true);
    expect(stopClusterIn(wanted)).toBe(false);
  }, 60_000);
});
