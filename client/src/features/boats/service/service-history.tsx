import List from '@mui/material/List';
import ListItem from '@mui/material/ListItem';
import ListItemText from '@mui/material/ListItemText';
import Typography from '@mui/material/Typography';
import { utcToLocal } from '@breakline/sync-protocol';
import type { LocalRecord } from '@/db/types';
import { dayWords } from './service-words';

/** The motor's services, newest first (the caller sorts). */
export function ServiceHistory({ records, zone }: { records: readonly LocalRecord<'serviceRecord'>[]; zone: string }) {
  if (records.length === 0) return <Typography sx={{ color: 'text.secondary' }}>No services recorded for this motor.</Typography>;
  return (
    <List disablePadding aria-label="Service history">
      {records.map((r) => {
        const s = r.fields;
        return (
          <ListItem key={r.id} disableGutters divider>
            <ListItemText
              primary={`${dayWords(utcToLocal(s.servicedAt, zone).date)} at ${s.engineHours.toFixed(1)} h · ${s.work}`}
              secondary={`${s.parts ? `Parts: ${s.parts} · ` : ''}by ${s.performedBy}${r.waiting ? ' · not sent yet' : ''}`}
              slotProps={{ primary: { sx: { fontWeight: 700, whiteSpace: 'pre-wrap' } }, secondary: { sx: { whiteSpace: 'pre-wrap' } } }}
            />
          </ListItem>
        );
      })}
    </List>
  );
}
