import { useState } from 'react';
import Alert from '@mui/material/Alert';
import Box from '@mui/material/Box';
import Button from '@mui/material/Button';
import CircularProgress from '@mui/material/CircularProgress';
import MenuItem from '@mui/material/MenuItem';
import TextField from '@mui/material/TextField';
import Typography from '@mui/material/Typography';
import type { DefectSeverity } from '@breakline/sync-protocol';
import { useRecords, useReplica } from '@/db/hooks';
import type { LocalRecord } from '@/db/types';
import { useLocalSave } from '@/lib/use-local-save';
import { raiseDefect } from '../model/writes';
import { PhotoPicker } from './photo-picker';
import { SeverityPicker } from './severity-picker';

/** Report a defect on its own: the boat, maybe its motor, how serious, what is wrong, photos. */
export function DefectForm(props: { boatId?: string; onSaved: (id: string) => void }) {
  const boats = useRecords('boat');
  const motors = useRecords('motor');
  if (!boats || !motors) return <CircularProgress aria-label="Loading the boats" />;
  return <DefectFormFields {...props} boats={boats} motors={motors} />;
}

interface FieldsProps {
  boatId?: string;
  onSaved: (id: string) => void;
  boats: readonly LocalRecord<'boat'>[];
  motors: readonly LocalRecord<'motor'>[];
}

function DefectFormFields({ boatId: initialBoat, onSaved, boats, motors }: FieldsProps) {
  const ctx = useReplica();
  const [boatId, setBoatId] = useState(boats.some((b) => b.id === initialBoat) ? initialBoat! : '');
  const [motorId, setMotorId] = useState('');
  const [severity, setSeverity] = useState<DefectSeverity | null>(null);
  const [description, setDescription] = useState('');
  const [photos, setPhotos] = useState<string[]>([]);
  const [errors, setErrors] = useState<Record<string, string>>({});
  const { refusal, saving, run } = useLocalSave();
  async function save() {
    const e: Record<string, string> = {};
    if (!boatId) e.boat = 'Choose the boat.';
    if (!severity) e.severity = 'Choose how serious it is.';
    if (!description.trim()) e.description = 'Say what is wrong and where on the boat.';
    setErrors(e);
    if (Object.keys(e).length > 0 || !severity) return;
    let id = '';
    if (await run(async () => void (id = await raiseDefect(ctx, { boatId, motorId: motorId || null, severity, description, photos })))) onSaved(id);
  }
  const fitted = motors.filter((m) => m.fields.boatId === boatId);
  return (
    <Box sx={{ display: 'grid', gap: 2 }}>
      <TextField select label="Boat" value={boatId} onChange={(e) => { setBoatId(e.target.value); setMotorId(''); }} error={Boolean(errors.boat)} helperText={errors.boat}>
        {boats.map((b) => <MenuItem key={b.id} value={b.id}>{b.fields.fleetNumber} · {b.fields.name}</MenuItem>)}
      </TextField>
      <TextField select label="Motor (if the fault is on the motor)" value={motorId} onChange={(e) => setMotorId(e.target.value)}>
        <MenuItem value="">Not the motor</MenuItem>
        {[...fitted, ...motors.filter((m) => !fitted.includes(m))].map((m) => <MenuItem key={m.id} value={m.id}>{m.fields.model} · {m.fields.serial}</MenuItem>)}
      </TextField>
      <SeverityPicker value={severity} onChange={setSeverity} />
      {errors.severity && <Typography sx={{ color: 'error.main' }}>{errors.severity}</Typography>}
      <TextField label="What is wrong" value={description} onChange={(e) => setDescription(e.target.value)} multiline minRows={3} error={Boolean(errors.description)} helperText={errors.description} slotProps={{ htmlInput: { maxLength: 2000 } }} />
      <PhotoPicker photos={photos} onChange={setPhotos} />
      {refusal && <Alert severity="error">{refusal}</Alert>}
      <Button variant="contained" size="large" disabled={saving} onClick={save} sx={{ minHeight: 56 }}>Save defect</Button>
    </Box>
  );
}
