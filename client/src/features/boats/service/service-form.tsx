import { useState } from 'react';
import Alert from '@mui/material/Alert';
import Box from '@mui/material/Box';
import Button from '@mui/material/Button';
import TextField from '@mui/material/TextField';
import { useReplica } from '@/db/hooks';
import { createRecord } from '@/db/write';
import { useLocalSave } from '@/lib/use-local-save';
import { buildService, newServiceDraft, type ServiceDraft, type ServiceDraftErrors } from './service-draft';

interface Props {
  motorId: string;
  today: string;
  zone: string;
  hourMeter: number;
  last: { date: string; hours: number } | null;
  onDone: () => void;
}

/** A supervisor's entry of a service done; what was typed stays in the boxes until it is saved. */
export function ServiceForm({ motorId, today, zone, hourMeter, last, onDone }: Props) {
  const ctx = useReplica();
  const [draft, setDraft] = useState<ServiceDraft>(() => newServiceDraft(today, hourMeter));
  const [errors, setErrors] = useState<ServiceDraftErrors>({});
  const { refusal, saving, run } = useLocalSave();
  async function save() {
    const built = buildService(draft, motorId, { today, zone, last });
    setErrors(built.ok ? {} : built.errors);
    if (!built.ok) return;
    if (await run(async () => { await createRecord(ctx, 'serviceRecord', built.fields); })) onDone();
  }
  const box = (field: keyof ServiceDraft, label: string, more: { type?: string; inputMode?: 'decimal'; multiline?: boolean; helper?: string } = {}) => (
    <TextField
      label={label}
      type={more.type}
      value={draft[field]}
      multiline={more.multiline}
      minRows={more.multiline ? 2 : undefined}
      onChange={(e) => setDraft((d) => ({ ...d, [field]: e.target.value }))}
      error={Boolean(errors[field])}
      helperText={errors[field] ?? more.helper}
      slotProps={{ htmlInput: { inputMode: more.inputMode }, inputLabel: more.type === 'date' ? { shrink: true } : undefined }}
    />
  );
  return (
    <Box component="form" aria-label="Record a service" noValidate onSubmit={(e) => { e.preventDefault(); void save(); }} sx={{ display: 'grid', gap: 2 }}>
      {box('date', 'Date of the service', { type: 'date' })}
      {box('engineHours', 'Hour meter at the service (h)', { inputMode: 'decimal' })}
      {box('work', 'Work done', { multiline: true, helper: 'As the manufacturer’s service schedule lists it, e.g. gearbox oil, plugs, impeller' })}
      {box('parts', 'Parts fitted', { multiline: true, helper: 'Optional: part names or numbers and quantities' })}
      {box('performedBy', 'Done by', { helper: 'A member or an outside mechanic' })}
      {Object.keys(errors).length > 0 && <Alert severity="error">Some boxes need fixing before the service is saved.</Alert>}
      {refusal && <Alert severity="error">{refusal}</Alert>}
      <Box sx={{ display: 'flex', gap: 1, flexWrap: 'wrap' }}>
        <Button type="submit" variant="contained" size="large" disabled={saving}>Save the service</Button>
        <Button size="large" onClick={onDone}>Cancel</Button>
      </Box>
    </Box>
  );
}
