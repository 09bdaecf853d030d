import { lazy, Suspense, useState } from 'react';
import Alert from '@mui/material/Alert';
import Box from '@mui/material/Box';
import Button from '@mui/material/Button';
import type { BoatState } from '@breakline/sync-protocol';
import type { LocalRecord } from '@/db/types';
import { useLocalSave } from '@/lib/use-local-save';
import type { PatrolContext } from '../hooks/use-patrol-context';
import { daylightWarning } from '../model/daylight';
import { launchTrip, preloadWrites } from '../model/lazy-writes';
import type { NewTrip } from '../model/writes';

// Only a stood-down boat asks first, so the dialog loads when it is needed.
const loadAsk = () => import('./stood-down-launch-dialog');
const StoodDownLaunchDialog = lazy(() => loadAsk().then((m) => ({ default: m.StoodDownLaunchDialog })));

interface Props {
  boat: LocalRecord<'boat'>;
  trip: NewTrip;
  state: BoatState | null;
  now: string;
  p: PatrolContext;
}

/**
 * Launch with one tap. A stood-down boat asks first, since it is not to be launched until a
 * competent person returns it to service; the phone records, the patrol captain decides.
 */
export function LaunchButton({ boat, trip, state, now, p }: Props) {
  const [asking, setAsking] = useState(false);
  // Once asked, the dialog stays mounted so that it closes with its transition.
  const [asked, setAsked] = useState(false);
  const { refusal, saving, run } = useLocalSave();
  const dark = daylightWarning(now, p.place);
  const launch = () => run(async () => { await launchTrip(p.ctx, trip); setAsking(false); });
  const stoodDown = state === 'stood-down';
  return (
    <Box sx={{ display: 'grid', gap: 1 }}>
      {dark && <Alert severity="warning">{dark.replace(/^Launch at/, 'Launching now at')}</Alert>}
      {state === 'unchecked' && <Alert severity="warning">No launch check of {boat.fields.name} today. Run it before the first launch.</Alert>}
      <Button
        variant="contained" size="large" disabled={saving} color={stoodDown ? 'error' : 'primary'} sx={{ minHeight: 56 }}
        onPointerDown={() => void (stoodDown ? Promise.all([loadAsk(), preloadWrites()]) : preloadWrites())}
        onClick={stoodDown ? () => { setAsked(true); setAsking(true); } : launch}
      >
        {stoodDown ? `${boat.fields.name} is stood down…` : `Launch ${boat.fields.name}`}
      </Button>
      {refusal && <Alert severity="error">{refusal}</Alert>}
      {asked && (
        <Suspense fallback={null}>
          <StoodDownLaunchDialog open={asking} boatName={boat.fields.name} saving={saving} onCancel={() => setAsking(false)} onLaunch={launch} />
        </Suspense>
      )}
    </Box>
  );
}
