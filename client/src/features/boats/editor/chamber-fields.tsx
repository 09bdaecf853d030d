import Box from '@mui/material/Box';
import Button from '@mui/material/Button';
import Paper from '@mui/material/Paper';
import TextField from '@mui/material/TextField';
import Typography from '@mui/material/Typography';
import type { PressureUnit } from '@breakline/sync-protocol';
import { chamberId, type ChamberDraft, type DraftErrors } from './boat-draft';
import { PressureField } from './pressure-field';

interface Props {
  chambers: ChamberDraft[];
  unit: PressureUnit;
  errors: DraftErrors;
  onChange: (chambers: ChamberDraft[]) => void;
}

/** Each air chamber with its valve and the maker's working range, entered in the club's unit. */
export function ChamberFields({ chambers, unit, errors, onChange }: Props) {
  const set = (i: number, change: Partial<ChamberDraft>) => onChange(chambers.map((c, j) => (j === i ? { ...c, ...change } : c)));
  const add = () => onChange([...chambers, { id: chamberId('chamber', chambers.map((c) => c.id)), name: '', valve: '', min: { text: '' }, max: { text: '' } }]);
  return (
    <Box sx={{ display: 'grid', gap: 1.5 }}>
      <Typography variant="h6" component="h2">Air chambers</Typography>
      <Typography variant="body2" sx={{ color: 'text.secondary' }}>
        Working pressures come from the boat maker's specification; enter them in {unit}, the club's unit.
      </Typography>
      {chambers.map((c, i) => (
        <Paper key={c.id} variant="outlined" sx={{ p: 1.5, display: 'grid', gap: 1.5 }} aria-label={`Air chamber ${i + 1}`} component="fieldset">
          <TextField label="Air chamber name" value={c.name} onChange={(e) => set(i, { name: e.target.value })} error={Boolean(errors[`chambers.${i}.name`])} helperText={errors[`chambers.${i}.name`] ?? `Check items find it as "${c.id}"`} />
          <TextField label="Valve" value={c.valve} onChange={(e) => set(i, { valve: e.target.value })} />
          <Box sx={{ display: 'grid', gridTemplateColumns: '1fr 1fr', gap: 1 }}>
            <PressureField label="Lowest" unit={unit} value={c.min} error={errors[`chambers.${i}.min`]} onChange={(min) => set(i, { min })} />
            <PressureField label="Highest" unit={unit} value={c.max} error={errors[`chambers.${i}.max`]} onChange={(max) => set(i, { max })} />
          </Box>
          <Button color="error" onClick={() => onChange(chambers.filter((_, j) => j !== i))}>Remove this chamber</Button>
        </Paper>
      ))}
      <Button variant="outlined" onClick={add}>Add an air chamber</Button>
    </Box>
  );
}
