import { useState } from 'react';
import Alert from '@mui/material/Alert';
import Box from '@mui/material/Box';
import Button from '@mui/material/Button';
import CircularProgress from '@mui/material/CircularProgress';
import Stack from '@mui/material/Stack';
import TextField from '@mui/material/TextField';
import Typography from '@mui/material/Typography';
import FileDownloadOutlined from '@mui/icons-material/FileDownloadOutlined';
import PictureAsPdfOutlined from '@mui/icons-material/PictureAsPdfOutlined';
import { utcToLocal } from '@breakline/sync-protocol';
import { useSearchParams } from 'react-router-dom';
import { ProblemAlert } from '@/components/problem-alert';
import { useRecords } from '@/db/hooks';
import { useSession } from '@/features/auth/use-auth';
import { saveFile } from '@/lib/save-file';
import { useSeasonFigures, useSeasonPdf, type JobState } from '../api/season';
import { figuresCsv } from '../model/figures-csv';
import { seasonRange } from '../model/range';
import { SeasonCharts } from './season-charts';

function calendarRange(from: string, to: string): string {
  const f = (d: string) => new Intl.DateTimeFormat('en-AU', { timeZone: 'UTC', day: 'numeric', month: 'short', year: 'numeric' }).format(Date.parse(`${d}T12:00:00Z`));
  return `${f(from)} to ${f(to)}`;
}

const JOB_WORDS: Record<JobState, string> = {
  queued: 'Waiting for the server to start the PDF…',
  working: 'Making the PDF…',
  done: 'The PDF is ready; your browser is saving it.',
  failed: 'The PDF could not be made.',
};

/** The Season report: figures and charts for chosen dates, a CSV of them, and a PDF for the committee. */
export function SeasonReport() {
  const { activeClub } = useSession();
  const today = utcToLocal(new Date(), activeClub.timeZone).date;
  const [search, setSearch] = useSearchParams();
  const { from, to, problem } = seasonRange(search, today);
  const figures = useSeasonFigures(from, to, !problem);
  const boats = useRecords('boat');
  const boatName = (id: string) => {
    const b = boats?.find((x) => x.id === id);
    return b ? `${b.fields.fleetNumber} ${b.fields.name}` : `boat …${id.slice(-6)}`;
  };
  const [job, setJob] = useState<JobState | null>(null);
  const pdf = useSeasonPdf(setJob);
  const setRange = (change: { from?: string; to?: string }) => {
    const next = { from, to, ...change };
    if (next.from && next.to) setSearch(next, { replace: true });
  };

  return (
    <Stack spacing={2}>
      <Stack direction="row" spacing={1.5} sx={{ flexWrap: 'wrap', alignItems: 'flex-start', rowGap: 1.5 }}>
        <TextField size="small" type="date" label="From" value={from} onChange={(e) => setRange({ from: e.target.value })} slotProps={{ inputLabel: { shrink: true } }} error={Boolean(problem)} />
        <TextField
          size="small" type="date" label="To" value={to} onChange={(e) => setRange({ to: e.target.value })} slotProps={{ inputLabel: { shrink: true } }}
          error={Boolean(problem)} helperText={problem ?? undefined}
        />
        <Box sx={{ flexGrow: 1, alignSelf: 'center' }}>
          <Typography variant="body2" color="text.secondary">{calendarRange(from, to)}, both days included</Typography>
          <Typography variant="body2" color="text.secondary">Local dates at the club ({activeClub.timeZone})</Typography>
        </Box>
        <Stack direction="row" spacing={1} sx={{ flexShrink: 0 }}>
          <Button
            variant="outlined" startIcon={<FileDownloadOutlined />} disabled={!figures.data}
            onClick={() => figures.data && saveFile(new Blob([figuresCsv(figures.data, boatName)], { type: 'text/csv;charset=utf-8' }), `breakline-season-figures-${from}-to-${to}.csv`)}
          >
            Figures as CSV
          </Button>
          <Button
            variant="contained" startIcon={<PictureAsPdfOutlined />} disabled={pdf.isPending || Boolean(problem)}
            onClick={() => { setJob(null); pdf.mutate({ from, to }); }}
          >
            {pdf.isPending ? 'Making the PDF…' : 'PDF for the committee'}
          </Button>
        </Stack>
      </Stack>
      {pdf.isPending && job && <Alert severity="info" icon={<CircularProgress size={20} />}>{JOB_WORDS[job]}</Alert>}
      {pdf.isSuccess && <Alert severity="success">{JOB_WORDS.done}</Alert>}
      {pdf.error && <ProblemAlert title="No PDF this time" error={pdf.error} onRetry={() => pdf.mutate({ from, to })} />}
      {figures.error && <ProblemAlert title="The season's figures could not be loaded" error={figures.error} onRetry={() => void figures.refetch()} />}
      {figures.isPending && !problem && <CircularProgress aria-label="Loading the season's figures" />}
      {figures.data && <SeasonCharts f={figures.data} boatName={boatName} />}
      <Typography variant="body2" color="text.secondary">
        These figures come from the records the club's devices have synced. They do not replace the reports your
        governing body requires.
      </Typography>
    </Stack>
  );
}
