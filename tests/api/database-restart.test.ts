// A PostgreSQL restart and a PostgreSQL outage under a running app. The app runs in this test
// process against a throwaway cluster of its own (never the shared test cluster, which other files
// use at the same time), so an uncaught exception here would be the app's.
import { execFile } from 'node:child_process';
import { randomUUID } from 'node:crypto';
import fs from 'node:fs';
import http from 'node:http';
import type { AddressInfo } from 'node:net';
import os from 'node:os';
import path from 'node:path';
import type { Sequelize } from 'sequelize';
import supertest from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { appUrl, ensureDatabase } from '../../scripts/lib/database';
import { startCluster, type Cluster } from '../../scripts/lib/pg-cluster';
import { createApp } from '../../server/app';
import { loadEnv } from '../../server/config/env';
import { createSequelize } from '../../server/db/sequelize';
import { seedReference } from '../../server/db/seed/seed-reference';
import { migrate } from '../../server/db/umzug';
import { makePress, makeUser } from '../factories';
import { makeTestBandSet, workToResistanceStep } from '../visit-steps';

// npm test sets this when it runs its own cluster; against someone's DATABASE_URL there may be no
// PostgreSQL binaries here to make a throwaway cluster with.
const ownClusters = Boolean(process.env.TEST_PG_CLUSTER_DIR);
const DATABASE = 'crankwise_restart';
// A folder of our own; startCluster may put the cluster elsewhere (a place the postgres user can
// enter), so the cluster's own dir is used for restarts and removal.
const root = fs.mkdtempSync(path.join(os.tmpdir(), 'crankwise-restart-'));
const clusterDir = path.join(root, 'pg');
let actualDir = '';
let cluster: Cluster | undefined;
let sequelize: Sequelize | undefined;
let server: http.Server | undefined;
let closeApp: (() => Promise<void>) | undefined;
let uploadDir: string | undefined;
let base = '';
let tech: supertest.Agent;
let visitId = 0;

const uncaught: unknown[] = [];
const onUncaught = (err: unknown) => uncaught.push(err);

beforeAll(async () => {
  if (!ownClusters) return;
  process.on('uncaughtException', onUncaught);
  cluster = await startCluster(clusterDir, { preferredPort: 0, throwaway: true });
  actualDir = cluster.dir;
  await ensureDatabase(cluster.adminUrl(), DATABASE);
  const url = appUrl(cluster.adminUrl(), DATABASE);
  sequelize = createSequelize(url);
  await migrate(sequelize);
  await seedReference(sequelize);
  uploadDir = fs.mkdtempSync(path.join(os.tmpdir(), 'crankwise-uploads-'));
  const env = loadEnv({ NODE_ENV: 'test', DATABASE_URL: url, SESSION_SECRET: 'test-secret-that-is-long-enough', LOG_LEVEL: 'silent', UPLOAD_DIR: uploadDir });
  const built = createApp({ env, sequelize });
  closeApp = built.close;
  server = http.createServer(built.app);
  await new Promise<void>((resolve) => server!.listen(0, '127.0.0.1', resolve));
  base = `http://127.0.0.1:${(server.address() as AddressInfo).port}`;

  await makeTestBandSet();
  const { press } = await makePress({ assetTag: 'RS-1' });
  await press.update({ sensorGeneration: 'test-gen' });
  const user = await makeUser('technician');
  // Our own pages send their origin; the same-origin rule refuses changes without it.
  tech = supertest.agent(base).set('Origin', base);
  await tech.post('/api/session').send({ email: user.email, password: 'correct horse battery staple' }).expect(200);
  const visit = await tech.post('/api/visits').send({ pressId: press.id, faultDisplayed: 'Crank angle sensor fault 31', controlFirmwareFound: '3.4' });
  expect(visit.status, JSON.stringify(visit.body)).toBe(201);
  visitId = visit.body.id as number;
  await workToResistanceStep(tech, visitId);
}, 240_000);

afterAll(async () => {
  process.off('uncaughtException', onUncaught);
  await new Promise<void>((resolve) => (server ? server.close(() => resolve()) : resolve()));
  await closeApp?.();
  await sequelize?.close();
  cluster?.stop();
  if (actualDir) {
    fs.rmSync(actualDir, { recursive: true, force: true });
    // Outside our folder the cluster sits in a parent made for it alone: remove that too when empty.
    const parent = path.dirname(actualDir);
    if (parent !== root && fs.existsSync(parent) && fs.readdirSync(parent).length === 0) fs.rmdirSync(parent);
  }
  fs.rmSync(root, { recursive: true, force: true });
  if (uploadDir) fs.rmSync(uploadDir, { recursive: true, force: true });
}, 60_000);

const sleep = (ms: number) => new Promise((resolve) => setTimeout(resolve, ms));
const body = (id: string) => ({ id, stepId: 'resistance-control-end', quantity: 'resistance', circuit: 'rotor', position: 'control_end', entered: '100' });

interface Save {
  id: string;
  status: number;
  code?: string;
  at: number;
}

async function save(id: string): Promise<Save> {
  const res = await tech.post(`/api/visits/${visitId}/readings`).send(body(id));
  return { id, status: res.status, code: (res.body as { error?: { code?: string } }).error?.code, at: Date.now() };
}

/** restartCluster runs in a child process: it waits for pg_ctl, and this process must keep serving meanwhile. */
function restartInChild(): Promise<{ startedAt: number; doneAt: number }> {
  const startedAt = Date.now();
  const script = "import('./scripts/lib/pg-cluster.ts').then((m) => m.restartCluster(process.env.RESTART_DIR))";
  return new Promise((resolve, reject) => {
    execFile('node_modules/.bin/tsx', ['-e', script], { env: { ...process.env, RESTART_DIR: actualDir }, timeout: 90_000 }, (err, _out, stderr) =>
      err ? reject(new Error(`restart failed: ${stderr || err.message}`)) : resolve({ startedAt, doneAt: Date.now() }),
    );
  });
}

async function storedIds(): Promise<Set<string>> {
  const [rows] = await sequelize!.query('SELECT id FROM readings WHERE visit_id = :visitId', { replacements: { visitId } });
  return new Set((rows as { id: string }[]).map((r) => r.id));
}

describe.skipIf(!ownClusters)('a PostgreSQL restart under a loop of reading saves', () => {
  it('keeps the process alive, answers 503 while the database is away, stores every acknowledged save, and recovers by itself', async () => {
    const saves: Save[] = [];
    let restart: Promise<{ startedAt: number; doneAt: number }> | undefined;
    let restartDone: { startedAt: number; doneAt: number } | undefined;
    // 150 saves 20 ms apart, the restart starting at save 40; if the (loaded) machine is slow, the loop
    // goes on until 40 saves after the restart finished, at most 400 saves.
    for (let i = 0; i < 400; i++) {
      if (i === 40) restart = restartInChild().then((r) => (restartDone = r));
      saves.push(await save(randomUUID()));
      const after = restartDone ? saves.filter((s) => s.at > restartDone!.doneAt).length : 0;
      if (i >= 149 && restartDone && after >= 40) break;
      await sleep(20);
    }
    await restart;
    expect(restartDone).toBeDefined();
    expect(uncaught).toEqual([]);

    const ok = saves.filter((s) => s.status >= 200 && s.status < 300);
    const failed = saves.filter((s) => !(s.status >= 200 && s.status < 300));
    // Every refused save was refused as "database unavailable", never a 500 or a dropped connection.
    expect(failed.map((s) => `${s.status} ${s.code}`)).toEqual(failed.map(() => '503 database_unavailable'));

    // Every acknowledged save is stored.
    const stored = await storedIds();
    expect(ok.filter((s) => !stored.has(s.id))).toEqual([]);

    // Saves work again within 5 s of the database being back.
    const firstOkAfter = ok.find((s) => s.at > restartDone!.doneAt);
    expect(firstOkAfter).toBeDefined();
    expect(firstOkAfter!.at - restartDone!.doneAt).toBeLessThanOrEqual(5000);

    // The tablet retries each refused save with the same id: each is then stored exactly once.
    for (const f of failed) expect((await save(f.id)).status).toBe(200);
    const [rows] = await sequelize!.query('SELECT id, count(*)::int AS n FROM readings WHERE visit_id = :visitId GROUP BY id HAVING count(*) > 1', { replacements: { visitId } });
    expect(rows).toEqual([]);
    const after = await storedIds();
    expect(saves.filter((s) => !after.has(s.id))).toEqual([]);
    console.info(`restart took ${restartDone!.doneAt - restartDone!.startedAt} ms; ${saves.length} saves: ${ok.length} × 2xx, ${failed.length} × 503; first 2xx ${firstOkAfter!.at - restartDone!.doneAt} ms after the restart returned`);
  }, 180_000);

  it('answers 503 with a clear message and a down health check while the database is stopped, then comes back', async () => {
    const port = cluster!.port;
    cluster!.stop();
    const health = await supertest(base).get('/api/health');
    expect(health.status).toBe(503);
    expect(health.body).toMatchObject({ status: 'degraded', database: { state: 'down' } });
    const refused = await save(randomUUID());
    expect(refused).toMatchObject({ status: 503, code: 'database_unavailable' });
    const res = await tech.get(`/api/visits/${visitId}`);
    expect(res.status).toBe(503);
    expect(res.body.error.message).toBe('The database is not answering; try again in a moment.');
    expect(res.headers['retry-after']).toBe('5');
    expect(uncaught).toEqual([]);

    cluster = await startCluster(clusterDir, { preferredPort: port, throwaway: true });
    expect(cluster.dir).toBe(actualDir);
    expect(cluster.port).toBe(port);
    const backAt = Date.now();
    let healthy = 0;
    while (Date.now() - backAt < 5000 && healthy !== 200) {
      healthy = (await supertest(base).get('/api/health')).status;
      if (healthy !== 200) await sleep(100);
    }
    expect(healthy).toBe(200);
    const again = await save(randomUUID());
    expect(again.status).toBe(200);
    expect(again.at - backAt).toBeLessThanOrEqual(5000);
    expect(uncaught).toEqual([]);
  }, 120_000);
});
