import { useState, type ReactNode } from 'react';
import Alert from '@mui/material/Alert';
import Button from '@mui/material/Button';
import Dialog from '@mui/material/Dialog';
import DialogActions from '@mui/material/DialogActions';
import DialogContent from '@mui/material/DialogContent';
import DialogTitle from '@mui/material/DialogTitle';
import TextField from '@mui/material/TextField';
import { useLocalSave } from '@/lib/use-local-save';

export interface ActionDialogProps {
  title: string;
  confirm: string;
  children?: ReactNode;
  /** A text box, and the message when it must not be left blank (else the shared rules judge it). */
  field?: { label: string; blankMessage?: string };
  onConfirm: (text: string) => Promise<void>;
  onClose: () => void;
}

/** One step of a defect's path: say what is needed, then save it on this phone. */
export function ActionDialog({ title, confirm, children, field, onConfirm, onClose }: ActionDialogProps) {
  const [text, setText] = useState('');
  const [blank, setBlank] = useState<string | null>(null);
  const { refusal, saving, run } = useLocalSave();
  async function submit() {
    if (field?.blankMessage && !text.trim()) return setBlank(field.blankMessage);
    setBlank(null);
    if (await run(() => onConfirm(text))) onClose();
  }
  return (
    <Dialog open onClose={onClose} fullWidth aria-label={title}>
      <DialogTitle>{title}</DialogTitle>
      <DialogContent sx={{ display: 'grid', gap: 2 }}>
        {children}
        {field && <TextField label={field.label} value={text} onChange={(e) => setText(e.target.value)} multiline minRows={2} error={Boolean(blank)} helperText={blank} sx={{ mt: 1 }} />}
        {refusal && <Alert severity="error">{refusal}</Alert>}
      </DialogContent>
      <DialogActions>
        <Button onClick={onClose}>Cancel</Button>
        <Button variant="contained" size="large" disabled={saving} onClick={submit}>{confirm}</Button>
      </DialogActions>
    </Dialog>
  );
}
