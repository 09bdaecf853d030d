import Box from '@mui/material/Box';
import Button from '@mui/material/Button';
import List from '@mui/material/List';
import Paper from '@mui/material/Paper';
import Typography from '@mui/material/Typography';
import { Link as RouterLink } from 'react-router-dom';
import { paths } from '@/app/paths';
import { EmptyState } from '@/components/empty-state';
import { useRecords } from '@/db/hooks';
import type { LocalRecord } from '@/db/types';
import { canUseReviewDesk } from '@/features/auth/roles';
import { useSession } from '@/features/auth/use-auth';
import { CheckRow } from './check-row';
import { newestFirst } from '../model/order';

function Group({ title, checks, boats, zone }: { title: string; checks: LocalRecord<'check'>[]; boats: LocalRecord<'boat'>[]; zone: string }) {
  if (checks.length === 0) return null;
  return (
    <Paper component="section" aria-label={title} variant="outlined">
      <Typography variant="h6" component="h2" sx={{ px: 2, pt: 1.5 }}>{title}</Typography>
      <List disablePadding>
        {checks.map((c) => <CheckRow key={c.id} check={c} boatName={boats.find((b) => b.id === c.fields.boatId)?.fields.name} zone={zone} />)}
      </List>
    </Paper>
  );
}

/** The Checks tab: start one, carry on with one, or read the latest. */
export function CheckList() {
  const checks = [...(useRecords('check') ?? [])].sort(newestFirst);
  const boats = useRecords('boat') ?? [];
  const { activeClub } = useSession();
  const open = checks.filter((c) => c.fields.status === 'in-progress');
  const done = checks.filter((c) => c.fields.status === 'complete').slice(0, 30);
  return (
    <Box sx={{ display: 'grid', gap: 2 }}>
      <Box sx={{ display: 'grid', gridTemplateColumns: '1fr 1fr', gap: 1 }}>
        <Button component={RouterLink} to={paths.checkStart.href({ type: 'launch' })} variant="contained" size="large" sx={{ minHeight: 56 }}>Launch check</Button>
        <Button component={RouterLink} to={paths.checkStart.href({ type: 'stow' })} variant="contained" size="large" sx={{ minHeight: 56 }}>Stow check</Button>
      </Box>
      <Group title="In progress" checks={open} boats={boats} zone={activeClub.timeZone} />
      <Group title="Completed" checks={done} boats={boats} zone={activeClub.timeZone} />
      {canUseReviewDesk(activeClub.role) && (
        <Button component={RouterLink} to={paths.templates.href()} size="large">What the checks ask: check templates</Button>
      )}
      {checks.length === 0 && (
        <EmptyState title="No checks yet">
          Launch checks and stow checks run on this phone show here. Each answer is saved on the phone as you go and sent to the
          club when there is a connection.
        </EmptyState>
      )}
    </Box>
  );
}
