import { decodeHlc, maxEncodedHlc, type Hlc } from '../hlc.js';
import { assertNotAhead, type HybridClock } from '../hybrid-clock.js';
import { ClockDriftError, HlcCounterOverflowError } from '../hlc-errors.js';
import { patchIsValid, validateChangedRecord, validatePatch, validateRecord, describeErrors, type Validation } from '../validate.js';
import { checkCreate, checkDelete, checkUpdate } from '../permissions.js';
import { mergeMutation } from '../merge.js';
import type { Actor } from '../merge-types.js';
import type { Fields, Mutation, MutationError, MutationResult } from '../wire.js';
import { deepEqual } from '../deep-equal.js';
import type { AuthContext, ClubState, StoredRecord } from './club-state.js';
import { recordConflicts } from './conflicts.js';

export interface ApplyContext {
  club: ClubState;
  auth: AuthContext;
  deviceId: string;
  pt: number;
  clock: HybridClock;
  newId: () => string;
  /**
   * Records' `fields` objects that passed validateRecord during this batch, with what the parse
   * gave: a later change to the same record parses only the fields it changes. Give a new map
   * each batch; records must not be changed in place while it lives.
   */
  validated?: Map<Fields, Fields>;
}

const rejected = (m: Mutation, error: MutationError): MutationResult => ({ mutationId: m.mutationId, status: 'rejected', error });

/**
 * The server's clock follows the change's, so its own later stamps order after it. A clock whose
 * counter is full (stamps far ahead, then many within one millisecond) stays where it is: the
 * record keeps the change's own stamp, and one server's clock serves every club, so refusing here
 * would refuse every club's changes until real time caught up.
 */
function receiveClock(clock: HybridClock, hlc: Hlc, pt: number): void {
  try {
    clock.receive(hlc, pt);
  } catch (e) {
    if (!(e instanceof HlcCounterOverflowError)) throw e;
  }
}

/** Check, merge and write one mutation, as the real server does inside the batch transaction. */
export function applyMutation(ctx: ApplyContext, m: Mutation): MutationResult {
  const { club, auth, pt } = ctx;
  const hlc = decodeHlc(m.hlc);
  try {
    assertNotAhead(hlc, pt);
  } catch (e) {
    if (e instanceof ClockDriftError) return rejected(m, { code: 'clock-drift', message: e.message });
    throw e;
  }
  const stored: StoredRecord | undefined = club.records[m.recordId];
  const actor: Actor = { deviceId: ctx.deviceId, userId: auth.userId, role: auth.role };
  // Each mutation's fields are parsed once: the patch's own errors come first, as they always did.
  const patchRefused = (): MutationResult | undefined => {
    if (patchIsValid(m.kind, m.patch)) return undefined;
    const valid = validatePatch(m.kind, m.patch);
    return valid.ok ? undefined : rejected(m, { code: 'invalid', message: describeErrors(valid.errors), fields: valid.errors });
  };
  let created: Validation<Fields> | undefined;
  if (!stored) {
    if (m.baseVersion !== 0 || m.deleted) {
      return patchRefused() ?? rejected(m, { code: 'not-found', message: 'This record is not on the server, so the change could not be saved.' });
    }
    // A whole record that passes holds a patch that passes, so the patch is parsed apart only when it fails.
    created = validateRecord(m.kind, m.patch);
    if (!created.ok) {
      const errors = created.errors;
      return patchRefused() ?? rejected(m, { code: 'invalid', message: describeErrors(errors), fields: errors });
    }
  } else {
    const refused = patchRefused();
    if (refused) return refused;
    if (stored.kind !== m.kind) return rejected(m, { code: 'invalid', message: `This record is ${stored.kind}, not ${m.kind}.` });
  }
  const decision = !stored
    ? checkCreate(m.kind, auth.role, m.patch, auth.userId)
    : m.deleted
      ? checkDelete(m.kind, auth.role, stored.fields, auth.userId)
      : checkUpdate(m.kind, auth.role, m.patch, stored.fields, auth.userId);
  if (!decision.ok) return rejected(m, { code: 'forbidden', message: decision.reason });

  const merge = mergeMutation({
    kind: m.kind,
    current: stored ? stored.fields : null,
    currentDeleted: stored?.deleted,
    currentHlc: stored?.hlc ?? null,
    currentActor: stored?.lastActor ?? null,
    currentFieldStamps: stored?.fieldStamps,
    mutation: { base: m.base, patch: m.patch, hlc: m.hlc, deleted: m.deleted, actor },
    baseIsCurrent: stored !== undefined && stored.version === m.baseVersion,
  });
  // The merge hands back a new object, so a new record can keep it as its fields.
  const fields = stored ? { ...stored.fields, ...merge.apply } : merge.apply;
  const changed = !stored || merge.deleted !== stored.deleted || !deepEqual(fields, stored.fields);
  if (changed && !merge.deleted) {
    const full = created?.ok && sameEntries(fields, m.patch) ? created : validateMerged(ctx, m, stored, fields, Object.keys(merge.apply));
    if (!full.ok) return rejected(m, { code: 'invalid', message: `After merging with newer changes: ${describeErrors(full.errors)}`, fields: full.errors });
    ctx.validated?.set(fields, full.value);
  }
  receiveClock(ctx.clock, hlc, pt);
  let record = stored;
  if (changed) {
    club.changeSeq += 1;
    const stamps = { ...(stored?.fieldStamps ?? {}) };
    // One stamp for every field this write set (stamps are never changed in place).
    const stamp = { actor, hlc: m.hlc };
    for (const f of Object.keys(merge.apply)) stamps[f] = stamp;
    if (!stored || merge.deleted !== stored.deleted) stamps.deleted = stamp;
    record = {
      id: m.recordId,
      kind: m.kind,
      clubId: auth.clubId,
      version: (stored?.version ?? 0) + 1,
      hlc: stored ? maxEncodedHlc(stored.hlc, m.hlc) : m.hlc,
      updatedAt: new Date(pt).toISOString(),
      deleted: merge.deleted,
      fields,
      changeSeq: club.changeSeq,
      lastActor: actor,
      fieldStamps: stamps,
    };
    club.records[m.recordId] = record;
  }
  const conflictIds = recordConflicts(ctx, m, merge.conflicts);
  const result: MutationResult = { mutationId: m.mutationId, status: merge.status, version: record!.version };
  if (conflictIds.length > 0) Object.assign(result, { conflictId: conflictIds[0], conflictIds });
  return result;
}

/** Same keys, each holding the very same value: a new record's fields copied from its patch. */
function sameEntries(a: Fields, b: Fields): boolean {
  const keys = Object.keys(a);
  if (keys.length !== Object.keys(b).length) return false;
  for (const k of keys) if (a[k] !== b[k] || !Object.prototype.hasOwnProperty.call(b, k)) return false;
  return true;
}

/** The merged record's validation; a record this batch already validated has only its changed fields parsed. */
function validateMerged(ctx: ApplyContext, m: Mutation, stored: StoredRecord | undefined, fields: Fields, changed: string[]): Validation<Fields> {
  const known = stored && stored.kind === m.kind ? ctx.validated?.get(stored.fields) : undefined;
  return known ? validateChangedRecord(m.kind, known as never, fields, changed) : validateRecord(m.kind, fields);
}
