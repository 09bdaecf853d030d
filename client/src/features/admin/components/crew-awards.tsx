import { useMemo, useState } from 'react';
import Alert from '@mui/material/Alert';
import Box from '@mui/material/Box';
import Button from '@mui/material/Button';
import Chip from '@mui/material/Chip';
import CircularProgress from '@mui/material/CircularProgress';
import FormControlLabel from '@mui/material/FormControlLabel';
import Paper from '@mui/material/Paper';
import Stack from '@mui/material/Stack';
import Switch from '@mui/material/Switch';
import Table from '@mui/material/Table';
import TableBody from '@mui/material/TableBody';
import TableCell from '@mui/material/TableCell';
import TableHead from '@mui/material/TableHead';
import TableRow from '@mui/material/TableRow';
import Typography from '@mui/material/Typography';
import ErrorOutline from '@mui/icons-material/ErrorOutlineOutlined';
import FileDownloadOutlined from '@mui/icons-material/FileDownloadOutlined';
import HelpOutline from '@mui/icons-material/HelpOutlineOutlined';
import HourglassBottomOutlined from '@mui/icons-material/HourglassBottomOutlined';
import TaskAltOutlined from '@mui/icons-material/TaskAltOutlined';
import Papa from 'papaparse';
import { kindSpec, LAPSING_WITHIN_DAYS, roleAtLeast, utcToLocal } from '@breakline/sync-protocol';
import { EmptyState } from '@/components/empty-state';
import { useRecords } from '@/db/hooks';
import { useSession } from '@/features/auth/use-auth';
import { saveFile } from '@/lib/save-file';
import { awardCsvRows, awardRows, cardSummaries, countByStatus, STATUS_WORDS, type AwardRow } from '../model/awards';
import { AwardEditor } from './award-editor';

const STATE_LOOK: Record<AwardRow['status'], { icon: React.ReactElement; color: 'error' | 'warning' | 'primary' | 'default' }> = {
  expired: { icon: <ErrorOutline />, color: 'error' },
  lapsing: { icon: <HourglassBottomOutlined />, color: 'warning' },
  'not-yet-held': { icon: <HelpOutline />, color: 'default' },
  none: { icon: <HelpOutline />, color: 'default' },
  current: { icon: <TaskAltOutlined />, color: 'primary' },
};

/** "28 Oct 2023" for a local calendar date. */
function dateText(date: string | null | undefined): string {
  if (!date) return '—';
  const ms = Date.parse(`${date}T12:00:00Z`);
  return Number.isFinite(ms) ? new Intl.DateTimeFormat('en-AU', { timeZone: 'UTC', day: 'numeric', month: 'short', year: 'numeric' }).format(ms) : date;
}

function StateChip({ row }: { row: AwardRow }) {
  const look = STATE_LOOK[row.status];
  const days = row.status === 'lapsing' && row.daysLeft !== null ? (row.daysLeft === 0 ? ': last valid day' : `: ${row.daysLeft} day${row.daysLeft === 1 ? '' : 's'} left`) : '';
  return <Chip size="small" variant="outlined" icon={look.icon} color={look.color} label={`${STATUS_WORDS[row.status]}${days}`} />;
}

/** Every member's awards and whether each is current today, worst first; supervisors keep them up to date. */
export function CrewAwards() {
  const { activeClub } = useSession();
  const cards = useRecords('member');
  const today = utcToLocal(new Date(), activeClub.timeZone).date;
  const [onlyAction, setOnlyAction] = useState(false);
  const [editing, setEditing] = useState<string | null>(null);
  const mayEdit = roleAtLeast(activeClub.role, kindSpec('member').access.update);
  const rows = useMemo(() => awardRows(cards ?? [], today), [cards, today]);
  const summaries = useMemo(() => new Map(cardSummaries(cards ?? [], today).map((s) => [s.cardId, s])), [cards, today]);
  if (!cards) return <CircularProgress aria-label="Loading the member cards" />;
  if (cards.length === 0) {
    return <EmptyState title="No member cards on this computer yet">Member cards arrive with the next sync once members have joined the club.</EmptyState>;
  }
  const counts = countByStatus(rows);
  const shown = onlyAction ? rows.filter((r) => r.status === 'expired' || r.status === 'lapsing' || r.status === 'none') : rows;
  const editCard = cards.find((c) => c.id === editing);

  function exportCsv() {
    const csv = Papa.unparse(awardCsvRows(rows), { header: true });
    saveFile(new Blob([csv], { type: 'text/csv;charset=utf-8' }), `breakline-crew-awards-${today}.csv`);
  }

  return (
    <Stack spacing={2}>
      {(counts.expired > 0 || counts.lapsing > 0) && (
        <Alert severity={counts.expired > 0 ? 'error' : 'warning'}>
          {[counts.expired > 0 && `${counts.expired} award${counts.expired === 1 ? ' has' : 's have'} expired`,
            counts.lapsing > 0 && `${counts.lapsing} lapse${counts.lapsing === 1 ? 's' : ''} within ${LAPSING_WITHIN_DAYS} days`].filter(Boolean).join('; ')}.
          {' '}A member without a current award should not sign on in that role; follow the club's and the governing body's rules.
        </Alert>
      )}
      <Stack direction="row" spacing={2} sx={{ alignItems: 'center', flexWrap: 'wrap' }}>
        <Typography color="text.secondary" sx={{ flexGrow: 1 }}>
          {counts.current} current · {counts.lapsing} lapsing · {counts.expired} expired · {counts.none} member{counts.none === 1 ? '' : 's'} with none recorded
        </Typography>
        <FormControlLabel control={<Switch checked={onlyAction} onChange={(e) => setOnlyAction(e.target.checked)} />} label="Only those needing action" />
        <Button variant="outlined" startIcon={<FileDownloadOutlined />} onClick={exportCsv}>Export as CSV</Button>
      </Stack>
      <Paper variant="outlined">
        <Table size="small" aria-label="Crew awards">
          <TableHead>
            <TableRow>
              <TableCell>Member</TableCell><TableCell>Award</TableCell><TableCell>Qualifies as</TableCell>
              <TableCell>Awarded</TableCell><TableCell>Expires</TableCell><TableCell>State today</TableCell>
              <TableCell>May sign on today as</TableCell>{mayEdit && <TableCell />}
            </TableRow>
          </TableHead>
          <TableBody>
            {shown.map((r) => {
              const s = summaries.get(r.cardId);
              const roles = s ? [s.driver.current && 'driver', s.crew.current && 'crew'].filter(Boolean).join(' and ') || 'neither' : '';
              return (
                <TableRow key={`${r.cardId}-${r.award?.id ?? 'none'}`}>
                  <TableCell>{r.member}</TableCell>
                  <TableCell>{r.award?.name ?? '—'}</TableCell>
                  <TableCell>{r.award ? (r.award.qualifies === 'driver' ? 'Driver (and crew)' : 'Crew') : '—'}</TableCell>
                  <TableCell sx={{ whiteSpace: 'nowrap' }}>{dateText(r.award?.awardedOn)}</TableCell>
                  <TableCell sx={{ whiteSpace: 'nowrap' }}>{r.award ? (r.award.expiresOn ? dateText(r.award.expiresOn) : 'does not expire') : '—'}</TableCell>
                  <TableCell><StateChip row={r} /></TableCell>
                  <TableCell>{roles}</TableCell>
                  {mayEdit && (
                    <TableCell>
                      <Button size="small" sx={{ whiteSpace: 'nowrap' }} onClick={() => setEditing(r.cardId)} aria-label={`Edit the awards of ${r.member}`}>Edit awards</Button>
                    </TableCell>
                  )}
                </TableRow>
              );
            })}
          </TableBody>
        </Table>
      </Paper>
      <Box>
        <Typography variant="body2" color="text.secondary">
          Dates are the club's local dates ({activeClub.timeZone}). An award is shown as lapsing from {LAPSING_WITHIN_DAYS} days before its expiry date.
        </Typography>
      </Box>
      {editCard && (
        <AwardEditor cardId={editCard.id} member={editCard.fields.displayName} awards={editCard.fields.awards} onClose={() => setEditing(null)} />
      )}
    </Stack>
  );
}
