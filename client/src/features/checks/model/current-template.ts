import type { LocalRecord } from '@/db/types';

/** The club's template of a type to start new checks from: not retired, the highest version. */
export function currentTemplate(
  templates: readonly LocalRecord<'checkTemplate'>[], type: 'launch' | 'stow',
): LocalRecord<'checkTemplate'> | undefined {
  return templates
    .filter((t) => t.fields.checkType === type && !t.fields.retired)
    .reduce<LocalRecord<'checkTemplate'> | undefined>(
      (best, t) => (!best || t.fields.templateVersion > best.fields.templateVersion || (t.fields.templateVersion === best.fields.templateVersion && t.id > best.id) ? t : best),
      undefined,
    );
}
