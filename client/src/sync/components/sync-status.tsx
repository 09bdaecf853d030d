import { lazy, Suspense, useEffect, useState } from 'react';
import Badge from '@mui/material/Badge';
import IconButton from '@mui/material/IconButton';
import CloudDoneOutlined from '@mui/icons-material/CloudDoneOutlined';
import CloudOffOutlined from '@mui/icons-material/CloudOffOutlined';
import CloudUploadOutlined from '@mui/icons-material/CloudUploadOutlined';
import SyncOutlined from '@mui/icons-material/SyncOutlined';
import SyncProblemOutlined from '@mui/icons-material/SyncProblemOutlined';
import { useReplica } from '@/db/hooks';
import { syncRunner } from '../index';
import type { SyncRunner } from '../runner';
import { useSyncStatus, type SyncStatus as Status } from '../status';
import { headline } from '../status-text';

// The details (and MUI's dialog) load on the first tap; the top bar needs only the icon.
const loadDetails = () => import('./sync-details-dialog');
const SyncDetailsDialog = lazy(() => loadDetails().then((m) => ({ default: m.SyncDetailsDialog })));

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
  // Once opened, the dialog stays mounted so that it closes with its transition.
  const [opened, setOpened] = useState(false);
  useEffect(() => runner.start(), [runner]);
  if (!s) return null;
  const summary = headline(s, now);
  return (
    <>
      <IconButton
        color="inherit"
        aria-label={`Sync: ${summary}`}
        onPointerDown={() => void loadDetails()}
        onClick={() => {
          setOpened(true);
          setOpen(true);
        }}
      >
        <Badge badgeContent={s.waiting + s.photosWaiting} color="secondary" max={999}>
          <StatusIcon s={s} />
        </Badge>
      </IconButton>
      {opened && (
        <Suspense fallback={null}>
          <SyncDetailsDialog open={open} onClose={() => setOpen(false)} s={s} now={now} db={db} runner={runner} />
        </Suspense>
      )}
    </>
  );
}
