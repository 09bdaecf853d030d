import { describe, expect, it } from 'vitest';
import { MAX_MUTATIONS_PER_PUSH, MutationSchema, PROTOCOL_VERSION, PullQuerySchema, PushRequestSchema, SettleRequestSchema, encodeHlc } from '../src/index.js';

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

  it('asks for a value exactly when settling with another value', () => {
    const base = { protocolVersion: 1, conflictId: '0190f1a0-0000-7000-8000-000000000009' };
    expect(SettleRequestSchema.safeParse({ ...base, choice: 'kept' }).success).toBe(true);
    expect(SettleRequestSchema.safeParse({ ...base, choice: 'other' }).success).toBe(false);
    expect(SettleRequestSchema.safeParse({ ...base, choice: 'other', value: 'open' }).success).toBe(true);
    expect(SettleRequestSchema.safeParse({ ...base, choice: 'kept', value: 'open' }).success).toBe(false);
  });
});
