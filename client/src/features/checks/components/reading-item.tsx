import { useState } from 'react';
import Box from '@mui/material/Box';
import Button from '@mui/material/Button';
import InputAdornment from '@mui/material/InputAdornment';
import TextField from '@mui/material/TextField';
import Typography from '@mui/material/Typography';
import { formatPressure } from '@breakline/sync-protocol';
import { parsePressureEntry, pressureEntryText } from '@/lib/pressure-entry';
import { pressureEntry } from '../model/answers';
import type { ItemProps } from './item-props';
import { OutcomeButtons } from './outcome-buttons';
import { PlainReadingItem } from './plain-reading-item';
import { PressureStatus } from './pressure-status';

/** A reading: an air chamber's pressure, or a value in the item's own unit. */
export function ReadingItem(props: ItemProps) {
  return props.item.chamberId ? <PressureReadingItem {...props} /> : <PlainReadingItem {...props} />;
}

/** A chamber pressure typed in the club's unit and kept in kPa, judged against the boat's range. */
function PressureReadingItem({ item, entry, unit, chamber, readOnly, save }: ItemProps) {
  const [text, setText] = useState(typeof entry?.value === 'number' ? pressureEntryText(entry.value, unit) : '');
  const [problem, setProblem] = useState<string | null>(null);
  const parsed = text.trim() ? parsePressureEntry(text, unit) : null;
  const kpa = parsed?.ok ? parsed.kpa : null;
  const range = chamber ? { minKpa: chamber.minKpa, maxKpa: chamber.maxKpa } : undefined;
  function submit(judged?: 'pass' | 'fail') {
    const entryNow = parsePressureEntry(text, unit);
    if (!entryNow.ok) return setProblem(entryNow.message);
    setProblem(null);
    void save(pressureEntry(entryNow.kpa, range, judged));
  }
  return (
    <Box sx={{ display: 'grid', gap: 1 }}>
      <TextField
        label={`${item.label} (${unit})`}
        value={text}
        disabled={readOnly}
        onChange={(e) => setText(e.target.value)}
        onKeyDown={(e) => e.key === 'Enter' && range && submit()}
        error={Boolean(problem) || parsed?.ok === false}
        helperText={problem ?? (parsed?.ok === false ? parsed.message : undefined)}
        slotProps={{ htmlInput: { inputMode: 'decimal' }, input: { endAdornment: <InputAdornment position="end">{unit}</InputAdornment> } }}
      />
      <PressureStatus kpa={kpa} chamber={chamber} unit={unit} />
      {typeof entry?.value === 'number' && (
        <Typography sx={{ fontWeight: 700, color: entry.outcome === 'pass' ? 'primary.main' : 'error.main' }}>
          Saved: {formatPressure(entry.value, unit)}, {entry.outcome === 'pass' ? 'pass' : 'fail'}
        </Typography>
      )}
      {range ? (
        <Box sx={{ display: 'grid', gridTemplateColumns: '1fr 0.5fr', gap: 1 }}>
          <Button variant="contained" size="large" disabled={readOnly} onClick={() => submit()}>Save reading</Button>
          <Button variant={entry?.outcome === 'na' ? 'contained' : 'outlined'} color="inherit" size="large" aria-pressed={entry?.outcome === 'na'} disabled={readOnly} onClick={() => save({ outcome: 'na' })}>N/A</Button>
        </Box>
      ) : (
        <OutcomeButtons value={entry?.outcome} disabled={readOnly} onChoose={(o) => (o === 'na' ? save({ outcome: 'na' }) : submit(o))} />
      )}
    </Box>
  );
}
