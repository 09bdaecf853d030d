// npm start: install what is missing, start PostgreSQL on loopback, migrate, seed the demo club,
// build, and serve Breakline at http://127.0.0.1:3000 until Ctrl-C.
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { ensureDependencies } from './lib/deps.mjs';
import { buildAll } from './lib/build.mjs';
import { startPostgres } from './lib/postgres.mjs';
import { dataRoot, localSecrets } from './lib/data-dir.mjs';
import { isPortFree } from './lib/ports.mjs';
import { startS3Fake } from './lib/s3-fake.mjs';
import { startSmtpFake } from './lib/smtp-fake.mjs';
import { fail, run, startChild } from './lib/run.mjs';

const repo = fileURLToPath(new URL('..', import.meta.url));
const port = Number(process.env.PORT ?? 3000);
const pgPort = Number(process.env.BREAKLINE_PG_PORT ?? 5544);

ensureDependencies(repo);
if (!(await isPortFree(port))) fail(`Port ${port} on 127.0.0.1 is already in use (is Breakline already running?). Stop it, or run PORT=3100 npm start.`);
buildAll(repo);

const root = dataRoot(repo);
const secrets = localSecrets(root);
const pg = await startPostgres({ root: join(root, 'postgres'), port: pgPort, database: 'breakline', password: secrets.dbPassword });
const s3 = await startS3Fake({ dir: join(root, 'photos'), port: Number(process.env.BREAKLINE_S3_PORT ?? 5545) }).catch((e) => {
  pg.stop();
  fail(e.message);
});
// Mail is caught on loopback and shown to admins on the caught-mail page, never delivered.
const smtp = await startSmtpFake({ dir: join(root, 'mail'), port: Number(process.env.BREAKLINE_SMTP_PORT ?? 5546) }).catch((e) => {
  pg.stop();
  s3.stop().finally(() => fail(e.message));
});
const env = {
  ...process.env, DATABASE_URL: pg.url, S3_ENDPOINT: s3.endpoint, S3_BUCKET: s3.bucket, JWT_SECRET: secrets.jwtSecret, PORT: String(port), HOST: '127.0.0.1',
  CLIENT_DIST: join(repo, 'client', 'dist'), NODE_ENV: 'production',
  SMTP_HOST: smtp.host, SMTP_PORT: String(smtp.port), MAIL_CAUGHT_DIR: smtp.dir, APP_URL: process.env.APP_URL ?? `http://127.0.0.1:${port}`,
};

let server;
const shutdown = (code = 0) => {
  if (server && server.exitCode === null) server.kill('SIGTERM');
  pg.stop();
  Promise.allSettled([s3.stop(), smtp.stop()]).finally(() => process.exit(code));
};
process.on('SIGINT', () => shutdown(0));
process.on('SIGTERM', () => shutdown(0));

try {
  run('node', ['server/dist/cli/migrate.js'], { cwd: repo, env });
  run('node', ['server/dist/cli/seed.js'], { cwd: repo, env });
} catch {
  shutdown(1);
}

server = startChild('node', ['server/dist/main.js'], { cwd: repo, env });
const { DEMO_CLUBS, DEMO_PASSWORD } = await import('../server/dist/seed/demo-scenario.js');
setTimeout(() => printWelcome(DEMO_CLUBS, DEMO_PASSWORD), 1500);
const { code } = await server.done;
shutdown(code ?? 0);

function printWelcome(clubs, password) {
  if (server.exitCode !== null) return;
  console.log(`\n  Breakline is running at http://127.0.0.1:${port}   (API docs: http://127.0.0.1:${port}/api/docs)`);
  console.log(`  Demo sign-ins (password for all: ${password}):`);
  for (const c of clubs) for (const m of c.members) console.log(`    ${m.role.padEnd(10)} ${m.email.padEnd(28)} ${c.name}`);
  console.log(`  Mail is caught, not sent: admins read it at /api/dev/mail (kept in ${smtp.dir}).`);
  console.log('  Press Ctrl-C to stop the server and its database.\n');
}
