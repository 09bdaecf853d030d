import { useState } from 'react';
import MenuItem from '@mui/material/MenuItem';
import TextField from '@mui/material/TextField';
import Typography from '@mui/material/Typography';
import { useSession } from '@/features/auth/use-auth';
import { useMembers } from '../api/members';
import { ActionDialog } from './action-dialog';

/** Choose who repairs it. The member list needs the server once; offline, assign it to yourself. */
export function AssignDialog({ onAssign, onClose }: { onAssign: (memberId: string) => Promise<void>; onClose: () => void }) {
  const { user } = useSession();
  const members = useMembers();
  const [memberId, setMemberId] = useState(user.id);
  const others = (members.data ?? []).filter((m) => m.userId !== user.id);
  return (
    <ActionDialog title="Assign the repair" confirm="Assign" onConfirm={() => onAssign(memberId)} onClose={onClose}>
      <TextField select label="Who repairs it" value={memberId} onChange={(e) => setMemberId(e.target.value)} sx={{ mt: 1 }}>
        <MenuItem value={user.id}>Me ({user.displayName})</MenuItem>
        {others.map((m) => <MenuItem key={m.userId} value={m.userId}>{m.displayName}</MenuItem>)}
      </TextField>
      {members.isError && <Typography variant="body2" sx={{ color: 'text.secondary' }}>The member list needs a connection; you can assign it to yourself now.</Typography>}
    </ActionDialog>
  );
}
