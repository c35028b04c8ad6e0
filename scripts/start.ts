// `npm start`: private PostgreSQL, migrations, demo seed, client build, one Express process on PORT.
import { spawn } from 'node:child_process';
import { DEMO_PASSWORD, DEMO_USERS } from '../server/db/seed/demo-data';
import { createSequelize } from '../server/db/sequelize';
import { seedDemo } from '../server/db/seed/seed-demo';
import { seedReference } from '../server/db/seed/seed-reference';
import { migrate } from '../server/db/umzug';
import { devDatabaseUrl } from './lib/dev-database';
import { fail, say } from './lib/log';
import { runInherit } from './lib/run';
import { localSessionSecret } from './lib/secret';

const port = Number(process.env.PORT ?? 3000);
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
  },
});

server.on('exit', (code) => {
  stopCluster();
  if (!stopping) say(`server stopped (exit ${code ?? 'signal'})`);
  process.exit(code ?? 0);
});

for (const signal of ['SIGINT', 'SIGTERM'] as const) {
  process.on(signal, () => {
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
