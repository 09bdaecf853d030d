import { useState } from 'react';
import Box from '@mui/material/Box';
import Button from '@mui/material/Button';
import Typography from '@mui/material/Typography';
import { countEntry } from '../model/answers';
import type { ItemProps } from './item-props';

/** How many are in the boat against how many must be; one tap when they are all there. */
export function CountItem({ item, entry, readOnly, save }: ItemProps) {
  const required = item.required ?? 1;
  const [count, setCount] = useState(typeof entry?.value === 'number' ? entry.value : required);
  const step = (by: number) => setCount((c) => Math.max(0, c + by));
  return (
    <Box sx={{ display: 'grid', gap: 1 }}>
      <Typography variant="body2">Required: {required}</Typography>
      <Box sx={{ display: 'grid', gridTemplateColumns: '56px 1fr 56px', gap: 1, alignItems: 'center' }}>
        <Button variant="outlined" size="large" aria-label="One fewer" disabled={readOnly || count === 0} onClick={() => step(-1)}>−</Button>
        <Typography aria-live="polite" sx={{ textAlign: 'center', fontSize: '1.6rem', fontWeight: 700 }}>{count}</Typography>
        <Button variant="outlined" size="large" aria-label="One more" disabled={readOnly} onClick={() => step(1)}>+</Button>
      </Box>
      <Box sx={{ display: 'grid', gridTemplateColumns: '1fr 0.5fr', gap: 1 }}>
        <Button variant="contained" color={count >= required ? 'primary' : 'error'} size="large" disabled={readOnly} onClick={() => save(countEntry(count, required))}>
          Save count: {count} of {required}
        </Button>
        <Button variant={entry?.outcome === 'na' ? 'contained' : 'outlined'} color="inherit" size="large" aria-pressed={entry?.outcome === 'na'} disabled={readOnly} onClick={() => save({ outcome: 'na' })}>
          N/A
        </Button>
      </Box>
      {entry && entry.outcome !== 'na' && (
        <Typography sx={{ color: entry.outcome === 'pass' ? 'primary.main' : 'error.main', fontWeight: 700 }}>
          Saved: {String(entry.value)} of {required} · {entry.outcome === 'pass' ? 'Pass' : 'Fail, short'}
        </Typography>
      )}
    </Box>
  );
}
