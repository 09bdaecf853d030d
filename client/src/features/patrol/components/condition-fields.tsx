import Box from '@mui/material/Box';
import InputAdornment from '@mui/material/InputAdornment';
import MenuItem from '@mui/material/MenuItem';
import TextField from '@mui/material/TextField';
import Typography from '@mui/material/Typography';
import type { LocalRecord } from '@/db/types';
import type { PatrolContext } from '../hooks/use-patrol-context';
import { compassPoint, parseReading, parseWind, seaText, windText } from '../model/conditions';
import type { TripDraft } from '../model/trip-draft';
import { PremixLines } from './premix-lines';

const DIRECTIONS = Array.from({ length: 16 }, (_, i) => i * 22.5);

interface Props {
  draft: TripDraft;
  set: (patch: Partial<TripDraft>) => void;
  errors: Partial<Record<keyof TripDraft, string>>;
  motor: LocalRecord<'motor'> | null;
  p: PatrolContext;
}

const unitBox = (unit: string) => ({ input: { endAdornment: <InputAdornment position="end">{unit}</InputAdornment> }, htmlInput: { inputMode: 'decimal' as const } });

/** Wind, waves, engine hours and fuel, each with what it means shown as it is typed. */
export function ConditionFields({ draft, set, errors, motor, p }: Props) {
  const wind = parseWind(draft.wind, p.windUnit);
  const dir = parseReading(draft.windDirection, 'direction', { max: 359.9 });
  const wave = parseReading(draft.wave, 'wave height', { max: 30 });
  const fuel = parseReading(draft.fuel, 'fuel', { max: 500 });
  const windHint = wind.ok && wind.value !== null ? windText(wind.value, dir.ok ? dir.value : null, p.windUnit) : undefined;
  const waveHint = wave.ok && wave.value !== null ? seaText(wave.value) : undefined;
  const hours = ['hoursStart', 'hoursEnd'] as const;
  return (
    <Box sx={{ display: 'grid', gap: 2 }}>
      <Typography variant="subtitle1" component="h3" sx={{ fontWeight: 700 }}>Conditions, as you judge them</Typography>
      <Box sx={{ display: 'grid', gridTemplateColumns: '1fr 1fr', gap: 1 }}>
        <TextField label="Wind speed" value={draft.wind} onChange={(e) => set({ wind: e.target.value })} slotProps={unitBox(p.windUnit)} error={Boolean(errors.wind)} helperText={errors.wind} />
        <TextField select label="Wind from" value={draft.windDirection} onChange={(e) => set({ windDirection: e.target.value })} error={Boolean(errors.windDirection)} helperText={errors.windDirection}>
          <MenuItem value="">Not recorded</MenuItem>
          {DIRECTIONS.map((d) => <MenuItem key={d} value={String(d)}>{compassPoint(d)} ({d}°)</MenuItem>)}
          {draft.windDirection !== '' && !DIRECTIONS.map(String).includes(draft.windDirection) && <MenuItem value={draft.windDirection}>{draft.windDirection}°</MenuItem>}
        </TextField>
      </Box>
      {windHint && <Typography role="status" sx={{ fontWeight: 500 }}>{windHint}</Typography>}
      <TextField label="Wave height" value={draft.wave} onChange={(e) => set({ wave: e.target.value })} slotProps={unitBox('m')} error={Boolean(errors.wave)} helperText={errors.wave ?? waveHint ?? 'Average height of the larger waves'} />
      <Box sx={{ display: 'grid', gap: 2 }}>
        {hours.map((k) => (
          <TextField key={k} label={k === 'hoursStart' ? 'Engine hours at launch' : 'Engine hours at retrieval'} value={draft[k]} onChange={(e) => set({ [k]: e.target.value })}
            slotProps={unitBox('h')} error={Boolean(errors[k])} helperText={errors[k] ?? (k === 'hoursStart' && motor ? `Meter last read ${motor.fields.hourMeter} h` : undefined)} />
        ))}
      </Box>
      <TextField label="Fuel added" value={draft.fuel} onChange={(e) => set({ fuel: e.target.value })} slotProps={unitBox('L')} error={Boolean(errors.fuel)} helperText={errors.fuel} />
      {fuel.ok && <PremixLines litres={fuel.value} motor={motor?.fields ?? null} />}
    </Box>
  );
}
