import { useMemo } from 'react';
import { useRecords } from '@/db/hooks';
import { useSession } from '@/features/auth/use-auth';
import { useDeskMembers, type DeskMember } from '../api/members';

/** Names for the ids records hold: boats and motors from this computer's copy, people from the server. */
export interface Names {
  boat(id: unknown): string;
  motor(id: unknown): string;
  member(id: unknown): string;
  boats: { id: string; label: string }[];
  motors: { id: string; label: string }[];
  members: DeskMember[];
}

const shortId = (id: string) => `…${id.slice(-6)}`;

export function useNames(): Names {
  const { user } = useSession();
  const boats = useRecords('boat');
  const motors = useRecords('motor');
  const cards = useRecords('member');
  const { data: listed } = useDeskMembers();
  return useMemo(() => {
    // Member cards reach this computer by sync (so names show offline); the server's list adds anyone without one yet.
    const fromCards: DeskMember[] = (cards ?? []).map((c) => ({ userId: c.fields.memberId, displayName: c.fields.displayName, role: 'crew' }));
    const members = [...(listed ?? []), ...fromCards.filter((c) => !(listed ?? []).some((m) => m.userId === c.userId))];
    const boatList = (boats ?? []).map((b) => ({ id: b.id, label: `${b.fields.fleetNumber} ${b.fields.name}` }))
      .sort((a, b) => a.label.localeCompare(b.label));
    const motorList = (motors ?? []).map((m) => ({ id: m.id, label: motorLabel(m.fields) }))
      .sort((a, b) => a.label.localeCompare(b.label));
    const byBoat = new Map(boatList.map((b) => [b.id, b.label]));
    const byMotor = new Map(motorList.map((m) => [m.id, m.label]));
    const byMember = new Map(members.map((m) => [m.userId, m.displayName]));
    const known = (map: Map<string, string>, what: string) => (id: unknown) =>
      typeof id !== 'string' || id === '' ? '—' : (map.get(id) ?? `${what} ${shortId(id)}`);
    const member = known(byMember, 'member');
    return {
      boat: known(byBoat, 'boat'),
      motor: known(byMotor, 'motor'),
      member: (id: unknown) => (id === user.id ? `${user.displayName} (you)` : member(id)),
      boats: boatList,
      motors: motorList,
      members: members.sort((a, b) => a.displayName.localeCompare(b.displayName)),
    };
  }, [boats, motors, cards, listed, user.id, user.displayName]);
}

function motorLabel(f: { model: string; serial: string }): string {
  return `${f.model} (${f.serial})`;
}
