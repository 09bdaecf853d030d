import type { LocalRecord } from '@/db/types';
import type { ChamberChoice } from './kind-fields';

/** The air chambers the club's boats have, by id, named as the first boat names them. */
export function chamberChoices(boats: readonly LocalRecord<'boat'>[]): ChamberChoice[] {
  const seen = new Map<string, string>();
  for (const b of boats) for (const c of b.fields.airChambers) if (!seen.has(c.id)) seen.set(c.id, c.name);
  return [...seen].map(([id, name]) => ({ id, name }));
}
