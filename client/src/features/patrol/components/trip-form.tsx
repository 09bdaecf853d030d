import { useState } from 'react';
import Alert from '@mui/material/Alert';
import Box from '@mui/material/Box';
import Button from '@mui/material/Button';
import MenuItem from '@mui/material/MenuItem';
import TextField from '@mui/material/TextField';
import { TRIP_PURPOSES } from '@breakline/sync-protocol';
import type { LocalRecord } from '@/db/types';
import { useLocalSave } from '@/lib/use-local-save';
import type { PatrolContext } from '../hooks/use-patrol-context';
import { draftOf, reasonLine, tripChanges, type TimeField, type TripDraft } from '../model/trip-draft';
import type { LocalEntry } from '../model/local-entry';
import { saveTrip } from '../model/writes';
import { PURPOSE_WORDS } from '../model/words';
import { ConditionFields } from './condition-fields';
import { CrewPicker } from './crew-picker';
import { LocalTimeField } from './local-time-field';

interface Props {
  trip: LocalRecord<'trip'>;
  motor: LocalRecord<'motor'> | null;
  p: PatrolContext;
  onDone: () => void;
}

type Asks = Partial<Record<TimeField, Extract<LocalEntry, { choices: unknown }>>>;

/** The driver's form for a trip: times, purpose, who, conditions, readings. A logged trip's change keeps its reason. */
export function TripForm({ trip, motor, p, onDone }: Props) {
  const [draft, setDraft] = useState<TripDraft>(() => draftOf(trip.fields, p.zone, p.windUnit));
  const [reason, setReason] = useState('');
  const [errors, setErrors] = useState<Partial<Record<keyof TripDraft | 'reason', string>>>({});
  const [ask, setAsk] = useState<Asks>({});
  const { refusal, saving, run } = useLocalSave();
  const set = (patch: Partial<TripDraft>) => setDraft((d) => ({ ...d, ...patch }));
  const logged = trip.fields.retrievedAt !== null;

  async function save() {
    const r = tripChanges(draft, trip.fields, p.zone, p.windUnit);
    if (!r.ok) { setErrors(r.errors); setAsk(r.ask); return; }
    setAsk({});
    if (r.changed.length === 0) { onDone(); return; }
    if (r.needsReason && !reason.trim()) { setErrors({ reason: 'Say why this logged trip is being changed; the reason is kept with the trip.' }); return; }
    setErrors({});
    const why = r.needsReason ? reasonLine(reason, r.changed) : null;
    if (await run(() => saveTrip(p.ctx, trip, r.patch, why, motor))) onDone();
  }

  return (
    <Box component="form" aria-label="Edit trip" onSubmit={(e) => { e.preventDefault(); void save(); }} sx={{ display: 'grid', gap: 2 }}>
      <TextField select label="Purpose" value={draft.purpose} onChange={(e) => set({ purpose: e.target.value as TripDraft['purpose'] })}>
        {TRIP_PURPOSES.map((x) => <MenuItem key={x} value={x}>{PURPOSE_WORDS[x]}</MenuItem>)}
      </TextField>
      <LocalTimeField label="Launch" date={draft.launchDate} time={draft.launchTime} error={errors.launchTime}
        onChange={(launchDate, launchTime) => set({ launchDate, launchTime, launchChoice: null })}
        ask={ask.launch} choice={draft.launchChoice} onChoose={(launchChoice) => set({ launchChoice })} />
      <LocalTimeField label="Retrieval" date={draft.retrievalDate} time={draft.retrievalTime} error={errors.retrievalTime}
        onChange={(retrievalDate, retrievalTime) => set({ retrievalDate, retrievalTime, retrievalChoice: null })}
        ask={ask.retrieval} choice={draft.retrievalChoice} onChoose={(retrievalChoice) => set({ retrievalChoice })} />
      <CrewPicker driverId={draft.driverId} crewIds={draft.crewIds} p={p} onChange={(driverId, crewIds) => set({ driverId, crewIds })} />
      <ConditionFields draft={draft} set={set} errors={errors} motor={motor} p={p} />
      {(logged || reason || errors.reason) && (
        <TextField label={logged ? 'Reason for the change (kept with the trip)' : 'Reason for the change, if you changed a time'} value={reason}
          onChange={(e) => setReason(e.target.value)} multiline minRows={2} error={Boolean(errors.reason)} helperText={errors.reason}
          slotProps={{ htmlInput: { maxLength: 1500 } }} />
      )}
      {refusal && <Alert severity="error">{refusal}</Alert>}
      <Box sx={{ display: 'grid', gridTemplateColumns: '1fr 2fr', gap: 1 }}>
        <Button size="large" onClick={onDone}>Cancel</Button>
        <Button type="submit" variant="contained" size="large" disabled={saving} sx={{ minHeight: 56 }}>Save trip</Button>
      </Box>
    </Box>
  );
}
