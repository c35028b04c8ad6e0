// `npm run db:up` / `npm run db:down`: the private dev cluster by hand (psql, inspection).
import { devDatabaseUrl } from './lib/dev-database';
import { say } from './lib/log';
import { stopClusterIn } from './lib/pg-cluster';

if (process.argv[2] === 'down') {
  say(stopClusterIn('.data/dev-pg') ? 'dev PostgreSQL stopped' : 'dev PostgreSQL was not running');
} else {
  const { url } = await devDatabaseUrl();
  say(`dev database: ${url}`);
}
