// The e2e world, built once for all journeys: a database copied from the migrated template with the
// invented demo seeded, an SMTP server that keeps every message as a file, and the real app serving
// the built client on a loopback port with its outbox worker running.
import { spawnSync } from 'node:child_process';
import fs from 'node:fs';
import type { Server } from 'node:http';
import type { AddressInfo } from 'node:net';
import os from 'node:os';
import path from 'node:path';
import pg from 'pg';
import { SMTPServer } from 'smtp-server';
import type { TestProject } from 'vitest/node';

declare module 'vitest' {
  export interface ProvidedContext {
    baseUrl: string;
    databaseUrl: string;
    mailDir: string;
    sessionSecret: string;
  }
}

const SESSION_SECRET = 'e2e-session-secret-long-enough-to-pass';

async function admin(sql: string): Promise<void> {
  const client = new pg.Client({ connectionString: process.env.TEST_ADMIN_URL });
  await client.connect();
  try {
    await client.query(sql);
  } finally {
    await client.end();
  }
}

/** Reuses the build scripts/test.ts made; builds one when a journey is run on its own. */
function clientDist(tmp: string): string {
  const given = process.env.E2E_CLIENT_DIST;
  if (given && fs.existsSync(path.join(given, 'index.html'))) return given;
  const out = path.join(tmp, 'client');
  const r = spawnSync('node_modules/.bin/vite', ['build', '--outDir', out, '--emptyOutDir', '--logLevel', 'warn'], { stdio: 'inherit', env: { ...process.env, NODE_ENV: 'production' } });
  if (r.status !== 0) throw new Error('vite build failed: the journeys need the built client');
  return out;
}

const listening = (server: { listen: (port: number, host: string, cb: () => void) => unknown }) =>
  new Promise<void>((resolve) => server.listen(0, '127.0.0.1', resolve));

export default async function setup(project: TestProject) {
  if (!process.env.TEST_ADMIN_URL) throw new Error('TEST_ADMIN_URL is not set: run the journeys through `npm test`, which starts the test database.');
  const tmp = fs.mkdtempSync(path.join(os.tmpdir(), 'crankwise-e2e-'));
  const mailDir = path.join(tmp, 'mail');
  fs.mkdirSync(mailDir);
  const dist = clientDist(tmp);

  const name = `cw_e2e_${process.pid}`;
  const template = process.env.TEST_TEMPLATE_DATABASE ?? 'crankwise_template';
  await admin(`DROP DATABASE IF EXISTS "${name}" WITH (FORCE)`);
  await admin(`CREATE DATABASE "${name}" TEMPLATE "${template}" OWNER crankwise`);
  const dbUrl = new URL(process.env.TEST_ADMIN_URL);
  dbUrl.username = 'crankwise';
  dbUrl.pathname = `/${name}`;
  const databaseUrl = dbUrl.toString();

  // Every message is written whole (raw MIME) to the mail folder; the journeys parse what arrived.
  let received = 0;
  const smtp = new SMTPServer({
    authOptional: true,
    disabledCommands: ['STARTTLS'],
    logger: false,
    onData(stream, _session, callback) {
      const chunks: Buffer[] = [];
      stream.on('data', (c: Buffer) => chunks.push(c));
      stream.on('end', () => {
        received++;
        fs.writeFileSync(path.join(mailDir, `${String(received).padStart(4, '0')}.eml`), Buffer.concat(chunks));
        callback();
      });
    },
  });
  await listening(smtp);
  const smtpPort = (smtp.server.address() as AddressInfo).port;

  // Imported after the environment is known: the server's modules read it when they load.
  const { createSequelize } = await import('../../../server/db/sequelize');
  const { seedDemo } = await import('../../../server/db/seed/seed-demo');
  const { loadEnv } = await import('../../../server/config/env');
  const { createApp } = await import('../../../server/app');
  const { startOutboxWorker } = await import('../../../server/modules/emails/outbox.service');

  const sequelize = createSequelize(databaseUrl);
  await seedDemo(sequelize);

  // The app's own address goes into the report links, so it must be known before the app is built.
  const probe = (await import('node:net')).createServer();
  await listening(probe);
  const port = (probe.address() as AddressInfo).port;
  await new Promise<void>((resolve) => probe.close(() => resolve()));
  const baseUrl = `http://127.0.0.1:${port}`;

  const env = loadEnv({
    NODE_ENV: 'test',
    LOG_LEVEL: process.env.E2E_LOG_LEVEL ?? 'silent',
    DATABASE_URL: databaseUrl,
    SESSION_SECRET,
    CLIENT_DIST: dist,
    UPLOAD_DIR: path.join(tmp, 'uploads'),
    PUBLIC_BASE_URL: baseUrl,
    SMTP_HOST: '127.0.0.1',
    SMTP_PORT: String(smtpPort),
    OUTBOX_POLL_MS: '300',
    // Journeys sign in many times; the limit counts failed sign-ins only, but keep it out of the way.
    SIGNIN_RATE_LIMIT: '1000',
  });
  const { app, close } = createApp({ env, sequelize });
  const server: Server = await new Promise((resolve) => {
    const s = app.listen(port, '127.0.0.1', () => resolve(s));
  });
  const stopOutbox = startOutboxWorker({ pollMs: env.OUTBOX_POLL_MS });

  project.provide('baseUrl', baseUrl);
  project.provide('databaseUrl', databaseUrl);
  project.provide('mailDir', mailDir);
  project.provide('sessionSecret', SESSION_SECRET);

  return async () => {
    await stopOutbox();
    server.closeAllConnections();
    await new Promise<void>((resolve) => server.close(() => resolve()));
    await close();
    await sequelize.close();
    await new Promise<void>((resolve) => smtp.close(() => resolve()));
    await admin(`DROP DATABASE IF EXISTS "${name}" WITH (FORCE)`);
    fs.rmSync(tmp, { recursive: true, force: true });
  };
}
