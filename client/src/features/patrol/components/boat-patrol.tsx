import { lazy, Suspense, useState } from 'react';
import Box from '@mui/material/Box';
import Button from '@mui/material/Button';
import Typography from '@mui/material/Typography';
import { roleAtLeast, type BoatState } from '@breakline/sync-protocol';
import { useRecords } from '@/db/hooks';
import type { LocalRecord } from '@/db/types';
import { useLocalSave } from '@/lib/use-local-save';
import { useClock } from '../hooks/use-clock';
import { usePatrolContext } from '../hooks/use-patrol-context';
import { openTrips, sessionDateOf, signedOn } from '../model/session-day';
import { preloadWrites, signOff } from '../model/lazy-writes';
import { LaunchButton } from './launch-button';
import { OnWaterBar } from './on-water-bar';
import { SignedOnList } from './signed-on-list';

// The dialog (MUI's dialog, select and menu with it) and its write load when someone signs on,
// not with Today.
const loadSignOn = () => import('./sign-on-dialog');
const SignOnDialog = lazy(() => loadSignOn().then((m) => ({ default: m.SignOnDialog })));

interface Props {
  boat: LocalRecord<'boat'>;
  boats: readonly LocalRecord<'boat'>[];
  /** The boat's state as Today worked it out; null when it could not be. */
  state: BoatState | null;
}

/** A boat's patrol on Today: who is signed on, the trip afloat with its timer, and the next tap. */
export function BoatPatrol({ boat, boats, state }: Props) {
  const p = usePatrolContext();
  const now = useClock(30_000);
  const signOns = useRecords('signOn', { boatId: boat.id });
  const trips = useRecords('trip', { boatId: boat.id });
  const motors = useRecords('motor');
  const [signingOn, setSigningOn] = useState(false);
  const { refusal, run } = useLocalSave();
  if (!signOns || !trips || !motors || !p.loaded) return null;
  const date = sessionDateOf(now, p.zone);
  const on = signedOn(signOns, boat.id, date);
  const mine = on.find((s) => s.fields.memberId === p.userId);
  const afloat = openTrips(trips, boat.id)[0];
  const driver = roleAtLeast(p.role, 'driver');
  const crewIds = on.filter((s) => s.fields.role === 'crew').map((s) => s.fields.memberId);
  const signedDriver = on.find((s) => s.fields.role === 'driver')?.fields.memberId;
  const motor = motors.find((m) => m.fields.boatId === boat.id);
  const launchDriver = signedDriver ?? p.userId;
  return (
    <Box sx={{ display: 'grid', gap: 1.5 }}>
      {afloat && <OnWaterBar trip={afloat} p={p} canRetrieve={driver} today={date} />}
      <SignedOnList on={on} date={date} p={p} />
      <Box sx={{ display: 'flex', gap: 1, flexWrap: 'wrap' }}>
        {!mine && <Button variant="outlined" size="large" onPointerDown={() => void loadSignOn()} onClick={() => setSigningOn(true)} sx={{ minHeight: 48, flex: 1 }}>Sign on to {boat.fields.name}</Button>}
        {mine && !afloat && <Button size="large" onPointerDown={() => void preloadWrites()} onClick={() => run(() => signOff(p.ctx, mine.id))} sx={{ minHeight: 48 }}>Sign off</Button>}
        {driver && mine && <Button size="large" onPointerDown={() => void loadSignOn()} onClick={() => setSigningOn(true)} sx={{ minHeight: 48 }}>Sign on someone else</Button>}
      </Box>
      {refusal && <Typography sx={{ color: 'error.main' }}>{refusal}</Typography>}
      {afloat ? null : driver ? (
        <>
          {!signedDriver && <Typography variant="body2" sx={{ color: 'text.secondary' }}>No driver is signed on: a launch from here logs you as the driver.</Typography>}
          <LaunchButton boat={boat} state={state} now={now} p={p}
            trip={{ boatId: boat.id, motorId: motor?.id ?? null, driverId: launchDriver, crewIds: crewIds.filter((id) => id !== launchDriver) }} />
        </>
      ) : (
        <Typography variant="body2" sx={{ color: 'text.secondary' }}>A driver logs the launch and retrieval.</Typography>
      )}
      {signingOn && (
        <Suspense fallback={null}>
          <SignOnDialog open onClose={() => setSigningOn(false)} boat={boat} boats={boats} date={date} p={p} />
        </Suspense>
      )}
    </Box>
  );
}
