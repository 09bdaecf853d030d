// Debian's Chromium drives the browser tests; installed with apt-get when missing (as root).
import { existsSync } from 'node:fs';
import { isRoot, run, fail } from './run.mjs';

export const CHROMIUM = process.env.CHROMIUM_PATH ?? '/usr/bin/chromium';

export function ensureChromium() {
  if (existsSync(CHROMIUM)) return CHROMIUM;
  if (!isRoot()) fail('Chromium is needed for the browser tests. Install it with "sudo apt-get install -y chromium" and run npm test again.');
  console.log('• Installing Chromium from Debian packages (about a minute)…');
  run('apt-get', ['update', '-qq']);
  run('apt-get', ['install', '-y', '-qq', 'chromium'], { env: { ...process.env, DEBIAN_FRONTEND: 'noninteractive' } });
  return CHROMIUM;
}
