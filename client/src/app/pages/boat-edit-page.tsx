import { useParams } from 'react-router-dom';
import { BoatEditor } from '@/features/boats/editor/boat-editor';

export function BoatEditPage() {
  const { boatId = 'new' } = useParams();
  return <BoatEditor key={boatId} boatId={boatId} />;
}
