// Starts the built server on a free loopback port against the e2e database, serving the built client.
import { spawn, spawnSync, type ChildProcess } from 'node:child_process';
import { createServer } from 'node:net';
import { fileURLToPath } from 'node:url';
import { join } from 'node:path';

const repo = fileURLToPath(new URL('../../../', import.meta.url));

function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const s = createServer();
    s.once('error', reject);
    s.listen(0, '127.0.0.1', () => {
      const { port } = s.address() as { port: number };
      s.close(() => resolve(port));
    });
  });
}

export interface RunningServer { baseUrl: string; stop: () => Promise<void>; log: () => string }

export async function startServer(): Promise<RunningServer> {
  const url = process.env.E2E_DATABASE_URL;
  if (!url) throw new Error('E2E_DATABASE_URL is not set: run the browser tests through "npm test".');
  const port = await freePort();
  const env = {
    ...process.env, DATABASE_URL: url, PORT: String(port), HOST: '127.0.0.1', NODE_ENV: 'test',
    JWT_SECRET: 'e2e-secret-e2e-secret-e2e-secret-e2e', CLIENT_DIST: join(repo, 'client', 'dist'),
    ...(process.env.E2E_S3_ENDPOINT ? { S3_ENDPOINT: process.env.E2E_S3_ENDPOINT, S3_BUCKET: process.env.E2E_S3_BUCKET } : {}),
  };
  for (const cli of ['migrate', 'seed']) {
    const r = spawnSync('node', [`server/dist/cli/${cli}.js`], { cwd: repo, env, encoding: 'utf8' });
    if (r.status !== 0) throw new Error(`${cli} failed: ${r.stderr || r.stdout}`);
  }
  let out = '';
  const child: ChildProcess = spawn('node', ['server/dist/main.js'], { cwd: repo, env });
  child.stdout!.on('data', (d) => (out += d));
  child.stderr!.on('data', (d) => (out += d));
  const baseUrl = `http://127.0.0.1:${port}`;
  for (let i = 0; i < 100; i++) {
    if (child.exitCode !== null) throw new Error(`server exited: ${out}`);
    const ok = await fetch(`${baseUrl}/api/health`).then((r) => r.ok).catch(() => false);
    if (ok) break;
    await new Promise((r) => setTimeout(r, 200));
  }
  return {
    baseUrl,
    log: () => out,
    stop: () => new Promise((resolve) => {
      if (child.exitCode !== null) return resolve();
      child.once('exit', () => resolve());
      child.kill('SIGTERM');
    }),
  };
}
