// `npm run dev`: the API under tsx watch and Vite's dev server (proxying /api), both reloading on change.
import { spawn, type ChildProcess } from 'node:child_process';
import { devDatabaseUrl } from './lib/dev-database';
import { say } from './lib/log';
import { localSessionSecret } from './lib/secret';

const { url, cluster } = await devDatabaseUrl();
const port = process.env.PORT ?? '3000';
const env = { ...process.env, NODE_ENV: 'development', PORT: port, DATABASE_URL: url, SESSION_SECRET: localSessionSecret(), COOKIE_SECURE: 'false' };

const children: ChildProcess[] = [
  spawn('node_modules/.bin/tsx', ['watch', '--clear-screen=false', 'server/index.ts'], { stdio: 'inherit', env }),
  spawn('node_modules/.bin/vite', [], { stdio: 'inherit', env }),
];
say('API on :' + port + ', client with hot reload on http://127.0.0.1:5173/ (run `npm run seed` once for demo data)');

const stop = () => {
  for (const c of children) c.kill('SIGTERM');
  cluster?.stop();
  process.exit(0);
};
process.on('SIGINT', stop);
process.on('SIGTERM', stop);
for (const c of children) c.on('exit', stop);
