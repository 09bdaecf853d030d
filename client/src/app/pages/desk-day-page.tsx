import { canUseReviewDesk } from '@/features/auth/roles';
import { DayLog } from '@/features/review/components/day-log';
import { DeskFrame } from '@/features/review/components/desk-frame';
import { DeskGate } from './desk-gate';

export function DeskDayPage() {
  return (
    <DeskGate title="Review desk" allowed={canUseReviewDesk} who="supervisors and admins">
      <DeskFrame screen="day">
        <DayLog />
      </DeskFrame>
    </DeskGate>
  );
}
