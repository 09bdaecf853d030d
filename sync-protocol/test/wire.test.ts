import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import {
  MAX_MUTATIONS_PER_PUSH, MutationSchema, PROTOCOL_VERSION, PullQuerySchema, PushRequestSchema, SettleRequestSchema, encodeHlc,
  formatCheckpoint, isWellFormedPush, needsFreshStart, parseCheckpoint, parsePushRequest,
} from '../src/index.js';

const mutation = (seq: number) => ({
  mutationId: `0190f1a0-0000-7000-8000-${String(seq).padStart(12, '0')}`,
  seq,
  recordId: '0190f1a0-0000-7000-8000-000000000001',
  kind: 'defect',
  baseVersion: 0,
  base: {},
  hlc: encodeHlc({ l: 1_800_000_000_000, c: 0, node: 'phone-1' }),
  patch: { description: 'x' },
});

describe('wire schemas', () => {
  it('accepts a well-formed push', () => {
    expect(PushRequestSchema.safeParse({ protocolVersion: PROTOCOL_VERSION, deviceId: 'phone-1', mutations: [mutation(1), mutation(2)] }).success).toBe(true);
  });

  it('refuses mutations out of seq order, too many, or malformed', () => {
    const push = (mutations: unknown[]) => PushRequestSchema.safeParse({ protocolVersion: 1, deviceId: 'phone-1', mutations }).success;
    expect(push([mutation(2), mutation(1)])).toBe(false);
    expect(push(Array.from({ length: MAX_MUTATIONS_PER_PUSH + 1 }, (_, i) => mutation(i + 1)))).toBe(false);
    expect(push(Array.from({ length: MAX_MUTATIONS_PER_PUSH }, (_, i) => mutation(i + 1)))).toBe(true);
    expect(MutationSchema.safeParse({ ...mutation(1), hlc: '2026-12-01' }).success).toBe(false);
    expect(MutationSchema.safeParse({ ...mutation(1), kind: 'canoe' }).success).toBe(false);
    expect(MutationSchema.safeParse({ ...mutation(1), seq: 0 }).success).toBe(false);
    expect(MutationSchema.safeParse({ ...mutation(1), extra: 1 }).success).toBe(false);
    expect(MutationSchema.safeParse({ ...mutation(1), patch: {} }).success).toBe(false);
    expect(MutationSchema.safeParse({ ...mutation(1), patch: {}, deleted: true }).success).toBe(true);
    expect(MutationSchema.safeParse({ ...mutation(1), deleted: false }).success).toBe(false);
  });

  it('reads pull queries with a default and a cap', () => {
    expect(PullQuerySchema.parse({})).toEqual({ limit: 500 });
    expect(PullQuerySchema.parse({ since: '42', limit: '10' })).toEqual({ since: '42', limit: 10 });
    expect(PullQuerySchema.safeParse({ limit: '5000' }).success).toBe(false);
    expect(PullQuerySchema.safeParse({ since: 'yesterday' }).success).toBe(false);
  });

  it('reads checkpoints with and without a purge horizon', () => {
    expect(PullQuerySchema.parse({ since: '120.42' })).toEqual({ since: '120.42', limit: 500 });
    for (const bad of ['1.2.3', '.5', '5.', '-1', '1e3', '12345678901234567890']) {
      expect(PullQuerySchema.safeParse({ since: bad }).success, bad).toBe(false);
    }
    expect(parseCheckpoint(undefined)).toEqual({ horizon: 0, seq: 0 });
    expect(parseCheckpoint('42')).toEqual({ horizon: 0, seq: 42 });
    expect(parseCheckpoint('120.42')).toEqual({ horizon: 120, seq: 42 });
    expect(() => parseCheckpoint('yesterday')).toThrow(/not a checkpoint/);
    // Sixteen digits could pass 2^53 and, at nineteen, PostgreSQL's bigint: refused as not a checkpoint.
    expect(parseCheckpoint('999999999999999')).toEqual({ horizon: 0, seq: 999_999_999_999_999 });
    expect(() => parseCheckpoint('9999999999999999')).toThrow(/not a checkpoint/);
    expect(() => parseCheckpoint('1.9999999999999999')).toThrow(/not a checkpoint/);
    expect(formatCheckpoint({ horizon: 0, seq: 42 })).toBe('42');
    expect(formatCheckpoint({ horizon: 120, seq: 42 })).toBe('120.42');
  });

  it('sends back to the start only replicas that pulled below the horizon before it moved', () => {
    const purgedThrough = 100;
    expect(needsFreshStart({ horizon: 0, seq: 0 }, purgedThrough, 500)).toBe(false); // nothing held yet
    expect(needsFreshStart({ horizon: 0, seq: 50 }, purgedThrough, 500)).toBe(true); // pulled before the purge
    expect(needsFreshStart({ horizon: 60, seq: 50 }, purgedThrough, 500)).toBe(true); // before the latest purge
    expect(needsFreshStart({ horizon: 100, seq: 50 }, purgedThrough, 500)).toBe(false); // a fresh start since
    expect(needsFreshStart({ horizon: 0, seq: 100 }, purgedThrough, 500)).toBe(false); // saw every purged tombstone
    expect(needsFreshStart({ horizon: 0, seq: 150 }, purgedThrough, 500)).toBe(false);
    expect(needsFreshStart({ horizon: 200, seq: 150 }, purgedThrough, 500)).toBe(true); // a horizon this server never had
    expect(needsFreshStart({ horizon: 0, seq: 50 }, 0, 500)).toBe(false);
    // A seq the server never gave out (a database restored from an older backup): start afresh.
    expect(needsFreshStart({ horizon: 0, seq: 500 }, 0, 500)).toBe(false);
    expect(needsFreshStart({ horizon: 0, seq: 501 }, 0, 500)).toBe(true);
    expect(needsFreshStart({ horizon: 100, seq: 510 }, purgedThrough, 500)).toBe(true);
  });

  it('asks for a value exactly when settling with another value', () => {
    const base = { protocolVersion: 1, conflictId: '0190f1a0-0000-7000-8000-000000000009' };
    expect(SettleRequestSchema.safeParse({ ...base, choice: 'kept' }).success).toBe(true);
    expect(SettleRequestSchema.safeParse({ ...base, choice: 'other' }).success).toBe(false);
    expect(SettleRequestSchema.safeParse({ ...base, choice: 'other', value: 'open' }).success).toBe(true);
    expect(SettleRequestSchema.safeParse({ ...base, choice: 'kept', value: 'open' }).success).toBe(false);
  });
});

describe('the hand-written push check', () => {
  const HLC = encodeHlc({ l: 1_800_000_000_000, c: 3, node: 'phone-1' });
  const MISSING = Symbol('missing');
  /** Mostly a valid value, now and then a wrong or missing one, so both answers are tried. */
  const pick = (valid: unknown[], wrong: unknown[]) =>
    fc.oneof({ arbitrary: fc.constantFrom(...valid), weight: 40 }, { arbitrary: fc.constantFrom(...wrong, MISSING), weight: 1 });
  const UUIDS = ['0190f1a0-0000-7000-8000-000000000001', '0190F1A0-0000-4000-A000-00000000000B', '00000000-0000-0000-0000-000000000000'];
  const BAD_UUIDS = ['0190f1a0-0000-9000-8000-000000000001', '0190f1a0-0000-7000-7000-000000000001', 'not-a-uuid', 7];
  const FIELDS = [{}, { description: 'x' }, { description: 'x', photos: [], notes: null }, { ['k'.repeat(64)]: 1 }];
  const BAD_FIELDS = [{ '': 1 }, { ['k'.repeat(65)]: 1 }, [], null, 'x', 3];
  const mutationArb = fc.record({
    mutationId: pick(UUIDS, BAD_UUIDS),
    seq: pick([1, 2, 3], [0, -1, 1.5, '2', 2 ** 53]),
    recordId: pick(UUIDS, BAD_UUIDS),
    kind: pick(['defect', 'trip'], ['canoe', 'Defect', null]),
    baseVersion: pick([0, 3], [-1, 0.5, '0']),
    base: pick(FIELDS, BAD_FIELDS),
    hlc: pick([HLC], ['2026-12-01', `${HLC}!`, 5]),
    patch: pick(FIELDS, BAD_FIELDS),
    deleted: fc.constantFrom(MISSING, MISSING, MISSING, true, false, null),
    extra: fc.constantFrom(...Array(30).fill(MISSING), 1),
  });
  const bodyArb = fc.record({
    protocolVersion: pick([1, 2], [0, 1.5, '1', null]),
    deviceId: pick(['phone-1', 'shed.tablet:2', 'd'.repeat(64)], ['', 'd'.repeat(65), 'bad id', 7]),
    mutations: fc.oneof({ arbitrary: fc.array(mutationArb, { maxLength: 4 }), weight: 30 }, { arbitrary: fc.constantFrom({}, null, 'x', MISSING), weight: 1 }),
    // Most pushes number their changes in order; some keep the drawn numbers, in any order.
    renumber: fc.boolean(),
    extra: fc.constantFrom(...Array(30).fill(MISSING), 'x'),
  });
  const strip = (o: Record<string, unknown>) => Object.fromEntries(Object.entries(o).filter(([, v]) => v !== MISSING));
  // What the server's JSON body parser hands over.
  const asJson = ({ renumber, ...b }: Record<string, unknown>) => {
    const ms = Array.isArray(b.mutations)
      ? b.mutations.map((m: Record<string, unknown>, i) => strip(renumber && typeof m.seq === 'number' ? { ...m, seq: m.seq + i * 3 } : m))
      : b.mutations;
    return JSON.parse(JSON.stringify(strip({ ...b, mutations: ms })));
  };

  it('accepts exactly the pushes the schema accepts, and hands over the same data', () => {
    let accepted = 0;
    fc.assert(fc.property(bodyArb, (raw) => {
      const body = asJson(raw);
      const schema = PushRequestSchema.safeParse(body);
      if (schema.success) accepted += 1;
      expect(isWellFormedPush(body)).toBe(schema.success);
      const parsed = parsePushRequest(body);
      expect(parsed.success).toBe(schema.success);
      if (parsed.success && schema.success) expect(parsed.data).toEqual(schema.data);
      if (!parsed.success && !schema.success) expect(parsed.error.issues).toEqual(schema.error.issues);
    }), { numRuns: 2000 });
    // Both sides of the rule were tried, not only refusals.
    expect(accepted).toBeGreaterThan(100);
    expect(accepted).toBeLessThan(1900);
  });

  it('leaves what it does not vouch for to the schema', () => {
    const m = { mutationId: UUIDS[0], seq: 1, recordId: UUIDS[0], kind: 'defect', baseVersion: 0, base: {}, hlc: HLC, patch: { description: 'x' } };
    const body = JSON.parse(`{"protocolVersion":1,"deviceId":"phone-1","mutations":[${JSON.stringify(m).replace('"patch":{', '"patch":{"__proto__":{"a":1},')}]}`);
    expect(isWellFormedPush(body)).toBe(false);
    const parsed = parsePushRequest(body);
    expect(parsed).toEqual(PushRequestSchema.safeParse(body));
    const seqs = { protocolVersion: 1, deviceId: 'phone-1', mutations: [{ ...m, seq: 2 }, { ...m, seq: 2 }] };
    expect(isWellFormedPush(seqs)).toBe(false);
    expect(parsePushRequest(seqs).success).toBe(false);
    // The server keeps a device's seq as a 32-bit integer: one past it is refused with a reason.
    const top = { protocolVersion: 1, deviceId: 'phone-1', mutations: [{ ...m, seq: 2_147_483_647 }] };
    expect(parsePushRequest(top).success).toBe(true);
    const past = parsePushRequest({ ...top, mutations: [{ ...m, seq: 2_147_483_648 }] });
    expect(past.success ? [] : past.error.issues.map((i) => `${i.path.join('.')}: ${i.message}`)).toEqual(['mutations.0.seq: must be at most 2147483647']);
  });
});
