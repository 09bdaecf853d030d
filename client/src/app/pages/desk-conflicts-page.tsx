import { canUseReviewDesk } from '@/features/auth/roles';
import { ConflictList } from '@/features/review/components/conflict-list';
import { DeskFrame } from '@/features/review/components/desk-frame';
import { DeskGate } from './desk-gate';

export function DeskConflictsPage() {
  return (
    <DeskGate title="Review desk" allowed={canUseReviewDesk} who="supervisors and admins">
      <DeskFrame screen="conflicts">
        <ConflictList />
      </DeskFrame>
    </DeskGate>
  );
}
