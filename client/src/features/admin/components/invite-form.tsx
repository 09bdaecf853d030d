import { useState } from 'react';
import Alert from '@mui/material/Alert';
import Box from '@mui/material/Box';
import Button from '@mui/material/Button';
import MenuItem from '@mui/material/MenuItem';
import TextField from '@mui/material/TextField';
import type { Role } from '@breakline/sync-protocol';
import { ProblemAlert } from '@/components/problem-alert';
import { isApiError } from '@/lib/api-error';
import { useSendInvite } from '../api/invites';
import { ROLE_CHOICES } from '../model/roles';

const EMAIL = /^[^\s@]+@[^\s@]+\.[^\s@]+$/;

/** Invite a person by e-mail with the role they will hold in this club. */
export function InviteForm() {
  const send = useSendInvite();
  const [email, setEmail] = useState('');
  const [role, setRole] = useState<Role>('crew');
  const [problem, setProblem] = useState<string | null>(null);
  const [sentTo, setSentTo] = useState<string | null>(null);
  const serverEmail = isApiError(send.error) ? send.error.fieldMessage('email') : undefined;

  function submit(e: React.FormEvent) {
    e.preventDefault();
    setSentTo(null);
    const address = email.trim();
    if (!EMAIL.test(address)) return setProblem('Enter an e-mail address such as name@example.org.');
    setProblem(null);
    send.mutate({ email: address, role }, { onSuccess: () => { setSentTo(address); setEmail(''); } });
  }

  return (
    <Box component="form" onSubmit={submit} noValidate aria-label="Invite a member" sx={{ display: 'grid', gap: 1.5 }}>
      <Box sx={{ display: 'flex', gap: 1.5, flexWrap: 'wrap', alignItems: 'flex-start' }}>
        <TextField
          label="E-mail address" type="email" value={email} onChange={(e) => setEmail(e.target.value)} sx={{ minWidth: 280, flex: 1 }}
          error={Boolean(problem ?? serverEmail)} helperText={problem ?? serverEmail ?? 'They get a link to join; it works once and expires.'}
        />
        <TextField
          select label="Role" value={role} onChange={(e) => setRole(e.target.value as Role)} sx={{ minWidth: 220 }}
          helperText={ROLE_CHOICES.find((c) => c.role === role)?.may}
        >
          {ROLE_CHOICES.map((c) => <MenuItem key={c.role} value={c.role}>{c.label}</MenuItem>)}
        </TextField>
        <Button type="submit" variant="contained" disabled={send.isPending} sx={{ mt: 0.5 }}>
          {send.isPending ? 'Sending…' : 'Send invitation'}
        </Button>
      </Box>
      {sentTo && <Alert severity="success">Invitation sent to {sentTo}. It is listed below until they accept it.</Alert>}
      {send.error && !serverEmail && <ProblemAlert title="The invitation was not sent" error={send.error} />}
    </Box>
  );
}
