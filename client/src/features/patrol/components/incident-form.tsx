import { useState } from 'react';
import Alert from '@mui/material/Alert';
import Box from '@mui/material/Box';
import Button from '@mui/material/Button';
import TextField from '@mui/material/TextField';
import ToggleButton from '@mui/material/ToggleButton';
import ToggleButtonGroup from '@mui/material/ToggleButtonGroup';
import Typography from '@mui/material/Typography';
import { INCIDENT_KINDS } from '@breakline/sync-protocol';
import { useLocalSave } from '@/lib/use-local-save';
import type { PatrolContext } from '../hooks/use-patrol-context';
import { incidentOf, type IncidentErrors, type IncidentForm as Form, type IncidentResult } from '../model/incident-draft';
import type { IncidentDraft } from '../model/writes';
import { INCIDENT_WORDS } from '../model/words';
import { HealthNotice } from './health-notice';
import { LocalTimeField } from './local-time-field';
import { PlaceField } from './place-field';
import { chosenToggle } from './toggle-style';

interface Props {
  initial: Form;
  /** The instant the time boxes started from: kept exactly while they are not changed. */
  storedAt: string;
  link: { tripId: string | null; boatId: string | null };
  p: PatrolContext;
  save: (note: IncidentDraft) => Promise<void>;
  onSaved: () => void;
}

/** An incident note: what kind, when, where, how many helped, what was done and how it ended. */
export function IncidentForm({ initial, storedAt, link, p, save, onSaved }: Props) {
  const [f, setF] = useState(initial);
  const [errors, setErrors] = useState<IncidentErrors>({});
  const [ask, setAsk] = useState<Extract<IncidentResult, { ok: false }>['ask']>();
  const { refusal, saving, run } = useLocalSave();
  const set = (patch: Partial<Form>) => setF((x) => ({ ...x, ...patch }));
  async function submit() {
    const r = incidentOf(f, link, storedAt, p.zone);
    if (!r.ok) { setErrors(r.errors); setAsk(r.ask); return; }
    setErrors({});
    setAsk(undefined);
    if (await run(() => save(r.note))) onSaved();
  }
  return (
    <Box component="form" aria-label="Incident note" onSubmit={(e) => { e.preventDefault(); void submit(); }} sx={{ display: 'grid', gap: 2 }}>
      <HealthNotice clubName={p.clubName} />
      <Box component="fieldset" sx={{ border: 0, m: 0, p: 0, display: 'grid', gap: 1 }}>
        <Typography component="legend" sx={{ fontWeight: 700, mb: 1 }}>What kind of incident</Typography>
        <ToggleButtonGroup exclusive color="primary" value={f.kind} onChange={(_, kind) => kind && set({ kind })} aria-label="Kind of incident"
          sx={{ ...chosenToggle, display: 'grid', gridTemplateColumns: '1fr 1fr', gap: 1, '& .MuiToggleButton-root': { border: 1, borderColor: 'divider', borderRadius: 1, minHeight: 52, fontWeight: 700 } }}>
          {INCIDENT_KINDS.map((k) => <ToggleButton key={k} value={k}>{INCIDENT_WORDS[k]}</ToggleButton>)}
        </ToggleButtonGroup>
        {errors.kind && <Typography sx={{ color: 'error.main' }}>{errors.kind}</Typography>}
      </Box>
      <LocalTimeField label="Incident" date={f.date} time={f.time} error={errors.time} onChange={(date, time) => set({ date, time, choice: null })}
        ask={ask} choice={f.choice} onChoose={(choice) => set({ choice })} />
      <PlaceField place={f.place} onChange={(place) => set({ place })} />
      <TextField label="People helped" value={f.peopleHelped} onChange={(e) => set({ peopleHelped: e.target.value })} error={Boolean(errors.peopleHelped)}
        helperText={errors.peopleHelped ?? 'How many people the crew helped; 0 for a near miss or an equipment failure'} slotProps={{ htmlInput: { inputMode: 'numeric' } }} />
      <TextField label="What was done" value={f.actionTaken} onChange={(e) => set({ actionTaken: e.target.value })} multiline minRows={2}
        error={Boolean(errors.actionTaken)} helperText={errors.actionTaken} slotProps={{ htmlInput: { maxLength: 4000 } }} />
      <TextField label="Outcome" value={f.outcome} onChange={(e) => set({ outcome: e.target.value })} multiline slotProps={{ htmlInput: { maxLength: 1000 } }}
        helperText="For example: walked up the beach, handed to the first aid room, taken by ambulance" />
      <TextField label="Other notes" value={f.text} onChange={(e) => set({ text: e.target.value })} multiline minRows={2} slotProps={{ htmlInput: { maxLength: 8000 } }}
        helperText="Only what is needed to understand what happened" />
      {refusal && <Alert severity="error">{refusal}</Alert>}
      <Button type="submit" variant="contained" size="large" disabled={saving} sx={{ minHeight: 56 }}>Save incident note</Button>
    </Box>
  );
}
