import { PageHeader } from '@/components/page-header';
import { canUseReviewDesk } from '@/features/auth/roles';
import { SeasonReport } from '@/features/reports/components/season-report';
import { DeskGate } from './desk-gate';

export function SeasonReportPage() {
  return (
    <DeskGate title="Season report" allowed={canUseReviewDesk} who="supervisors and admins">
      <PageHeader title="Season report" subtitle="Trips, hours on the water, defects and repairs for the dates you choose" />
      <SeasonReport />
    </DeskGate>
  );
}
