import { useState } from 'react';
import Alert from '@mui/material/Alert';
import Box from '@mui/material/Box';
import Button from '@mui/material/Button';
import Dialog from '@mui/material/Dialog';
import DialogActions from '@mui/material/DialogActions';
import DialogContent from '@mui/material/DialogContent';
import DialogTitle from '@mui/material/DialogTitle';
import MenuItem from '@mui/material/MenuItem';
import Paper from '@mui/material/Paper';
import Stack from '@mui/material/Stack';
import TextField from '@mui/material/TextField';
import Typography from '@mui/material/Typography';
import type { MemberAward } from '@breakline/sync-protocol';
import { useReplica } from '@/db/hooks';
import { updateRecord } from '@/db/write';
import { useLocalSave } from '@/lib/use-local-save';
import { fromDrafts, toDraft, type AwardDraft } from '../model/awards';

interface Props {
  cardId: string;
  member: string;
  awards: MemberAward[];
  onClose: () => void;
}

/** A member card's awards: add, renew (a new expiry date) or remove; saved here and sent on the next sync. */
export function AwardEditor({ cardId, member, awards, onClose }: Props) {
  const ctx = useReplica();
  const [drafts, setDrafts] = useState<AwardDraft[]>(() => awards.map(toDraft));
  const [problem, setProblem] = useState<string | null>(null);
  const { refusal, saving, run } = useLocalSave();
  const set = (i: number, change: Partial<AwardDraft>) => setDrafts((ds) => ds.map((d, j) => (j === i ? { ...d, ...change } : d)));

  async function save() {
    const built = fromDrafts(drafts);
    if (!built.ok) return setProblem(built.message);
    setProblem(null);
    if (await run(() => updateRecord(ctx, 'member', cardId, { awards: built.awards }))) onClose();
  }

  return (
    <Dialog open onClose={onClose} fullWidth maxWidth="md" aria-labelledby="award-editor-title">
      <DialogTitle id="award-editor-title">Awards of {member}</DialogTitle>
      <DialogContent>
        <Typography color="text.secondary" gutterBottom>
          Enter the dates on the member's certificate. An award is valid up to and including its expiry date; leave the
          expiry empty only for an award that does not expire.
        </Typography>
        <Stack spacing={1.5} sx={{ mt: 1 }}>
          {drafts.map((d, i) => (
            <Paper key={d.id} variant="outlined" sx={{ p: 1.5 }} component="fieldset" aria-label={d.name || `Award ${i + 1}`}>
              <Box sx={{ display: 'grid', gridTemplateColumns: { xs: '1fr', md: '2fr 1fr 1fr 1fr auto' }, gap: 1.5, alignItems: 'center' }}>
                <TextField label="Award" value={d.name} onChange={(e) => set(i, { name: e.target.value })} />
                <TextField select label="Qualifies as" value={d.qualifies} onChange={(e) => set(i, { qualifies: e.target.value as AwardDraft['qualifies'] })}>
                  <MenuItem value="driver">Driver (and crew)</MenuItem>
                  <MenuItem value="crew">Crew</MenuItem>
                </TextField>
                <TextField type="date" label="Awarded on" value={d.awardedOn} onChange={(e) => set(i, { awardedOn: e.target.value })} slotProps={{ inputLabel: { shrink: true } }} />
                <TextField type="date" label="Expires on" value={d.expiresOn} onChange={(e) => set(i, { expiresOn: e.target.value })} slotProps={{ inputLabel: { shrink: true } }} />
                <Button color="error" onClick={() => setDrafts((ds) => ds.filter((_, j) => j !== i))} aria-label={`Remove ${d.name || `award ${i + 1}`}`}>
                  Remove
                </Button>
              </Box>
            </Paper>
          ))}
          <Box>
            <Button onClick={() => setDrafts((ds) => [...ds, { id: crypto.randomUUID(), name: '', qualifies: 'crew', awardedOn: '', expiresOn: '' }])}>
              Add an award
            </Button>
          </Box>
          {problem && <Alert severity="error">{problem}</Alert>}
          {refusal && <Alert severity="error">{refusal}</Alert>}
        </Stack>
      </DialogContent>
      <DialogActions>
        <Button onClick={onClose}>Cancel</Button>
        <Button variant="contained" onClick={save} disabled={saving}>Save awards</Button>
      </DialogActions>
    </Dialog>
  );
}
