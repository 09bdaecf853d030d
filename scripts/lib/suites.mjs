// Runs one test suite and reads its JSON report, so the total counts tests, not suites.
import { existsSync, readFileSync, rmSync } from 'node:fs';
import { spawnSync } from 'node:child_process';

export function runSuite(name, cmd, args, { cwd, env, report }) {
  console.log(`\n━━ ${name} ━━`);
  rmSync(report, { force: true });
  const res = spawnSync(cmd, args, { cwd, env, stdio: 'inherit' });
  let passed = 0;
  let failed = 0;
  if (existsSync(report)) {
    const r = JSON.parse(readFileSync(report, 'utf8'));
    passed = r.numPassedTests ?? 0;
    failed = (r.numFailedTests ?? 0) + (r.numRuntimeErrorTestSuites ?? 0);
  }
  const ok = res.status === 0 && passed > 0;
  if (!ok && failed === 0) failed = 1; // crashed before reporting, or found no test at all
  return { name, ok, passed, failed };
}
