import { useState } from 'react';
import Box from '@mui/material/Box';
import Button from '@mui/material/Button';
import InputAdornment from '@mui/material/InputAdornment';
import TextField from '@mui/material/TextField';
import Typography from '@mui/material/Typography';
import { readingEntry } from '../model/answers';
import type { ItemProps } from './item-props';

const rangeWords = (min?: number, max?: number, unit = '') =>
  min !== undefined && max !== undefined ? `${min} to ${max} ${unit}` : min !== undefined ? `at least ${min} ${unit}` : max !== undefined ? `at most ${max} ${unit}` : null;

/** A reading in the item's own unit (not a chamber pressure), judged against the template's limits. */
export function PlainReadingItem({ item, entry, readOnly, save }: ItemProps) {
  const unit = item.unit ?? '';
  const [text, setText] = useState(typeof entry?.value === 'number' ? String(entry.value) : '');
  const [problem, setProblem] = useState<string | null>(null);
  const clean = text.trim().replace(',', '.');
  const value = clean === '' ? null : Number(clean);
  const range = rangeWords(item.min, item.max, unit);
  const live = value !== null && Number.isFinite(value) ? readingEntry(value, item.min, item.max).outcome : null;
  function submit() {
    if (value === null || !Number.isFinite(value)) return setProblem(`Enter the reading as a number${unit ? ` in ${unit}` : ''}.`);
    setProblem(null);
    void save(readingEntry(value, item.min, item.max));
  }
  return (
    <Box sx={{ display: 'grid', gap: 1 }}>
      <TextField
        label={`${item.label}${unit ? ` (${unit})` : ''}`}
        value={text}
        disabled={readOnly}
        onChange={(e) => setText(e.target.value)}
        onKeyDown={(e) => e.key === 'Enter' && submit()}
        error={Boolean(problem)}
        helperText={problem}
        slotProps={{ htmlInput: { inputMode: 'decimal' }, input: { endAdornment: unit ? <InputAdornment position="end">{unit}</InputAdornment> : undefined } }}
      />
      {range && live === null && <Typography>Acceptable: {range}</Typography>}
      {live && range && (
        <Typography role="status" sx={{ color: live === 'pass' ? 'primary.main' : 'error.main', fontWeight: 700 }}>
          {live === 'pass' ? 'In range' : 'Out of range'}: {clean} {unit} (acceptable {range})
        </Typography>
      )}
      {typeof entry?.value === 'number' && (
        <Typography sx={{ fontWeight: 700, color: entry.outcome === 'pass' ? 'primary.main' : 'error.main' }}>
          Saved: {entry.value} {unit}, {entry.outcome === 'pass' ? 'pass' : 'fail'}
        </Typography>
      )}
      <Box sx={{ display: 'grid', gridTemplateColumns: '1fr 0.5fr', gap: 1 }}>
        <Button variant="contained" size="large" disabled={readOnly} onClick={submit}>Save reading</Button>
        <Button variant={entry?.outcome === 'na' ? 'contained' : 'outlined'} color="inherit" size="large" aria-pressed={entry?.outcome === 'na'} disabled={readOnly} onClick={() => save({ outcome: 'na' })}>N/A</Button>
      </Box>
    </Box>
  );
}
