import { useParams } from 'react-router-dom';
import { TripFile } from '@/features/patrol/components/trip-file';

export function TripFilePage() {
  const { tripId = '' } = useParams();
  return <TripFile tripId={tripId} />;
}
