import Divider from '@mui/material/Divider';
import ListItemIcon from '@mui/material/ListItemIcon';
import ListItemText from '@mui/material/ListItemText';
import Menu from '@mui/material/Menu';
import MenuItem from '@mui/material/MenuItem';
import Logout from '@mui/icons-material/Logout';
import PeopleAltOutlined from '@mui/icons-material/PeopleAltOutlined';
import PersonAddOutlined from '@mui/icons-material/PersonAddOutlined';
import { useNavigate } from 'react-router-dom';
import { useSignOut } from '@/features/auth/api/logout';
import { useDeviceMembers } from '@/features/auth/members/use-members';
import { roleLabels } from '@/features/auth/roles';
import { useSession } from '@/features/auth/use-auth';
import { paths } from '../paths';
import { ClubSwitchItems } from './club-switch-items';

/** The account menu itself, loaded on the first tap of the account button. */
export default function AccountMenuPopup({ anchor, onClose }: { anchor: HTMLElement | null; onClose: () => void }) {
  const { user, activeClub } = useSession();
  const signOut = useSignOut();
  const navigate = useNavigate();
  const others = useDeviceMembers().filter((v) => !v.active).length;
  const go = (to: string) => {
    onClose();
    navigate(to);
  };
  return (
    <Menu anchorEl={anchor} open={anchor !== null} onClose={onClose}>
      <MenuItem disabled sx={{ '&.Mui-disabled': { opacity: 1 } }}>
        <ListItemText primary={user.displayName} secondary={`${user.email} · ${roleLabels[activeClub.role]}`} />
      </MenuItem>
      <ClubSwitchItems onDone={onClose} />
      <Divider />
      {others > 0 && (
        <MenuItem onClick={() => go(paths.members.href())}>
          <ListItemIcon>
            <PeopleAltOutlined />
          </ListItemIcon>
          <ListItemText primary="Switch member" secondary={others === 1 ? '1 other member on this device' : `${others} other members on this device`} />
        </MenuItem>
      )}
      <MenuItem onClick={() => go(paths.memberAdd.href())}>
        <ListItemIcon>
          <PersonAddOutlined />
        </ListItemIcon>
        Add a member to this device
      </MenuItem>
      <Divider />
      <MenuItem
        onClick={() => {
          onClose();
          signOut.mutate();
        }}
      >
        <ListItemIcon>
          <Logout />
        </ListItemIcon>
        Sign out
      </MenuItem>
    </Menu>
  );
}
