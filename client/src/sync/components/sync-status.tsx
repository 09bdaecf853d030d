import { useEffect, useState } from 'react';
import Alert from '@mui/material/Alert';
import Badge from '@mui/material/Badge';
import Button from '@mui/material/Button';
import Dialog from '@mui/material/Dialog';
import DialogActions from '@mui/material/DialogActions';
import DialogContent from '@mui/material/DialogContent';
import DialogTitle from '@mui/material/DialogTitle';
import IconButton from '@mui/material/IconButton';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import CloudDoneOutlined from '@mui/icons-material/CloudDoneOutlined';
import CloudOffOutlined from '@mui/icons-material/CloudOffOutlined';
import CloudUploadOutlined from '@mui/icons-material/CloudUploadOutlined';
import SyncOutlined from '@mui/icons-material/SyncOutlined';
import SyncProblemOutlined from '@mui/icons-material/SyncProblemOutlined';
import { useReplica } from '@/db/hooks';
import { syncRunner } from '../index';
import { STORAGE_NOT_PERSISTED } from '../persist';
import type { SyncRunner } from '../runner';
import { dismissRejected, retryPhoto, useSyncStatus, type SyncStatus as Status } from '../status';
import { conflictsText, headline, lastSyncText, photosWaitingText, progressText, rejectedTitle, waitingText } from '../status-text';

function StatusIcon({ s }: { s: Status }) {
  if (s.running) return <SyncOutlined />;
  if (s.lastError?.reason === 'offline') return <CloudOffOutlined />;
  if (s.lastError) return <SyncProblemOutlined />;
  return s.waiting + s.photosWaiting > 0 ? <CloudUploadOutlined /> : <CloudDoneOutlined />;
}

/** Refreshes "5 minutes ago" while the status is on screen. */
function useMinuteClock(): number {
  const [now, setNow] = useState(Date.now);
  useEffect(() => {
    const timer = setInterval(() => setNow(Date.now()), 60_000);
    return () => clearInterval(timer);
  }, []);
  return now;
}

/** The Sync status in the top bar: a word and an icon, and the details a tap away. Starts the sync runner. */
export function SyncStatus({ runner = syncRunner }: { runner?: SyncRunner }) {
  const { db, clubId } = useReplica();
  const s = useSyncStatus(db, clubId);
  const now = useMinuteClock();
  const [open, setOpen] = useState(false);
  useEffect(() => runner.start(), [runner]);
  if (!s) return null;
  const summary = headline(s, now);
  const conflicts = conflictsText(s.openConflicts);
  const photos = photosWaitingText(s.photosWaiting);
  return (
    <>
      <IconButton color="inherit" aria-label={`Sync: ${summary}`} onClick={() => setOpen(true)}>
        <Badge badgeContent={s.waiting + s.photosWaiting} color="secondary" max={999}>
          <StatusIcon s={s} />
        </Badge>
      </IconButton>
      <Dialog open={open} onClose={() => setOpen(false)} fullWidth maxWidth="xs" aria-labelledby="sync-title">
        <DialogTitle id="sync-title">Sync</DialogTitle>
        <DialogContent>
          <Stack spacing={1.5}>
            <Typography>{waitingText(s.waiting)}</Typography>
            {photos && <Typography>{photos}</Typography>}
            <Typography>{lastSyncText(s.lastSyncAt, now)}</Typography>
            {progressText(s) && <Typography role="status">{progressText(s)}</Typography>}
            {s.lastError && <Alert severity={s.lastError.reason === 'offline' ? 'info' : 'warning'}>{s.lastError.message}</Alert>}
            {conflicts && <Alert severity="info">{conflicts}. Both values are kept until one is chosen at the Review desk.</Alert>}
            {s.rejected.map((r) => (
              <Alert
                key={r.mutationId}
                severity="error"
                action={<Button color="inherit" size="small" onClick={() => void dismissRejected(db, r.mutationId)}>Dismiss</Button>}
              >
                {rejectedTitle(r)} {r.error.message}
              </Alert>
            ))}
            {s.refusedPhotos.map((p) => (
              <Alert
                key={p.sha256}
                severity="error"
                action={<Button color="inherit" size="small" onClick={() => void retryPhoto(db, p.sha256).then(() => runner.requestSync())}>Try again</Button>}
              >
                A photo was not sent. {p.problem} It stays on this phone.
              </Alert>
            ))}
            {s.storage === 'refused' && <Alert severity="warning">{STORAGE_NOT_PERSISTED}</Alert>}
          </Stack>
        </DialogContent>
        <DialogActions>
          <Button onClick={() => void runner.requestSync()} disabled={s.running}>Sync now</Button>
          <Button onClick={() => setOpen(false)}>Close</Button>
        </DialogActions>
      </Dialog>
    </>
  );
}
