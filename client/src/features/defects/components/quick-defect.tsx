import { useState } from 'react';
import Alert from '@mui/material/Alert';
import Box from '@mui/material/Box';
import Button from '@mui/material/Button';
import Dialog from '@mui/material/Dialog';
import DialogActions from '@mui/material/DialogActions';
import DialogContent from '@mui/material/DialogContent';
import DialogTitle from '@mui/material/DialogTitle';
import TextField from '@mui/material/TextField';
import Typography from '@mui/material/Typography';
import type { DefectSeverity } from '@breakline/sync-protocol';
import { Link as RouterLink } from 'react-router-dom';
import { paths } from '@/app/paths';
import { useRecords, useReplica } from '@/db/hooks';
import { useLocalSave } from '@/lib/use-local-save';
import { SEVERITY_META } from '../model/words';
import { raiseDefect } from '../model/writes';
import { usePhotoTaker } from './photo-picker';
import { SeverityPicker } from './severity-picker';

export interface QuickDefectProps {
  checkId: string;
  boatId: string;
  motorId: string | null;
  itemId: string;
  itemLabel: string;
  critical: boolean;
  note?: string;
}

/**
 * "Report a defect" under a failed check item: everything prefilled from the check, so it is
 * saved in two taps, with the camera as the second tap when a photo helps.
 */
export function QuickDefect(p: QuickDefectProps) {
  const ctx = useReplica();
  const reported = (useRecords('defect', { boatId: p.boatId }) ?? []).find((d) => d.fields.checkId === p.checkId && d.fields.itemId === p.itemId);
  const [open, setOpen] = useState(false);
  const [severity, setSeverity] = useState<DefectSeverity>(p.critical ? 'stand-down' : 'limit');
  const [description, setDescription] = useState(`${p.itemLabel}: failed${p.note ? `. ${p.note}` : ''}`);
  const { refusal, saving, run } = useLocalSave();
  const save = (photos: string[]) =>
    run(() => raiseDefect(ctx, { boatId: p.boatId, motorId: p.motorId, checkId: p.checkId, itemId: p.itemId, severity, description, photos }).then(() => undefined)).then((ok) => ok && setOpen(false));
  const camera = usePhotoTaker((sha) => void save([sha]));
  if (reported) {
    const f = reported.fields;
    const photos = f.photos.length === 0 ? 'no photo' : f.photos.length === 1 ? '1 photo' : `${f.photos.length} photos`;
    return (
      <Box sx={{ display: 'grid', gap: 1 }}>
        <Typography role="status" sx={{ fontWeight: 700 }}>
          Defect reported: {SEVERITY_META[f.severity].word.toLowerCase()}, {photos}{reported.waiting ? ', saved on this phone' : ''}.
        </Typography>
        <Button component={RouterLink} to={paths.defectFile.href(reported.id)} variant="outlined" color="error" size="large" sx={{ minHeight: 56 }}>
          Open the defect
        </Button>
      </Box>
    );
  }
  return (
    <>
      <Button variant="contained" color="error" size="large" onClick={() => setOpen(true)}>Report a defect</Button>
      <Dialog open={open} onClose={() => setOpen(false)} fullWidth aria-labelledby={`qd-${p.itemId}`}>
        <DialogTitle id={`qd-${p.itemId}`}>Report a defect</DialogTitle>
        <DialogContent sx={{ display: 'grid', gap: 2 }}>
          <TextField label="What is wrong" value={description} onChange={(e) => setDescription(e.target.value)} multiline sx={{ mt: 1 }} />
          <SeverityPicker value={severity} onChange={setSeverity} />
          {camera.field}
          {(refusal || camera.problem) && <Alert severity="error">{refusal ?? camera.problem}</Alert>}
        </DialogContent>
        {/* Full width at the thumb: the second tap is the camera, and the photo saves the defect. */}
        <DialogActions disableSpacing sx={{ display: 'grid', gridTemplateColumns: '1fr', gap: 1, px: 3, pb: 2 }}>
          <Button variant="contained" color="error" size="large" disabled={saving} onClick={camera.open} sx={{ minHeight: 56 }}>Take a photo and save</Button>
          <Button variant="outlined" size="large" disabled={saving} onClick={() => void save([])} sx={{ minHeight: 56 }}>Save without a photo</Button>
          <Button size="large" onClick={() => setOpen(false)} sx={{ minHeight: 48 }}>Cancel</Button>
        </DialogActions>
      </Dialog>
    </>
  );
}
