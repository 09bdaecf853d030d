import { EmptyState } from '@/components/empty-state';
import { PageHeader } from '@/components/page-header';
import { canUseReviewDesk } from '@/features/auth/roles';
import { RoleGate } from './role-gate';

export function ReviewDeskPage() {
  return (
    <>
      <PageHeader title="Review desk" subtitle="Merged records of the day and the season" />
      <RoleGate allowed={canUseReviewDesk} who="supervisors and admins">
        <EmptyState title="Nothing to review yet">
          Checks, trips, defects and incident notes from the club's devices show here once they have synced, to be
          read, signed off, and any conflicts between devices settled.
        </EmptyState>
      </RoleGate>
    </>
  );
}
