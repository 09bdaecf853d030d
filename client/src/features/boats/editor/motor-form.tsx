import { useState } from 'react';
import Alert from '@mui/material/Alert';
import Box from '@mui/material/Box';
import Button from '@mui/material/Button';
import { useRecords, useReplica } from '@/db/hooks';
import { createRecord, updateRecord } from '@/db/write';
import { useSession } from '@/features/auth/use-auth';
import type { DraftErrors } from './boat-draft';
import { buildMotor, type MotorDraft } from './motor-draft';
import { MotorFields } from './motor-fields';
import { useLocalSave } from '@/lib/use-local-save';

interface Props {
  motorId: string | null;
  /** The boat the motor is on now, to log a move when that changes. */
  fittedTo: string | null;
  initial: MotorDraft;
  editable: boolean;
  onSaved: () => void;
}

export function MotorForm({ motorId, fittedTo, initial, editable, onSaved }: Props) {
  const ctx = useReplica();
  const { activeClub } = useSession();
  const boats = useRecords('boat') ?? [];
  const [draft, setDraft] = useState(initial);
  const [errors, setErrors] = useState<DraftErrors>({});
  const { refusal, saving, run } = useLocalSave();
  async function save() {
    const built = buildMotor(draft, activeClub.timeZone);
    setErrors(built.ok ? {} : built.errors);
    if (!built.ok) return;
    const ok = await run(async () => {
      const id = motorId ?? (await createRecord(ctx, 'motor', built.fields));
      if (motorId) await updateRecord(ctx, 'motor', motorId, built.fields);
      // The move is history of its own, so the boat file can say where a motor has been.
      if (built.fields.boatId !== fittedTo) {
        const movedAt = new Date().toISOString();
        await createRecord(ctx, 'motorMove', { motorId: id, fromBoatId: fittedTo, toBoatId: built.fields.boatId, movedAt, reason: '' });
      }
    });
    if (ok) onSaved();
  }
  return (
    <Box component="fieldset" disabled={!editable} sx={{ border: 0, p: 0, m: 0, display: 'grid', gap: 2 }}>
      <MotorFields draft={draft} errors={errors} boats={boats} set={(c) => setDraft((d) => ({ ...d, ...c }))} />
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
