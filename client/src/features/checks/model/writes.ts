import { DEFAULT_LAUNCH_TEMPLATE, DEFAULT_STOW_TEMPLATE } from '@breakline/sync-protocol';
import type { LocalRecord } from '@/db/types';
import { createRecord, updateRecord, type WriteContext } from '@/db/write';
import { isLocalWriteError, LocalWriteError } from '@/db/write-error';
import type { CheckItemEntry } from './types';

/**
 * Saves one answer at once. The answer is laid into the results as stored when the write runs,
 * inside its transaction, so two quick taps never overwrite each other's item; IndexedDB runs
 * write transactions on the same tables in the order they were opened, so answers, and a finish
 * tapped after them, are saved in the order they were given.
 */
export function saveAnswer(ctx: WriteContext, checkId: string, itemId: string, entry: CheckItemEntry): Promise<void> {
  return updateRecord(ctx, 'check', checkId, (shown) => ({ results: { ...shown.results, [itemId]: entry } })).catch((e: unknown) => {
    if (isLocalWriteError(e, 'not-found')) throw new LocalWriteError('not-found', 'This check is not on this phone any more; start it again from Checks.');
    throw e;
  });
}

export async function finishCheck(ctx: WriteContext, checkId: string, now = new Date()): Promise<void> {
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
