import { useSyncExternalStore, type ReactNode } from 'react';
import Alert from '@mui/material/Alert';
import CircularProgress from '@mui/material/CircularProgress';
import Paper from '@mui/material/Paper';
import Typography from '@mui/material/Typography';
import { useLiveQuery } from 'dexie-react-hooks';
import { useReplica } from '@/db/hooks';
import { loadClubState } from '@/db/replica-state';
import { syncActivity } from '@/sync/activity';

/**
 * Holds back a screen of boat states until this phone has had the club's records once. Part of
 * a first pull is not a smaller picture but a wrong one: a boat would read fit while its
 * stand-down defect is still on a later page. (It also spares the pull a screen that re-reads
 * every record after each page.)
 */
export function FirstSyncGate({ children }: { children: ReactNode }) {
  const { db, clubId } = useReplica();
  const state = useLiveQuery(() => loadClubState(db, clubId), [db, clubId]);
  const activity = useSyncExternalStore(syncActivity.subscribe, syncActivity.getSnapshot);
  if (!state) return null;
  if (state.lastSyncAt !== undefined) return children;
  // Only while records are arriving: an attempt that fails before any page (no signal) leaves
  // the screen as it is rather than swapping it out and back on every retry.
  if (activity.running && activity.progress?.phase === 'receiving') {
    const received = activity.progress.done;
    return (
      <Paper variant="outlined" sx={{ p: 3 }} role="status">
        <Typography variant="h6" component="h2" gutterBottom>
          Getting the club's records
        </Typography>
        <Typography color="text.secondary" sx={{ mb: 2 }}>
          {received > 0 ? `${received.toLocaleString()} records on this phone so far. ` : ''}
          Boat states show once all of them are here, so no boat is shown without its defects and checks.
        </Typography>
        <CircularProgress aria-label="Getting the club's records" />
      </Paper>
    );
  }
  return (
    <>
      <Alert severity="warning" sx={{ mb: 2 }}>
        This phone has not had all of the club's records yet, so a boat's state may be missing a defect or a check.
        It fetches them by itself when there is a connection.
      </Alert>
      {children}
    </>
  );
}
