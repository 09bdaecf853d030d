import { useState } from 'react';
import Alert from '@mui/material/Alert';
import Box from '@mui/material/Box';
import Button from '@mui/material/Button';
import Link from '@mui/material/Link';
import Paper from '@mui/material/Paper';
import Stack from '@mui/material/Stack';
import Table from '@mui/material/Table';
import TableBody from '@mui/material/TableBody';
import TableCell from '@mui/material/TableCell';
import TableHead from '@mui/material/TableHead';
import TableRow from '@mui/material/TableRow';
import TextField from '@mui/material/TextField';
import Typography from '@mui/material/Typography';
import { addDays, utcToLocal } from '@breakline/sync-protocol';
import { Link as RouterLink, useSearchParams } from 'react-router-dom';
import { paths } from '@/app/paths';
import { ProblemAlert } from '@/components/problem-alert';
import { useRecords, useReplica } from '@/db/hooks';
import { isLocalWriteError } from '@/db/write-error';
import { useSession } from '@/features/auth/use-auth';
import { useDeskList, type DeskRow } from '../api/desk-list';
import { useLocalCopies } from '../hooks/use-local-copies';
import { useNames } from '../hooks/use-names';
import { calendarDate, CHECK_TYPE_WORDS, clubTime, duration, DEFECT_STATUS_WORDS, minutesText, PURPOSE_WORDS } from '../model/format';
import type { DeskQuery } from '../model/desk-query';
import { signOffBlock, signOffCheck, signOffDay } from '../model/sign-off';

const DATE = /^\d{4}-\d{2}-\d{2}$/;
const SEVERITY_WORDS: Record<string, string> = { 'stand-down': 'Stand-down', limit: 'Limit', note: 'Note' };

function dayQuery(tab: DeskQuery['tab'], date: string): DeskQuery {
  return { tab, from: date, to: date, page: 0, pageSize: 100, sort: tab === 'checks' ? 'startedAt' : tab === 'trips' ? 'launchedAt' : 'reportedAt', dir: 'asc' };
}

const failed = (row: DeskRow) =>
  Object.values((row.results ?? {}) as Record<string, { outcome?: string }>).filter((r) => r?.outcome === 'fail').length;

/** A day at the club: its checks to sign off, its trips and defects, and the entry that closes its log. */
export function DayLog() {
  const { activeClub } = useSession();
  const ctx = useReplica();
  const names = useNames();
  const [search, setSearch] = useSearchParams();
  const today = utcToLocal(new Date(), activeClub.timeZone).date;
  const asked = search.get('date');
  const date = asked && DATE.test(asked) ? asked : today;
  const go = (d: string) => setSearch(d === today ? {} : { date: d }, { replace: true });
  const checks = useDeskList(dayQuery('checks', date));
  const trips = useDeskList(dayQuery('trips', date));
  const defects = useDeskList(dayQuery('defects', date));
  const checkRows = checks.data?.rows ?? [];
  const locals = useLocalCopies('check', checkRows.map((r) => r.id));
  const signOffs = (useRecords('daySignOff') ?? []).filter((s) => s.fields.sessionDate === date);
  const clubSignOff = signOffs.find((s) => s.fields.boatId === null);
  const [note, setNote] = useState('');
  const [refusal, setRefusal] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);

  const shown = checkRows.map((r) => {
    const l = locals?.get(r.id);
    return l ? { ...r, status: l.fields.status, signedOffBy: l.fields.signedOffBy, signedOffAt: l.fields.signedOffAt } : r;
  });
  const toSign = shown.filter((r) => r.status === 'complete' && !r.signedOffAt);
  // Only checks this computer holds can be signed here; the rest arrive with the next sync.
  const signable = locals ? toSign.filter((r) => signOffBlock(locals.get(r.id)) === null) : [];
  const minutes = (trips.data?.rows ?? []).reduce((sum, t) => {
    const d = typeof t.launchedAt === 'string' && typeof t.retrievedAt === 'string' ? (Date.parse(t.retrievedAt) - Date.parse(t.launchedAt)) / 60_000 : 0;
    return sum + (d > 0 ? d : 0);
  }, 0);
  const afloat = (trips.data?.rows ?? []).filter((t) => !t.retrievedAt).length;
  const openStandDown = (defects.data?.rows ?? []).filter((d) => d.severity === 'stand-down' && ['open', 'assigned', 'repaired'].includes(String(d.status))).length;

  async function run(work: () => Promise<unknown>) {
    setRefusal(null);
    setBusy(true);
    try {
      await work();
    } catch (e) {
      if (!isLocalWriteError(e)) throw e;
      setRefusal(e.message);
    } finally {
      setBusy(false);
    }
  }
  const signAll = () => run(async () => {
    for (const r of signable) await signOffCheck(ctx, locals?.get(r.id));
  });
  const loadError = checks.error ?? trips.error ?? defects.error;

  return (
    <Stack spacing={2}>
      <Stack direction="row" spacing={1} sx={{ alignItems: 'center', flexWrap: 'wrap' }}>
        <Button onClick={() => go(addDays(date, -1))}>Day before</Button>
        <TextField size="small" type="date" label="Day" value={date} onChange={(e) => DATE.test(e.target.value) && go(e.target.value)} slotProps={{ inputLabel: { shrink: true } }} />
        <Button onClick={() => go(addDays(date, 1))} disabled={date >= today}>Day after</Button>
        <Typography variant="h6" component="h2" sx={{ pl: 1 }}>{calendarDate(date)}{date === today ? ' (today)' : ''}</Typography>
      </Stack>
      {loadError && <ProblemAlert title="The day's records could not be loaded" error={loadError} onRetry={() => { void checks.refetch(); void trips.refetch(); void defects.refetch(); }} />}
      {refusal && <Alert severity="warning" onClose={() => setRefusal(null)}>{refusal}</Alert>}

      <Paper variant="outlined" sx={{ p: 2 }}>
        <Stack direction="row" sx={{ alignItems: 'center', mb: 1 }}>
          <Typography variant="h6" component="h3" sx={{ flexGrow: 1 }}>Checks ({shown.length})</Typography>
          {signable.length > 1 && (
            <Button variant="outlined" onClick={signAll} disabled={busy}>
              Sign off all {signable.length} completed checks
            </Button>
          )}
        </Stack>
        {shown.length === 0 ? <Typography color="text.secondary">No checks on this day have reached the server.</Typography> : (
          <Table size="small" aria-label="Checks of the day">
            <TableHead>
              <TableRow><TableCell>Started</TableCell><TableCell>Boat</TableCell><TableCell>Check</TableCell><TableCell>Done by</TableCell><TableCell>Failed items</TableCell><TableCell>Sign-off</TableCell></TableRow>
            </TableHead>
            <TableBody>
              {shown.map((r) => {
                const block = signOffBlock(locals?.get(r.id));
                const n = failed(r);
                return (
                  <TableRow key={r.id}>
                    <TableCell><Link component={RouterLink} to={paths.deskRecord.href('check', r.id)}>{clubTime(r.startedAt, activeClub.timeZone)}</Link></TableCell>
                    <TableCell>{names.boat(r.boatId)}</TableCell>
                    <TableCell>{CHECK_TYPE_WORDS[String(r.checkType)] ?? String(r.checkType)}</TableCell>
                    <TableCell>{names.member(r.performedBy)}</TableCell>
                    <TableCell sx={n > 0 ? { color: 'error.main', fontWeight: 700 } : undefined}>{n > 0 ? `${n} failed: read before signing` : 'none'}</TableCell>
                    <TableCell>
                      {r.signedOffAt ? `Signed off by ${names.member(r.signedOffBy)}, ${clubTime(r.signedOffAt, activeClub.timeZone)}`
                        : r.status !== 'complete' ? 'In progress'
                          : locals && block ? (
                            <Typography variant="body2" color="text.secondary">Not on this computer yet: sync, then sign off</Typography>
                          ) : (
                            <Button size="small" variant="outlined" disabled={busy || !locals}
                              onClick={() => run(() => signOffCheck(ctx, locals?.get(r.id)))}>
                              Sign off
                            </Button>
                          )}
                    </TableCell>
                  </TableRow>
                );
              })}
            </TableBody>
          </Table>
        )}
      </Paper>

      <Stack direction={{ xs: 'column', md: 'row' }} spacing={2}>
        <Paper variant="outlined" sx={{ p: 2, flex: 1 }}>
          <Typography variant="h6" component="h3">Trips ({trips.data?.rows.length ?? 0})</Typography>
          <Typography color="text.secondary" gutterBottom>
            {minutesText(minutes)} on the water{afloat > 0 ? `; ${afloat} boat${afloat === 1 ? '' : 's'} still on the water` : ''}
          </Typography>
          {(trips.data?.rows ?? []).map((t) => (
            <Typography key={t.id} variant="body2">
              <Link component={RouterLink} to={paths.deskRecord.href('trip', t.id)}>{clubTime(t.launchedAt, activeClub.timeZone)}</Link>
              {' '}· {names.boat(t.boatId)} · {PURPOSE_WORDS[String(t.purpose)] ?? String(t.purpose)} · {duration(t.launchedAt, t.retrievedAt) ?? 'on the water'}
            </Typography>
          ))}
        </Paper>
        <Paper variant="outlined" sx={{ p: 2, flex: 1 }}>
          <Typography variant="h6" component="h3">Defects raised ({defects.data?.rows.length ?? 0})</Typography>
          {openStandDown > 0 && (
            <Alert severity="error" sx={{ my: 1 }}>
              {openStandDown} stand-down defect{openStandDown === 1 ? ' is' : 's are'} still open: that boat is not to be launched until a competent person returns it to service.
            </Alert>
          )}
          {(defects.data?.rows ?? []).map((d) => (
            <Typography key={d.id} variant="body2">
              <Link component={RouterLink} to={paths.deskRecord.href('defect', d.id)}>{String(d.description ?? 'Defect')}</Link>
              {' '}· {names.boat(d.boatId)} · {SEVERITY_WORDS[String(d.severity)] ?? String(d.severity)} · {DEFECT_STATUS_WORDS[String(d.status)] ?? String(d.status)}
            </Typography>
          ))}
        </Paper>
      </Stack>

      <Paper variant="outlined" sx={{ p: 2 }}>
        <Typography variant="h6" component="h3" gutterBottom>Day's sign-off</Typography>
        {signOffs.length === 0 && <Typography color="text.secondary" gutterBottom>Nobody has closed this day's log yet.</Typography>}
        {signOffs.map((s) => (
          <Typography key={s.id} gutterBottom>
            {s.fields.boatId ? names.boat(s.fields.boatId) : 'Whole club'}: signed off by <b>{names.member(s.fields.signedOffBy)}</b>, {clubTime(s.fields.signedOffAt, activeClub.timeZone)}
            {s.fields.note ? ` — ${s.fields.note}` : ''}{s.waiting > 0 ? ' (waiting to sync)' : ''}
          </Typography>
        ))}
        {!clubSignOff && (
          <Stack spacing={1.5} sx={{ mt: 1 }}>
            {toSign.length > 0 && <Alert severity="info">{toSign.length} completed check{toSign.length === 1 ? ' is' : 's are'} not signed off yet. You can still close the day; they stay on the list.</Alert>}
            <TextField label="Note for the day's log (optional)" value={note} onChange={(e) => setNote(e.target.value)} multiline minRows={2} slotProps={{ htmlInput: { maxLength: 2000 } }} />
            <Box>
              <Button variant="contained" disabled={busy} onClick={() => run(async () => { await signOffDay(ctx, { sessionDate: date, boatId: null, note }); setNote(''); })}>
                Sign off the day's log
              </Button>
            </Box>
          </Stack>
        )}
      </Paper>
    </Stack>
  );
}
