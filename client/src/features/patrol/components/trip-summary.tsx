import Box from '@mui/material/Box';
import Typography from '@mui/material/Typography';
import type { LocalRecord } from '@/db/types';
import type { PatrolContext } from '../hooks/use-patrol-context';
import { seaText, windText } from '../model/conditions';
import { namesList } from '../model/members';
import { PURPOSE_WORDS } from '../model/words';
import { PremixLines } from './premix-lines';

const hours = (n: number) => `${Number(n.toFixed(1))} h`;

/** What a trip logged, in words: purpose, who, conditions with their scales, readings and fuel. */
export function TripSummary({ trip, motor, p }: { trip: LocalRecord<'trip'>; motor: LocalRecord<'motor'> | null; p: PatrolContext }) {
  const t = trip.fields;
  const crew = t.crewIds.map((id) => (id === p.userId ? 'you' : p.nameOf(id)));
  const engine =
    t.engineHoursStart !== null && t.engineHoursEnd !== null
      ? `${t.engineHoursStart} h → ${t.engineHoursEnd} h (${hours(t.engineHoursEnd - t.engineHoursStart)} run)`
      : t.engineHoursStart !== null ? `${t.engineHoursStart} h at launch` : t.engineHoursEnd !== null ? `${t.engineHoursEnd} h at retrieval` : null;
  const rows: [string, string | null][] = [
    ['Purpose', PURPOSE_WORDS[t.purpose]],
    ['Driver', t.driverId === p.userId ? 'You' : p.nameOf(t.driverId)],
    ['Crew', crew.length ? namesList(crew) : 'none recorded'],
    ['Wind', windText(t.windSpeedKn, t.windDirectionDeg, p.windUnit)],
    ['Waves', seaText(t.waveHeightM)],
    ['Motor', motor ? `${motor.fields.model} · ${motor.fields.serial}` : null],
    ['Engine hours', engine],
    ['Fuel added', t.fuelAddedL === null ? null : `${t.fuelAddedL} L`],
  ];
  return (
    <Box sx={{ display: 'grid', gap: 1 }}>
      <Box component="dl" sx={{ m: 0, display: 'grid', gridTemplateColumns: 'max-content 1fr', columnGap: 2, rowGap: 0.75 }}>
        {rows.map(([k, v]) => (
          <Box key={k} sx={{ display: 'contents' }}>
            <Typography component="dt" sx={{ fontWeight: 700 }}>{k}</Typography>
            <Typography component="dd" sx={{ m: 0, color: v ? 'text.primary' : 'text.secondary' }}>{v ?? 'not recorded'}</Typography>
          </Box>
        ))}
      </Box>
      <PremixLines litres={t.fuelAddedL} motor={motor?.fields ?? null} />
    </Box>
  );
}
