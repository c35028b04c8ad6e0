import { describeDir, startCluster, type Cluster } from './pg-cluster';
import { appUrl, ensureDatabase } from './database';
import { say } from './log';

export const DEV_DATABASE = 'crankwise';

/** DATABASE_URL wins; otherwise the private dev cluster (.data/dev-pg, or outside the checkout when the postgres user cannot reach it). */
export async function devDatabaseUrl(): Promise<{ url: string; cluster?: Cluster }> {
  if (process.env.DATABASE_URL) {
    say('using DATABASE_URL from the environment');
    return { url: process.env.DATABASE_URL };
  }
  const cluster = await startCluster('.data/dev-pg', { preferredPort: 54320, throwaway: false });
  await ensureDatabase(cluster.adminUrl(), DEV_DATABASE);
  say(`PostgreSQL is up on 127.0.0.1:${cluster.port} (data in ${describeDir(cluster.dir)})`);
  return { url: appUrl(cluster.adminUrl(), DEV_DATABASE), cluster };
}
