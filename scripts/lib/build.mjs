// Rebuilds a package only when a source file is newer than its last build.
import { existsSync, readdirSync, statSync, writeFileSync, mkdirSync } from 'node:fs';
import { join, dirname } from 'node:path';
import { run } from './run.mjs';

function newestMtime(path) {
  if (!existsSync(path)) return 0;
  const st = statSync(path);
  if (!st.isDirectory()) return st.mtimeMs;
  let newest = st.mtimeMs;
  for (const name of readdirSync(path)) {
    if (name === 'node_modules' || name === 'dist') continue;
    newest = Math.max(newest, newestMtime(join(path, name)));
  }
  return newest;
}

/** Runs `npm run build -w <workspace>` when any of `inputs` changed since the stamp. */
export function buildIfStale(root, workspace, inputs, { force = false } = {}) {
  const stamp = join(root, workspace, 'dist', '.built');
  const built = existsSync(stamp) ? statSync(stamp).mtimeMs : 0;
  const newest = Math.max(...inputs.map((p) => newestMtime(join(root, p))));
  if (!force && built > newest) return false;
  console.log(`• Building ${workspace}…`);
  run('npm', ['run', 'build', '-w', workspace], { cwd: root });
  mkdirSync(dirname(stamp), { recursive: true });
  writeFileSync(stamp, new Date().toISOString());
  return true;
}

export function buildAll(root, opts) {
  const proto = buildIfStale(root, 'sync-protocol', ['sync-protocol/src', 'sync-protocol/package.json', 'tsconfig.base.json'], opts);
  const force = opts?.force || proto;
  buildIfStale(root, 'server', ['server/src', 'server/package.json', 'server/tsconfig.build.json'], { force });
  buildIfStale(root, 'client', ['client/src', 'client/public', 'client/index.html', 'client/package.json', 'vite.config.ts'], { force });
}
