import { useMemo, useState } from 'react';
import Box from '@mui/material/Box';
import Button from '@mui/material/Button';
import CircularProgress from '@mui/material/CircularProgress';
import List from '@mui/material/List';
import ListItemButton from '@mui/material/ListItemButton';
import ListItemText from '@mui/material/ListItemText';
import Typography from '@mui/material/Typography';
import { roleAtLeast } from '@breakline/sync-protocol';
import { Link as RouterLink } from 'react-router-dom';
import { paths } from '@/app/paths';
import { EmptyState } from '@/components/empty-state';
import { useRecords } from '@/db/hooks';
import { usePatrolContext } from '../hooks/use-patrol-context';
import { seaText, windText } from '../model/conditions';
import { openTrips } from '../model/session-day';
import { clubTime, durationText, onWaterMinutes } from '../model/trip-times';
import { PURPOSE_WORDS } from '../model/words';
import { OnWaterBar } from './on-water-bar';

const PAGE = 30;

/** Trips afloat with their timers, then logged trips newest first. */
export function TripList() {
  const p = usePatrolContext();
  const trips = useRecords('trip');
  const boats = useRecords('boat');
  const [shown, setShown] = useState(PAGE);
  const logged = useMemo(() => (trips ?? []).filter((t) => t.fields.retrievedAt !== null).sort((a, b) => b.fields.launchedAt.localeCompare(a.fields.launchedAt)), [trips]);
  if (!trips || !boats || !p.loaded) return <CircularProgress aria-label="Loading the trips" />;
  const afloat = openTrips(trips);
  const boatName = (id: string) => boats.find((b) => b.id === id)?.fields.name ?? 'a boat not on this phone';
  if (trips.length === 0) {
    return (
      <EmptyState title="No trips yet">
        A driver logs a launch from Today with one tap, and the retrieval with another. Each trip then shows here with its
        times, purpose, conditions, engine hours and fuel, and any incident notes.
      </EmptyState>
    );
  }
  return (
    <Box sx={{ display: 'grid', gap: 2 }}>
      {afloat.map((t) => (
        <Box key={t.id} sx={{ display: 'grid', gap: 0.5 }}>
          <Typography sx={{ fontWeight: 700 }}>{boatName(t.fields.boatId)}</Typography>
          <OnWaterBar trip={t} p={p} canRetrieve={roleAtLeast(p.role, 'driver')} />
        </Box>
      ))}
      <List aria-label="Logged trips" disablePadding>
        {logged.slice(0, shown).map((t) => {
          const f = t.fields;
          const conditions = [windText(f.windSpeedKn, f.windDirectionDeg, p.windUnit), seaText(f.waveHeightM)].filter(Boolean).join(' · ');
          return (
            <ListItemButton key={t.id} component={RouterLink} to={paths.tripFile.href(t.id)} sx={{ borderLeft: 4, borderColor: 'info.main', mb: 0.5 }}>
              <ListItemText
                primary={`${PURPOSE_WORDS[f.purpose]} · ${boatName(f.boatId)} · ${durationText(onWaterMinutes(f, f.retrievedAt!))}`}
                secondary={`${clubTime(f.launchedAt, p.zone)} · driver ${p.nameOf(f.driverId)}${conditions ? ` · ${conditions}` : ''}${t.waiting ? ' · waiting to sync' : ''}`}
              />
            </ListItemButton>
          );
        })}
      </List>
      {logged.length > shown && <Button size="large" onClick={() => setShown((n) => n + PAGE)}>Show older ({logged.length - shown} more)</Button>}
    </Box>
  );
}
