import fs from 'node:fs';
import net from 'node:net';
import path from 'node:path';
import { fail, say } from './log';
import { runQuiet } from './run';

const isRoot = process.getuid?.() === 0;

export interface Cluster {
  dir: string;
  port: number;
  /** Superuser URL over TCP on loopback. */
  adminUrl: (database?: string) => string;
  stop: () => void;
}

/** Finds Debian's PostgreSQL binaries, installing the package when we are root and it is missing. */
export function findPgBin(): string {
  const find = () => {
    const base = '/usr/lib/postgresql';
    if (!fs.existsSync(base)) return undefined;
    const versions = fs.readdirSync(base).filter((v) => fs.existsSync(path.join(base, v, 'bin', 'initdb')));
    versions.sort((a, b) => Number(b) - Number(a));
    return versions[0] ? path.join(base, versions[0], 'bin') : undefined;
  };
  let bin = find();
  if (!bin && isRoot) {
    say('PostgreSQL is not installed: installing Debian\'s postgresql package (about a minute) ...');
    runQuiet('apt-get', ['update']);
    runQuiet('apt-get', ['install', '-y', 'postgresql'], { env: { ...process.env, DEBIAN_FRONTEND: 'noninteractive' } });
    // Debian may start its own cluster on 5432; ours never uses it, so leave it stopped.
    try {
      runQuiet('pg_ctlcluster', ['--force', fs.readdirSync('/usr/lib/postgresql')[0] ?? '15', 'main', 'stop']);
    } catch {
      /* no system cluster running */
    }
    bin = find();
  }
  if (!bin) {
    fail('PostgreSQL server binaries were not found. Install them with:\n  sudo apt-get update && sudo apt-get install -y postgresql\nor set DATABASE_URL to a server of your own.');
  }
  return bin!;
}

function asPostgres(bin: string, tool: string, args: string[], cwd: string): string {
  const exe = path.join(bin, tool);
  return isRoot ? runQuiet('runuser', ['-u', 'postgres', '--', exe, ...args], { cwd }) : runQuiet(exe, args, { cwd });
}

export function freePort(preferred: number): Promise<number> {
  const tryPort = (port: number) =>
    new Promise<number | undefined>((resolve) => {
      const srv = net.createServer();
      srv.once('error', () => resolve(undefined));
      srv.listen(port, '127.0.0.1', () => {
        const got = (srv.address() as net.AddressInfo).port;
        srv.close(() => resolve(got));
      });
    });
  return tryPort(preferred).then((p) => p ?? tryPort(0).then((q) => q!));
}

function isRunning(bin: string, dir: string): boolean {
  try {
    asPostgres(bin, 'pg_ctl', ['-D', dir, 'status'], dir);
    return true;
  } catch {
    return false;
  }
}

function runningPort(dir: string): number | undefined {
  const pidFile = path.join(dir, 'postmaster.pid');
  if (!fs.existsSync(pidFile)) return undefined;
  const port = Number(fs.readFileSync(pidFile, 'utf8').split('\n')[3]);
  return Number.isFinite(port) ? port : undefined;
}

/**
 * Starts (creating when needed) a private cluster in `dir`, on loopback, with its socket inside `dir`.
 * `throwaway` turns off durability for the test cluster only.
 */
export async function startCluster(dir: string, opts: { preferredPort: number; throwaway: boolean }): Promise<Cluster> {
  const bin = findPgBin();
  const absDir = path.resolve(dir);
  // The parent stays world-readable so the postgres user can reach its own folder inside it.
  fs.mkdirSync(path.dirname(absDir), { recursive: true, mode: 0o755 });
  fs.chmodSync(path.dirname(absDir), 0o755);
  fs.mkdirSync(absDir, { recursive: true, mode: 0o700 });
  if (isRoot) runQuiet('chown', ['-R', 'postgres:postgres', absDir]);

  if (!fs.existsSync(path.join(absDir, 'PG_VERSION'))) {
    say(`creating a private PostgreSQL cluster in ${path.relative(process.cwd(), absDir)}`);
    asPostgres(bin, 'initdb', ['-D', absDir, '-U', 'postgres', '--auth=trust', '-E', 'UTF8', '--locale=C.UTF-8'], absDir);
    const conf = [
      "listen_addresses = '127.0.0.1'",
      `unix_socket_directories = '${absDir}'`,
      'max_connections = 100',
      ...(opts.throwaway ? ['fsync = off', 'synchronous_commit = off', 'full_page_writes = off'] : []),
    ];
    fs.appendFileSync(path.join(absDir, 'postgresql.conf'), `\n# Crankwise\n${conf.join('\n')}\n`);
  }

  let port = isRunning(bin, absDir) ? runningPort(absDir) : undefined;
  if (port === undefined) {
    port = await freePort(opts.preferredPort);
    asPostgres(bin, 'pg_ctl', ['-D', absDir, '-l', path.join(absDir, 'server.log'), '-w', '-t', '30', '-o', `-p ${port}`, 'start'], absDir);
  }
  const finalPort = port;
  return {
    dir: absDir,
    port: finalPort,
    adminUrl: (database = 'postgres') => `postgres://postgres@127.0.0.1:${finalPort}/${database}`,
    stop: () => {
      try {
        asPostgres(bin, 'pg_ctl', ['-D', absDir, '-m', 'fast', '-w', 'stop'], absDir);
      } catch {
        /* already stopped */
      }
    },
  };
}

/** Restarts a running cluster in place (fast shutdown: every open connection is cut), same port. */
export function restartCluster(dir: string): void {
  const absDir = path.resolve(dir);
  const bin = findPgBin();
  asPostgres(bin, 'pg_ctl', ['-D', absDir, '-l', path.join(absDir, 'server.log'), '-m', 'fast', '-w', '-t', '30', 'restart'], absDir);
}

/** Stops a cluster if it runs; starts nothing. */
export function stopClusterIn(dir: string): boolean {
  const absDir = path.resolve(dir);
  if (!fs.existsSync(path.join(absDir, 'PG_VERSION'))) return false;
  const bin = findPgBin();
  if (!isRunning(bin, absDir)) return false;
  asPostgres(bin, 'pg_ctl', ['-D', absDir, '-m', 'fast', '-w', 'stop'], absDir);
  return true;
}
