// Installs the npm dependencies when node_modules is missing or older than package-lock.json.
// Plain Node on purpose: it runs before anything from node_modules can be imported.
import { createHash } from 'node:crypto';
import { execSync } from 'node:child_process';
import { existsSync, readFileSync, writeFileSync } from 'node:fs';

const lock = existsSync('package-lock.json') ? readFileSync('package-lock.json') : readFileSync('package.json');
const want = createHash('sha256').update(lock).digest('hex');
const stampFile = 'node_modules/.crankwise-deps-stamp';
const have = existsSync(stampFile) ? readFileSync(stampFile, 'utf8').trim() : '';

if (have !== want) {
  const cmd = existsSync('package-lock.json') ? 'npm ci --no-audit --no-fund' : 'npm install --no-audit --no-fund';
  console.log(`[crankwise] installing dependencies (${cmd}) ...`);
  execSync(cmd, { stdio: 'inherit' });
  writeFileSync(stampFile, want + '\n');
}
