import Alert from '@mui/material/Alert';
import Box from '@mui/material/Box';
import FormControlLabel from '@mui/material/FormControlLabel';
import Radio from '@mui/material/Radio';
import RadioGroup from '@mui/material/RadioGroup';
import TextField from '@mui/material/TextField';
import type { LocalEntry } from '../model/local-entry';

interface Props {
  label: string;
  date: string;
  time: string;
  onChange: (date: string, time: string) => void;
  /** Set when the time typed happened twice or not at all: the person picks one. */
  ask?: Extract<LocalEntry, { choices: unknown }>;
  choice: string | null;
  onChoose: (instant: string) => void;
  error?: string;
}

/** A local date and time at the club; a time the clocks skipped or repeated is asked about, never guessed. */
export function LocalTimeField({ label, date, time, onChange, ask, choice, onChoose, error }: Props) {
  return (
    <Box component="fieldset" sx={{ border: 0, m: 0, p: 0, display: 'grid', gap: 1 }}>
      <Box sx={{ display: 'grid', gridTemplateColumns: '1.3fr 1fr', gap: 1 }}>
        <TextField label={`${label} date`} type="date" value={date} onChange={(e) => onChange(e.target.value, time)} slotProps={{ inputLabel: { shrink: true } }} />
        <TextField label={`${label} time`} type="time" value={time} onChange={(e) => onChange(date, e.target.value)} error={Boolean(error)} helperText={error} slotProps={{ inputLabel: { shrink: true } }} />
      </Box>
      {ask && (
        <Alert severity="warning" role="alert">
          {ask.message}
          <RadioGroup aria-label={`Which ${label.toLowerCase()} time`} value={choice ?? ''} onChange={(e) => onChoose(e.target.value)}>
            {ask.choices.map((c) => <FormControlLabel key={c.instant} value={c.instant} control={<Radio />} label={c.label} />)}
          </RadioGroup>
        </Alert>
      )}
    </Box>
  );
}
