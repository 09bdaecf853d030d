import { useSearchParams } from 'react-router-dom';
import { canUseReviewDesk } from '@/features/auth/roles';
import { useSession } from '@/features/auth/use-auth';
import { DeskFrame } from '@/features/review/components/desk-frame';
import { DeskTable } from '@/features/review/components/desk-table';
import { parseDeskQuery, tabsFor } from '@/features/review/model/desk-query';
import { DeskGate } from './desk-gate';

export function ReviewDeskPage() {
  return (
    <DeskGate title="Review desk" allowed={canUseReviewDesk} who="supervisors and admins">
      <Tables />
    </DeskGate>
  );
}

function Tables() {
  const { activeClub } = useSession();
  const [search] = useSearchParams();
  const { tab } = parseDeskQuery(search, tabsFor(activeClub.role));
  return (
    <DeskFrame screen={tab}>
      <DeskTable key={tab} />
    </DeskFrame>
  );
}
