import { createHash, randomBytes, timingSafeEqual } from 'node:crypto';
import { isUUID } from 'class-validator';

/** Tokens in mailed links are `<row id>.<secret>`; the row keeps only the secret's SHA-256. */
export function newSecret(): { secret: string; hash: string } {
  const secret = randomBytes(32).toString('base64url');
  return { secret, hash: sha256(secret) };
}

export const linkToken = (id: string, secret: string) => `${id}.${secret}`;

/** The row id and secret of a token, or null when it cannot be one of ours. */
export function splitToken(token: string): { id: string; secret: string } | null {
  const [id, secret, extra] = token.trim().split('.');
  if (extra !== undefined || !id || !secret || !isUUID(id) || !/^[A-Za-z0-9_-]{20,100}$/.test(secret)) return null;
  return { id, secret };
}

export function secretMatches(hash: string, secret: string): boolean {
  const a = Buffer.from(hash, 'hex');
  const b = Buffer.from(sha256(secret), 'hex');
  return a.length === b.length && timingSafeEqual(a, b);
}

const sha256 = (s: string) => createHash('sha256').update(s).digest('hex');
