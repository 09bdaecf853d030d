import Box from '@mui/material/Box';
import Paper from '@mui/material/Paper';
import Table from '@mui/material/Table';
import TableBody from '@mui/material/TableBody';
import TableCell from '@mui/material/TableCell';
import TableHead from '@mui/material/TableHead';
import TableRow from '@mui/material/TableRow';
import Typography from '@mui/material/Typography';
import { BarChart } from '@mui/x-charts/BarChart';
import { TRIP_PURPOSES } from '@breakline/sync-protocol';
import type { SeasonReportView } from '../api/season';
import { boatLabel, boatsWithHours, hoursText, tenth, weekLabel } from '../model/chart-data';

const PURPOSE_WORDS: Record<string, string> = {
  patrol: 'Patrol', training: 'Training', rescue: 'Rescue', search: 'Search', 'preventive-action': 'Preventive action',
  'event-support': 'Event support', 'maintenance-run': 'Maintenance run',
};

// Our own sand-and-ocean series colours, distinct in hue and lightness so neighbouring bars part.
const SERIES = ['#0B6E6A', '#1F6FB2', '#C7882B', '#6B4E9B', '#B93A2B', '#2E7D32', '#0E2A47', '#8A6D3B'];

function Card({ title, caption, children }: { title: string; caption?: string; children: React.ReactNode }) {
  return (
    <Paper variant="outlined" sx={{ p: 2, minWidth: 0 }} component="section" aria-label={title}>
      <Typography variant="h6" component="h2">{title}</Typography>
      {caption && <Typography variant="body2" color="text.secondary" gutterBottom>{caption}</Typography>}
      {children}
    </Paper>
  );
}

function Figure({ label, value, note }: { label: string; value: string; note?: string }) {
  return (
    <Paper variant="outlined" sx={{ p: 2 }}>
      <Typography color="text.secondary">{label}</Typography>
      <Typography variant="h4" component="p" sx={{ fontWeight: 700 }}>{value}</Typography>
      {note && <Typography variant="body2" color="text.secondary">{note}</Typography>}
    </Paper>
  );
}

/** The season's figures: headline numbers, then a chart and its numbers for each question the committee asks. */
export function SeasonCharts({ f, boatName }: { f: SeasonReportView; boatName: (id: string) => string }) {
  const boats = boatsWithHours(f);
  const weekly = f.defects.weekly;
  return (
    <Box sx={{ display: 'grid', gap: 2 }}>
      <Box sx={{ display: 'grid', gap: 2, gridTemplateColumns: { xs: '1fr 1fr', md: 'repeat(5, 1fr)' } }}>
        <Figure label="Trips" value={String(f.trips.total)} note={f.trips.open > 0 ? `${f.trips.open} not yet retrieved, left out of the hours` : undefined} />
        <Figure label="Hours on the water" value={String(tenth(f.hoursOnWater.total))} />
        <Figure label="Rescues" value={String(f.rescues.incidents)} note={`${f.rescues.persons} people`} />
        <Figure label="Assists" value={String(f.assists.incidents)} note={`${f.assists.persons} people`} />
        <Figure label="Median time, report to repair" value={hoursText(f.defects.medianHoursToRepair)} note={`over ${f.defects.repairedCount} repaired defect${f.defects.repairedCount === 1 ? '' : 's'}`} />
      </Box>

      <Card title="Hours on the water per boat, by week" caption="Each colour is one boat, stacked. Weeks start on Monday; a trip counts in the week it launched.">
        {boats.length === 0 ? <Typography color="text.secondary">No retrieved trips in these dates.</Typography> : (
          <BarChart
            height={320}
            xAxis={[{ scaleType: 'band', data: f.weeks.map(weekLabel), label: 'Week starting' }]}
            yAxis={[{ label: 'Hours' }]}
            series={boats.map((b, i) => ({
              id: b.boatId, label: boatLabel(b, boatName), stack: 'hours', color: SERIES[i % SERIES.length],
              data: b.weekly.map(tenth), valueFormatter: (v: number | null) => `${v ?? 0} h`,
            }))}
          />
        )}
        <Table size="small" aria-label="Hours on the water per boat">
          <TableHead><TableRow><TableCell>Boat</TableCell><TableCell align="right">Hours in these dates</TableCell></TableRow></TableHead>
          <TableBody>
            {f.hoursOnWater.byBoat.map((b) => <TableRow key={b.boatId}><TableCell>{boatLabel(b, boatName)}</TableCell><TableCell align="right">{tenth(b.totalHours)}</TableCell></TableRow>)}
          </TableBody>
        </Table>
      </Card>

      <Box sx={{ display: 'grid', gap: 2, gridTemplateColumns: { xs: '1fr', md: '1fr 1fr' } }}>
        <Card title="Trips by purpose">
          <BarChart
            height={300}
            layout="horizontal"
            yAxis={[{ scaleType: 'band', data: TRIP_PURPOSES.map((p) => PURPOSE_WORDS[p]), width: 130 }]}
            xAxis={[{ label: 'Trips', tickMinStep: 1 }]}
            series={[{ data: TRIP_PURPOSES.map((p) => f.trips.byPurpose[p]), label: 'Trips', color: SERIES[0] }]}
            hideLegend
          />
          <Table size="small" aria-label="Trips by purpose">
            <TableBody>
              {TRIP_PURPOSES.map((p) => <TableRow key={p}><TableCell>{PURPOSE_WORDS[p]}</TableCell><TableCell align="right">{f.trips.byPurpose[p]}</TableCell></TableRow>)}
            </TableBody>
          </Table>
        </Card>
        <Card title="Defects raised and returned to service, by week" caption="A return to service counts in the week a supervisor verified the repair, whenever the defect was raised.">
          <BarChart
            height={300}
            xAxis={[{ scaleType: 'band', data: weekly.map((w) => weekLabel(w.week)), label: 'Week starting' }]}
            yAxis={[{ label: 'Defects', tickMinStep: 1 }]}
            series={[
              { data: weekly.map((w) => w.raised), label: 'Raised', color: SERIES[4] },
              { data: weekly.map((w) => w.returnedToService), label: 'Returned to service', color: SERIES[0] },
            ]}
          />
          <Table size="small" aria-label="Defects">
            <TableBody>
              <TableRow><TableCell>Raised in these dates</TableCell><TableCell align="right">{f.defects.raised}</TableCell></TableRow>
              <TableRow><TableCell>Of those, closed (verified or rejected)</TableCell><TableCell align="right">{f.defects.closed}</TableCell></TableRow>
              <TableRow><TableCell>Median time from report to repair</TableCell><TableCell align="right">{hoursText(f.defects.medianHoursToRepair)}</TableCell></TableRow>
            </TableBody>
          </Table>
        </Card>
      </Box>
    </Box>
  );
}
