import { listRecords } from '@/db/queries';
import type { LocalRecord } from '@/db/types';
import { createRecord, type WriteContext } from '@/db/write';
import { buildTemplate, type TemplateDraft, type TemplateErrors } from './template-draft';

type CheckType = 'launch' | 'stow';

/** Every saved version of a type, newest first (retired ones too). */
export function versionsOf(templates: readonly LocalRecord<'checkTemplate'>[], type: CheckType): LocalRecord<'checkTemplate'>[] {
  return templates
    .filter((t) => t.fields.checkType === type)
    .sort((a, b) => b.fields.templateVersion - a.fields.templateVersion || (a.id < b.id ? 1 : -1));
}

export function nextVersion(templates: readonly LocalRecord<'checkTemplate'>[], type: CheckType): number {
  return (versionsOf(templates, type)[0]?.fields.templateVersion ?? 0) + 1;
}

export type SavedVersion = { ok: true; id: string; version: number } | { ok: false; errors: TemplateErrors };

/**
 * Saves the draft as a new record with the next version number. Saved versions are never
 * changed, so every check keeps the items, limits and critical flags it was run against.
 */
export async function saveTemplateVersion(ctx: WriteContext, draft: TemplateDraft): Promise<SavedVersion> {
  const version = nextVersion(await listRecords(ctx.db, ctx.clubId, 'checkTemplate'), draft.checkType);
  const built = buildTemplate(draft, version);
  if (!built.ok) return built;
  return { ok: true, id: await createRecord(ctx, 'checkTemplate', built.fields), version };
}
