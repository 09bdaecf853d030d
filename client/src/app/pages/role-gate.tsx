import type { ReactNode } from 'react';
import { EmptyState } from '@/components/empty-state';
import type { Role } from '@/features/auth/api/types';
import { roleLabels } from '@/features/auth/roles';
import { useSession } from '@/features/auth/use-auth';

/** Explains, rather than hides, a page the person's role does not open. The server checks too. */
export function RoleGate(props: { allowed: (role: Role) => boolean; who: string; children: ReactNode }) {
  const { activeClub } = useSession();
  if (props.allowed(activeClub.role)) return props.children;
  return (
    <EmptyState title="Not open to your role">
      This page is for {props.who} of {activeClub.name}. You are signed in as {roleLabels[activeClub.role].toLowerCase()}.
    </EmptyState>
  );
}
