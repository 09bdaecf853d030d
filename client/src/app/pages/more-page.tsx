import Button from '@mui/material/Button';
import List from '@mui/material/List';
import ListItem from '@mui/material/ListItem';
import ListItemButton from '@mui/material/ListItemButton';
import ListItemText from '@mui/material/ListItemText';
import Paper from '@mui/material/Paper';
import Switch from '@mui/material/Switch';
import Typography from '@mui/material/Typography';
import { Link as RouterLink } from 'react-router-dom';
import { PageHeader } from '@/components/page-header';
import { useSignOut } from '@/features/auth/api/logout';
import { canAdminister, canUseReviewDesk, roleLabels } from '@/features/auth/roles';
import { useSession } from '@/features/auth/use-auth';
import { paths } from '../paths';
import { useThemeMode } from '../theme-mode';

export function MorePage() {
  const { user, activeClub } = useSession();
  const { mode, setMode } = useThemeMode();
  const signOut = useSignOut();
  const role = activeClub.role;
  return (
    <>
      <PageHeader title="More" />
      <Paper variant="outlined" sx={{ p: 2, mb: 2 }}>
        <Typography sx={{ fontWeight: 700 }}>{user.displayName}</Typography>
        <Typography color="text.secondary">{user.email}</Typography>
        <Typography color="text.secondary">
          {roleLabels[role]} at {activeClub.name}
        </Typography>
      </Paper>
      <Paper variant="outlined" sx={{ mb: 2 }}>
        <List disablePadding>
          <ListItem
            secondaryAction={
              <Switch
                edge="end"
                checked={mode === 'sunlight'}
                onChange={(e) => setMode(e.target.checked ? 'sunlight' : 'standard')}
                slotProps={{ input: { 'aria-label': 'Sunlight colours' } }}
              />
            }
          >
            <ListItemText primary="Sunlight colours" secondary="High contrast for bright sun and glare" />
          </ListItem>
          <ListItemButton component={RouterLink} to={paths.members.href()}>
            <ListItemText primary="Members on this device" secondary="Switch member with a PIN, or add one to share this device" />
          </ListItemButton>
          {canUseReviewDesk(role) && (
            <ListItemButton component={RouterLink} to={paths.reviewDesk.href()}>
              <ListItemText primary="Review desk" secondary="Best on a desktop screen" />
            </ListItemButton>
          )}
          {canUseReviewDesk(role) && (
            <ListItemButton component={RouterLink} to={paths.templates.href()}>
              <ListItemText primary="Check templates" secondary="What the launch and stow checks ask; admins edit them" />
            </ListItemButton>
          )}
          {canAdminister(role) && (
            <ListItemButton component={RouterLink} to={paths.admin.href()}>
              <ListItemText primary="Admin" secondary="Members, boats, check templates, club settings" />
            </ListItemButton>
          )}
        </List>
      </Paper>
      <Button variant="outlined" color="error" fullWidth onClick={() => signOut.mutate()}>
        Sign out
      </Button>
    </>
  );
}
