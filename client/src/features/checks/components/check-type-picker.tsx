import Box from '@mui/material/Box';
import Button from '@mui/material/Button';
import { CHECK_NAMES } from './check-names';

export function CheckTypePicker({ value, onChange }: { value: 'launch' | 'stow'; onChange: (t: 'launch' | 'stow') => void }) {
  return (
    <Box role="group" aria-label="Which check" sx={{ display: 'grid', gridTemplateColumns: '1fr 1fr', gap: 1 }}>
      {(['launch', 'stow'] as const).map((t) => (
        <Button key={t} size="large" variant={value === t ? 'contained' : 'outlined'} aria-pressed={value === t} onClick={() => onChange(t)} sx={{ minHeight: 56 }}>
          {CHECK_NAMES[t]}
        </Button>
      ))}
    </Box>
  );
}
