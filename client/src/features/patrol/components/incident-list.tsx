import Box from '@mui/material/Box';
import Button from '@mui/material/Button';
import Typography from '@mui/material/Typography';
import { canSee, canUpdate } from '@breakline/sync-protocol';
import { Link as RouterLink } from 'react-router-dom';
import { paths } from '@/app/paths';
import type { LocalRecord } from '@/db/types';
import type { PatrolContext } from '../hooks/use-patrol-context';
import { latLonText } from '../model/place-text';
import { clubTime } from '../model/trip-times';
import { INCIDENT_WORDS } from '../model/words';

/** A trip's incident notes that this person may see; the rest are not on the phone at all. */
export function IncidentList({ notes, p }: { notes: readonly LocalRecord<'incidentNote'>[]; p: PatrolContext }) {
  const shown = notes.filter((n) => canSee('incidentNote', p.role, n.fields, p.userId)).sort((a, b) => a.fields.occurredAt.localeCompare(b.fields.occurredAt));
  if (shown.length === 0) return <Typography sx={{ color: 'text.secondary' }}>No incident notes you can see on this trip.</Typography>;
  return (
    <Box component="ul" aria-label="Incident notes" sx={{ m: 0, p: 0, listStyle: 'none', display: 'grid', gap: 1.5 }}>
      {shown.map((n) => {
        const f = n.fields;
        const helped = f.peopleHelped === 1 ? '1 person helped' : `${f.peopleHelped} people helped`;
        return (
          <Box component="li" key={n.id} sx={{ borderLeft: 4, borderColor: 'error.main', pl: 1.5, display: 'grid', gap: 0.25 }}>
            <Typography sx={{ fontWeight: 700 }}>{INCIDENT_WORDS[f.kind]} · {clubTime(f.occurredAt, p.zone)} · {helped}</Typography>
            <Typography>{f.actionTaken}</Typography>
            {f.outcome && <Typography>Outcome: {f.outcome}</Typography>}
            {f.text && <Typography sx={{ whiteSpace: 'pre-wrap' }}>{f.text}</Typography>}
            <Typography variant="body2" sx={{ color: 'text.secondary' }}>
              {f.lat !== null && f.lon !== null ? `At ${latLonText(f.lat, f.lon)} (WGS 84) · ` : ''}
              by {f.authorId === p.userId ? 'you' : p.nameOf(f.authorId)}{n.waiting ? ' · waiting to sync' : ''}
            </Typography>
            {canUpdate('incidentNote', p.role, { text: `${f.text} ` }, f, p.userId) && (
              <Button component={RouterLink} to={paths.incidentFile.href(n.id)} sx={{ justifySelf: 'start' }}>Edit this note</Button>
            )}
          </Box>
        );
      })}
    </Box>
  );
}
