import type { ReactNode } from 'react';
import Box from '@mui/material/Box';
import Card from '@mui/material/Card';
import CardActionArea from '@mui/material/CardActionArea';
import CardContent from '@mui/material/CardContent';
import Typography from '@mui/material/Typography';
import { Link as RouterLink } from 'react-router-dom';
import { paths } from '@/app/paths';
import type { LocalRecord } from '@/db/types';
import type { BoatReadiness } from '../readiness/adapt';
import { STATE_META } from '../state/state-meta';
import { StateBadge } from '../state/state-badge';
import { NextActionBar } from './next-action-bar';
import { ReasonList } from './reason-list';

const defectWords = (n: number) => (n === 0 ? 'No open defects' : n === 1 ? '1 open defect' : `${n} open defects`);

/** One boat on Today: its state as a word and a mark, why, its open defects, and what to do next. */
export function BoatCard(props: {
  boat: LocalRecord<'boat'>; result: BoatReadiness; openDefects: number;
  /** Another feature's part of the card, below the next action (see TodayBoard). */
  extra?: (boat: LocalRecord<'boat'>, result: BoatReadiness, boats: readonly LocalRecord<'boat'>[]) => ReactNode;
  boats?: readonly LocalRecord<'boat'>[];
}) {
  const { boat, result, openDefects } = props;
  const title = `${boat.fields.fleetNumber} · ${boat.fields.name}`;
  const colour = result.ok ? STATE_META[result.readiness.state].colour : 'error.main';
  return (
    <Card component="article" aria-label={title} variant="outlined" sx={{ borderLeft: 6, borderLeftColor: colour }}>
      <CardActionArea component={RouterLink} to={paths.boatFile.href(boat.id)}>
        <CardContent sx={{ display: 'grid', gap: 1 }}>
          <Box sx={{ display: 'flex', justifyContent: 'space-between', alignItems: 'baseline', gap: 1 }}>
            <Typography variant="h6" component="h2" sx={{ fontWeight: 700 }}>
              {title}
            </Typography>
            <Typography variant="body2" sx={{ color: openDefects ? 'error.main' : 'text.secondary', fontWeight: 700 }}>
              {defectWords(openDefects)}
            </Typography>
          </Box>
          {result.ok ? (
            <>
              <StateBadge state={result.readiness.state} />
              <ReasonList reasons={result.readiness.reasons} label={`Why ${boat.fields.name} is ${STATE_META[result.readiness.state].word.toLowerCase()}`} />
            </>
          ) : (
            <Typography sx={{ color: 'error.main' }}>{result.message} Do not launch until a supervisor has checked the boat file.</Typography>
          )}
        </CardContent>
      </CardActionArea>
      {result.ok && (
        <Box sx={{ px: 2, pb: 2 }}>
          <NextActionBar boatId={boat.id} readiness={result.readiness} />
        </Box>
      )}
      {props.extra && <Box sx={{ px: 2, pb: 2 }}>{props.extra(boat, result, props.boats ?? [boat])}</Box>}
    </Card>
  );
}
