import Paper from '@mui/material/Paper';
import Typography from '@mui/material/Typography';
import type { LocalRecord } from '@/db/types';
import type { Fleet } from '../hooks/use-fleet-records';
import { readinessOf, type ReadinessContext } from '../readiness/adapt';
import { STATE_META } from '../state/state-meta';
import { StateBadge } from '../state/state-badge';
import { NextActionBar } from './next-action-bar';
import { ReasonList } from './reason-list';

export function BoatStatePanel({ boat, fleet, ctx }: { boat: LocalRecord<'boat'>; fleet: Fleet; ctx: ReadinessContext }) {
  const result = readinessOf(boat, fleet, ctx);
  if (!result.ok) {
    return (
      <Paper variant="outlined" sx={{ p: 2 }}>
        <Typography sx={{ color: 'error.main' }}>{result.message}</Typography>
      </Paper>
    );
  }
  const { state, reasons } = result.readiness;
  return (
    <Paper component="section" aria-label="State" variant="outlined" sx={{ p: 2, display: 'grid', gap: 1.5, borderLeft: 6, borderLeftColor: STATE_META[state].colour }}>
      <StateBadge state={state} size="large" />
      <ReasonList reasons={reasons} label={`Why ${boat.fields.name} is ${STATE_META[state].word.toLowerCase()}`} />
      <NextActionBar boatId={boat.id} readiness={result.readiness} />
    </Paper>
  );
}
