import { useState } from 'react';
import Alert from '@mui/material/Alert';
import Box from '@mui/material/Box';
import Button from '@mui/material/Button';
import TextField from '@mui/material/TextField';
import Typography from '@mui/material/Typography';
import type { NoteEntry } from '@breakline/sync-protocol';
import type { LocalRecord } from '@/db/types';
import { useLocalSave } from '@/lib/use-local-save';
import type { PatrolContext } from '../hooks/use-patrol-context';
import { clubTime } from '../model/trip-times';
import { addTripNote } from '../model/writes';

function Entries({ entries, p, empty }: { entries: readonly NoteEntry[]; p: PatrolContext; empty: string }) {
  if (entries.length === 0) return <Typography sx={{ color: 'text.secondary' }}>{empty}</Typography>;
  return (
    <Box component="ul" sx={{ m: 0, pl: 2.5, display: 'grid', gap: 0.75 }}>
      {[...entries].sort((a, b) => a.at.localeCompare(b.at)).map((n) => (
        <li key={`${n.at}${n.by}${n.text}`}>
          <Typography>{n.text}</Typography>
          <Typography variant="body2" sx={{ color: 'text.secondary' }}>{n.by === p.userId ? 'You' : p.nameOf(n.by)}, {clubTime(n.at, p.zone)}</Typography>
        </li>
      ))}
    </Box>
  );
}

/** The trip's notes, with a box for the driver to add one. */
export function TripNotes({ trip, p, canAdd }: { trip: LocalRecord<'trip'>; p: PatrolContext; canAdd: boolean }) {
  const [text, setText] = useState('');
  const { refusal, saving, run } = useLocalSave();
  async function add() {
    if (!text.trim()) return;
    if (await run(() => addTripNote(p.ctx, trip, text))) setText('');
  }
  return (
    <Box sx={{ display: 'grid', gap: 1 }}>
      <Entries entries={trip.fields.notes} p={p} empty="No notes on this trip." />
      {canAdd && (
        <Box sx={{ display: 'grid', gridTemplateColumns: '1fr auto', gap: 1, alignItems: 'start' }}>
          <TextField label="Add a note" value={text} onChange={(e) => setText(e.target.value)} multiline slotProps={{ htmlInput: { maxLength: 2000 } }} />
          <Button variant="outlined" size="large" onClick={add} disabled={saving || !text.trim()} sx={{ minHeight: 56 }}>Add</Button>
        </Box>
      )}
      {refusal && <Alert severity="error">{refusal}</Alert>}
    </Box>
  );
}

/** Why the logged trip was changed, oldest first. */
export function EditHistory({ trip, p }: { trip: LocalRecord<'trip'>; p: PatrolContext }) {
  return <Entries entries={trip.fields.editReasons} p={p} empty="Not changed since it was logged." />;
}
