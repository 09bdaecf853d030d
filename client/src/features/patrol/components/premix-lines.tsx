import Box from '@mui/material/Box';
import Typography from '@mui/material/Typography';
import type { KindFields } from '@breakline/sync-protocol';
import { premixFor } from '../model/fuel';

/** The two-stroke oil for the fuel added, under both readings of the ratio, with the caution. */
export function PremixLines({ litres, motor }: { litres: number | null; motor: KindFields['motor'] | null }) {
  const mix = premixFor(litres, motor);
  if (!mix) return null;
  return (
    <Box component="section" aria-label="Premix oil" sx={{ display: 'grid', gap: 0.5, p: 1.5, borderRadius: 1, border: 1, borderColor: 'divider' }}>
      {mix.lines.map((l) => (
        <Box key={l.wording}>
          <Typography sx={{ fontWeight: 700 }}>{l.oil}</Typography>
          <Typography variant="body2" sx={{ color: 'text.secondary' }}>{l.wording}</Typography>
        </Box>
      ))}
      <Typography variant="body2">{mix.note}</Typography>
    </Box>
  );
}
