import { useState } from 'react';
import Alert from '@mui/material/Alert';
import Button from '@mui/material/Button';
import CircularProgress from '@mui/material/CircularProgress';
import Dialog from '@mui/material/Dialog';
import DialogActions from '@mui/material/DialogActions';
import DialogContent from '@mui/material/DialogContent';
import DialogTitle from '@mui/material/DialogTitle';
import MenuItem from '@mui/material/MenuItem';
import Table from '@mui/material/Table';
import TableBody from '@mui/material/TableBody';
import TableCell from '@mui/material/TableCell';
import TableHead from '@mui/material/TableHead';
import TableRow from '@mui/material/TableRow';
import TextField from '@mui/material/TextField';
import Typography from '@mui/material/Typography';
import type { Role } from '@breakline/sync-protocol';
import { ProblemAlert } from '@/components/problem-alert';
import { useSession } from '@/features/auth/use-auth';
import { useChangeRole, useClubMembers, type ClubMember } from '../api/members';
import { ROLE_CHOICES } from '../model/roles';

/** The club's members and their roles; an admin changes a role here (after a confirmation for their own). */
export function MemberList() {
  const { user } = useSession();
  const members = useClubMembers();
  const change = useChangeRole();
  const [confirm, setConfirm] = useState<{ member: ClubMember; role: Role } | null>(null);
  const [changed, setChanged] = useState<string | null>(null);
  const label = (r: Role) => ROLE_CHOICES.find((c) => c.role === r)?.label ?? r;

  function apply(member: ClubMember, role: Role) {
    setChanged(null);
    change.mutate({ membershipId: member.membershipId, role }, {
      onSuccess: () => setChanged(`${member.displayName} is now ${label(role).toLowerCase()}. The server applies it at once; their screens catch up when their session next renews.`),
    });
  }

  if (members.error) return <ProblemAlert title="The member list could not be loaded" error={members.error} onRetry={() => void members.refetch()} />;
  if (!members.data) return <CircularProgress aria-label="Loading the members" />;
  const sorted = [...members.data].sort((a, b) => a.displayName.localeCompare(b.displayName));
  return (
    <>
      {changed && <Alert severity="success" sx={{ mb: 1 }} onClose={() => setChanged(null)}>{changed}</Alert>}
      {change.error && <ProblemAlert title="The role was not changed" error={change.error} />}
      <Table aria-label="Members" size="small">
        <TableHead>
          <TableRow><TableCell>Name</TableCell><TableCell>E-mail</TableCell><TableCell sx={{ width: 220 }}>Role</TableCell></TableRow>
        </TableHead>
        <TableBody>
          {sorted.map((m) => (
            <TableRow key={m.membershipId}>
              <TableCell>{m.displayName}{m.userId === user.id ? ' (you)' : ''}</TableCell>
              <TableCell>{m.email}</TableCell>
              <TableCell>
                <TextField
                  select size="small" fullWidth value={m.role} disabled={change.isPending}
                  slotProps={{ htmlInput: { 'aria-label': `Role of ${m.displayName}` } }}
                  onChange={(e) => {
                    const role = e.target.value as Role;
                    if (m.userId === user.id && role !== 'admin') setConfirm({ member: m, role });
                    else apply(m, role);
                  }}
                >
                  {ROLE_CHOICES.map((c) => <MenuItem key={c.role} value={c.role}>{c.label}</MenuItem>)}
                </TextField>
              </TableCell>
            </TableRow>
          ))}
        </TableBody>
      </Table>
      <Typography variant="body2" color="text.secondary" sx={{ mt: 1 }}>
        {ROLE_CHOICES.map((c) => `${c.label}: ${c.may}.`).join(' ')}
      </Typography>
      <Dialog open={confirm !== null} onClose={() => setConfirm(null)} aria-labelledby="own-role-title">
        <DialogTitle id="own-role-title">Give up your admin role?</DialogTitle>
        <DialogContent>
          You will become {confirm ? label(confirm.role).toLowerCase() : ''} and lose this page. Another admin would have to give the role back.
        </DialogContent>
        <DialogActions>
          <Button onClick={() => setConfirm(null)}>Keep my role</Button>
          <Button color="error" onClick={() => { if (confirm) apply(confirm.member, confirm.role); setConfirm(null); }}>
            Change my role
          </Button>
        </DialogActions>
      </Dialog>
    </>
  );
}
