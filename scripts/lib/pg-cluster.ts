import { createHash } from 'node:crypto';
import fs from 'node:fs';
import net from 'node:net';
import os from 'node:os';
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

/** Can the postgres system user (who runs the cluster when we are root) enter `dir`? */
function postgresCanEnter(dir: string): boolean {
  if (!isRoot) return true;
  try {
    runQuiet('runuser', ['-u', 'postgres', '--', 'test', '-x', dir, '-a', '-r', dir], { cwd: '/' });
    return true;
  } catch {
    return false;
  }
}

/** Base folders, in order, for clusters that cannot live inside the checkout. /var/tmp survives a reboot. */
function outsideBases(): string[] {
  const bases = [process.env.CRANKWISE_PG_ROOT, '/var/tmp', os.tmpdir()].filter((b): b is string => !!b && fs.existsSync(b));
  return [...new Set(bases.map((b) => path.resolve(b)))];
}

/** The folder outside the checkout that stands for `absDir`: named from a hash of the checkout-side path. */
function outsideDirFor(absDir: string, base: string): string {
  const hash = createHash('sha256').update(path.dirname(absDir)).digest('hex').slice(0, 16);
  return path.join(base, `crankwise-pg-${hash}`, path.basename(absDir));
}

/** Makes (or checks) the per-checkout folder outside the checkout: ours alone, mode 0700, owned by postgres when root. */
function claimOutsideParent(parent: string): void {
  const owner = isRoot ? Number(runQuiet('id', ['-u', 'postgres']).trim()) : process.getuid?.();
  if (!fs.existsSync(parent)) {
    fs.mkdirSync(parent, { mode: 0o700 });
    if (isRoot) runQuiet('chown', ['postgres:postgres', parent]);
  }
  const st = fs.lstatSync(parent);
  // Under a shared temporary folder anyone could have made this name first: refuse what is not ours.
  if (!st.isDirectory() || st.uid !== owner || (st.mode & 0o077) !== 0) {
    fail(`${parent} exists but is not a private folder of ${isRoot ? 'the postgres user' : 'yours'} (mode 0700). Remove it, or set CRANKWISE_PG_ROOT to another folder.`);
  }
}

/**
 * Where a cluster named `dir` (relative to the checkout) really lives. Inside the checkout when the
 * postgres user can reach it; otherwise (a checkout inside a 0700 home or `mktemp -d` folder, when we
 * run as root) in a per-checkout folder under /var/tmp or the system temporary folder. An existing
 * cluster is found where it already is, so `db:down` finds what `start` made.
 */
export function resolveClusterDir(dir: string): { dir: string; inCheckout: boolean } {
  const absDir = path.resolve(dir);
  if (fs.existsSync(path.join(absDir, 'PG_VERSION'))) return { dir: absDir, inCheckout: true };
  const outside = outsideBases().map((b) => outsideDirFor(absDir, b));
  const existing = outside.find((d) => fs.existsSync(path.join(d, 'PG_VERSION')));
  if (existing) return { dir: existing, inCheckout: false };
  // Folders we would make on the way are made world-enterable, so the nearest existing one decides.
  if (postgresCanEnter(nearestExisting(path.dirname(absDir))) && socketFits(absDir)) return { dir: absDir, inCheckout: true };
  for (const d of outside) {
    if (postgresCanEnter(path.dirname(path.dirname(d)))) return { dir: d, inCheckout: false };
  }
  return fail(`no folder the postgres user can reach for the database (tried the checkout, ${outsideBases().join(', ')}). Set CRANKWISE_PG_ROOT to a folder it may enter, or DATABASE_URL to a server of your own.`);
}

function nearestExisting(dir: string): string {
  return fs.existsSync(dir) || path.dirname(dir) === dir ? dir : nearestExisting(path.dirname(dir));
}

// A Unix socket path is limited to about 107 bytes; a deep checkout cannot hold the socket.
const socketFits = (absDir: string) => Buffer.byteLength(path.join(absDir, '.s.PGSQL.65535')) < 100;

/**
 * Starts (creating when needed) a private cluster for `dir`, on loopback, with its socket inside its
 * data folder. `throwaway` turns off durability for the test cluster only.
 */
export async function startCluster(dir: string, opts: { preferredPort: number; throwaway: boolean }): Promise<Cluster> {
  const bin = findPgBin();
  const { dir: absDir, inCheckout } = resolveClusterDir(dir);
  if (inCheckout) {
    // The parent stays world-readable so the postgres user can reach its own folder inside it.
    fs.mkdirSync(path.dirname(absDir), { recursive: true, mode: 0o755 });
    fs.chmodSync(path.dirname(absDir), 0o755);
  } else {
    claimOutsideParent(path.dirname(absDir));
  }
  fs.mkdirSync(absDir, { recursive: true, mode: 0o700 });
  if (isRoot) runQuiet('chown', ['-R', 'postgres:postgres', absDir]);

  if (!fs.existsSync(path.join(absDir, 'PG_VERSION'))) {
    say(`creating a private PostgreSQL cluster in ${describeDir(absDir)}`);
    asPostgres(bin, 'initdb', ['-D', absDir, '-U', 'postgres', '--auth=trust', '-E', 'UTF8', '--locale=C.UTF-8'], absDir);
    const conf = [
      "listen_addresses = '127.0.0.1'",
      // Double quotes keep a path with spaces or commas whole; no socket when the path is too long for one.
      `unix_socket_directories = '${socketFits(absDir) ? `"${absDir.replace(/'/g, "''")}"` : ''}'`,
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

/** A cluster folder as the start message names it: relative inside the checkout, absolute outside. */
export function describeDir(absDir: string): string {
  const rel = path.relative(process.cwd(), absDir);
  return rel.startsWith('..') || path.isAbsolute(rel) ? absDir : rel;
}

/** Restarts a running cluster in place (fast shutdown: every open connection is cut), same port. */
export function restartCluster(dir: string): void {
  const absDir = path.isAbsolute(dir) && fs.existsSync(path.join(dir, 'PG_VERSION')) ? dir : resolveClusterDir(dir).dir;
  const bin = findPgBin();
  asPostgres(bin, 'pg_ctl', ['-D', absDir, '-l', path.join(absDir, 'server.log'), '-m', 'fast', '-w', '-t', '30', 'restart'], absDir);
}

/** Stops a cluster if it runs; starts nothing. */
export function stopClusterIn(dir: string): boolean {
  const { dir: absDir } = resolveClusterDir(dir);
  if (!fs.existsSync(path.join(absDir, 'PG_VERSION'))) return false;
  const bin = findPgBin();
  if (!isRunning(bin, absDir)) return false;
  asPostgres(bin, 'pg_ctl', ['-D', absDir, '-m', 'fast', '-w', 'stop'], absDir);
  return true;
}
