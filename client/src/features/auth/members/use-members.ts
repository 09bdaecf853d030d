import { useEffect, useSyncExternalStore } from 'react';
import { useAuthState } from '../use-auth';
import { noteSignedIn } from './device';
import { roster, type DeviceMember } from './roster';

export interface MemberView {
  member: DeviceMember;
  /** Using the device now. */
  active: boolean;
  /** Can be switched to with a PIN, offline. */
  byPin: boolean;
}

/** The members signed in on this device, the active one first, then by name. */
export function useDeviceMembers(): MemberView[] {
  const members = useSyncExternalStore(roster.subscribe, roster.getState);
  const { session } = useAuthState();
  const activeId = session?.user.id ?? null;
  // A session kept from before this device knew its members gets its entry now.
  useEffect(() => {
    if (session && !roster.find(session.user.id)) noteSignedIn(session);
  }, [session]);
  return members
    .map((member) => ({
      member,
      active: member.userId === activeId,
      byPin: member.pin !== null && (member.userId === activeId || member.session !== null),
    }))
    .sort((a, b) => Number(b.active) - Number(a.active) || a.member.displayName.localeCompare(b.member.displayName));
}
