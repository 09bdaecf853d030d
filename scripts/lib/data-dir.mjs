// Where the product keeps its local database and secrets between runs.
import { createHash, randomBytes } from 'node:crypto';
import { accessSync, constants, existsSync, mkdirSync, readFileSync, statSync, writeFileSync } from 'node:fs';
import { dirname, join } from 'node:path';
import { isRoot } from './run.mjs';

/** True when every folder above `dir` lets other users pass (the postgres user must reach it). */
function reachableByOthers(dir) {
  for (let d = dir; ; d = dirname(d)) {
    if (existsSync(d) && (statSync(d).mode & 0o001) === 0) return false;
    if (d === dirname(d)) return true;
  }
}

/** `.data/` in the repository, or a folder under /var/lib when the repository is private to root. */
export function dataRoot(repo) {
  const local = join(repo, '.data');
  if (!isRoot() || reachableByOthers(repo)) return local;
  return join('/var/lib/breakline', createHash('sha256').update(repo).digest('hex').slice(0, 12));
}

/** Secrets made once on first start and kept, so tokens and the database survive restarts. */
export function localSecrets(root) {
  const file = join(root, 'secrets.json');
  if (existsSync(file)) return JSON.parse(readFileSync(file, 'utf8'));
  mkdirSync(root, { recursive: true });
  const secrets = { dbPassword: randomBytes(18).toString('base64url'), jwtSecret: randomBytes(48).toString('base64url') };
  writeFileSync(file, JSON.stringify(secrets, null, 2), { mode: 0o600 });
  accessSync(file, constants.R_OK);
  return secrets;
}
