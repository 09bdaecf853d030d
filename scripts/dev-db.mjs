// A private PostgreSQL (and S3 fake) for working on one suite: prints the settings to export
// and runs until Ctrl-C. Usage: node scripts/dev-db.mjs [port]   (default 5560; S3 fake on port+1,
// SMTP fake on port+2)
import { mkdirSync } from 'node:fs';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { startPostgres } from './lib/postgres.mjs';
import { startS3Fake } from './lib/s3-fake.mjs';
import { startSmtpFake } from './lib/smtp-fake.mjs';

const repo = fileURLToPath(new URL('..', import.meta.url));
const port = Number(process.argv[2] ?? 5560);
if (!Number.isInteger(port) || port < 1024 || port > 65534) {
  console.error(`"${process.argv[2]}" is not a port number: give one between 1024 and 65534.`);
  process.exit(2);
}
const root = join('/tmp', `breakline-dev-db-${port}`);
mkdirSync(root, { recursive: true });
const pg = await startPostgres({ root, port, database: 'breakline_dev', password: 'breakline-dev', fast: true });
const s3 = await startS3Fake({ dir: join(root, 'photos'), port: port + 1 });
const smtp = await startSmtpFake({ dir: join(root, 'mail'), port: port + 2 });
console.log(`export DATABASE_URL=${pg.url}`);
console.log(`export S3_ENDPOINT=${s3.endpoint} S3_BUCKET=${s3.bucket}`);
console.log(`export SMTP_HOST=${smtp.host} SMTP_PORT=${smtp.port} MAIL_CAUGHT_DIR=${smtp.dir}`);
console.log(`(from ${repo}; Ctrl-C stops all three)`);
const stop = () => { pg.stop(); Promise.allSettled([s3.stop(), smtp.stop()]).finally(() => process.exit(0)); };
process.on('SIGINT', stop);
process.on('SIGTERM', stop);
