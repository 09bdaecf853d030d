import Button from '@mui/material/Button';
import CircularProgress from '@mui/material/CircularProgress';
import Table from '@mui/material/Table';
import TableBody from '@mui/material/TableBody';
import TableCell from '@mui/material/TableCell';
import TableHead from '@mui/material/TableHead';
import TableRow from '@mui/material/TableRow';
import Typography from '@mui/material/Typography';
import { ProblemAlert } from '@/components/problem-alert';
import { useSession } from '@/features/auth/use-auth';
import { useInvites, useWithdrawInvite } from '../api/invites';
import { INVITE_STATUS_WORDS, ROLE_CHOICES } from '../model/roles';

function when(iso: string | null, zone: string): string {
  if (!iso) return '—';
  const ms = Date.parse(iso);
  return Number.isFinite(ms)
    ? new Intl.DateTimeFormat('en-AU', { timeZone: zone, day: 'numeric', month: 'short', year: 'numeric', hour: '2-digit', minute: '2-digit', hourCycle: 'h23' }).format(ms)
    : iso;
}

/** Invitations sent from this club, newest first, with the ones still waiting able to be withdrawn. */
export function InviteList() {
  const { activeClub } = useSession();
  const invites = useInvites();
  const withdraw = useWithdrawInvite();
  if (invites.error) return <ProblemAlert title="The invitations could not be loaded" error={invites.error} onRetry={() => void invites.refetch()} />;
  if (!invites.data) return <CircularProgress aria-label="Loading the invitations" />;
  if (invites.data.length === 0) return <Typography color="text.secondary">No invitations sent yet.</Typography>;
  const sorted = [...invites.data].sort((a, b) => b.createdAt.localeCompare(a.createdAt));
  return (
    <>
      {withdraw.error && <ProblemAlert title="The invitation was not withdrawn" error={withdraw.error} />}
      <Table aria-label="Invitations" size="small">
        <TableHead>
          <TableRow>
            <TableCell>E-mail</TableCell><TableCell>Role</TableCell><TableCell>State</TableCell><TableCell>Sent by</TableCell>
            <TableCell>Sent</TableCell><TableCell>Link expires</TableCell><TableCell />
          </TableRow>
        </TableHead>
        <TableBody>
          {sorted.map((i) => (
            <TableRow key={i.id}>
              <TableCell>{i.email}</TableCell>
              <TableCell>{ROLE_CHOICES.find((c) => c.role === i.role)?.label ?? i.role}</TableCell>
              <TableCell>{i.status === 'accepted' && i.acceptedAt ? `Accepted ${when(i.acceptedAt, activeClub.timeZone)}` : INVITE_STATUS_WORDS[i.status]}</TableCell>
              <TableCell>{i.invitedBy.name ?? '—'}</TableCell>
              <TableCell>{when(i.createdAt, activeClub.timeZone)}</TableCell>
              <TableCell>{i.status === 'pending' ? when(i.expiresAt, activeClub.timeZone) : '—'}</TableCell>
              <TableCell>
                {i.status === 'pending' && (
                  <Button size="small" color="error" disabled={withdraw.isPending} onClick={() => withdraw.mutate(i.id)} aria-label={`Withdraw the invitation to ${i.email}`}>
                    Withdraw
                  </Button>
                )}
              </TableCell>
            </TableRow>
          ))}
        </TableBody>
      </Table>
    </>
  );
}
