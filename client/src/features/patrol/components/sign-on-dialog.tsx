import { useState } from 'react';
import Alert from '@mui/material/Alert';
import Button from '@mui/material/Button';
import Dialog from '@mui/material/Dialog';
import DialogActions from '@mui/material/DialogActions';
import DialogContent from '@mui/material/DialogContent';
import DialogTitle from '@mui/material/DialogTitle';
import MenuItem from '@mui/material/MenuItem';
import TextField from '@mui/material/TextField';
import ToggleButton from '@mui/material/ToggleButton';
import ToggleButtonGroup from '@mui/material/ToggleButtonGroup';
import Typography from '@mui/material/Typography';
import { roleAtLeast } from '@breakline/sync-protocol';
import { useRecords } from '@/db/hooks';
import type { LocalRecord } from '@/db/types';
import { useLocalSave } from '@/lib/use-local-save';
import type { PatrolContext } from '../hooks/use-patrol-context';
import { openSignOnOf } from '../model/session-day';
import { signOnVerdict, type SignOnRole } from '../model/sign-on-check';
import { signOn } from '../model/writes';
import { chosenToggle } from './toggle-style';

const SEVERITY = { ok: 'success', lapsing: 'warning', warn: 'warning', block: 'error' } as const;

interface Props {
  open: boolean;
  onClose: () => void;
  boat: LocalRecord<'boat'>;
  boats: readonly LocalRecord<'boat'>[];
  date: string;
  p: PatrolContext;
}

/** Sign a member on to a boat for today's session, with the award for the role checked first. */
export function SignOnDialog({ open, onClose, boat, boats, date, p }: Props) {
  // Every boat's sign-ons, read only while the dialog is open: a member signed on elsewhere is moved.
  const signOns = useRecords('signOn');
  const [memberId, setMemberId] = useState(p.userId);
  const [role, setRole] = useState<SignOnRole>(roleAtLeast(p.role, 'driver') ? 'driver' : 'crew');
  const { refusal, saving, run } = useLocalSave();
  // Drivers and up sign others on at the boat; a crew member signs on themselves.
  const canPick = roleAtLeast(p.role, 'driver');
  const name = memberId === p.userId ? 'you' : p.nameOf(memberId);
  const verdict = signOnVerdict(p.cards.get(memberId), name, role, date, p.rule);
  const current = signOns ? openSignOnOf(signOns, memberId, date) : undefined;
  const here = current?.fields.boatId === boat.id;
  const elsewhere = current && !here ? boats.find((b) => b.id === current.fields.boatId) : undefined;
  async function confirm() {
    if (await run(() => signOn(p.ctx, { boatId: boat.id, memberId, role, sessionDate: date, moveFrom: here ? undefined : current }).then(() => undefined))) onClose();
  }
  const action = verdict.level === 'warn' ? 'Sign on anyway' : 'Sign on';
  return (
    <Dialog open={open} onClose={onClose} fullWidth aria-labelledby="sign-on-title">
      <DialogTitle id="sign-on-title">Sign on to {boat.fields.fleetNumber} · {boat.fields.name}</DialogTitle>
      <DialogContent sx={{ display: 'grid', gap: 2, pt: 1 }}>
        <Typography sx={{ color: 'text.secondary' }}>Today's session, {date}.</Typography>
        {canPick && (
          <TextField select label="Who" value={memberId} onChange={(e) => setMemberId(e.target.value)}>
            <MenuItem value={p.userId}>You</MenuItem>
            {p.cardList.filter((c) => c.fields.memberId !== p.userId).map((c) => (
              <MenuItem key={c.id} value={c.fields.memberId}>{c.fields.displayName}</MenuItem>
            ))}
          </TextField>
        )}
        <ToggleButtonGroup exclusive fullWidth color="primary" value={role} onChange={(_, v: SignOnRole | null) => v && setRole(v)} aria-label="Sign on as" sx={chosenToggle}>
          <ToggleButton value="driver" sx={{ minHeight: 56 }}>Driver</ToggleButton>
          <ToggleButton value="crew" sx={{ minHeight: 56 }}>Crew</ToggleButton>
        </ToggleButtonGroup>
        <Alert severity={SEVERITY[verdict.level]} role="status">{verdict.message}</Alert>
        {here && <Alert severity="info">{name === 'you' ? 'You are' : `${name} is`} already signed on to this boat today.</Alert>}
        {elsewhere && <Alert severity="info">This signs {name} off {elsewhere.fields.fleetNumber} · {elsewhere.fields.name} first.</Alert>}
        {refusal && <Alert severity="error">{refusal}</Alert>}
      </DialogContent>
      <DialogActions sx={{ px: 3, pb: 2 }}>
        <Button onClick={onClose} size="large">Cancel</Button>
        <Button variant="contained" size="large" onClick={confirm} disabled={saving || !signOns || here || verdict.level === 'block'} color={verdict.level === 'warn' ? 'warning' : 'primary'}>
          {action}
        </Button>
      </DialogActions>
    </Dialog>
  );
}
