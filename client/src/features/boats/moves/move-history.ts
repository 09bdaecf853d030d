import { utcToLocal } from '@breakline/sync-protocol';
import type { LocalRecord } from '@/db/types';

export interface MoveLine {
  id: string;
  from: string;
  to: string;
  /** The club's local date and time, "2026-11-03 06:25". */
  when: string;
  by: string;
  reason: string;
  /** Saved on this phone, not yet accepted by the server. */
  waiting: boolean;
}

/** A motor's moves between boats, newest first, in words a crew member reads. */
export function moveHistory(
  moves: readonly LocalRecord<'motorMove'>[], motorId: string, boats: readonly LocalRecord<'boat'>[], zone: string,
  nameOf: (memberId: string) => string,
): MoveLine[] {
  const place = (boatId: string | null) => {
    if (boatId === null) return 'the store';
    const b = boats.find((x) => x.id === boatId);
    return b ? `${b.fields.fleetNumber} ${b.fields.name}` : 'a boat not on this phone';
  };
  return moves
    .filter((m) => m.fields.motorId === motorId)
    .sort((a, b) => b.fields.movedAt.localeCompare(a.fields.movedAt) || (a.id < b.id ? 1 : -1))
    .map(({ id, fields: m, waiting }) => {
      const at = utcToLocal(m.movedAt, zone);
      return { id, from: place(m.fromBoatId), to: place(m.toBoatId), when: `${at.date} ${at.time}`, by: nameOf(m.movedBy), reason: m.reason, waiting: waiting > 0 };
    });
}
