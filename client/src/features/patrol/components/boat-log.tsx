import { useMemo, useState } from 'react';
import Box from '@mui/material/Box';
import Button from '@mui/material/Button';
import List from '@mui/material/List';
import ListItemButton from '@mui/material/ListItemButton';
import ListItemText from '@mui/material/ListItemText';
import Paper from '@mui/material/Paper';
import Typography from '@mui/material/Typography';
import { beaufortForce, seaStateCode } from '@breakline/sync-protocol';
import { Link as RouterLink } from 'react-router-dom';
import { paths } from '@/app/paths';
import { useRecords } from '@/db/hooks';
import type { LocalRecord } from '@/db/types';
import { usePatrolContext, type PatrolContext } from '../hooks/use-patrol-context';
import { daylightWarning } from '../model/daylight';
import { boatTimeline, type TimelineEntry, type TimelineKind } from '../model/timeline';
import { clubTime, durationText, onWaterMinutes } from '../model/trip-times';

const PAGE = 40;

const MARKS: Record<TimelineKind, { word: string; colour: string }> = {
  check: { word: 'Check', colour: 'primary.main' },
  trip: { word: 'Trip', colour: 'info.main' },
  incident: { word: 'Incident', colour: 'error.main' },
  defect: { word: 'Defect', colour: 'error.main' },
  repair: { word: 'Repair', colour: 'secondary.main' },
  return: { word: 'Service', colour: 'primary.main' },
  motor: { word: 'Motor', colour: 'text.secondary' },
};

const hrefOf = (link: NonNullable<TimelineEntry['link']>) =>
  link.to === 'check' ? paths.checkRun.href(link.id) : link.to === 'trip' ? paths.tripFile.href(link.id) : paths.defectFile.href(link.id);

function tripLine(t: LocalRecord<'trip'>, p: PatrolContext): string {
  const f = t.fields;
  const when = f.retrievedAt ? durationText(onWaterMinutes(f, f.retrievedAt)) : 'afloat now';
  const dark = daylightWarning(f.launchedAt, p.place) ? ' · launched outside daylight' : '';
  const scales = [f.windSpeedKn !== null && `Beaufort ${beaufortForce(f.windSpeedKn)}`, f.waveHeightM !== null && `sea state ${seaStateCode(f.waveHeightM)}`].filter(Boolean);
  return `${when} · driver ${p.nameOf(f.driverId)}${scales.length ? ` · ${scales.join(', ')}` : ''}${dark}`;
}

/**
 * The boat's log, newest first. Each kind is read once through the boat index (motor moves, which
 * name two boats, are few and read whole), so a season of history is a handful of reads.
 */
export function BoatLog({ boatId }: { boatId: string }) {
  const p = usePatrolContext();
  const checks = useRecords('check', { boatId });
  const trips = useRecords('trip', { boatId });
  const incidents = useRecords('incidentNote', { boatId });
  const defects = useRecords('defect', { boatId });
  const moves = useRecords('motorMove');
  const motors = useRecords('motor');
  const [shown, setShown] = useState(PAGE);
  const entries = useMemo(
    () => checks && trips && incidents && defects && moves && motors && p.loaded
      ? boatTimeline(boatId, { checks, trips, incidents, defects, moves, motors }, p, (t) => tripLine(t, p))
      : undefined,
    [boatId, checks, trips, incidents, defects, moves, motors, p],
  );
  if (!entries) return null;
  return (
    <Paper component="section" aria-label="Boat log" variant="outlined" sx={{ p: 2, display: 'grid', gap: 1 }}>
      <Typography variant="h6" component="h2" sx={{ fontWeight: 700 }}>Boat log</Typography>
      <Typography variant="body2" sx={{ color: 'text.secondary' }}>Checks, trips, incident notes you may see, defects, repairs and motor moves, newest first.</Typography>
      {entries.length === 0 && <Typography sx={{ color: 'text.secondary' }}>Nothing logged for this boat on this phone yet.</Typography>}
      <List disablePadding aria-label="Boat log entries">
        {entries.slice(0, shown).map((e) => {
          const mark = MARKS[e.kind];
          const text = (
            <ListItemText
              primary={<><Box component="span" sx={{ color: mark.colour, fontWeight: 700 }}>{e.title}</Box></>}
              secondary={`${clubTime(e.at, p.zone)}${e.detail ? ` · ${e.detail}` : ''}`}
            />
          );
          return e.link ? (
            <ListItemButton key={e.key} component={RouterLink} to={hrefOf(e.link)} sx={{ borderLeft: 4, borderColor: mark.colour, mb: 0.5 }}>{text}</ListItemButton>
          ) : (
            <Box component="li" key={e.key} sx={{ listStyle: 'none', borderLeft: 4, borderColor: mark.colour, px: 2, py: 0.75, mb: 0.5 }}>{text}</Box>
          );
        })}
      </List>
      {entries.length > shown && (
        <Button size="large" onClick={() => setShown((n) => n + PAGE)}>Show older ({entries.length - shown} more)</Button>
      )}
    </Paper>
  );
}
