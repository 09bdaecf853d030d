import { useState } from 'react';
import Avatar from '@mui/material/Avatar';
import Divider from '@mui/material/Divider';
import IconButton from '@mui/material/IconButton';
import ListItemIcon from '@mui/material/ListItemIcon';
import ListItemText from '@mui/material/ListItemText';
import Menu from '@mui/material/Menu';
import MenuItem from '@mui/material/MenuItem';
import Logout from '@mui/icons-material/Logout';
import { useSignOut } from '@/features/auth/api/logout';
import { roleLabels } from '@/features/auth/roles';
import { useSession } from '@/features/auth/use-auth';
import { ClubSwitchItems } from './club-switch-items';

function initials(name: string): string {
  const parts = name.trim().split(/\s+/).filter(Boolean);
  return (parts.length > 1 ? parts[0][0] + parts[parts.length - 1][0] : (parts[0] ?? '?').slice(0, 2)).toUpperCase();
}

export function AccountMenu() {
  const { user, activeClub } = useSession();
  const signOut = useSignOut();
  const [anchor, setAnchor] = useState<HTMLElement | null>(null);
  const close = () => setAnchor(null);
  return (
    <>
      <IconButton
        color="inherit"
        aria-label={`Account: ${user.displayName}`}
        aria-haspopup="menu"
        onClick={(e) => setAnchor(e.currentTarget)}
      >
        <Avatar sx={{ width: 36, height: 36, bgcolor: 'primary.main', fontSize: '0.95rem' }}>{initials(user.displayName)}</Avatar>
      </IconButton>
      <Menu anchorEl={anchor} open={anchor !== null} onClose={close}>
        <MenuItem disabled sx={{ '&.Mui-disabled': { opacity: 1 } }}>
          <ListItemText primary={user.displayName} secondary={`${user.email} · ${roleLabels[activeClub.role]}`} />
        </MenuItem>
        <ClubSwitchItems onDone={close} />
        <Divider />
        <MenuItem
          onClick={() => {
            close();
            signOut.mutate();
          }}
        >
          <ListItemIcon>
            <Logout />
          </ListItemIcon>
          Sign out
        </MenuItem>
      </Menu>
    </>
  );
}
