import { z } from 'zod';
import { RECORD_KINDS } from './kinds.js';
import { HLC_NODE_PATTERN, isEncodedHlc } from './hlc.js';
import { MAX_MUTATIONS_PER_PUSH, MAX_PULL_LIMIT, DEFAULT_PULL_LIMIT } from './wire.js';

/**
 * Envelope checks. A request failing these is refused whole (a client bug); a mutation
 * whose fields are wrong passes here and is rejected alone after validatePatch.
 */
const fields = z.record(z.string().min(1).max(64), z.unknown());

export const DeviceIdSchema = z.string().regex(HLC_NODE_PATTERN, {
  error: 'must be 1-64 letters, digits or . _ : -',
});

export const HlcStringSchema = z.string().refine(isEncodedHlc, { error: 'must be an encoded clock value' });

export const MutationSchema = z
  .strictObject({
    mutationId: z.uuid(),
    seq: z.number().int().min(1),
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

/** Query of GET /api/sync/pull; `since` absent means from the start. */
export const PullQuerySchema = z.strictObject({
  since: z.string().regex(/^\d{1,19}$/, { error: 'must be a checkpoint from an earlier pull' }).optional(),
  limit: z.coerce.number().int().min(1).max(MAX_PULL_LIMIT).default(DEFAULT_PULL_LIMIT),
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
