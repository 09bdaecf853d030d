import type { WriteContext } from '@/db/write';
import { createRecord, updateRecord } from '@/db/write';
import { LocalWriteError } from '@/db/write-error';
import type { LocalRecord } from '@/db/types';

export const NOT_HERE_YET =
  'This record has not reached this computer yet. Wait for the Sync status to show it is up to date (or press Sync now), then sign off.';

/** Whether a check can be signed off now, and if not, why not, in words. */
export function signOffBlock(check: LocalRecord<'check'> | undefined): string | null {
  if (!check) return NOT_HERE_YET;
  if (check.fields.signedOffAt) return 'Already signed off.';
  if (check.fields.status !== 'complete') return 'The check is still in progress: it can be signed off once the crew completes it.';
  return null;
}

/** A supervisor's sign-off of a completed check, saved here first and sent with the next sync. */
export async function signOffCheck(ctx: WriteContext, check: LocalRecord<'check'> | undefined, now = new Date()): Promise<void> {
  const block = signOffBlock(check);
  if (block) throw new LocalWriteError(check ? 'invalid' : 'not-found', block);
  await updateRecord(ctx, 'check', check!.id, { signedOffBy: ctx.userId, signedOffAt: now.toISOString() });
}

/** The entry that closes a day's log, for one boat or (boatId null) the whole club. */
export async function signOffDay(
  ctx: WriteContext, day: { sessionDate: string; boatId: string | null; note: string }, now = new Date(),
): Promise<string> {
  return createRecord(ctx, 'daySignOff', {
    sessionDate: day.sessionDate, boatId: day.boatId, note: day.note.trim(), signedOffBy: ctx.userId, signedOffAt: now.toISOString(),
  });
}
