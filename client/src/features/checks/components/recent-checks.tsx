import List from '@mui/material/List';
import Paper from '@mui/material/Paper';
import Typography from '@mui/material/Typography';
import { useRecords } from '@/db/hooks';
import { useSession } from '@/features/auth/use-auth';
import { newestFirst } from '../model/order';
import { CheckRow } from './check-row';


/** A boat's latest checks, for its boat file. */
export function RecentChecks({ boatId, limit = 6 }: { boatId: string; limit?: number }) {
  const checks = useRecords('check', { boatId });
  const { activeClub } = useSession();
  if (!checks) return null;
  const shown = [...checks].sort(newestFirst).slice(0, limit);
  return (
    <Paper component="section" aria-label="Recent checks" variant="outlined" sx={{ p: 2 }}>
      <Typography variant="h6" component="h2" sx={{ fontWeight: 700 }}>Recent checks</Typography>
      {shown.length === 0 ? (
        <Typography sx={{ color: 'text.secondary' }}>No checks of this boat on this phone yet.</Typography>
      ) : (
        <List disablePadding>
          {shown.map((c) => (
            <CheckRow key={c.id} check={c} boatName={undefined} zone={activeClub.timeZone} />
          ))}
        </List>
      )}
    </Paper>
  );
}
