// The mutation score of the engine counting every mutant except those listed in equivalent.json
// (each with the reason no test can tell it from the original). Reads Stryker's JSON report.
import fs from 'node:fs';
import path from 'node:path';
import { fileURLToPath } from 'node:url';

const ROOT = fileURLToPath(new URL('../..', import.meta.url));
const REPORT = path.join(ROOT, 'reports/mutation/mutation.json');
const EQUIVALENT = path.join(ROOT, 'scripts/mutation/equivalent.json');

/** The score the engine must reach, and the files where no mutant may survive (safety rules and formulas). */
export const MINIMUM_SCORE = 90;
export const NO_SURVIVORS_IN = [
  'shared/domain/energy-state.ts',
  'shared/domain/procedure-step-rules.ts',
  'shared/domain/validate-procedure.ts',
  'shared/domain/safety-distance.ts',
  'shared/domain/brake-monitor.ts',
];

interface Mutant {
  id: string;
  mutatorName: string;
  replacement?: string;
  status: string;
  location: { start: { line: number; column: number } };
}
interface Report {
  files: Record<string, { mutants: Mutant[] }>;
}
export interface Equivalent {
  file: string;
  line: number;
  column: number;
  mutator: string;
  replacement: string;
  reason: string;
}

const DETECTED = new Set(['Killed', 'Timeout']);
// Stryker leaves these out of its own score too: the mutant did not compile or was not run.
const NOT_COUNTED = new Set(['CompileError', 'RuntimeError', 'Ignored', 'Pending']);

export function loadEquivalents(): Equivalent[] {
  return JSON.parse(fs.readFileSync(EQUIVALENT, 'utf8')) as Equivalent[];
}

const matches = (e: Equivalent, file: string, m: Mutant) =>
  e.file === file &&
  e.line === m.location.start.line &&
  e.column === m.location.start.column &&
  e.mutator === m.mutatorName &&
  e.replacement === (m.replacement ?? '');

/** Prints the adjusted score per file; true when the minimum is met and no safety file has a survivor. */
export function printScore(report: Report = JSON.parse(fs.readFileSync(REPORT, 'utf8')) as Report): boolean {
  const equivalents = loadEquivalents();
  const used = new Set<Equivalent>();
  const rows: string[][] = [];
  let [allCounted, allDetected] = [0, 0];
  const offenders: string[] = [];
  for (const [rawFile, { mutants }] of Object.entries(report.files).sort(([a], [b]) => a.localeCompare(b))) {
    const file = path.relative(ROOT, path.resolve(ROOT, rawFile)).split(path.sep).join('/');
    let [counted, detected, undetected, equivalent] = [0, 0, 0, 0];
    for (const m of mutants) {
      if (NOT_COUNTED.has(m.status)) continue;
      if (DETECTED.has(m.status)) {
        counted += 1;
        detected += 1;
        continue;
      }
      const eq = equivalents.find((e) => matches(e, file, m));
      if (eq) {
        used.add(eq);
        equivalent += 1;
        continue;
      }
      counted += 1;
      undetected += 1;
      if (NO_SURVIVORS_IN.includes(file)) offenders.push(`${file}:${m.location.start.line}:${m.location.start.column} ${m.mutatorName} → ${m.replacement ?? ''} (${m.status})`);
    }
    allCounted += counted;
    allDetected += detected;
    const score = counted ? ((detected / counted) * 100).toFixed(2) : '100.00';
    rows.push([file, String(mutants.length), String(detected), String(undetected), String(equivalent), score]);
  }
  const total = allCounted ? (allDetected / allCounted) * 100 : 100;
  rows.push(['All files', '', String(allDetected), String(allCounted - allDetected), String(used.size), total.toFixed(2)]);
  const head = ['file', 'mutants', 'detected', 'undetected', 'equivalent', 'score %'];
  const widths = head.map((h, i) => Math.max(h.length, ...rows.map((r) => r[i]!.length)));
  const line = (cells: string[]) => cells.map((c, i) => (i === 0 ? c.padEnd(widths[i]!) : c.padStart(widths[i]!))).join('  ');
  console.log('\nMutation score, equivalent mutants (scripts/mutation/equivalent.json) left out:\n');
  console.log(line(head));
  for (const r of rows) console.log(line(r));
  const files = new Set(Object.keys(report.files).map((f) => path.relative(ROOT, path.resolve(ROOT, f)).split(path.sep).join('/')));
  const stale = equivalents.filter((e) => files.has(e.file) && !used.has(e));
  for (const e of stale) console.log(`note: listed as equivalent but not undetected in this run: ${e.file}:${e.line}:${e.column} ${e.mutator}`);
  for (const o of offenders) console.log(`SURVIVOR in a safety file: ${o}`);
  const ok = total >= MINIMUM_SCORE && offenders.length === 0;
  console.log(ok ? `\nOK: ${total.toFixed(2)} % ≥ ${MINIMUM_SCORE} %, no survivors in the safety files.` : `\nBELOW TARGET: ${total.toFixed(2)} % (minimum ${MINIMUM_SCORE} %), ${offenders.length} survivor(s) in safety files.`);
  return ok;
}

if (process.argv[1] && path.resolve(process.argv[1]) === fileURLToPath(import.meta.url)) {
  process.exit(printScore() ? 0 : 1);
}
