import { useState, type ReactNode } from 'react';
import Alert from '@mui/material/Alert';
import Box from '@mui/material/Box';
import Button from '@mui/material/Button';
import CircularProgress from '@mui/material/CircularProgress';
import Paper from '@mui/material/Paper';
import Typography from '@mui/material/Typography';
import { roleAtLeast } from '@breakline/sync-protocol';
import { Link as RouterLink } from 'react-router-dom';
import { paths } from '@/app/paths';
import { EmptyState } from '@/components/empty-state';
import { PageHeader } from '@/components/page-header';
import { useRecord, useRecords } from '@/db/hooks';
import type { LocalRecord } from '@/db/types';
import { usePatrolContext, type PatrolContext } from '../hooks/use-patrol-context';
import { daylightWarning } from '../model/daylight';
import { clubTime } from '../model/trip-times';
import { PURPOSE_WORDS } from '../model/words';
import { IncidentList } from './incident-list';
import { OnWaterBar } from './on-water-bar';
import { TripForm } from './trip-form';
import { TripSummary } from './trip-summary';
import { EditHistory, TripNotes } from './trip-notes';
import { TripTimes } from './trip-times';

function Part({ title, children }: { title: string; children: ReactNode }) {
  return (
    <Paper component="section" aria-label={title} variant="outlined" sx={{ p: 2, display: 'grid', gap: 1 }}>
      <Typography variant="h6" component="h2" sx={{ fontWeight: 700 }}>{title}</Typography>
      {children}
    </Paper>
  );
}

/** One trip: its times and timer, what it logged, its notes and changes, and its incident notes. */
export function TripFile({ tripId }: { tripId: string }) {
  const trip = useRecord('trip', tripId);
  const p = usePatrolContext();
  if (trip === undefined || !p.loaded) return <CircularProgress aria-label="Loading the trip" />;
  if (trip === null) return <EmptyState title="This trip is not on this phone">It may have been deleted, or not synced here yet.</EmptyState>;
  return <TripParts trip={trip} p={p} />;
}

function TripParts({ trip, p }: { trip: LocalRecord<'trip'>; p: PatrolContext }) {
  const boat = useRecord('boat', trip.fields.boatId);
  const motor = useRecord('motor', trip.fields.motorId ?? undefined);
  const notes = useRecords('incidentNote', { boatId: trip.fields.boatId });
  const [editing, setEditing] = useState(false);
  const t = trip.fields;
  const driver = roleAtLeast(p.role, 'driver');
  const dark = daylightWarning(t.launchedAt, p.place);
  const missing = [
    t.windSpeedKn === null && 'wind', t.waveHeightM === null && 'waves',
    (t.engineHoursStart === null || t.engineHoursEnd === null) && 'engine hours',
  ].filter((x): x is string => Boolean(x));
  const boatName = boat ? `${boat.fields.fleetNumber} · ${boat.fields.name}` : 'a boat not on this phone';
  return (
    <Box sx={{ display: 'grid', gap: 2 }}>
      <PageHeader title={`Trip · ${PURPOSE_WORDS[t.purpose]}`} subtitle={`${boatName} · ${clubTime(t.launchedAt, p.zone)}${trip.waiting ? ' · waiting to sync' : ''}`} />
      {t.retrievedAt === null ? <OnWaterBar trip={trip} p={p} canRetrieve={driver} /> : <TripTimes trip={t} p={p} />}
      {dark && <Alert severity="warning">{dark}</Alert>}
      <Part title="Trip log">
        {editing ? <TripForm trip={trip} motor={motor ?? null} p={p} onDone={() => setEditing(false)} /> : <TripSummary trip={trip} motor={motor ?? null} p={p} />}
        {driver && !editing && missing.length > 0 && (
          <Typography sx={{ fontWeight: 500 }}>Not recorded yet: {missing.join(', ')}. Add them while you remember.</Typography>
        )}
        {driver && !editing && (
          <Button variant={missing.length > 0 ? 'contained' : 'outlined'} size="large" onClick={() => setEditing(true)} sx={{ minHeight: 56 }}>
            {missing.length > 0 ? 'Add conditions and readings' : 'Edit this trip'}
          </Button>
        )}
      </Part>
      <Part title="Incident notes">
        <IncidentList notes={(notes ?? []).filter((n) => n.fields.tripId === trip.id)} p={p} />
        <Button component={RouterLink} to={paths.incidentNew.href(trip.id)} variant="contained" color="error" size="large" sx={{ minHeight: 56 }}>
          Add an incident note
        </Button>
      </Part>
      <Part title="Notes"><TripNotes trip={trip} p={p} canAdd={driver} /></Part>
      <Part title="Changes after logging"><EditHistory trip={trip} p={p} /></Part>
      {boat && <Button component={RouterLink} to={paths.boatFile.href(boat.id)} size="large">Boat file of {boat.fields.name}</Button>}
    </Box>
  );
}
