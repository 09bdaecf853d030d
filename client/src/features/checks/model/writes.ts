import { DEFAULT_LAUNCH_TEMPLATE, DEFAULT_STOW_TEMPLATE } from '@breakline/sync-protocol';
import { getRecord } from '@/db/queries';
import type { LocalRecord } from '@/db/types';
import { createRecord, updateRecord, type WriteContext } from '@/db/write';
import { LocalWriteError } from '@/db/write-error';
import type { CheckItemEntry } from './types';

const queues = new Map<string, Promise<void>>();

/**
 * Saves one answer at once. Answers to one check are written one after another, each on top of
 * the check as stored, so two quick taps never overwrite each other's item.
 */
export function saveAnswer(ctx: WriteContext, checkId: string, itemId: string, entry: CheckItemEntry): Promise<void> {
  const previous = queues.get(checkId) ?? Promise.resolve();
  const next = previous.catch(() => undefined).then(async () => {
    const check = await getRecord(ctx.db, ctx.clubId, 'check', checkId);
    if (!check) throw new LocalWriteError('not-found', 'This check is not on this phone any more; start it again from Checks.');
    await updateRecord(ctx, 'check', checkId, { results: { ...check.fields.results, [itemId]: entry } });
  });
  queues.set(checkId, next);
  return next;
}

export async function finishCheck(ctx: WriteContext, checkId: string, now = new Date()): Promise<void> {
  await queues.get(checkId)?.catch(() => undefined);
  await updateRecord(ctx, 'check', checkId, { status: 'complete', completedAt: now.toISOString() });
}

export function startCheck(
  ctx: WriteContext, boatId: string, motorId: string | null, template: LocalRecord<'checkTemplate'>, now = new Date(),
): Promise<string> {
  return createRecord(ctx, 'check', {
    boatId,
    motorId,
    checkType: template.fields.checkType,
    templateId: template.id,
    templateVersion: template.fields.templateVersion,
    startedAt: now.toISOString(),
    completedAt: null,
    status: 'in-progress',
    results: {},
    performedBy: ctx.userId,
    signedOffBy: null,
    signedOffAt: null,
  });
}

/** The default launch and stow templates for a club that has none (an admin's write). */
export async function createDefaultTemplates(ctx: WriteContext, missing: readonly ('launch' | 'stow')[]): Promise<void> {
  for (const type of missing) await createRecord(ctx, 'checkTemplate', type === 'launch' ? DEFAULT_LAUNCH_TEMPLATE : DEFAULT_STOW_TEMPLATE);
}
