import { useNavigate, useParams } from 'react-router-dom';
import { paths } from '@/app/paths';
import { NewIncident } from '@/features/patrol/components/incident-pages';

export function IncidentNewPage() {
  const { tripId = '' } = useParams();
  const navigate = useNavigate();
  return <NewIncident tripId={tripId} onSaved={() => navigate(paths.tripFile.href(tripId), { replace: true })} />;
}
