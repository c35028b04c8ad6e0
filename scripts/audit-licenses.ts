// `npm run audit:licenses`: every production dependency (direct and transitive, from
// package-lock.json) with its license. Permissive licenses pass; MPL-2.0 is listed as weak copyleft
// to review; GPL family, AGPL, any other license and a missing one fail unless scripts/license-allow.json
// names the package with a reason. Exit code 1 when something fails.
import fs from 'node:fs';
import path from 'node:path';
import { fail, say } from './lib/log';

const PERMISSIVE = new Set(['MIT', 'MIT-0', 'ISC', 'BSD-2-Clause', 'BSD-3-Clause', 'Apache-2.0', '0BSD', 'BlueOak-1.0.0', 'Unlicense', 'CC0-1.0', 'Python-2.0']);
const WEAK_COPYLEFT = new Set(['MPL-2.0']);

type Verdict = 'permissive' | 'review' | 'allowed' | 'refused';
interface LockEntry {
  name?: string;
  version?: string;
  license?: string;
  dev?: boolean;
  optional?: boolean;
}

/** One SPDX identifier: permissive, weak copyleft to review, or refused (GPL family, AGPL, anything unknown). */
function judgeId(id: string): Exclude<Verdict, 'allowed'> {
  const clean = id.replace(/[()]/g, '').trim();
  if (PERMISSIVE.has(clean)) return 'permissive';
  if (WEAK_COPYLEFT.has(clean)) return 'review';
  return 'refused';
}

const RANK: Record<Exclude<Verdict, 'allowed'>, number> = { permissive: 0, review: 1, refused: 2 };

/** A simple SPDX expression: OR takes the best choice, AND the worst part (no nesting beyond that). */
export function judgeLicense(expression: string | undefined): Exclude<Verdict, 'allowed'> {
  if (!expression) return 'refused';
  const choices = expression.replace(/^\(|\)$/g, '').split(/\s+OR\s+/);
  const judged = choices.map((choice) => {
    const parts = choice.split(/\s+AND\s+/).map(judgeId);
    return parts.reduce((worst, v) => (RANK[v] > RANK[worst] ? v : worst), 'permissive' as Exclude<Verdict, 'allowed'>);
  });
  return judged.reduce((best, v) => (RANK[v] < RANK[best] ? v : best), 'refused' as Exclude<Verdict, 'allowed'>);
}

function licenseFromPackageJson(dir: string): string | undefined {
  const file = path.join(dir, 'package.json');
  if (!fs.existsSync(file)) return undefined;
  const pkg = JSON.parse(fs.readFileSync(file, 'utf8')) as { license?: string | { type?: string }; licenses?: { type?: string }[] };
  if (typeof pkg.license === 'string') return pkg.license;
  if (pkg.license?.type) return pkg.license.type;
  if (pkg.licenses?.length) return pkg.licenses.map((l) => l.type).join(' OR ');
  return undefined;
}

const root = process.cwd();
const lock = JSON.parse(fs.readFileSync(path.join(root, 'package-lock.json'), 'utf8')) as { lockfileVersion: number; packages?: Record<string, LockEntry> };
if (!lock.packages) fail('package-lock.json has no "packages" map (lockfile version 2 or later is needed).');
const allowFile = path.join(root, 'scripts', 'license-allow.json');
const allowList = fs.existsSync(allowFile) ? (JSON.parse(fs.readFileSync(allowFile, 'utf8')) as Record<string, string>) : {};

const rows: { name: string; version: string; license: string; verdict: Verdict; note: string }[] = [];
for (const [location, entry] of Object.entries(lock.packages!)) {
  if (!location || entry.dev) continue; // the root project, or a package only the tooling needs
  const name = entry.name ?? location.slice(location.lastIndexOf('node_modules/') + 'node_modules/'.length);
  const version = entry.version ?? '?';
  const installed = fs.existsSync(path.join(root, location));
  const license = entry.license ?? (installed ? licenseFromPackageJson(path.join(root, location)) : undefined);
  let verdict: Verdict = judgeLicense(license);
  let note = installed ? '' : 'not installed here (optional, another platform)';
  const reason = allowList[`${name}@${version}`] ?? allowList[name];
  if (verdict !== 'permissive' && reason) {
    verdict = 'allowed';
    note = reason;
  } else if (verdict === 'review') {
    note = 'weak copyleft, review: changes to its own files must be shared';
  }
  rows.push({ name, version, license: license ?? 'UNKNOWN', verdict, note });
}
rows.sort((a, b) => a.name.localeCompare(b.name) || a.version.localeCompare(b.version));

const width = Math.max(...rows.map((r) => `${r.name}@${r.version}`.length));
for (const r of rows) console.log(`${`${r.name}@${r.version}`.padEnd(width)}  ${r.license.padEnd(36)}  ${r.verdict}${r.note ? `  (${r.note})` : ''}`);
const count = (v: Verdict) => rows.filter((r) => r.verdict === v).length;
say(`${rows.length} production packages: ${count('permissive')} permissive, ${count('allowed')} allowed by scripts/license-allow.json, ${count('review')} to review, ${count('refused')} refused`);
const refused = rows.filter((r) => r.verdict === 'refused');
if (refused.length) {
  fail(`not permissive and not in scripts/license-allow.json:\n${refused.map((r) => `  ${r.name}@${r.version}: ${r.license}`).join('\n')}\nReplace the package, or add it to the allow-list with the reason it is acceptable.`);
}
