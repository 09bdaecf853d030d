import Box from '@mui/material/Box';
import Button from '@mui/material/Button';
import Typography from '@mui/material/Typography';
import type { LocalRecord } from '@/db/types';

/** Every boat in service as a big button. */
export function BoatPicker({ boats, value, onChange }: { boats: readonly LocalRecord<'boat'>[]; value: string | null; onChange: (id: string) => void }) {
  const shown = boats.filter((b) => b.fields.inService);
  if (shown.length === 0) return <Typography sx={{ color: 'text.secondary' }}>No boats in service on this phone. A supervisor adds them under Fleet.</Typography>;
  return (
    <Box role="group" aria-label="Which boat" sx={{ display: 'grid', gap: 1 }}>
      {shown.map((b) => (
        <Button key={b.id} size="large" variant={value === b.id ? 'contained' : 'outlined'} color="secondary" aria-pressed={value === b.id} onClick={() => onChange(b.id)} sx={{ minHeight: 56, justifyContent: 'flex-start' }}>
          {b.fields.fleetNumber} · {b.fields.name}
        </Button>
      ))}
    </Box>
  );
}
