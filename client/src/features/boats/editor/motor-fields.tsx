import Box from '@mui/material/Box';
import MenuItem from '@mui/material/MenuItem';
import TextField from '@mui/material/TextField';
import type { LocalRecord } from '@/db/types';
import type { DraftErrors } from './boat-draft';
import type { MotorDraft } from './motor-draft';
import type { LoggedService } from './logged-service';
import { dayWords } from '../service/service-words';

type Key = Exclude<keyof MotorDraft, 'fuelMode' | 'storedService'>;

interface Props {
  draft: MotorDraft;
  errors: DraftErrors;
  boats: readonly LocalRecord<'boat'>[];
  logged?: LoggedService;
  set: (change: Partial<MotorDraft>) => void;
}

/**
 * Notes where the motor's own boxes are not what its service is counted from: a later service in
 * the history, or trips and services that logged the hour meter higher than the record says.
 */
function notesOf(draft: MotorDraft, logged: LoggedService | undefined): Partial<Record<Key, string>> {
  const notes: Partial<Record<Key, string>> = {};
  if (!logged) return notes;
  const typed = Number(draft.hourMeter.trim().replace(',', '.'));
  if (logged.hourMeter !== null && Number.isFinite(typed) && logged.hourMeter > typed) {
    notes.hourMeter = `Trips and services have logged up to ${logged.hourMeter.toFixed(1)} h; the due counts from that.`;
  }
  const last = logged.last;
  if (last?.recordId) {
    notes.lastServiceHours = `The service history below has a later one: ${dayWords(last.date)} at ${last.hours.toFixed(1)} h. The due counts from that; these two boxes keep a service from before the history.`;
  }
  return notes;
}

export function MotorFields({ draft, errors, boats, logged, set }: Props) {
  const notes = notesOf(draft, logged);
  const box = (field: Key, label: string, inputMode?: 'decimal' | 'numeric', type?: string) => (
    <TextField
      label={label}
      type={type}
      value={draft[field]}
      onChange={(e) => set({ [field]: e.target.value })}
      error={Boolean(errors[field])}
      helperText={errors[field] ?? notes[field]}
      slotProps={{ htmlInput: { inputMode }, inputLabel: type === 'date' ? { shrink: true } : undefined }}
    />
  );
  return (
    <Box sx={{ display: 'grid', gap: 2 }}>
      {box('serial', 'Serial number')}
      {box('model', 'Make and model')}
      {box('powerHp', 'Power (hp)', 'decimal')}
      {box('hourMeter', 'Hour meter (h)', 'decimal')}
      {box('intervalHours', 'Service every (engine hours)', 'decimal')}
      {box('intervalMonths', 'Service every (months)', 'numeric')}
      {box('lastServiceDate', 'Last service date', undefined, 'date')}
      {box('lastServiceHours', 'Hour meter at last service (h)', 'decimal')}
      <TextField select label="Fuel" value={draft.fuelMode} onChange={(e) => set({ fuelMode: e.target.value as MotorDraft['fuelMode'] })}>
        <MenuItem value="premix">Premix (oil mixed into the petrol)</MenuItem>
        <MenuItem value="oil-injection">Oil injection</MenuItem>
      </TextField>
      {draft.fuelMode === 'premix' && box('premixRatio', 'Premix ratio, petrol to oil (e.g. 50 for 50:1, from the manual)', 'decimal')}
      <TextField select label="Fitted to" value={draft.boatId} onChange={(e) => set({ boatId: e.target.value })}>
        <MenuItem value="">Not fitted (in the store)</MenuItem>
        {draft.boatId && !boats.some((b) => b.id === draft.boatId) && <MenuItem value={draft.boatId}>A boat not on this phone</MenuItem>}
        {boats.map((b) => (
          <MenuItem key={b.id} value={b.id}>
            {b.fields.fleetNumber} · {b.fields.name}
          </MenuItem>
        ))}
      </TextField>
    </Box>
  );
}
