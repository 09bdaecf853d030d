import Alert from '@mui/material/Alert';
import Box from '@mui/material/Box';
import Button from '@mui/material/Button';
import Typography from '@mui/material/Typography';
import { Link as RouterLink } from 'react-router-dom';
import { paths } from '@/app/paths';
import type { LocalRecord } from '@/db/types';
import { useLocalSave } from '@/lib/use-local-save';
import { useClock } from '../hooks/use-clock';
import type { PatrolContext } from '../hooks/use-patrol-context';
import { clubTime, onWaterMinutes, timerText } from '../model/trip-times';
import { PURPOSE_WORDS } from '../model/words';
import { preloadWrites, retrieveTrip } from '../model/lazy-writes';

/** A trip afloat: its running on-water time and the one tap that logs the retrieval. */
export function OnWaterBar({ trip, p, canRetrieve, today }: { trip: LocalRecord<'trip'>; p: PatrolContext; canRetrieve: boolean; today?: string }) {
  const now = useClock(1000);
  const { refusal, saving, run } = useLocalSave();
  const t = trip.fields;
  return (
    <Box component="section" aria-label="On the water" sx={{ display: 'grid', gap: 1, p: 1.5, borderRadius: 1, bgcolor: 'info.main', color: 'info.contrastText' }}>
      <Box sx={{ display: 'flex', justifyContent: 'space-between', alignItems: 'baseline', gap: 1, flexWrap: 'wrap' }}>
        <Typography sx={{ fontWeight: 700 }}>On the water · {PURPOSE_WORDS[t.purpose]}</Typography>
        <Typography component="span" role="timer" aria-label="Time on the water" sx={{ fontSize: '1.6rem', fontWeight: 700, fontVariantNumeric: 'tabular-nums' }}>
          {timerText(onWaterMinutes(t, now))}
        </Typography>
      </Box>
      <Typography variant="body2">Launched {clubTime(t.launchedAt, p.zone, today)} · driver {p.nameOf(t.driverId)}</Typography>
      <Box sx={{ display: 'grid', gridTemplateColumns: canRetrieve ? '1fr 1fr' : '1fr', gap: 1 }}>
        {canRetrieve && (
          <Button variant="contained" color="secondary" size="large" disabled={saving} onPointerDown={() => void preloadWrites()} onClick={() => run(() => retrieveTrip(p.ctx, trip))} sx={{ minHeight: 56 }}>
            Retrieve now
          </Button>
        )}
        <Button component={RouterLink} to={paths.tripFile.href(trip.id)} variant="outlined" color="inherit" size="large" sx={{ minHeight: 56 }}>
          Trip details
        </Button>
      </Box>
      {refusal && <Alert severity="error">{refusal}</Alert>}
    </Box>
  );
}
