import { randomBytes } from 'node:crypto';
import fs from 'node:fs';
import path from 'node:path';

/** A session secret kept under .data/ so sign-ins survive a restart of `npm start`. */
export function localSessionSecret(): string {
  if (process.env.SESSION_SECRET) return process.env.SESSION_SECRET;
  const file = path.resolve('.data/session-secret');
  if (!fs.existsSync(file)) {
    fs.mkdirSync(path.dirname(file), { recursive: true });
    fs.writeFileSync(file, randomBytes(32).toString('hex'), { mode: 0o600 });
  }
  return fs.readFileSync(file, 'utf8').trim();
}
