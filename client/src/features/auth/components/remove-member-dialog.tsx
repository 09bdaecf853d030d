import { useState } from 'react';
import Alert from '@mui/material/Alert';
import Button from '@mui/material/Button';
import Dialog from '@mui/material/Dialog';
import DialogActions from '@mui/material/DialogActions';
import DialogContent from '@mui/material/DialogContent';
import DialogContentText from '@mui/material/DialogContentText';
import DialogTitle from '@mui/material/DialogTitle';
import { useLiveQuery } from 'dexie-react-hooks';
import { removeMember, unsentChanges, type RemoveResult } from '../members/device-data';
import type { DeviceMember } from '../members/roster';

export interface RemoveMemberDialogProps {
  member: DeviceMember | null;
  onClose: () => void;
  onRemoved: (member: DeviceMember, result: RemoveResult) => void;
}

/** Says plainly what removing a member does to changes not yet sent, before doing it. */
export function RemoveMemberDialog({ member, onClose, onRemoved }: RemoveMemberDialogProps) {
  const unsent = useLiveQuery(() => (member ? unsentChanges(member.userId) : 0), [member?.userId]);
  const [busy, setBusy] = useState(false);
  const name = member?.displayName ?? '';
  const remove = async () => {
    if (!member) return;
    setBusy(true);
    try {
      onRemoved(member, await removeMember(member));
    } finally {
      setBusy(false);
    }
  };
  return (
    <Dialog open={member !== null} onClose={onClose} aria-labelledby="remove-member-title">
      <DialogTitle id="remove-member-title">Remove {name} from this device?</DialogTitle>
      <DialogContent>
        {unsent !== undefined && unsent > 0 && (
          <Alert severity="warning" sx={{ mb: 2 }}>
            {name} has {unsent === 1 ? '1 change' : `${unsent} changes`} not yet sent to the club. They stay on this device and are
            sent when {name} signs in here again with the password. Until then nobody else sees them.
          </Alert>
        )}
        <DialogContentText>
          {name} is signed out here and needs the password to come back; the PIN is forgotten.
          {unsent === 0 ? ` ${name}'s copy of the club's records is deleted from this device.` : ''}
        </DialogContentText>
      </DialogContent>
      <DialogActions>
        <Button onClick={onClose} disabled={busy}>
          Keep
        </Button>
        <Button color="error" variant="contained" onClick={() => void remove()} disabled={busy || unsent === undefined}>
          Remove
        </Button>
      </DialogActions>
    </Dialog>
  );
}
