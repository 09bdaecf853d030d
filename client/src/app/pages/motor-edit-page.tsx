import { useParams } from 'react-router-dom';
import { MotorEditor } from '@/features/boats/editor/motor-editor';
import { MotorMoves } from '@/features/boats/moves/motor-moves';
import { useMemberName } from '@/features/defects/api/members';

/** The motor's record, with its moves between boats and who made them. */
export function MotorEditPage() {
  const { motorId = 'new' } = useParams();
  const memberName = useMemberName();
  return <MotorEditor key={motorId} motorId={motorId} history={<MotorMoves motorId={motorId} nameOf={memberName} />} />;
}
