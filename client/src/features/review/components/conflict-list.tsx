import { useState } from 'react';
import Alert from '@mui/material/Alert';
import CircularProgress from '@mui/material/CircularProgress';
import FormControlLabel from '@mui/material/FormControlLabel';
import Stack from '@mui/material/Stack';
import Switch from '@mui/material/Switch';
import Typography from '@mui/material/Typography';
import { useLiveQuery } from 'dexie-react-hooks';
import { EmptyState } from '@/components/empty-state';
import { ProblemAlert } from '@/components/problem-alert';
import { useReplica } from '@/db/hooks';
import { useConflicts } from '../api/conflicts';
import { ConflictCard } from './conflict-card';

/** Conflicts between devices, oldest first, each to be settled by a supervisor; settled ones on request. */
export function ConflictList() {
  const [showSettled, setShowSettled] = useState(false);
  const list = useConflicts(showSettled ? 'settled' : 'open');
  const { db } = useReplica();
  const deviceId = useLiveQuery(async () => {
    const row = await db.syncState.get('replica');
    return row && 'deviceId' in row ? row.deviceId : undefined;
  }, [db]);
  return (
    <Stack spacing={2}>
      <Alert severity="info">
        Two devices changed the same thing while offline. Both values are kept until you choose; your choice reaches every
        phone on its next sync. When a value is about the boat's safety, check the boat itself and follow the club's
        procedures before you decide.
      </Alert>
      <FormControlLabel
        control={<Switch checked={showSettled} onChange={(e) => setShowSettled(e.target.checked)} />}
        label="Show settled conflicts instead"
      />
      {list.error && <ProblemAlert title="The conflicts could not be loaded" error={list.error} onRetry={() => void list.refetch()} />}
      {list.isPending && <CircularProgress aria-label="Loading the conflicts" />}
      {list.data && list.data.length === 0 && (
        <EmptyState title={showSettled ? 'No settled conflicts' : 'No conflicts to settle'}>
          {showSettled ? 'Conflicts settled at the desk are listed here.' : 'When two devices change the same field offline, it shows here for you to settle.'}
        </EmptyState>
      )}
      {list.data && list.data.length > 0 && (
        <Typography color="text.secondary">
          {list.data.length} {showSettled ? 'settled' : 'open'} conflict{list.data.length === 1 ? '' : 's'}
        </Typography>
      )}
      {list.data?.map((c) => <ConflictCard key={c.id} c={c} deviceId={deviceId} />)}
    </Stack>
  );
}
