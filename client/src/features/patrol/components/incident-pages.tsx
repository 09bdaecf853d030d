import { useState } from 'react';
import CircularProgress from '@mui/material/CircularProgress';
import { canSee } from '@breakline/sync-protocol';
import { EmptyState } from '@/components/empty-state';
import { PageHeader } from '@/components/page-header';
import { useRecord } from '@/db/hooks';
import { usePatrolContext } from '../hooks/use-patrol-context';
import { blankIncident, incidentFormOf } from '../model/incident-draft';
import { clubTime } from '../model/trip-times';
import { PURPOSE_WORDS } from '../model/words';
import { addIncidentNote, updateIncidentNote } from '../model/writes';
import { IncidentForm } from './incident-form';

/** A new incident note on a trip. */
export function NewIncident({ tripId, onSaved }: { tripId: string; onSaved: () => void }) {
  const p = usePatrolContext();
  const trip = useRecord('trip', tripId);
  const [openedAt] = useState(() => new Date().toISOString());
  if (trip === undefined || !p.loaded) return <CircularProgress aria-label="Loading the trip" />;
  if (trip === null) return <EmptyState title="This trip is not on this phone">Open the trip from Today or Trips and add the note there.</EmptyState>;
  return (
    <>
      <PageHeader title="New incident note" subtitle={`${PURPOSE_WORDS[trip.fields.purpose]} trip launched ${clubTime(trip.fields.launchedAt, p.zone)}`} />
      <IncidentForm initial={blankIncident(openedAt, p.zone)} storedAt={openedAt} link={{ tripId, boatId: trip.fields.boatId }} p={p}
        save={(note) => addIncidentNote(p.ctx, note).then(() => undefined)} onSaved={onSaved} />
    </>
  );
}

/** An incident note opened to change it (its author, drivers, supervisors and admins). */
export function EditIncident({ incidentId, onSaved }: { incidentId: string; onSaved: (tripId: string | null) => void }) {
  const p = usePatrolContext();
  const note = useRecord('incidentNote', incidentId);
  if (note === undefined || !p.loaded) return <CircularProgress aria-label="Loading the incident note" />;
  if (note === null || !canSee('incidentNote', p.role, note.fields, p.userId)) {
    return <EmptyState title="This incident note is not on this phone">Incident notes are kept to their author and the club's drivers, supervisors and admins.</EmptyState>;
  }
  const f = note.fields;
  return (
    <>
      <PageHeader title="Incident note" subtitle={`Written by ${f.authorId === p.userId ? 'you' : p.nameOf(f.authorId)}`} />
      <IncidentForm initial={incidentFormOf(f, p.zone)} storedAt={f.occurredAt} link={{ tripId: f.tripId, boatId: f.boatId }} p={p}
        save={(n) => updateIncidentNote(p.ctx, incidentId, n)} onSaved={() => onSaved(f.tripId)} />
    </>
  );
}
