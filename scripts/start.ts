// `npm start`: private PostgreSQL, migrations, demo seed, client build, one Express process on PORT.
import { spawn } from 'node:child_process';
import net from 'node:net';
import path from 'node:path';
import { DEMO_PASSWORD, DEMO_USERS } from '../server/db/seed/demo-data';
import { createSequelize } from '../server/db/sequelize';
import { seedDemo } from '../server/db/seed/seed-demo';
import { seedReference } from '../server/db/seed/seed-reference';
import { migrate } from '../server/db/umzug';
import { devDatabaseUrl } from './lib/dev-database';
import { fail, say } from './lib/log';
import { runInherit } from './lib/run';
import { startMailInbox } from './lib/mail-inbox';
import { localSessionSecret } from './lib/secret';

const port = Number(process.env.PORT ?? 3000);
// Refuse early when something else holds the port: otherwise that other process would answer
// our health check and the product would look started while this server failed to bind.
if (!(await isFree(port))) {
  fail(`port ${port} is already in use (another Crankwise still running?). Stop that process, or run with PORT=3001 npm start.`);
}
const { url, cluster } = await devDatabaseUrl();
let stopping = false;
const stopCluster = () => cluster?.stop();

try {
  const sequelize = createSequelize(url);
  const applied = await migrate(sequelize);
  const { created } = await seedDemo(sequelize);
  await seedReference(sequelize);
  await sequelize.close();
  say(`database ready (${applied.length} migrations applied, ${created} demo rows created)`);

  say('building the client ...');
  if ((await runInherit('node_modules/.bin/vite', ['build', '--logLevel', 'warn'])) !== 0) throw new Error('client build failed');
} catch (err) {
  stopCluster();
  fail(`start failed: ${err instanceof Error ? err.message : String(err)}`);
}

const mail = await startMailCatcher();

const server = spawn(process.execPath, ['--import', 'tsx', 'server/index.ts'], {
  stdio: 'inherit',
  env: {
    ...process.env,
    NODE_ENV: process.env.NODE_ENV ?? 'production',
    PORT: String(port),
    DATABASE_URL: url,
    SESSION_SECRET: localSessionSecret(),
    // Plain http on this machine: a Secure cookie would never come back. Set COOKIE_SECURE=true behind HTTPS.
    COOKIE_SECURE: process.env.COOKIE_SECURE ?? 'false',
    CLIENT_DIST: process.env.CLIENT_DIST ?? 'dist/client',
    PUBLIC_BASE_URL: process.env.PUBLIC_BASE_URL ?? `http://127.0.0.1:${port}`,
    ...mail.env,
  },
});

server.on('exit', (code) => {
  mail.stop();
  // Only Ctrl-C stops the database. A server that died on its own may have died because someone is
  // restarting PostgreSQL right now; a pg_ctl stop in the middle of that leaves the cluster half down.
  if (stopping) stopCluster();
  else say(`server stopped (exit ${code ?? 'signal'}); the database keeps running (npm run db:down stops it)`);
  process.exit(code ?? 0);
});

for (const signal of ['SIGINT', 'SIGTERM'] as const) {
  process.on(signal, () => {
    if (stopping) return; // one Ctrl-C reaches both us and the server; stop it once
    stopping = true;
    say('stopping ...');
    server.kill('SIGTERM');
  });
}

await waitForHealth(`http://127.0.0.1:${port}/api/health`);
const width = Math.max(...DEMO_USERS.map((u) => u.email.length));
say(`Crankwise is running: http://127.0.0.1:${port}/`);
say(`demo sign-ins (invented people), password for all: ${DEMO_PASSWORD}`);
for (const u of DEMO_USERS) say(`  ${u.email.padEnd(width)}  ${u.role}`);
if (mail.inboxUrl) say(`mail sent by Crankwise (visit reports) arrives in the local inbox: ${mail.inboxUrl}`);
say('Ctrl-C stops the server and its database.');

async function waitForHealth(healthUrl: string): Promise<void> {
  for (let i = 0; i < 100; i++) {
    try {
      if ((await fetch(healthUrl)).ok) return;
    } catch {
      /* not listening yet */
    }
    await new Promise((r) => setTimeout(r, 200));
  }
  say('the server did not answer its health check within 20 s; see the log above');
}

function isFree(p: number): Promise<boolean> {
  return new Promise((resolve) => {
    const probe = net.createServer().once('error', () => resolve(false));
    probe.listen(p, '127.0.0.1', () => probe.close(() => resolve(true)));
  });
}


/**
 * The local mail inbox, so the reports Crankwise sends can be read. Skipped when SMTP_HOST names a
 * real server; if it fails, Crankwise still starts and its outbox keeps the mail until a server answers.
 */
async function startMailCatcher(): Promise<{ env: Record<string, string>; inboxUrl?: string; stop: () => void }> {
  if (process.env.SMTP_HOST) return { env: {}, stop: () => {} };
  try {
    const inbox = await startMailInbox({ mailDir: path.resolve('.data/maildev') });
    return { env: { SMTP_HOST: '127.0.0.1', SMTP_PORT: String(inbox.smtpPort), SMTP_SECURE: 'false' }, inboxUrl: inbox.inboxUrl, stop: inbox.stop };
  } catch (err) {
    say(`the local mail inbox did not start (${err instanceof Error ? err.message : String(err)}); reports stay queued in the outbox until a mail server answers`);
    return { env: {}, stop: () => {} };
  }
}
