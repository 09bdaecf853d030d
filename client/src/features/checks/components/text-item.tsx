import { useState } from 'react';
import Box from '@mui/material/Box';
import Button from '@mui/material/Button';
import TextField from '@mui/material/TextField';
import type { ItemProps } from './item-props';

/** Words the next crew reads, saved when the box is left or Save is pressed. */
export function TextItem({ item, entry, readOnly, save }: ItemProps) {
  const saved = typeof entry?.value === 'string' ? entry.value : '';
  const [text, setText] = useState(saved);
  const [problem, setProblem] = useState<string | null>(null);
  function submit() {
    if (!text.trim()) return setProblem('Write something, or "none" if there is nothing to note.');
    setProblem(null);
    if (text.trim() !== saved) void save({ outcome: 'pass', value: text.trim() });
  }
  return (
    <Box sx={{ display: 'grid', gap: 1 }}>
      <TextField label={item.label} value={text} multiline minRows={2} disabled={readOnly} onChange={(e) => setText(e.target.value)} onBlur={() => text.trim() && submit()} error={Boolean(problem)} helperText={problem} slotProps={{ htmlInput: { maxLength: 500 } }} />
      <Button variant="outlined" size="large" disabled={readOnly} onClick={submit}>Save</Button>
    </Box>
  );
}
