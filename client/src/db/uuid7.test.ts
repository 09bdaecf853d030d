import { describe, expect, it } from 'vitest';
import { validatePatch } from '@breakline/sync-protocol';
import { uuid7 } from './uuid7';

describe('uuid v7', () => {
  it('lays out time, version and variant as the RFC example does', () => {
    // RFC 9562 appendix A.6: 2022-02-22T19:22:22Z gives 017F22E2-79B0-7CC3-98C4-DC0C0C07398F
    // (value from memory); the random bytes are those of the example.
    const random = Uint8Array.from([0, 0, 0, 0, 0, 0, 0x0c, 0xc3, 0x18, 0xc4, 0xdc, 0x0c, 0x0c, 0x07, 0x39, 0x8f]);
    expect(uuid7(Date.parse('2022-02-22T19:22:22Z'), random)).toBe('017f22e2-79b0-7cc3-98c4-dc0c0c07398f');
  });

  it('makes ids the record schemas accept, in creation order', () => {
    const a = uuid7(1_796_000_000_000);
    const b = uuid7(1_796_000_000_001);
    expect(a < b).toBe(true);
    expect(validatePatch('defect', { boatId: a }).ok).toBe(true);
  });

  it('refuses a time it cannot encode', () => {
    expect(() => uuid7(-1)).toThrow(/time in ms/);
  });
});
