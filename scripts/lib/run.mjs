// Small process helpers shared by the start, test and bench scripts.
import { spawn, spawnSync } from 'node:child_process';

export const isRoot = () => typeof process.getuid === 'function' && process.getuid() === 0;

/** Prints one plain sentence and leaves with a non-zero code. */
export function fail(sentence) {
  console.error(`\n✖ ${sentence}\n`);
  process.exit(1);
}

/** Runs a command to completion, streaming its output; throws when it fails. */
export function run(cmd, args, opts = {}) {
  const res = spawnSync(cmd, args, { stdio: 'inherit', ...opts });
  if (res.error) throw res.error;
  if (res.status !== 0) {
    const err = new Error(`${cmd} ${args.join(' ')} exited with ${res.status}`);
    err.exitCode = res.status ?? 1;
    throw err;
  }
  return res;
}

/** Runs a command and returns its trimmed stdout, or null when it fails. */
export function capture(cmd, args, opts = {}) {
  const res = spawnSync(cmd, args, { encoding: 'utf8', ...opts });
  return res.status === 0 ? res.stdout.trim() : null;
}

/** Starts a long-running child whose output is prefixed; resolves on exit. */
export function startChild(cmd, args, opts = {}) {
  const child = spawn(cmd, args, { stdio: 'inherit', ...opts });
  child.done = new Promise((resolve) => child.on('exit', (code, signal) => resolve({ code, signal })));
  return child;
}

export const sleep = (ms) => new Promise((r) => setTimeout(r, ms));
