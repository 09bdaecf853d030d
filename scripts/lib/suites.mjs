// Runs one test suite and reads its JSON report, so the total counts tests, not suites.
// The suite runs as a child process that this one waits for without blocking: the local fakes
// (photo store, mail catcher) live in this process and must keep answering while tests run.
import { existsSync, readFileSync, rmSync } from 'node:fs';
import { spawn } from 'node:child_process';

export async function runSuite(name, cmd, args, { cwd, env, report }) {
  console.log(`\n━━ ${name} ━━`);
  rmSync(report, { force: true });
  const status = await new Promise((resolve) => {
    const child = spawn(cmd, args, { cwd, env, stdio: 'inherit' });
    child.on('error', (e) => { console.error(`${name} could not start: ${e.message}`); resolve(1); });
    child.on('close', (code, signal) => resolve(signal ? 1 : code));
  });
  let passed = 0;
  let failed = 0;
  if (existsSync(report)) {
    const r = JSON.parse(readFileSync(report, 'utf8'));
    passed = r.numPassedTests ?? 0;
    failed = (r.numFailedTests ?? 0) + (r.numRuntimeErrorTestSuites ?? 0);
  }
  const ok = status === 0 && passed > 0;
  if (!ok && failed === 0) failed = 1; // crashed before reporting, or found no test at all
  return { name, ok, passed, failed };
}
