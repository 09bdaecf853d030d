import InputAdornment from '@mui/material/InputAdornment';
import TextField from '@mui/material/TextField';
import type { PressureUnit } from '@breakline/sync-protocol';
import type { PressureDraft } from './pressure-draft';

/** A pressure typed in the club's unit; the number pad opens on a phone. */
export function PressureField(props: { label: string; unit: PressureUnit; value: PressureDraft; error?: string; onChange: (d: PressureDraft) => void }) {
  const { label, unit, value, error, onChange } = props;
  return (
    <TextField
      label={`${label} (${unit})`}
      value={value.text}
      onChange={(e) => onChange({ ...value, text: e.target.value })}
      error={Boolean(error)}
      helperText={error}
      slotProps={{ htmlInput: { inputMode: 'decimal' }, input: { endAdornment: <InputAdornment position="end">{unit}</InputAdornment> } }}
    />
  );
}
