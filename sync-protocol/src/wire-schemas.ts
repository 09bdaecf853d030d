import { z } from 'zod';
import { RECORD_KINDS } from './kinds.js';
import { HLC_NODE_PATTERN, isEncodedHlc } from './hlc.js';
import { MAX_MUTATIONS_PER_PUSH, MAX_PULL_LIMIT, DEFAULT_PULL_LIMIT, type Mutation, type PushRequest } from './wire.js';
import { CHECKPOINT_PATTERN } from './wire-checkpoint.js';

/**
 * Envelope checks. A request failing these is refused whole (a client bug); a mutation
 * whose fields are wrong passes here and is rejected alone after validatePatch.
 */
const fields = z.record(z.string().min(1).max(64), z.unknown());

export const DeviceIdSchema = z.string().regex(HLC_NODE_PATTERN, {
  error: 'must be 1-64 letters, digits or . _ : -',
});

export const HlcStringSchema = z.string().refine(isEncodedHlc, { error: 'must be an encoded clock value' });

/** A device's seq is stored as a 32-bit integer on the server; a phone counts one a change. */
export const MAX_DEVICE_SEQ = 2_147_483_647;

export const MutationSchema = z
  .strictObject({
    mutationId: z.uuid(),
    seq: z.number().int().min(1).max(MAX_DEVICE_SEQ, { error: `must be at most ${MAX_DEVICE_SEQ}` }),
    recordId: z.uuid(),
    kind: z.enum(RECORD_KINDS),
    baseVersion: z.number().int().min(0),
    base: fields,
    hlc: HlcStringSchema,
    patch: fields,
    deleted: z.literal(true).optional(),
  })
  .refine((m) => m.deleted === true || Object.keys(m.patch).length > 0, {
    error: 'a mutation must change at least one field or delete the record',
    path: ['patch'],
  });

export const PushRequestSchema = z
  .strictObject({
    protocolVersion: z.number().int().min(1),
    deviceId: DeviceIdSchema,
    mutations: z.array(MutationSchema).max(MAX_MUTATIONS_PER_PUSH, {
      error: `at most ${MAX_MUTATIONS_PER_PUSH} changes may be sent at once`,
    }),
  })
  .refine((r) => r.mutations.every((m, i) => i === 0 || m.seq > r.mutations[i - 1]!.seq), {
    error: 'mutations must be in increasing seq order',
    path: ['mutations'],
  });

const UUID = z.regexes.uuid();
const PUSH_KEYS = new Set(['protocolVersion', 'deviceId', 'mutations']);
const MUTATION_KEYS = new Set(['mutationId', 'seq', 'recordId', 'kind', 'baseVersion', 'base', 'hlc', 'patch', 'deleted']);
const KINDS: ReadonlySet<unknown> = new Set(RECORD_KINDS);
const isInt = (v: unknown, min: number) => Number.isSafeInteger(v) && (v as number) >= min;

function onlyKeys(o: object, allowed: ReadonlySet<string>): boolean {
  for (const k in o) if (!allowed.has(k)) return false;
  return true;
}

const isJsonObject = (v: unknown): v is Record<string, unknown> =>
  typeof v === 'object' && v !== null && Object.getPrototypeOf(v) === Object.prototype && Object.getOwnPropertySymbols(v).length === 0;

/** A JSON object of fields: keys of 1-64 characters, any values. */
function isFields(v: unknown): boolean {
  if (!isJsonObject(v)) return false;
  for (const k of Object.keys(v)) if (k.length < 1 || k.length > 64 || k === '__proto__') return false;
  return true;
}

function isMutation(o: unknown): boolean {
  return isJsonObject(o) && onlyKeys(o, MUTATION_KEYS)
    && typeof o.mutationId === 'string' && UUID.test(o.mutationId) && isInt(o.seq, 1) && (o.seq as number) <= MAX_DEVICE_SEQ
    && typeof o.recordId === 'string' && UUID.test(o.recordId) && KINDS.has(o.kind) && isInt(o.baseVersion, 0)
    && isFields(o.base) && isEncodedHlc(o.hlc) && isFields(o.patch)
    && (o.deleted === true || (!('deleted' in o) && Object.keys(o.patch as object).length > 0));
}

/**
 * The same rules as PushRequestSchema, written out by hand: zod's parse of a 10,000-change push
 * costs more than the rest of the server's work on it. Anything this does not accept goes to the
 * schema, so the answer (and every error message) is the schema's.
 */
export function isWellFormedPush(body: unknown): body is PushRequest {
  if (!isJsonObject(body)) return false;
  const o = body;
  if (!onlyKeys(o, PUSH_KEYS) || !isInt(o.protocolVersion, 1) || typeof o.deviceId !== 'string' || !HLC_NODE_PATTERN.test(o.deviceId)) return false;
  const ms = o.mutations;
  if (!Array.isArray(ms) || ms.length > MAX_MUTATIONS_PER_PUSH) return false;
  for (let i = 0; i < ms.length; i++) {
    if (!isMutation(ms[i]) || (i > 0 && (ms[i] as Mutation).seq <= (ms[i - 1] as Mutation).seq)) return false;
  }
  return true;
}

export type PushParse = { success: true; data: PushRequest } | { success: false; error: z.ZodError };

/** PushRequestSchema.safeParse, without the schema's cost for a push that is well formed. */
export function parsePushRequest(body: unknown): PushParse {
  if (isWellFormedPush(body)) return { success: true, data: body };
  const r = PushRequestSchema.safeParse(body);
  return r.success ? { success: true, data: r.data as PushRequest } : { success: false, error: r.error };
}

/**
 * Query of GET /api/sync/pull; `since` absent means from the start. `count=1` asks for
 * `remaining` in the answer: a phone asks on the first page of a pull only, since counting what
 * is left on every page of a large club would cost the server the square of its size.
 */
export const PullQuerySchema = z.strictObject({
  since: z.string().regex(CHECKPOINT_PATTERN, { error: 'must be a checkpoint from an earlier pull' }).optional(),
  limit: z.coerce.number().int().min(1).max(MAX_PULL_LIMIT).default(DEFAULT_PULL_LIMIT),
  count: z.enum(['0', '1'], { error: 'must be 1 to count the changes left, or 0' }).optional(),
});

export const SettleRequestSchema = z
  .strictObject({
    protocolVersion: z.number().int().min(1),
    conflictId: z.uuid(),
    choice: z.enum(['kept', 'overruled', 'other']),
    value: z.unknown().optional(),
    note: z.string().max(2000).optional(),
  })
  .refine((s) => (s.choice === 'other') === (s.value !== undefined), {
    error: "give a value with choice 'other', and only then",
    path: ['value'],
  });
