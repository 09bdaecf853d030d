import Button from '@mui/material/Button';
import Paper from '@mui/material/Paper';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import { Link as RouterLink } from 'react-router-dom';
import { paths } from '@/app/paths';
import { InviteForm } from './invite-form';
import { InviteList } from './invite-list';
import { MemberList } from './member-list';

/** Members, invitations and roles of the active club. */
export function MembersScreen({ showCaughtMail }: { showCaughtMail: boolean }) {
  return (
    <Stack spacing={2}>
      <Paper variant="outlined" sx={{ p: 2 }}>
        <Typography variant="h6" component="h2" gutterBottom>Invite a member</Typography>
        <InviteForm />
      </Paper>
      <Paper variant="outlined" sx={{ p: 2 }}>
        <Stack direction="row" sx={{ alignItems: 'center' }}>
          <Typography variant="h6" component="h2" sx={{ flexGrow: 1 }} gutterBottom>Invitations</Typography>
          {showCaughtMail && (
            <Button component={RouterLink} to={paths.caughtMail.href()}>Read caught mail</Button>
          )}
        </Stack>
        <InviteList />
      </Paper>
      <Paper variant="outlined" sx={{ p: 2 }}>
        <Stack direction="row" sx={{ alignItems: 'center' }}>
          <Typography variant="h6" component="h2" sx={{ flexGrow: 1 }} gutterBottom>Members and roles</Typography>
          <Button component={RouterLink} to={paths.crewAwards.href()}>Crew awards</Button>
          <Button component={RouterLink} to={paths.fleet.href()}>Fleet</Button>
        </Stack>
        <MemberList />
      </Paper>
    </Stack>
  );
}
