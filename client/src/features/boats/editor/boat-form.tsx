import { useState } from 'react';
import Alert from '@mui/material/Alert';
import Box from '@mui/material/Box';
import Button from '@mui/material/Button';
import FormControlLabel from '@mui/material/FormControlLabel';
import Switch from '@mui/material/Switch';
import TextField from '@mui/material/TextField';
import type { PressureUnit } from '@breakline/sync-protocol';
import { useReplica } from '@/db/hooks';
import { createRecord, updateRecord } from '@/db/write';
import { buildBoat, type BoatDraft, type DraftErrors } from './boat-draft';
import { ChamberFields } from './chamber-fields';
import { GearFields } from './gear-fields';
import { useLocalSave } from '@/lib/use-local-save';

interface Props {
  boatId: string | null;
  initial: BoatDraft;
  unit: PressureUnit;
  editable: boolean;
  onSaved: (boatId: string) => void;
}

export function BoatForm({ boatId, initial, unit, editable, onSaved }: Props) {
  const ctx = useReplica();
  const [draft, setDraft] = useState(initial);
  const [errors, setErrors] = useState<DraftErrors>({});
  const { refusal, saving, run } = useLocalSave();
  const set = (change: Partial<BoatDraft>) => setDraft((d) => ({ ...d, ...change }));
  const text = (field: 'fleetNumber' | 'name' | 'hullSerial' | 'notes', label: string, multiline = false) => (
    <TextField label={label} value={draft[field]} multiline={multiline} minRows={multiline ? 3 : undefined} onChange={(e) => set({ [field]: e.target.value })} error={Boolean(errors[field])} helperText={errors[field]} />
  );
  async function save() {
    const built = buildBoat(draft, unit);
    setErrors(built.ok ? {} : built.errors);
    if (!built.ok) return;
    let id = boatId;
    const ok = await run(async () => {
      if (id) await updateRecord(ctx, 'boat', id, built.fields);
      else id = await createRecord(ctx, 'boat', built.fields);
    });
    if (ok && id) onSaved(id);
  }
  return (
    <Box component="fieldset" disabled={!editable} sx={{ border: 0, p: 0, m: 0, display: 'grid', gap: 2 }}>
      {text('fleetNumber', 'Fleet number')}
      {text('name', 'Name')}
      {text('hullSerial', 'Hull serial')}
      <ChamberFields chambers={draft.chambers} unit={unit} errors={errors} onChange={(chambers) => set({ chambers })} />
      <GearFields gear={draft.gear} errors={errors} onChange={(gear) => set({ gear })} />
      {text('notes', 'Notes', true)}
      <FormControlLabel control={<Switch checked={draft.inService} onChange={(e) => set({ inService: e.target.checked })} />} label="In service (shown on Today)" />
      {Object.keys(errors).length > 0 && <Alert severity="error">Some boxes need fixing before the boat is saved.</Alert>}
      {refusal && <Alert severity="error">{refusal}</Alert>}
      {editable && (
        <Button variant="contained" size="large" onClick={save} disabled={saving}>
          Save boat
        </Button>
      )}
    </Box>
  );
}
