// Starts the built server for scripts that need one (bench), and waits until it answers.
import { spawn } from 'node:child_process';
import { sleep } from './run.mjs';

export async function startServer(repo, env, echo = false) {
  let out = '';
  const child = spawn('node', ['server/dist/main.js'], { cwd: repo, env });
  child.stdout.on('data', (d) => (out += d));
  child.stderr.on('data', (d) => (out += d));
  if (echo) child.stdout.pipe(process.stdout);
  const baseUrl = `http://127.0.0.1:${env.PORT}`;
  for (let i = 0; i < 150; i++) {
    if (child.exitCode !== null) throw new Error(`The server exited while starting:\n${out}`);
    if (await fetch(`${baseUrl}/api/health`).then((r) => r.ok, () => false)) break;
    await sleep(200);
  }
  return {
    baseUrl,
    stop: () => new Promise((resolve) => {
      if (child.exitCode !== null) return resolve();
      child.once('exit', resolve);
      child.kill('SIGTERM');
    }),
  };
}
