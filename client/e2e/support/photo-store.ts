// Reads a photo back from the S3 fake through the ordinary S3 client, as the server stores it.
import { GetObjectCommand, S3Client } from '@aws-sdk/client-s3';

export async function readStoredPhoto(key: string): Promise<Buffer> {
  const endpoint = process.env.E2E_S3_ENDPOINT;
  const bucket = process.env.E2E_S3_BUCKET;
  if (!endpoint || !bucket) throw new Error('E2E_S3_ENDPOINT and E2E_S3_BUCKET are not set: run the browser tests through "npm test".');
  const s3 = new S3Client({
    endpoint, region: 'us-east-1', forcePathStyle: true, requestChecksumCalculation: 'WHEN_REQUIRED',
    credentials: { accessKeyId: 'S3RVER', secretAccessKey: 'S3RVER' },
  });
  try {
    const answer = await s3.send(new GetObjectCommand({ Bucket: bucket, Key: key }));
    return Buffer.from(await answer.Body!.transformToByteArray());
  } finally {
    s3.destroy();
  }
}
