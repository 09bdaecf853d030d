// Installs npm dependencies when node_modules is missing or older than the manifests.
import { createHash } from 'node:crypto';
import { existsSync, readFileSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { run } from './run.mjs';

const MANIFESTS = ['package.json', 'package-lock.json', 'client/package.json', 'server/package.json', 'sync-protocol/package.json'];

function manifestHash(root) {
  const h = createHash('sha256');
  for (const f of MANIFESTS) {
    const p = join(root, f);
    if (existsSync(p)) h.update(f).update(readFileSync(p));
  }
  return h.digest('hex');
}

export function ensureDependencies(root) {
  const stamp = join(root, 'node_modules', '.breakline-deps');
  const want = manifestHash(root);
  if (existsSync(stamp) && readFileSync(stamp, 'utf8') === want) return;
  console.log('• Installing npm dependencies (first run or package files changed)…');
  const lock = existsSync(join(root, 'package-lock.json'));
  run('npm', [lock && !existsSync(join(root, 'node_modules')) ? 'ci' : 'install', '--no-audit', '--no-fund'], { cwd: root });
  writeFileSync(stamp, manifestHash(root));
}
