import { useState } from 'react';
import Alert from '@mui/material/Alert';
import Box from '@mui/material/Box';
import Button from '@mui/material/Button';
import TextField from '@mui/material/TextField';
import { useReplica } from '@/db/hooks';
import type { LocalRecord } from '@/db/types';
import { useLocalSave } from '@/lib/use-local-save';
import { addDefectNote } from '../model/writes';

export function AddNote({ defect }: { defect: LocalRecord<'defect'> }) {
  const ctx = useReplica();
  const [text, setText] = useState('');
  const { refusal, saving, run } = useLocalSave();
  const save = async () => {
    if (text.trim() && (await run(() => addDefectNote(ctx, defect.id, defect.fields, text)))) setText('');
  };
  return (
    <Box sx={{ display: 'grid', gap: 1 }}>
      <TextField label="Add a note" value={text} onChange={(e) => setText(e.target.value)} multiline />
      <Button variant="outlined" disabled={saving || !text.trim()} onClick={save}>Save note</Button>
      {refusal && <Alert severity="error">{refusal}</Alert>}
    </Box>
  );
}
