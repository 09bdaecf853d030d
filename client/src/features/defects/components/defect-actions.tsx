import { useState } from 'react';
import Box from '@mui/material/Box';
import Button from '@mui/material/Button';
import Typography from '@mui/material/Typography';
import { useReplica } from '@/db/hooks';
import type { LocalRecord } from '@/db/types';
import { availableActions, type DefectAction } from '../model/actions';
import { assignDefect, markRepaired, rejectDefect, reopenDefect, verifyDefect } from '../model/writes';
import { ActionDialog } from './action-dialog';
import { AssignDialog } from './assign-dialog';

const LABELS: Record<DefectAction, string> = {
  assign: 'Assign the repair',
  repair: 'Mark repaired',
  verify: 'Verify and return to service',
  reject: 'Reject: not a defect',
  reopen: 'Reopen',
};

/** The next steps on the defect's path this person's role allows; others see who may act. */
export function DefectActions({ defect }: { defect: LocalRecord<'defect'> }) {
  const ctx = useReplica();
  const [open, setOpen] = useState<DefectAction | null>(null);
  const actions = availableActions(defect.fields, ctx.role, ctx.userId);
  const close = () => setOpen(null);
  const id = defect.id;
  return (
    <Box sx={{ display: 'grid', gap: 1 }}>
      {actions.map((a) => (
        <Button key={a} size="large" variant={a === 'verify' || a === 'repair' ? 'contained' : 'outlined'} color={a === 'reject' ? 'error' : 'primary'} onClick={() => setOpen(a)}>
          {LABELS[a]}
        </Button>
      ))}
      {actions.length === 0 && defect.fields.status !== 'verified' && defect.fields.status !== 'rejected' && (
        <Typography sx={{ color: 'text.secondary' }}>A driver marks it repaired; a supervisor verifies it and returns the boat to service.</Typography>
      )}
      {open === 'assign' && <AssignDialog onAssign={(m) => assignDefect(ctx, id, m)} onClose={close} />}
      {open === 'repair' && (
        <ActionDialog title="Mark repaired" confirm="Save repair" field={{ label: 'What was done', blankMessage: 'Say what was done to repair it.' }} onConfirm={(t) => markRepaired(ctx, id, t)} onClose={close}>
          <Typography>The next crew reads this. A supervisor then verifies the repair before the boat goes back in service.</Typography>
        </ActionDialog>
      )}
      {open === 'verify' && (
        <ActionDialog title="Verify the repair" confirm="Verify and return to service" onConfirm={() => verifyDefect(ctx, id)} onClose={close}>
          <Typography>Only verify a repair you or another competent person has inspected. The club's procedures and the manufacturer's manual come first.</Typography>
        </ActionDialog>
      )}
      {open === 'reject' && <ActionDialog title="Reject the report" confirm="Reject" field={{ label: 'Why it is not a defect' }} onConfirm={(t) => rejectDefect(ctx, id, t)} onClose={close} />}
      {open === 'reopen' && <ActionDialog title="Reopen the defect" confirm="Reopen" onConfirm={() => reopenDefect(ctx, id)} onClose={close}><Typography>Reopening counts against the boat again until a supervisor closes it.</Typography></ActionDialog>}
    </Box>
  );
}
