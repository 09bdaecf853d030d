// npm run bench:client — the phone app in headless Chromium against the built app and the real
// server with a private PostgreSQL: the first sync of a 20,000-record club into IndexedDB, the
// time to save one check answer, and the first route's JS. Prints figures and, last, one JSON
// line; asserts nothing about time.
import { mkdtempSync, readFileSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { gzipSync } from 'node:zlib';
import { ensureDependencies } from './lib/deps.mjs';
import { buildAll } from './lib/build.mjs';
import { ensureChromium } from './lib/chromium.mjs';
import { openChromium } from './lib/browser.mjs';
import { startPostgres } from './lib/postgres.mjs';
import { freePort } from './lib/ports.mjs';
import { run } from './lib/run.mjs';
import { startServer } from './lib/server.mjs';

const RECORDS = 20_000;
const ANSWER_ROUNDS = 10;

const repo = fileURLToPath(new URL('..', import.meta.url));
const dist = join(repo, 'client', 'dist');
ensureDependencies(repo);
const chromiumPath = ensureChromium();
buildAll(repo);
// Loaded after the install and build above: a fresh clone has neither until then.
const playwright = await import('playwright-core');
const { default: pg } = await import('pg');
const { seedBenchClub } = await import('./lib/bench-data.mjs');
const { clubRecords, pushRecords, signIn } = await import('./lib/bench-client-data.mjs');
const { DEFAULT_LAUNCH_TEMPLATE } = await import('../sync-protocol/dist/index.js');

/** Records, in the page, when the sync's requests go out and when IndexedDB write transactions commit. */
function instrument() {
  const bench = { pulls: 0, pullStart: null, pullWaitMs: 0, statusAt: null, commits: [], waiter: null };
  window.__bench = bench;
  const fetchOf = window.fetch.bind(window);
  window.fetch = async (input, init) => {
    const url = String(input instanceof Request ? input.url : input);
    const sent = performance.now();
    if (url.includes('/api/sync/pull')) {
      bench.pulls += 1;
      bench.pullStart ??= sent;
    }
    const response = await fetchOf(input, init);
    // Until the answer's headers: the server's time and the wire's (the pull is one JSON body).
    if (url.includes('/api/sync/pull')) bench.pullWaitMs += performance.now() - sent;
    if (url.includes('/api/sync/status') && bench.pullStart !== null) bench.statusAt ??= performance.now();
    return response;
  };
  const transaction = IDBDatabase.prototype.transaction;
  IDBDatabase.prototype.transaction = function (names, mode, ...rest) {
    const tx = transaction.call(this, names, mode, ...rest);
    if (mode === 'readwrite') {
      const stores = typeof names === 'string' ? [names] : [...names];
      tx.addEventListener('complete', () => {
        const at = performance.now();
        bench.commits.push({ at, stores: stores.join(',') });
        if (stores.includes('outbox') && bench.waiter) {
          const resolve = bench.waiter;
          bench.waiter = null;
          resolve(at);
        }
      });
    }
    return tx;
  };
}

/** Gzip size of the app's own JS files the page asked for, read from the build. */
function jsGzip(urls) {
  const files = [...new Set(urls.map((u) => new URL(u).pathname))].filter((p) => p.endsWith('.js'));
  const bytes = files.reduce((sum, p) => sum + gzipSync(readFileSync(join(dist, p)), { level: 9 }).length, 0);
  return { kb: +(bytes / 1000).toFixed(1), files: files.map((p) => p.replace('/assets/', '')) };
}

async function scriptsFor(page, load) {
  const urls = [];
  const listen = (r) => r.resourceType() === 'script' && urls.push(r.url());
  page.on('request', listen);
  await load();
  await page.waitForLoadState('networkidle');
  page.off('request', listen);
  return jsGzip(urls);
}

const median = (xs) => {
  const s = [...xs].sort((a, b) => a - b);
  return s.length % 2 ? s[(s.length - 1) / 2] : (s[s.length / 2 - 1] + s[s.length / 2]) / 2;
};
const percentile = (xs, p) => [...xs].sort((a, b) => a - b)[Math.min(xs.length - 1, Math.ceil((p / 100) * xs.length) - 1)];

const root = mkdtempSync(join(tmpdir(), 'breakline-bench-client-pg-'));
const db = await startPostgres({ root, port: await freePort(), database: 'breakline_bench_client', password: 'bench' });
const env = {
  ...process.env, DATABASE_URL: db.url, JWT_SECRET: 'bench-secret-bench-secret-bench-secret', NODE_ENV: 'production',
  HOST: '127.0.0.1', CLIENT_DIST: dist,
};
let server;
let browser;
try {
  run('node', ['server/dist/cli/migrate.js'], { cwd: repo, env });
  const client = new pg.Client({ connectionString: db.url });
  await client.connect();
  const club = await seedBenchClub(client, 'bench-client');
  await client.end();
  server = await startServer(repo, { ...env, PORT: String(await freePort()) });

  console.log(`• Pushing a club of ${RECORDS.toLocaleString('en')} records (boats, template, checks, trips, defects) through the sync API…`);
  const { accessToken } = await signIn(server.baseUrl, club.email, club.password);
  const seeded = clubRecords({ userId: club.userId, template: DEFAULT_LAUNCH_TEMPLATE, total: RECORDS });
  await pushRecords(server.baseUrl, accessToken, seeded.records);

  browser = await openChromium(playwright, chromiumPath);
  const { page, context } = browser;
  await context.addInitScript(instrument);

  console.log('• First visit: sign-in screen, then sign in and the first sync…');
  const signInJs = await scriptsFor(page, async () => {
    await page.goto(server.baseUrl);
    await page.getByLabel(/e-mail/i).waitFor();
  });
  await page.getByLabel(/e-mail/i).fill(club.email);
  await page.getByLabel(/password/i).fill(club.password);
  await page.getByRole('button', { name: /sign in/i }).click();
  const deadline = Date.now() + 180_000;
  let sync;
  for (;;) {
    sync = await page.evaluate(() => {
      const b = window.__bench;
      const end = b.statusAt === null ? undefined : b.commits.find((c) => c.at > b.statusAt && c.stores === 'syncState');
      const pages = b.commits.filter((c) => c.stores.split(',').includes('records') && c.at >= b.pullStart);
      return end ? { ms: end.at - b.pullStart, pulls: b.pulls, waitMs: b.pullWaitMs, firstPageMs: pages.length ? pages[0].at - b.pullStart : null, gaps: pages.map((c, i) => Math.round(c.at - (i ? pages[i - 1].at : b.pullStart))), tail: Math.round(end.at - pages[pages.length - 1].at) } : null;
    });
    if (sync) break;
    if (Date.now() > deadline) throw new Error('The first sync did not finish within 3 minutes.');
    await new Promise((r) => setTimeout(r, 250));
  }
  const stored = await page.evaluate(
    (name) => new Promise((resolve, reject) => {
      const open = indexedDB.open(name);
      open.onerror = () => reject(open.error);
      open.onsuccess = () => {
        const count = open.result.transaction('records').objectStore('records').count();
        count.onsuccess = () => { resolve(count.result); open.result.close(); };
      };
    }),
    `breakline-replica-${club.userId}`,
  );
  if (stored !== RECORDS) throw new Error(`After the first sync IndexedDB holds ${stored} records, not ${RECORDS}.`);

  console.log('• Today on a later visit (signed in)…');
  const todayPage = await context.newPage();
  const todayJs = await scriptsFor(todayPage, async () => {
    await todayPage.goto(server.baseUrl);
    await todayPage.getByRole('heading', { name: 'Today' }).waitFor();
  });
  await todayPage.close();

  console.log('• Answering launch check items on the phone, offline…');
  await page.goto(`${server.baseUrl}/checks/run/${seeded.openCheckId}?section=1`);
  await page.getByRole('button', { name: 'Pass' }).first().waitFor({ timeout: 60_000 });
  await page.waitForLoadState('networkidle');
  await context.setOffline(true);
  const samples = await page.evaluate(async (rounds) => {
    const frame = () => new Promise((r) => requestAnimationFrame(() => r()));
    const out = [];
    for (let round = 0; round < rounds; round++) {
      const label = round % 2 === 0 ? 'Pass' : 'N/A';
      const count = [...document.querySelectorAll('button')].filter((b) => b.textContent.trim() === label).length;
      if (count === 0) throw new Error(`No "${label}" button on the check screen.`);
      for (let i = 0; i < count; i++) {
        const button = [...document.querySelectorAll('button')].filter((b) => b.textContent.trim() === label)[i];
        const committed = new Promise((resolve, reject) => {
          window.__bench.waiter = resolve;
          setTimeout(() => reject(new Error('An answer was not saved within 5 s.')), 5000);
        });
        const t0 = performance.now();
        button.click();
        out.push((await committed) - t0);
        // A person taps again after the screen shows the answer, not within the same frame.
        await frame();
        await frame();
      }
    }
    return out;
  }, ANSWER_ROUNDS);
  const queued = await page.evaluate(
    (name) => new Promise((resolve, reject) => {
      const open = indexedDB.open(name);
      open.onerror = () => reject(open.error);
      open.onsuccess = () => {
        const all = open.result.transaction('outbox').objectStore('outbox').getAll();
        all.onsuccess = () => { resolve(all.result.filter((e) => e.status === 'pending' && e.kind === 'check').length); open.result.close(); };
      };
    }),
    `breakline-replica-${club.userId}`,
  );
  // Every tap must have queued its own change to the check, or the times are of something else.
  if (queued < samples.length) throw new Error(`Only ${queued} check changes are queued after ${samples.length} taps.`);
  await context.setOffline(false);
  const measured = samples.slice(4); // the first taps warm up the runner's code paths

  const figures = {
    first_sync_20k_ms: Math.round(sync.ms),
    first_sync_records: stored,
    first_sync_pull_requests: sync.pulls,
    first_sync_records_per_s: Math.round(stored / (sync.ms / 1000)),
    first_sync_pull_wait_ms: Math.round(sync.waitMs),
    first_sync_first_page_ms: sync.firstPageMs === null ? null : Math.round(sync.firstPageMs),
    answer_save_ms_median: +median(measured).toFixed(2),
    answer_save_ms_p90: +percentile(measured, 90).toFixed(2),
    answer_samples: measured.length,
    first_route_js_gzip_kb: todayJs.kb,
    first_route_js_files: todayJs.files.length,
    sign_in_route_js_gzip_kb: signInJs.kb,
  };
  console.log(`first sync of ${stored.toLocaleString('en')} records into IndexedDB: ${figures.first_sync_20k_ms} ms in ${sync.pulls} pulls, ${figures.first_sync_records_per_s} records/s (target ≤ 5000 ms)`);
  console.log(`  page commits after each other (ms): ${sync.gaps.join(' ')}; then ${sync.tail} ms to the end`);
  console.log(`  of which waiting for the server's pull answers (while the previous page is written): ${figures.first_sync_pull_wait_ms} ms`);
  console.log(`save one check answer (tap to IndexedDB commit, offline): median ${figures.answer_save_ms_median} ms, p90 ${figures.answer_save_ms_p90} ms over ${measured.length} taps (target ≤ 5 ms)`);
  console.log(`first route (Today, signed in) JS: ${figures.first_route_js_gzip_kb} kB gzip in ${todayJs.files.length} files: ${todayJs.files.join(', ')} (target ≤ 200)`);
  console.log(`sign-in screen JS: ${figures.sign_in_route_js_gzip_kb} kB gzip in ${signInJs.files.length} files: ${signInJs.files.join(', ')}`);
  console.log(JSON.stringify(figures));
} finally {
  await browser?.close();
  await server?.stop();
  db.stop();
  rmSync(root, { recursive: true, force: true });
}
