import { useEffect, useState } from 'react';
import Alert from '@mui/material/Alert';
import Box from '@mui/material/Box';
import Button from '@mui/material/Button';
import Typography from '@mui/material/Typography';
import { switchToMember } from '../members/device';
import { waitLeft, waitText } from '../members/lockout';
import type { DeviceMember } from '../members/roster';
import { MemberAvatar } from './member-avatar';
import { PinPad } from './pin-pad';

export interface PinEntryProps {
  member: DeviceMember;
  onSwitched: () => void;
  /** The member needs their password: forgotten PIN, or tokens the server refused. */
  onPassword: () => void;
  onCancel: () => void;
}

/** Ticks while a wait after wrong PINs runs, so the screen says how long is left. */
function useWait(until: number | null): number {
  const [now, setNow] = useState(Date.now);
  useEffect(() => {
    if (until === null || until <= Date.now()) return;
    const timer = setInterval(() => setNow(Date.now()), 1000);
    return () => clearInterval(timer);
  }, [until]);
  return until === null ? 0 : Math.max(0, until - now);
}

export function PinEntry({ member, onSwitched, onPassword, onCancel }: PinEntryProps) {
  const [pin, setPin] = useState('');
  const [busy, setBusy] = useState(false);
  const [problem, setProblem] = useState<string | null>(null);
  const [until, setUntil] = useState<number | null>(() => (waitLeft(member.tries, Date.now()) > 0 ? member.tries.lockedUntil : null));
  const wait = useWait(until);

  const submit = async () => {
    setBusy(true);
    setProblem(null);
    try {
      const result = await switchToMember(member.userId, pin);
      setPin('');
      if (result.ok) return onSwitched();
      if (result.reason === 'password') return onPassword();
      if (result.reason === 'wait') setUntil(Date.now() + result.waitMs);
      else setProblem(result.triesLeft === 1 ? 'That PIN is not right. 1 more try before a wait.' : `That PIN is not right. ${result.triesLeft} more tries before a wait.`);
    } finally {
      setBusy(false);
    }
  };

  return (
    <Box>
      <Box sx={{ display: 'flex', alignItems: 'center', gap: 2, mb: 1 }}>
        <MemberAvatar name={member.displayName} size={48} />
        <Box>
          <Typography variant="h5" component="h2" sx={{ fontWeight: 700 }}>
            {member.displayName}
          </Typography>
          <Typography color="text.secondary">Enter your PIN</Typography>
        </Box>
      </Box>
      {wait > 0 && (
        <Alert severity="warning" sx={{ my: 2 }}>
          Too many wrong PINs. Try again in {waitText(wait)}, or sign in with the password.
        </Alert>
      )}
      {problem && wait === 0 && (
        <Alert severity="error" sx={{ my: 2 }}>
          {problem}
        </Alert>
      )}
      <PinPad
        label={`PIN for ${member.displayName}`}
        value={pin}
        onChange={setPin}
        onSubmit={() => void submit()}
        disabled={busy || wait > 0}
        submitLabel={busy ? 'Checking…' : 'OK'}
      />
      <Box sx={{ display: 'grid', gap: 1, mt: 3 }}>
        <Button size="large" onClick={onPassword}>
          Forgotten your PIN? Sign in with your password
        </Button>
        <Button size="large" color="inherit" onClick={onCancel}>
          Back to the list
        </Button>
      </Box>
    </Box>
  );
}
