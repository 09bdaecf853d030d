import { pbkdf2Sync } from 'node:crypto';
import { describe, expect, it } from 'vitest';
import { hashPin, PIN_ITERATIONS, pinProblem, verifyPin, type PinHash } from './pin';

const fromBase64 = (text: string) => Buffer.from(text, 'base64');
// A low count keeps the tests that are not about the cost quick; the stored count is what verifies.
const FAST = 1000;

describe('PIN hash', () => {
  it('derives PBKDF2-HMAC-SHA-256 as an independent implementation does, itself checked against RFC 7914', async () => {
    // RFC 7914 §11: PBKDF2-HMAC-SHA256 (P="passwd", S="salt", c=1, dkLen=64) begins 55 ac 04 6e ...
    expect(pbkdf2Sync('passwd', 'salt', 1, 32, 'sha256').toString('hex')).toBe('55ac046e56e3089fec1691c22544b605f94185216dde0465e68b9d57c20dacbc');
    // The same derivation by Node's crypto, for a PIN and a salt as this app stores them.
    const pin = '482913';
    const salt = Buffer.from('sixteen salt b!!');
    const stored: PinHash = { algorithm: 'PBKDF2-SHA-256', iterations: 5000, salt: salt.toString('base64'), hash: pbkdf2Sync(pin, salt, 5000, 32, 'sha256').toString('base64') };
    expect(await verifyPin(pin, stored)).toBe(true);
    expect(await verifyPin('482914', stored)).toBe(false);
  });

  it('stores only a salted hash with its iteration count, a fresh salt each time, and at least 600,000 iterations by default', async () => {
    const a = await hashPin('2580');
    const b = await hashPin('2580');
    expect(a.iterations).toBe(PIN_ITERATIONS);
    // OWASP Password Storage Cheat Sheet: 600,000 iterations for PBKDF2-HMAC-SHA256 (from memory of its 2023 text).
    expect(PIN_ITERATIONS).toBeGreaterThanOrEqual(600_000);
    expect(JSON.stringify(a)).not.toContain('2580');
    expect(fromBase64(a.salt)).toHaveLength(16);
    expect(fromBase64(a.hash)).toHaveLength(32);
    expect(a.salt).not.toBe(b.salt);
    expect(a.hash).not.toBe(b.hash);
    expect(fromBase64(a.hash).equals(pbkdf2Sync('2580', fromBase64(a.salt), a.iterations, 32, 'sha256'))).toBe(true);
    expect(await verifyPin('2580', a)).toBe(true);
    expect(await verifyPin('2581', a)).toBe(false);
  });

  it('verifies with the count the hash was made with', async () => {
    const low = await hashPin('13579', FAST);
    expect(low.iterations).toBe(FAST);
    expect(await verifyPin('13579', low)).toBe(true);
    expect(await verifyPin('13579', { ...low, iterations: FAST + 1 })).toBe(false);
  });

  it('takes 4 to 8 digits and says what is wrong with anything else', async () => {
    expect(pinProblem('1234')).toBeNull();
    expect(pinProblem('12345678')).toBeNull();
    expect(pinProblem('123')).toBe('A PIN has at least 4 digits.');
    expect(pinProblem('123456789')).toBe('A PIN has at most 8 digits.');
    expect(pinProblem('12a4')).toBe('A PIN is digits only.');
    expect(pinProblem(' 1234')).toBe('A PIN is digits only.');
    await expect(hashPin('123', FAST)).rejects.toThrow('A PIN has at least 4 digits.');
    const stored = await hashPin('1234', FAST);
    expect(await verifyPin('1234 ', stored)).toBe(false);
  });
});
