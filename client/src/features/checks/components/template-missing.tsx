import Alert from '@mui/material/Alert';
import Button from '@mui/material/Button';
import { kindSpec, roleAtLeast } from '@breakline/sync-protocol';
import { Link as RouterLink } from 'react-router-dom';
import { paths } from '@/app/paths';
import { useReplica } from '@/db/hooks';
import { useLocalSave } from '@/lib/use-local-save';
import { createDefaultTemplates } from '../model/writes';

/** No template of this type yet: an admin can add the defaults (or edit them first); anyone else is told whom to ask. */
export function TemplateMissing({ missing }: { missing: readonly ('launch' | 'stow')[] }) {
  const ctx = useReplica();
  const { refusal, saving, run } = useLocalSave();
  if (!roleAtLeast(ctx.role, kindSpec('checkTemplate').access.create)) {
    return (
      <Alert severity="warning">
        The club has no check templates on this phone yet. Ask an admin to set them up, or connect so this phone can sync
        them.
      </Alert>
    );
  }
  return (
    <Alert severity="info" sx={{ display: 'grid', gap: 1 }}>
      The club has no {missing.map((t) => `${t} check`).join(' or ')} template yet. Start from Breakline's default, then edit it to
      the club's boats and procedures.
      <Button variant="contained" size="large" disabled={saving} onClick={() => run(() => createDefaultTemplates(ctx, missing))} sx={{ mt: 1 }}>
        Set up the default {missing.length === 2 ? 'launch and stow checks' : `${missing[0]} check`}
      </Button>
      <Button component={RouterLink} to={paths.templates.href()} size="large">Edit them before the first check</Button>
      {refusal && <Alert severity="error">{refusal}</Alert>}
    </Alert>
  );
}
