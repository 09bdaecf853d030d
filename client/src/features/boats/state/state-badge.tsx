import Box from '@mui/material/Box';
import Typography from '@mui/material/Typography';
import type { BoatState } from '@breakline/sync-protocol';
import { STATE_META } from './state-meta';
import { StateIcon } from './state-icons';

/** A boat's state as its word and its mark together. */
export function StateBadge({ state, size = 'medium' }: { state: BoatState; size?: 'medium' | 'large' }) {
  const { word, colour } = STATE_META[state];
  const large = size === 'large';
  return (
    <Box sx={{ display: 'inline-flex', alignItems: 'center', gap: 1, color: colour }}>
      <StateIcon state={state} sx={{ fontSize: large ? 40 : 30 }} />
      <Typography component="span" sx={{ fontWeight: 700, fontSize: large ? '1.4rem' : '1.15rem', color: colour }}>
        {word}
      </Typography>
    </Box>
  );
}
