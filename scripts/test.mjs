// npm test: every suite of every workspace against a throwaway PostgreSQL, then browser tests
// against the built app served by the real server. Exits non-zero on any failure.
import { mkdtempSync, rmSync, mkdirSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { ensureDependencies } from './lib/deps.mjs';
import { ensureChromium } from './lib/chromium.mjs';
import { buildAll } from './lib/build.mjs';
import { startPostgres } from './lib/postgres.mjs';
import { freePort } from './lib/ports.mjs';
import { runSuite } from './lib/suites.mjs';
import { startS3Fake } from './lib/s3-fake.mjs';
import { startSmtpFake } from './lib/smtp-fake.mjs';

const repo = fileURLToPath(new URL('..', import.meta.url));
const reports = join(repo, '.tmp', 'reports');
mkdirSync(reports, { recursive: true });

ensureDependencies(repo);
const chromium = ensureChromium();
buildAll(repo);

const pgRoot = mkdtempSync(join(tmpdir(), 'breakline-test-pg-'));
const pg = await startPostgres({ root: pgRoot, port: await freePort(), database: 'breakline_test', password: 'breakline-test', fast: true });
const s3 = await startS3Fake({ dir: join(pgRoot, 'photos') });
const smtp = await startSmtpFake({ dir: join(pgRoot, 'mail') });
const mailEnv = { SMTP_HOST: smtp.host, SMTP_PORT: String(smtp.port), MAIL_CAUGHT_DIR: smtp.dir };
const cleanup = () => { pg.stop(); s3.stop().catch(() => {}); smtp.stop().catch(() => {}); rmSync(pgRoot, { recursive: true, force: true }); };
process.on('SIGINT', () => { cleanup(); process.exit(130); });

const base = { ...process.env, CHROMIUM_PATH: chromium, FORCE_COLOR: process.env.CI ? '0' : process.env.FORCE_COLOR };
const vitest = (dir, config, report) => ['node_modules/vitest/vitest.mjs', 'run', ...(dir ? ['--root', dir] : []), ...(config ? ['--config', config] : []),
  '--reporter=default', '--reporter=json', `--outputFile.json=${report}`];
const results = [];
try {
  let r = join(reports, 'sync-protocol.json');
  results.push(await runSuite('sync-protocol (vitest)', 'node', vitest('sync-protocol', null, r), { cwd: repo, env: base, report: r }));
  r = join(reports, 'client.json');
  results.push(await runSuite('client (vitest)', 'node', vitest(null, 'vite.config.ts', r), { cwd: repo, env: base, report: r }));
  r = join(reports, 'server.json');
  results.push(await runSuite('server (jest, PostgreSQL)', 'node',
    ['--experimental-vm-modules', '../node_modules/jest/bin/jest.js', '--runInBand', '--json', `--outputFile=${r}`],
    { cwd: join(repo, 'server'), env: { ...base, DATABASE_URL: pg.url, ...mailEnv }, report: r }));
  r = join(reports, 'browser.json');
  results.push(await runSuite('browser (Chromium, built app, real server)', 'node', vitest(null, 'client/e2e/vitest.e2e.config.ts', r),
    { cwd: repo, env: { ...base, ...mailEnv, E2E_DATABASE_URL: pg.addDatabase('breakline_e2e'), E2E_S3_ENDPOINT: s3.endpoint, E2E_S3_BUCKET: s3.bucket }, report: r }));
} finally {
  cleanup();
}

const passed = results.reduce((n, s) => n + s.passed, 0);
const failed = results.reduce((n, s) => n + s.failed, 0);
console.log('\n' + results.map((s) => `${s.ok ? '✔' : '✖'} ${s.name}: ${s.passed} passed, ${s.failed} failed`).join('\n'));
console.log(`${passed} passed, ${failed} failed`);
process.exit(results.every((s) => s.ok) ? 0 : 1);
