import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import {
  ClockDriftError, HlcCounterOverflowError, HlcFormatError, HybridClock, MAX_CLOCK_DRIFT_MS, MAX_HLC_COUNTER,
  compareHlc, decodeHlc, encodeHlc, type Hlc,
} from '../src/index.js';

const lc = (h: Hlc) => [h.l, h.c];

describe('hybrid logical clock', () => {
  it('follows the worked sequence step by step', () => {
    // Kulkarni et al. 2014, Fig. 5; sequence derived from the algorithm
    const a = new HybridClock('A');
    const b = new HybridClock('B');
    const m1 = a.now(10);
    expect(lc(m1)).toEqual([10, 0]);
    expect(lc(b.receive(m1, 8))).toEqual([10, 1]);
    const m2 = b.now(9);
    expect(lc(m2)).toEqual([10, 2]);
    expect(lc(a.receive(m2, 10))).toEqual([10, 3]);
    const m3 = b.now(11);
    expect(lc(m3)).toEqual([11, 0]);
    expect(lc(a.receive(m3, 12))).toEqual([12, 0]);
    expect(lc(a.now(12))).toEqual([12, 1]);
  });

  it('keeps its own node id when receiving', () => {
    const b = new HybridClock('B');
    expect(b.receive({ l: 5, c: 2, node: 'A' }, 1).node).toBe('B');
  });

  it('round-trips through the encoding', () => {
    fc.assert(
      fc.property(
        fc.integer({ min: 0, max: 10 ** 15 - 1 }),
        fc.integer({ min: 0, max: MAX_HLC_COUNTER }),
        fc.stringMatching(/^[A-Za-z0-9._:-]{1,64}$/),
        (l, c, node) => {
          expect(decodeHlc(encodeHlc({ l, c, node }))).toEqual({ l, c, node });
        },
      ),
    );
  });

  it('orders encoded strings exactly as compareHlc orders clocks', () => {
    const hlc = fc.record({
      l: fc.oneof(fc.integer({ min: 0, max: 20 }), fc.integer({ min: 0, max: 10 ** 15 - 1 })),
      c: fc.oneof(fc.integer({ min: 0, max: 12 }), fc.integer({ min: 0, max: MAX_HLC_COUNTER })),
      node: fc.stringMatching(/^[A-Za-z0-9._:-]{1,12}$/),
    });
    fc.assert(
      fc.property(hlc, hlc, (x, y) => {
        const sx = encodeHlc(x), sy = encodeHlc(y);
        const byString = sx < sy ? -1 : sx > sy ? 1 : 0;
        expect(byString).toBe(compareHlc(x, y));
      }),
      { numRuns: 2000 },
    );
  });

  it('orders by l, then c, then node', () => {
    expect(compareHlc({ l: 9, c: 99, node: 'z' }, { l: 10, c: 0, node: 'a' })).toBe(-1);
    expect(compareHlc({ l: 10, c: 2, node: 'a' }, { l: 10, c: 1, node: 'z' })).toBe(1);
    expect(compareHlc({ l: 10, c: 1, node: 'a' }, { l: 10, c: 1, node: 'b' })).toBe(-1);
    expect(encodeHlc({ l: 10, c: 3, node: 'dev-1' })).toBe('000000000000010-00003-dev-1');
  });

  it('refuses malformed strings with a clear error', () => {
    for (const bad of ['', 'abc', '10-3-a', '000000000000010-00003-', '000000000000010-0003-a', '000000000000010-00003-a b']) {
      expect(() => decodeHlc(bad)).toThrow(HlcFormatError);
    }
    expect(() => decodeHlc('10-3-a')).toThrow(/Not a clock value: "10-3-a"/);
    expect(() => encodeHlc({ l: 1.5, c: 0, node: 'a' })).toThrow(HlcFormatError);
  });

  it('throws a typed error when the counter would overflow its width', () => {
    const clock = new HybridClock('A', { initial: { l: 100, c: MAX_HLC_COUNTER - 1, node: 'A' } });
    expect(clock.now(50).c).toBe(MAX_HLC_COUNTER);
    expect(() => clock.now(50)).toThrow(HlcCounterOverflowError);
    expect(clock.current().c).toBe(MAX_HLC_COUNTER);
    const other = new HybridClock('B');
    expect(() => other.receive({ l: 100, c: MAX_HLC_COUNTER, node: 'A' }, 100)).toThrow(HlcCounterOverflowError);
    expect(clock.now(101)).toMatchObject({ l: 101, c: 0 });
  });

  it('refuses a remote clock more than five minutes ahead, with minutes in the message', () => {
    const server = new HybridClock('server');
    const pt = 1_800_000_000_000;
    expect(MAX_CLOCK_DRIFT_MS).toBe(300_000);
    expect(server.receive({ l: pt + MAX_CLOCK_DRIFT_MS, c: 0, node: 'phone' }, pt).l).toBe(pt + MAX_CLOCK_DRIFT_MS);
    const before = server.current();
    let err: unknown;
    try {
      server.receive({ l: pt + 7 * 60_000, c: 0, node: 'phone' }, pt);
    } catch (e) {
      err = e;
    }
    expect(err).toBeInstanceOf(ClockDriftError);
    expect((err as ClockDriftError).aheadMinutes).toBe(7);
    expect((err as Error).message).toMatch(/7 minutes ahead of the server.*date and time to automatic/);
    expect(server.current()).toEqual(before);
  });

  it('refuses a physical time that is not whole milliseconds', () => {
    expect(() => new HybridClock('A').now(Number.NaN)).toThrow(RangeError);
  });
});
