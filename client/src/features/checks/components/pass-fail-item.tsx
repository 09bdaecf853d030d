import { useState } from 'react';
import TextField from '@mui/material/TextField';
import { withNote } from '../model/answers';
import type { ItemProps } from './item-props';
import { OutcomeButtons } from './outcome-buttons';

export function PassFailItem({ entry, readOnly, save }: ItemProps) {
  const [note, setNote] = useState(entry?.note ?? '');
  return (
    <>
      <OutcomeButtons value={entry?.outcome} disabled={readOnly} onChoose={(outcome) => save(withNote({ outcome }, outcome === 'fail' ? note : ''))} />
      {entry?.outcome === 'fail' && (
        <TextField
          label="What is wrong? (optional)"
          value={note}
          disabled={readOnly}
          onChange={(e) => setNote(e.target.value)}
          onBlur={() => note.trim() !== (entry.note ?? '') && save(withNote(entry, note))}
          multiline
          slotProps={{ htmlInput: { maxLength: 2000 } }}
        />
      )}
    </>
  );
}
