// npm run bench:sync — push and pull throughput against a PostgreSQL with a long history.
// Prints figures and, last, one JSON line; asserts nothing about time.
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { ensureDependencies } from './lib/deps.mjs';
import { buildIfStale } from './lib/build.mjs';
import { startPostgres } from './lib/postgres.mjs';
import { freePort } from './lib/ports.mjs';
import { run } from './lib/run.mjs';
import { startServer } from './lib/server.mjs';

const repo = fileURLToPath(new URL('..', import.meta.url));
ensureDependencies(repo);
// The bench serves no pages, so the client is not built (a build is minutes on a small machine).
const protocolBuilt = buildIfStale(repo, 'sync-protocol', ['sync-protocol/src', 'sync-protocol/package.json', 'tsconfig.base.json']);
buildIfStale(repo, 'server', ['server/src', 'server/package.json', 'server/tsconfig.build.json'], { force: protocolBuilt });
// Loaded after the install above: a fresh clone has no node_modules until then.
const { default: pg } = await import('pg');
const { seedBenchClub, seedHistory } = await import('./lib/bench-data.mjs');
const { baselinePush, httpPush, mutationsFor, timePulls } = await import('./lib/bench-sync-ops.mjs');

const root = mkdtempSync(join(tmpdir(), 'breakline-bench-pg-'));
const db = await startPostgres({ root, port: await freePort(), database: 'breakline_bench', password: 'bench' });
const env = { ...process.env, DATABASE_URL: db.url, JWT_SECRET: 'bench-secret-bench-secret-bench-secret', NODE_ENV: 'production' };
let server;
try {
  run('node', ['server/dist/cli/migrate.js'], { cwd: repo, env });
  const client = new pg.Client({ connectionString: db.url });
  await client.connect();
  const pushClub = await seedBenchClub(client, 'bench-push');
  const baseClub = await seedBenchClub(client, 'bench-baseline');
  const small = await seedBenchClub(client, 'bench-10k');
  const large = await seedBenchClub(client, 'bench-1m');
  console.log('• Writing history: 100,000 changes for the push clubs, 10,000 and 1,000,000 for the pull clubs…');
  for (const c of [pushClub, baseClub]) await seedHistory(client, c, 100_000);
  await seedHistory(client, small, 10_000);
  await seedHistory(client, large, 1_000_000);
  await client.query('ANALYZE');

  server = await startServer(repo, { ...env, PORT: String(await freePort()) });
  const batches = [...Array(10).fill(1000), 10_000];
  const httpRes = await httpPush(server.baseUrl, pushClub, batches);
  const baseRes = await baselinePush(client, baseClub, batches.map((n) => mutationsFor(baseClub, n)));
  const pull10k = await timePulls(server.baseUrl, small, 1000);
  const pull1m = await timePulls(server.baseUrl, large, 1000);
  await client.end();

  const figures = {
    push_changes: httpRes.changes,
    push_changes_per_s: Math.round(httpRes.perSecond),
    baseline_changes_per_s: Math.round(baseRes.perSecond),
    push_ratio: +(httpRes.perSecond / baseRes.perSecond).toFixed(3),
    pull_ms_10k: +pull10k.toFixed(1),
    pull_ms_1m: +pull1m.toFixed(1),
    pull_ratio: +(pull1m / pull10k).toFixed(3),
  };
  console.log(`push through HTTP: ${figures.push_changes_per_s} changes/s; raw SQL baseline: ${figures.baseline_changes_per_s} changes/s; ratio ${figures.push_ratio} (target ≥ 0.7)`);
  console.log(`pull 1,000 changes: ${figures.pull_ms_10k} ms with a 10k history, ${figures.pull_ms_1m} ms with a 1M history; ratio ${figures.pull_ratio} (target ≤ 1.5)`);
  console.log(JSON.stringify(figures));
} finally {
  await server?.stop();
  db.stop();
  rmSync(root, { recursive: true, force: true });
}
