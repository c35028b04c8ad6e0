// `npm run db:up` / `npm run db:down`: the private dev cluster by hand (psql, inspection).
import { devDatabaseUrl } from './lib/dev-database';
import { say } from './lib/log';

const { url, cluster } = await devDatabaseUrl();
if (process.argv[2] === 'down') {
  cluster?.stop();
  say('dev PostgreSQL stopped');
} else {
  say(`dev database: ${url}`);
}
