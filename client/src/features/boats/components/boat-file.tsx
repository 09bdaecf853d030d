import type { ReactNode } from 'react';
import Box from '@mui/material/Box';
import Button from '@mui/material/Button';
import CircularProgress from '@mui/material/CircularProgress';
import Typography from '@mui/material/Typography';
import { roleAtLeast } from '@breakline/sync-protocol';
import { Link as RouterLink } from 'react-router-dom';
import { paths } from '@/app/paths';
import { EmptyState } from '@/components/empty-state';
import { PageHeader } from '@/components/page-header';
import { useSession } from '@/features/auth/use-auth';
import { useFleetRecords } from '../hooks/use-fleet-records';
import { useReadinessContext } from '../hooks/use-readiness-context';
import { BoatStatePanel } from './boat-state-panel';
import { ChamberList } from './chamber-list';
import { GearList } from './gear-list';
import { MotorSummary } from './motor-summary';
import { SectionCard } from './section-card';

/**
 * One boat's page: what the next crew reads when signing on. `defects` and `log` (the boat's
 * whole history: checks, trips, incidents, defects, repairs, services, motor moves) are the other
 * features' parts, placed here by the page.
 */
export function BoatFile(props: { boatId: string; defects: ReactNode; log?: ReactNode }) {
  const fleet = useFleetRecords();
  const ctx = useReadinessContext();
  const { activeClub } = useSession();
  if (!fleet) return <CircularProgress aria-label="Loading the boat file" />;
  const boat = fleet.boats.find((b) => b.id === props.boatId);
  if (!boat) return <EmptyState title="This boat is not on this phone">It may have been removed, or not synced here yet.</EmptyState>;
  const b = boat.fields;
  const motors = fleet.motors.filter((m) => m.fields.boatId === boat.id);
  const editor = roleAtLeast(activeClub.role, 'supervisor');
  return (
    <Box sx={{ display: 'grid', gap: 2 }}>
      <PageHeader title={`${b.fleetNumber} · ${b.name}`} subtitle={`Boat file${b.hullSerial ? ` · hull serial ${b.hullSerial}` : ''}${b.inService ? '' : ' · out of service'}`} />
      <BoatStatePanel boat={boat} fleet={fleet} ctx={ctx} />
      {props.defects}
      <SectionCard title="Air chambers">
        <ChamberList chambers={b.airChambers} unit={ctx.unit} />
      </SectionCard>
      <SectionCard title="Motor fitted">
        {motors.length === 0 && <Typography sx={{ color: 'text.secondary' }}>No motor is fitted to this boat in its record.</Typography>}
        {motors.map((m) => (
          <MotorSummary key={m.id} motor={m} sources={fleet} ctx={ctx} />
        ))}
      </SectionCard>
      <SectionCard title="Required gear">
        <GearList gear={b.requiredGear} />
      </SectionCard>
      {b.notes.trim() && (
        <SectionCard title="Notes">
          <Typography sx={{ whiteSpace: 'pre-wrap' }}>{b.notes}</Typography>
        </SectionCard>
      )}
      {props.log}
      <Button component={RouterLink} to={paths.boatEdit.href(boat.id)} variant="outlined" size="large">
        {editor ? 'Edit this boat' : 'Boat specification'}
      </Button>
    </Box>
  );
}
