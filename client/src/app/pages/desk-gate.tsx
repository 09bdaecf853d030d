import type { ReactNode } from 'react';
import { PageHeader } from '@/components/page-header';
import type { Role } from '@/features/auth/api/types';
import { useSession } from '@/features/auth/use-auth';
import { RoleGate } from './role-gate';

/** A desktop screen's role check, with the screen's title kept above the explanation. */
export function DeskGate(props: { title: string; allowed: (role: Role) => boolean; who: string; children: ReactNode }) {
  const { activeClub } = useSession();
  if (props.allowed(activeClub.role)) return props.children;
  return (
    <>
      <PageHeader title={props.title} />
      <RoleGate allowed={props.allowed} who={props.who}>{null}</RoleGate>
    </>
  );
}
