import IconButton from '@mui/material/IconButton';
import List from '@mui/material/List';
import ListItem from '@mui/material/ListItem';
import ListItemAvatar from '@mui/material/ListItemAvatar';
import ListItemButton from '@mui/material/ListItemButton';
import ListItemText from '@mui/material/ListItemText';
import Paper from '@mui/material/Paper';
import PersonRemoveOutlined from '@mui/icons-material/PersonRemoveOutlined';
import { useLiveQuery } from 'dexie-react-hooks';
import { unsentChanges } from '../members/device-data';
import type { DeviceMember } from '../members/roster';
import type { MemberView } from '../members/use-members';
import { roleLabels } from '../roles';
import { MemberAvatar } from './member-avatar';

function MemberState({ view }: { view: MemberView }) {
  const unsent = useLiveQuery(() => unsentChanges(view.member.userId), [view.member.userId]);
  const parts = [`${view.member.clubName} · ${roleLabels[view.member.role]}`];
  if (view.active) parts.push('Using this device now');
  else if (!view.byPin) parts.push('Signs in with the password next time');
  if (unsent) parts.push(unsent === 1 ? '1 change waiting to be sent' : `${unsent} changes waiting to be sent`);
  return <>{parts.join(' · ')}</>;
}

export interface MemberListProps {
  members: MemberView[];
  onPick: (member: DeviceMember) => void;
  onRemove: (member: DeviceMember) => void;
}

/** The members signed in on this device: tap one to switch to them. */
export function MemberList({ members, onPick, onRemove }: MemberListProps) {
  return (
    <Paper variant="outlined">
      <List disablePadding aria-label="Members on this device">
        {members.map((view) => (
          <ListItem
            key={view.member.userId}
            disablePadding
            divider
            secondaryAction={
              <IconButton edge="end" size="large" aria-label={`Remove ${view.member.displayName} from this device`} onClick={() => onRemove(view.member)}>
                <PersonRemoveOutlined />
              </IconButton>
            }
          >
            <ListItemButton onClick={() => onPick(view.member)} selected={view.active} sx={{ minHeight: 76 }}>
              <ListItemAvatar>
                <MemberAvatar name={view.member.displayName} />
              </ListItemAvatar>
              <ListItemText
                primary={view.member.displayName}
                secondary={<MemberState view={view} />}
                slotProps={{ primary: { sx: { fontWeight: 500, fontSize: '1.1rem' } } }}
              />
            </ListItemButton>
          </ListItem>
        ))}
      </List>
    </Paper>
  );
}
