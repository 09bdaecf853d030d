import { EmptyState } from '@/components/empty-state';
import { PageHeader } from '@/components/page-header';
import { canAdminister } from '@/features/auth/roles';
import { RoleGate } from './role-gate';

export function AdminPage() {
  return (
    <>
      <PageHeader title="Admin" subtitle="Club set-up" />
      <RoleGate allowed={canAdminister} who="admins">
        <EmptyState title="Nothing set up here yet">
          Members, invitations, roles and awards; boats, motors and their specifications; check templates; and the
          club's time zone, location and units will be managed here.
        </EmptyState>
      </RoleGate>
    </>
  );
}
