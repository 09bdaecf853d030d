import { encodeHlc, type Mutation, type RecordKind } from '../../src/index.js';

let n = 0;
/** A mutation with a fresh id; the clock defaults to just after T0. */
export function mut(kind: RecordKind, recordId: string, seq: number, patch: Record<string, unknown>, o: Partial<Mutation> & { l?: number; node?: string } = {}): Mutation {
  n += 1;
  const { l, node, ...rest } = o;
  return {
    mutationId: `0190f1a0-0000-7000-9000-${n.toString(16).padStart(12, '0')}`,
    seq,
    recordId,
    kind,
    baseVersion: 0,
    base: {},
    hlc: encodeHlc({ l: l ?? T0, c: 0, node: node ?? 'phone-a' }),
    patch,
    ...rest,
  };
}

export const T0 = 1_796_000_000_000;
