import { PageHeader } from '@/components/page-header';
import { CrewAwards } from '@/features/admin/components/crew-awards';
import { canUseReviewDesk } from '@/features/auth/roles';
import { DeskGate } from './desk-gate';

export function CrewAwardsPage() {
  return (
    <DeskGate title="Crew awards" allowed={canUseReviewDesk} who="supervisors and admins">
      <PageHeader title="Crew awards" subtitle="Each member's awards and when they expire" />
      <CrewAwards />
    </DeskGate>
  );
}
