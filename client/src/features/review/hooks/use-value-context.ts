import { useMemo } from 'react';
import { useRecord } from '@/db/hooks';
import { useSession } from '@/features/auth/use-auth';
import type { ValueContext } from '../model/values';
import { useNames } from './use-names';

/** Words for a record's values; a check's item ids are named from its template when this computer has it. */
export function useValueContext(templateId?: unknown): ValueContext {
  const { activeClub } = useSession();
  const names = useNames();
  const template = useRecord('checkTemplate', typeof templateId === 'string' ? templateId : undefined);
  return useMemo(() => {
    const labels = new Map<string, string>();
    for (const s of template?.fields.sections ?? []) for (const i of s.items) labels.set(i.id, `${s.title}: ${i.label}`);
    return { zone: activeClub.timeZone, boat: names.boat, motor: names.motor, member: names.member, itemLabel: (id: string) => labels.get(id) };
  }, [activeClub.timeZone, names, template]);
}
