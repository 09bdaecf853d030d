import { useParams } from 'react-router-dom';
import { canUseReviewDesk } from '@/features/auth/roles';
import { RecordView } from '@/features/review/components/record-view';
import { DeskGate } from './desk-gate';

export function DeskRecordPage() {
  const { kind = '', recordId = '' } = useParams();
  return (
    <DeskGate title="Review desk" allowed={canUseReviewDesk} who="supervisors and admins">
      <RecordView key={`${kind}/${recordId}`} kind={kind} id={recordId} />
    </DeskGate>
  );
}
