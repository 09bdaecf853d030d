/**
 * A UUID version 7: 48 bits of Unix time in ms, then random bits, with the version and variant
 * bits set. Ids made on phones sort by creation time, which keeps index inserts at the end.
 */
export function uuid7(now: number = Date.now(), random: Uint8Array = crypto.getRandomValues(new Uint8Array(16))): string {
  if (!Number.isSafeInteger(now) || now < 0 || now >= 2 ** 48) throw new RangeError(`A UUID v7 needs a time in ms from 0 to 2^48, got ${now}.`);
  if (random.length < 16) throw new RangeError('A UUID v7 needs 16 random bytes.');
  const b = Uint8Array.from(random.subarray(0, 16));
  let t = now;
  for (let i = 5; i >= 0; i--) {
    b[i] = t % 256;
    t = Math.floor(t / 256);
  }
  b[6] = (b[6]! & 0x0f) | 0x70;
  b[8] = (b[8]! & 0x3f) | 0x80;
  const hex = Array.from(b, (x) => x.toString(16).padStart(2, '0')).join('');
  return `${hex.slice(0, 8)}-${hex.slice(8, 12)}-${hex.slice(12, 16)}-${hex.slice(16, 20)}-${hex.slice(20)}`;
}
