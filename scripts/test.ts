// `npm test`: its own PostgreSQL cluster, a migrated template database, then typecheck, lint and
// every vitest suite. The cluster stops when the run ends, pass or fail.
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { createSequelize } from '../server/db/sequelize';
import { seedReference } from '../server/db/seed/seed-reference';
import { migrate } from '../server/db/umzug';
import { appUrl, dropDatabase, ensureDatabase } from './lib/database';
import { say } from './lib/log';
import { describeDir, startCluster, type Cluster } from './lib/pg-cluster';
import { runInherit } from './lib/run';

export const TEMPLATE_DATABASE = 'crankwise_template';

let cluster: Cluster | undefined;
let adminUrl: string;
if (process.env.DATABASE_URL) {
  // A user's own server: the URL must name a role that may create databases.
  const u = new URL(process.env.DATABASE_URL);
  u.pathname = '/postgres';
  adminUrl = u.toString();
  say('tests use the server named by DATABASE_URL');
} else {
  // A fresh cluster per run (about 2 s): concurrent runs and crashed runs never meet each other.
  cluster = await startCluster(`.data/test-pg/run-${process.pid}`, { preferredPort: 54330, throwaway: true });
  adminUrl = cluster.adminUrl();
  say(`test PostgreSQL is up on 127.0.0.1:${cluster.port} (data in ${describeDir(cluster.dir)}, removed at the end)`);
}

const cleanups: (() => void)[] = [];
const cleanUp = () => {
  for (const c of cleanups.splice(0)) c();
  if (!cluster) return;
  cluster.stop();
  fs.rmSync(cluster.dir, { recursive: true, force: true });
  cluster = undefined;
};
for (const signal of ['SIGINT', 'SIGTERM'] as const) {
  process.on(signal, () => {
    cleanUp();
    process.exit(130);
  });
}

let status: number;
try {
  await dropDatabase(adminUrl, TEMPLATE_DATABASE);
  await ensureDatabase(adminUrl, TEMPLATE_DATABASE);
  const sequelize = createSequelize(appUrl(adminUrl, TEMPLATE_DATABASE));
  await migrate(sequelize);
  // Reference data (procedure, invented demo bands and rules) is product data every suite may rely on.
  await seedReference(sequelize);
  await sequelize.close();

  const env: NodeJS.ProcessEnv = { ...process.env, NODE_ENV: 'test', TEST_ADMIN_URL: adminUrl, TEST_TEMPLATE_DATABASE: TEMPLATE_DATABASE };
  // Fault tests restart the throwaway cluster (restartCluster in scripts/lib/pg-cluster.ts); absent with DATABASE_URL.
  if (cluster) env.TEST_PG_CLUSTER_DIR = cluster.dir;
  // `npm test -- --quick <vitest filters>` skips typecheck and lint while iterating on one suite.
  const quick = process.argv.includes('--quick');
  const vitestArgs = process.argv.slice(2).filter((a) => a !== '--quick');
  const projectsAsked = vitestArgs.flatMap((a, i) => (a === '--project' ? [vitestArgs[i + 1]] : a.startsWith('--project=') ? [a.slice(10)] : []));
  const filters = vitestArgs.filter((a, i) => !a.startsWith('-') && vitestArgs[i - 1] !== '--project');
  // The browser journeys run after the unit and API suites, as a step of their own, against a client
  // built once; asked-for projects run as asked; a file filter that names no journey skips them.
  const wantsE2e = projectsAsked.length ? projectsAsked.includes('e2e') : filters.length === 0 || filters.some((f) => f.includes('e2e'));
  // A fresh folder per run in the system temp directory, removed afterwards.
  const clientDir = path.join(os.tmpdir(), `crankwise-client-${process.pid}`);
  const e2eSteps: [string, string, string[]][] = [
    ['Chromium check', 'node_modules/.bin/tsx', ['-e', "import('./scripts/lib/chromium.ts').then((m) => m.chromiumPath())"]],
    ['client build for the browser journeys', 'env', ['NODE_ENV=production', 'node_modules/.bin/vite', 'build', '--outDir', clientDir, '--emptyOutDir', '--logLevel', 'warn']],
    ...(projectsAsked.length ? [] : ([['browser journeys', 'node_modules/.bin/vitest', ['run', '--project', 'e2e', ...vitestArgs]]] as [string, string, string[]][])),
  ];
  env.E2E_CLIENT_DIST = clientDir;
  const steps: [string, string, string[]][] = [
    ...(quick
      ? []
      : ([
          ['typecheck', 'node_modules/.bin/tsc', ['--noEmit', '-p', 'tsconfig.json']],
          ['lint', 'node_modules/.bin/eslint', ['-c', 'scripts/eslint.config.js', '--max-warnings=0', '.']],
        ] as [string, string, string[]][])),
    ...(projectsAsked.length
      ? ([
          ...(wantsE2e ? e2eSteps : []),
          ['tests', 'node_modules/.bin/vitest', ['run', ...vitestArgs]],
        ] as [string, string, string[]][])
      : ([
          ...(filters.length === 0 || filters.some((f) => !f.includes('e2e'))
            ? ([['unit, component and API tests', 'node_modules/.bin/vitest', ['run', '--project', 'node', '--project', 'web', ...vitestArgs]]] as [string, string, string[]][])
            : []),
          ...(wantsE2e ? e2eSteps : []),
        ] as [string, string, string[]][])),
  ];
  cleanups.push(() => fs.rmSync(clientDir, { recursive: true, force: true }));
  status = 0;
  for (const [name, cmd, args] of steps) {
    say(`${name} ...`);
    const started = Date.now();
    const code = await runInherit(cmd, args, { env });
    say(`${name}: ${((Date.now() - started) / 1000).toFixed(0)} s`);
    if (code !== 0) {
      say(`${name} failed (exit ${code})`);
      status = code;
      break;
    }
  }
} finally {
  cleanUp();
}
process.exit(status);
