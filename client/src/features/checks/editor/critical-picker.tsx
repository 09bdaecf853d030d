import Box from '@mui/material/Box';
import Button from '@mui/material/Button';

/** Critical or minor, said as what a failure does to the boat. */
export function CriticalPicker({ value, onChange }: { value: boolean; onChange: (critical: boolean) => void }) {
  const choice = (critical: boolean, label: string) => (
    <Button
      size="large"
      variant={value === critical ? 'contained' : 'outlined'}
      color={critical ? 'error' : 'secondary'}
      aria-pressed={value === critical}
      onClick={() => onChange(critical)}
      sx={{ minHeight: 56, justifyContent: 'flex-start', textAlign: 'left' }}
    >
      {label}
    </Button>
  );
  return (
    <Box role="group" aria-label="If it fails" sx={{ display: 'grid', gridTemplateColumns: { xs: '1fr', sm: '1fr 1fr' }, gap: 1 }}>
      {choice(true, 'Critical: a failure stands the boat down')}
      {choice(false, 'Minor: a failure limits the boat')}
    </Box>
  );
}
