import { useState } from 'react';
import Alert from '@mui/material/Alert';
import Box from '@mui/material/Box';
import Button from '@mui/material/Button';
import TextField from '@mui/material/TextField';
import { useRecords, useReplica } from '@/db/hooks';
import { useSession } from '@/features/auth/use-auth';
import { saveMotor } from '../moves/save-motor';
import type { DraftErrors } from './boat-draft';
import { buildMotor, type MotorDraft } from './motor-draft';
import { MotorFields } from './motor-fields';
import { useLocalSave } from '@/lib/use-local-save';
import type { LoggedService } from './logged-service';

interface Props {
  motorId: string | null;
  /** The boat the motor is on now, to log a move when that changes. */
  fittedTo: string | null;
  initial: MotorDraft;
  /** What the service history and trips say beside the record; none for a new motor. */
  logged?: LoggedService;
  editable: boolean;
  onSaved: () => void;
}

export function MotorForm({ motorId, fittedTo, initial, logged, editable, onSaved }: Props) {
  const ctx = useReplica();
  const { activeClub } = useSession();
  const boats = useRecords('boat') ?? [];
  const [draft, setDraft] = useState(initial);
  const [errors, setErrors] = useState<DraftErrors>({});
  const [reason, setReason] = useState('');
  const { refusal, saving, run } = useLocalSave();
  const moving = (draft.boatId || null) !== fittedTo;
  async function save() {
    const built = buildMotor(draft, activeClub.timeZone);
    setErrors(built.ok ? {} : built.errors);
    if (!built.ok) return;
    // The move is history of its own, so the motor's page can say where it has been.
    const ok = await run(async () => {
      await saveMotor(ctx, { motorId, fields: built.fields, fittedTo, reason });
    });
    if (ok) onSaved();
  }
  return (
    <Box component="fieldset" disabled={!editable} sx={{ border: 0, p: 0, m: 0, display: 'grid', gap: 2 }}>
      <MotorFields draft={draft} errors={errors} boats={boats} logged={logged} set={(c) => setDraft((d) => ({ ...d, ...c }))} />
      {moving && (
        <TextField
          label="Why is it moving? (kept in the motor's history)"
          value={reason}
          onChange={(e) => setReason(e.target.value)}
          helperText="Optional, e.g. off for a service, stand-in for another motor"
          slotProps={{ htmlInput: { maxLength: 500 } }}
        />
      )}
      {Object.keys(errors).length > 0 && <Alert severity="error">Some boxes need fixing before the motor is saved.</Alert>}
      {refusal && <Alert severity="error">{refusal}</Alert>}
      {editable && (
        <Button variant="contained" size="large" onClick={save} disabled={saving}>
          Save motor
        </Button>
      )}
    </Box>
  );
}
