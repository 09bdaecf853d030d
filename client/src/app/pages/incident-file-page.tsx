import { useNavigate, useParams } from 'react-router-dom';
import { paths } from '@/app/paths';
import { EditIncident } from '@/features/patrol/components/incident-pages';

export function IncidentFilePage() {
  const { incidentId = '' } = useParams();
  const navigate = useNavigate();
  return <EditIncident incidentId={incidentId} onSaved={(tripId) => navigate(tripId ? paths.tripFile.href(tripId) : paths.trips.href(), { replace: true })} />;
}
