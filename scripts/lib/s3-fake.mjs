// A local S3 fake for photos: s3rver on loopback, with the bucket made before the first request.
// The server reaches it through the ordinary S3 client, so a real bucket replaces it by settings.
import { mkdirSync } from 'node:fs';

export const S3_FAKE_KEY = 'S3RVER';

/**
 * Starts s3rver on 127.0.0.1:port (0 picks a free port) storing objects under `dir`.
 * Returns { endpoint, bucket, accessKeyId, secretAccessKey, stop }.
 */
export async function startS3Fake({ dir, port = 0, bucket = 'breakline-photos' }) {
  if (typeof bucket !== 'string' || !/^[a-z0-9][a-z0-9.-]{1,61}[a-z0-9]$/.test(bucket)) {
    throw new Error(`The photo bucket name "${bucket}" is not valid: use 3 to 63 lower-case letters, digits, dots or hyphens.`);
  }
  if (!dir) throw new Error('startS3Fake needs a dir to keep the photos in.');
  mkdirSync(dir, { recursive: true });
  // Loaded here, not at the top: the scripts import this file before they install dependencies.
  const { default: S3rver } = await import('s3rver');
  const fake = new S3rver({ address: '127.0.0.1', port, directory: dir, silent: true, vhostBuckets: false, configureBuckets: [{ name: bucket }] });
  let addr;
  try {
    addr = await fake.run();
  } catch (e) {
    const why = e.code === 'EADDRINUSE' ? `port ${port} on 127.0.0.1 is already in use` : e.message;
    throw new Error(`The local photo store (S3 fake) could not start: ${why}. Stop what uses the port or choose another.`);
  }
  const stop = async () => {
    // Keep-alive sockets from the S3 client would otherwise hold close() open.
    fake.httpServer.closeAllConnections?.();
    await fake.close();
  };
  return { endpoint: `http://127.0.0.1:${addr.port}`, bucket, accessKeyId: S3_FAKE_KEY, secretAccessKey: S3_FAKE_KEY, stop };
}
