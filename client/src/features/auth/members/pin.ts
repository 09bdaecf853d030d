/**
 * A member's PIN for switching to themself on a shared device. Only a slow hash is kept:
 * PBKDF2 with HMAC-SHA-256 through WebCrypto, a random salt per member, and the iteration count
 * stored beside the hash so it can be raised later without locking anyone out.
 */
export interface PinHash {
  algorithm: 'PBKDF2-SHA-256';
  iterations: number;
  /** Base64. */
  salt: string;
  /** Base64 of the 32-byte derived key. */
  hash: string;
}

export const PIN_MIN_DIGITS = 4;
export const PIN_MAX_DIGITS = 8;
/** Makes each guess cost a phone a fraction of a second, so a stolen hash is slow to try. */
export const PIN_ITERATIONS = 600_000;
const SALT_BYTES = 16;
const KEY_BITS = 256;

/** Null for a PIN of 4 to 8 digits; otherwise what is wrong with it, in words. */
export function pinProblem(pin: string): string | null {
  if (!/^\d*$/.test(pin)) return 'A PIN is digits only.';
  if (pin.length < PIN_MIN_DIGITS) return `A PIN has at least ${PIN_MIN_DIGITS} digits.`;
  if (pin.length > PIN_MAX_DIGITS) return `A PIN has at most ${PIN_MAX_DIGITS} digits.`;
  return null;
}

const toBase64 = (bytes: Uint8Array) => btoa(String.fromCharCode(...bytes));
const fromBase64 = (text: string) => Uint8Array.from(atob(text), (c) => c.charCodeAt(0));

async function derive(pin: string, salt: Uint8Array, iterations: number): Promise<Uint8Array> {
  // Built here rather than with TextEncoder: under a test DOM its buffers are of another realm.
  const secret = Uint8Array.from(pin, (c) => c.charCodeAt(0));
  const key = await crypto.subtle.importKey('raw', secret, 'PBKDF2', false, ['deriveBits']);
  const bits = await crypto.subtle.deriveBits({ name: 'PBKDF2', hash: 'SHA-256', salt: new Uint8Array(salt), iterations }, key, KEY_BITS);
  return new Uint8Array(bits);
}

export async function hashPin(pin: string, iterations: number = PIN_ITERATIONS): Promise<PinHash> {
  const problem = pinProblem(pin);
  if (problem) throw new RangeError(problem);
  const salt = crypto.getRandomValues(new Uint8Array(SALT_BYTES));
  return { algorithm: 'PBKDF2-SHA-256', iterations, salt: toBase64(salt), hash: toBase64(await derive(pin, salt, iterations)) };
}

/** Whether `pin` is the one `stored` was made from; compares every byte, whatever the first difference. */
export async function verifyPin(pin: string, stored: PinHash): Promise<boolean> {
  if (pinProblem(pin) !== null) return false;
  const expected = fromBase64(stored.hash);
  const actual = await derive(pin, fromBase64(stored.salt), stored.iterations);
  let diff = expected.length ^ actual.length;
  for (let i = 0; i < expected.length; i++) diff |= expected[i]! ^ (actual[i] ?? 0);
  return diff === 0;
}
