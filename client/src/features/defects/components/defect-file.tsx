import Alert from '@mui/material/Alert';
import Box from '@mui/material/Box';
import Button from '@mui/material/Button';
import CircularProgress from '@mui/material/CircularProgress';
import Paper from '@mui/material/Paper';
import Typography from '@mui/material/Typography';
import { Link as RouterLink } from 'react-router-dom';
import { paths } from '@/app/paths';
import { EmptyState } from '@/components/empty-state';
import { useRecord, useReplica } from '@/db/hooks';
import { updateRecord } from '@/db/write';
import { useSession } from '@/features/auth/use-auth';
import { useLocalSave } from '@/lib/use-local-save';
import { STATUS_WORDS } from '../model/words';
import { AddNote } from './add-note';
import { DefectActions } from './defect-actions';
import { DefectHistory } from './defect-history';
import { PhotoPicker } from './photo-picker';
import { SeverityLabel } from './severity-label';

/** One defect: what is wrong, the photos, what was done about it, and the next step. */
export function DefectFile({ defectId }: { defectId: string }) {
  const defect = useRecord('defect', defectId);
  const boat = useRecord('boat', defect?.fields.boatId);
  const ctx = useReplica();
  const { activeClub } = useSession();
  const photoSave = useLocalSave();
  if (defect === undefined) return <CircularProgress aria-label="Loading the defect" />;
  if (!defect) return <EmptyState title="This defect is not on this phone">It may have been removed, or not synced here yet.</EmptyState>;
  const d = defect.fields;
  return (
    <Box sx={{ display: 'grid', gap: 2 }}>
      <Box>
        <SeverityLabel severity={d.severity} />
        <Typography variant="h5" component="h1" sx={{ fontWeight: 700, mt: 0.5 }}>{d.description.split('\n')[0]}</Typography>
        <Typography sx={{ color: 'text.secondary' }}>{STATUS_WORDS[d.status]}{defect.waiting ? ' · waiting to sync' : ''}</Typography>
      </Box>
      {d.severity === 'stand-down' && d.status !== 'verified' && d.status !== 'rejected' && (
        <Alert severity="error" variant="filled">Stood down: do not launch until a supervisor verifies the repair and returns the boat to service.</Alert>
      )}
      {boat && <Button component={RouterLink} to={paths.boatFile.href(boat.id)} variant="outlined">{boat.fields.fleetNumber} · {boat.fields.name}: open the boat file</Button>}
      {d.description.includes('\n') && <Typography sx={{ whiteSpace: 'pre-wrap' }}>{d.description}</Typography>}
      <DefectActions defect={defect} />
      <Paper variant="outlined" sx={{ p: 2, display: 'grid', gap: 1 }} component="section" aria-label="Photos">
        <Typography variant="h6" component="h2">Photos</Typography>
        <PhotoPicker photos={d.photos} onChange={(photos) => void photoSave.run(() => updateRecord(ctx, 'defect', defect.id, { photos }))} />
        {photoSave.refusal && <Alert severity="error">{photoSave.refusal}</Alert>}
      </Paper>
      <Paper variant="outlined" sx={{ p: 2, display: 'grid', gap: 1 }} component="section" aria-label="What was done">
        <Typography variant="h6" component="h2">What was done</Typography>
        <DefectHistory d={d} zone={activeClub.timeZone} />
        <AddNote defect={defect} />
      </Paper>
    </Box>
  );
}
