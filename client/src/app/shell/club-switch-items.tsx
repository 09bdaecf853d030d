import Divider from '@mui/material/Divider';
import ListItemIcon from '@mui/material/ListItemIcon';
import ListItemText from '@mui/material/ListItemText';
import MenuItem from '@mui/material/MenuItem';
import SwapHoriz from '@mui/icons-material/SwapHoriz';
import { useSwitchClub } from '@/features/auth/api/switch-club';
import { roleLabels } from '@/features/auth/roles';
import { useSession } from '@/features/auth/use-auth';

/** One menu item for each other club the person belongs to; nothing when there is only one. */
export function ClubSwitchItems({ onDone }: { onDone: () => void }) {
  const { activeClub, memberships } = useSession();
  const switchClub = useSwitchClub();
  const others = memberships.filter((m) => m.clubId !== activeClub.id);
  if (others.length === 0) return null;
  return [
    <Divider key="divider" />,
    ...others.map((m) => (
      <MenuItem
        key={m.clubId}
        disabled={switchClub.isPending}
        onClick={() => switchClub.mutate(m.clubId, { onSettled: onDone })}
      >
        <ListItemIcon>
          <SwapHoriz />
        </ListItemIcon>
        <ListItemText primary={`Switch to ${m.clubName}`} secondary={roleLabels[m.role]} />
      </MenuItem>
    )),
  ];
}
