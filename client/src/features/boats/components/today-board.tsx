import type { ReactNode } from 'react';
import Box from '@mui/material/Box';
import Button from '@mui/material/Button';
import CircularProgress from '@mui/material/CircularProgress';
import Typography from '@mui/material/Typography';
import { roleAtLeast } from '@breakline/sync-protocol';
import { Link as RouterLink } from 'react-router-dom';
import { paths } from '@/app/paths';
import { EmptyState } from '@/components/empty-state';
import type { LocalRecord } from '@/db/types';
import { useSession } from '@/features/auth/use-auth';
import { useFleetRecords } from '../hooks/use-fleet-records';
import { useReadinessContext } from '../hooks/use-readiness-context';
import { readinessOf, type BoatReadiness } from '../readiness/adapt';
import { openDefectsOf } from '../readiness/open-defects';
import { BoatCard } from './boat-card';

/**
 * Today's board: every boat in service with its state, worked out on this phone. `boatExtra` is
 * another feature's part for each boat's card (who is signed on, the trip afloat), placed by the page.
 */
export function TodayBoard({ boatExtra }: { boatExtra?: (boat: LocalRecord<'boat'>, result: BoatReadiness, boats: readonly LocalRecord<'boat'>[]) => ReactNode } = {}) {
  const fleet = useFleetRecords();
  const ctx = useReadinessContext();
  const { activeClub } = useSession();
  const editor = roleAtLeast(activeClub.role, 'supervisor');
  if (!fleet) return <CircularProgress aria-label="Loading the boats" />;
  const boats = [...fleet.boats].filter((b) => b.fields.inService).sort((a, b) => a.fields.fleetNumber.localeCompare(b.fields.fleetNumber, undefined, { numeric: true }));
  const away = fleet.boats.length - boats.length;
  return (
    <Box sx={{ display: 'grid', gap: 2 }}>
      {boats.length === 0 && (
        <EmptyState title="No boats yet">
          When a supervisor or admin adds the club's boats, each one shows here with its state for the day and what needs
          doing next.
        </EmptyState>
      )}
      {boats.map((boat) => (
        <BoatCard key={boat.id} boat={boat} result={readinessOf(boat, fleet, ctx)} openDefects={openDefectsOf(fleet.defects, boat.id).length} extra={boatExtra} boats={boats} />
      ))}
      {away > 0 && (
        <Typography sx={{ color: 'text.secondary' }}>
          {away === 1 ? '1 boat is' : `${away} boats are`} out of service and not shown. See the fleet list.
        </Typography>
      )}
      <Button component={RouterLink} to={paths.fleet.href()} variant="text" size="large">
        {editor ? 'Fleet: add and edit boats and motors' : 'Fleet: boats and motors'}
      </Button>
    </Box>
  );
}
