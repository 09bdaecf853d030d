import Alert from '@mui/material/Alert';
import Button from '@mui/material/Button';
import Dialog from '@mui/material/Dialog';
import DialogActions from '@mui/material/DialogActions';
import DialogContent from '@mui/material/DialogContent';
import DialogTitle from '@mui/material/DialogTitle';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import { useState } from 'react';
import { useReplica } from '@/db/hooks';
import type { ReplicaDb } from '@/db/schema';
import type { RejectedRow } from '@/db/types';
import { resendRejected } from '@/db/resend';
import { isLocalWriteError } from '@/db/write-error';
import { STORAGE_NOT_PERSISTED } from '../persist';
import type { SyncRunner } from '../runner';
import { dismissRaised, dismissRejected, retryPhoto, type SyncStatus as Status } from '../status';
import { raisedText, rejectedTitle } from '../rejected-title';
import { useSession } from '@/features/auth/use-auth';
import { conflictsText, lastSyncText, photosWaitingText, progressText, waitingText } from '../status-text';
import { elsewhereText } from './elsewhere-text';

interface Props {
  open: boolean;
  onClose: () => void;
  s: Status;
  now: number;
  db: ReplicaDb;
  runner: SyncRunner;
}

/** The sync details behind the top bar's status: what waits, when it last synced, what went wrong. */
export function SyncDetailsDialog({ open, onClose, s, now, db, runner }: Props) {
  const ctx = useReplica();
  const { memberships } = useSession();
  /** Why a refused change could not be queued again, by its mutation id. */
  const [resendErrors, setResendErrors] = useState<Record<string, string>>({});
  const sendAgain = async (r: RejectedRow) => {
    try {
      await resendRejected(ctx, r);
      setResendErrors(({ [r.mutationId]: _gone, ...rest }) => rest);
      runner.requestSync();
    } catch (e) {
      if (!isLocalWriteError(e)) throw e;
      setResendErrors((old) => ({ ...old, [r.mutationId]: `Not sent again: ${e.message}` }));
    }
  };
  const conflicts = conflictsText(s.openConflicts);
  const photos = photosWaitingText(s.photosWaiting);
  return (
    <Dialog open={open} onClose={onClose} fullWidth maxWidth="xs" aria-labelledby="sync-title">
      <DialogTitle id="sync-title">Sync</DialogTitle>
      <DialogContent>
        <Stack spacing={1.5}>
          <Typography>{waitingText(s.waiting)}</Typography>
          {photos && <Typography>{photos}</Typography>}
          {s.waitingElsewhere.map((w) => (
            <Alert key={w.clubId} severity="warning">{elsewhereText(w.count, memberships.find((m) => m.clubId === w.clubId)?.clubName)}</Alert>
          ))}
          <Typography>{lastSyncText(s.lastSyncAt, now)}</Typography>
          {progressText(s) && <Typography role="status">{progressText(s)}</Typography>}
          {s.lastError && <Alert severity={s.lastError.reason === 'offline' ? 'info' : 'warning'}>{s.lastError.message}</Alert>}
          {conflicts && <Alert severity="info">{conflicts}. Both values are kept until one is chosen at the Review desk.</Alert>}
          {raisedText(s.raisedConflicts) && (
            <Alert
              severity="info"
              action={<Button color="inherit" size="small" onClick={() => void dismissRaised(db, ctx.clubId)}>Dismiss</Button>}
            >
              {raisedText(s.raisedConflicts)}
            </Alert>
          )}
          {s.rejected.map((r) => (
            <Alert
              key={r.mutationId}
              severity="error"
              action={(
                <Stack>
                  <Button color="inherit" size="small" onClick={() => void sendAgain(r)}>Send again</Button>
                  <Button color="inherit" size="small" onClick={() => void dismissRejected(db, r.mutationId)}>Dismiss</Button>
                </Stack>
              )}
            >
              {rejectedTitle(r)} {r.error.message}
              {resendErrors[r.mutationId] && <Typography variant="body2" sx={{ mt: 1 }}>{resendErrors[r.mutationId]}</Typography>}
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
        <Button onClick={onClose}>Close</Button>
      </DialogActions>
    </Dialog>
  );
}
