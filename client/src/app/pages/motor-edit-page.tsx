import { useParams } from 'react-router-dom';
import { MotorEditor } from '@/features/boats/editor/motor-editor';

export function MotorEditPage() {
  const { motorId = 'new' } = useParams();
  return <MotorEditor key={motorId} motorId={motorId} />;
}
