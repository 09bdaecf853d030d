import { useState } from 'react';
import Alert from '@mui/material/Alert';
import Box from '@mui/material/Box';
import Button from '@mui/material/Button';
import Dialog from '@mui/material/Dialog';
import DialogActions from '@mui/material/DialogActions';
import DialogContent from '@mui/material/DialogContent';
import DialogContentText from '@mui/material/DialogContentText';
import DialogTitle from '@mui/material/DialogTitle';
import type { BoatState } from '@breakline/sync-protocol';
import type { LocalRecord } from '@/db/types';
import { useLocalSave } from '@/lib/use-local-save';
import type { PatrolContext } from '../hooks/use-patrol-context';
import { daylightWarning } from '../model/daylight';
import { launchTrip, type NewTrip } from '../model/writes';

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
  const { refusal, saving, run } = useLocalSave();
  const dark = daylightWarning(now, p.place);
  const launch = () => run(async () => { await launchTrip(p.ctx, trip); setAsking(false); });
  const stoodDown = state === 'stood-down';
  return (
    <Box sx={{ display: 'grid', gap: 1 }}>
      {dark && <Alert severity="warning">{dark.replace(/^Launch at/, 'Launching now at')}</Alert>}
      {state === 'unchecked' && <Alert severity="warning">No launch check of {boat.fields.name} today. Run it before the first launch.</Alert>}
      <Button variant="contained" size="large" disabled={saving} color={stoodDown ? 'error' : 'primary'} onClick={stoodDown ? () => setAsking(true) : launch} sx={{ minHeight: 56 }}>
        {stoodDown ? `${boat.fields.name} is stood down…` : `Launch ${boat.fields.name}`}
      </Button>
      {refusal && <Alert severity="error">{refusal}</Alert>}
      <Dialog open={asking} onClose={() => setAsking(false)} aria-labelledby="launch-stood-down">
        <DialogTitle id="launch-stood-down">{boat.fields.name} is stood down</DialogTitle>
        <DialogContent>
          <DialogContentText>
            A stood-down boat is not launched until a competent person returns it to service. Log a launch only if the
            patrol captain has made that call, for example a rescue with no other boat.
          </DialogContentText>
        </DialogContent>
        <DialogActions>
          <Button size="large" onClick={() => setAsking(false)}>Do not launch</Button>
          <Button size="large" color="error" onClick={launch} disabled={saving}>Log the launch</Button>
        </DialogActions>
      </Dialog>
    </Box>
  );
}
