import fs from 'node:fs';
import { fail, say } from './log';
import { runQuiet } from './run';

// Flags for this closed network (no background connections, no component updates).
export const CHROMIUM_ARGS = [
  '--headless',
  '--no-sandbox',
  '--disable-gpu',
  '--disable-quic',
  '--no-first-run',
  '--disable-background-networking',
  '--disable-component-update',
  '--disable-sync',
];

/** Debian's Chromium; installed with apt-get when missing and we are root (never a browser download). */
export function chromiumPath(): string {
  const exe = '/usr/bin/chromium';
  if (fs.existsSync(exe)) return exe;
  if (process.getuid?.() === 0) {
    say("Chromium is not installed: installing Debian's chromium package (about a minute) ...");
    runQuiet('apt-get', ['update']);
    runQuiet('apt-get', ['install', '-y', 'chromium'], { env: { ...process.env, DEBIAN_FRONTEND: 'noninteractive' } });
    if (fs.existsSync(exe)) return exe;
  }
  return fail('Chromium was not found. Install it with:\n  sudo apt-get update && sudo apt-get install -y chromium');
}
