import Box from '@mui/material/Box';
import Typography from '@mui/material/Typography';
import { utcToLocal, type KindFields } from '@breakline/sync-protocol';
import type { PatrolContext } from '../hooks/use-patrol-context';
import { clubTime, durationText, onWaterMinutes } from '../model/trip-times';

/** A logged trip's launch and retrieval at the club, and the time on the water between them (from UTC instants). */
export function TripTimes({ trip, p }: { trip: KindFields['trip']; p: PatrolContext }) {
  const back = trip.retrievedAt!;
  const launch = utcToLocal(trip.launchedAt, p.zone);
  const retrieval = utcToLocal(back, p.zone);
  const cells: [string, string][] = [
    ['Launched', launch.time],
    ['Retrieved', retrieval.date === launch.date ? retrieval.time : clubTime(back, p.zone)],
    ['On the water', durationText(onWaterMinutes(trip, back))],
  ];
  return (
    <Box component="section" aria-label="Times" sx={{ display: 'grid', gridTemplateColumns: '1fr 1fr 1fr', gap: 1, p: 1.5, borderRadius: 1, bgcolor: 'background.paper', border: 1, borderColor: 'divider' }}>
      {cells.map(([k, v]) => (
        <Box key={k}>
          <Typography variant="body2" sx={{ color: 'text.secondary' }}>{k}</Typography>
          <Typography sx={{ fontWeight: 700, fontSize: '1.15rem' }}>{v}</Typography>
        </Box>
      ))}
    </Box>
  );
}
