import { useSyncExternalStore, type ReactNode } from 'react';
import Alert from '@mui/material/Alert';
import Box from '@mui/material/Box';
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
  // The bar moves a page at a time and is still in between: an endless animation here would
  // take a slow phone's processor from the very writes it waits on.
  if (activity.running && activity.progress?.phase === 'receiving') {
    const { done, total } = activity.progress;
    const count = total === undefined
      ? `${done.toLocaleString('en')} records on this phone so far.`
      : `${done.toLocaleString('en')} of about ${total.toLocaleString('en')} records on this phone.`;
    return (
      <Paper variant="outlined" sx={{ p: 3 }} role="status">
        <Typography variant="h6" component="h2" gutterBottom>
          Getting the club's records
        </Typography>
        <Typography color="text.secondary" sx={{ mb: 2 }}>
          {done > 0 || total !== undefined ? `${count} ` : ''}
          Boat states show once all of them are here, so no boat is shown without its defects and checks.
        </Typography>
        {total !== undefined && total > 0 && (
          <Box
            role="progressbar" aria-label="Records received" aria-valuemin={0} aria-valuemax={total} aria-valuenow={Math.min(done, total)}
            sx={{ height: 8, borderRadius: 4, bgcolor: 'action.selected', overflow: 'hidden' }}
          >
            <Box sx={{ height: '100%', width: `${Math.min(100, (done / total) * 100)}%`, bgcolor: 'primary.main' }} />
          </Box>
        )}
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
