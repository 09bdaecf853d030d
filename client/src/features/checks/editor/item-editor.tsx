import { memo } from 'react';
import Alert from '@mui/material/Alert';
import Box from '@mui/material/Box';
import MenuItem from '@mui/material/MenuItem';
import Paper from '@mui/material/Paper';
import TextField from '@mui/material/TextField';
import Typography from '@mui/material/Typography';
import { CHECK_ITEM_KINDS } from '@breakline/sync-protocol';
import { CriticalPicker } from './critical-picker';
import { KindFields, type ChamberChoice } from './kind-fields';
import { MoveButtons } from './move-buttons';
import type { DraftAction, ItemDraft, ItemKind, TemplateErrors } from './template-draft';

export const KIND_WORDS: Record<ItemKind, string> = {
  'pass-fail': 'Pass or fail',
  count: 'Count against a required number',
  reading: 'Reading with a unit and range',
  text: 'Written answer',
  photo: 'Photo',
};

interface Props {
  item: ItemDraft;
  /** Its section's place and its own. */
  si: number;
  index: number;
  count: number;
  errors: TemplateErrors;
  chambers: readonly ChamberChoice[];
  dispatch: (action: DraftAction) => void;
}

/** One item of a section: what to check, how it is answered, how serious a failure is, and its caution. */
export const ItemEditor = memo(function ItemEditor({ item, si, index, count, errors, chambers, dispatch }: Props) {
  const name = `item ${index + 1}`;
  const at = `sections.${si}.items.${index}`;
  const onChange = (change: Extract<DraftAction, { type: 'item' }>['change']) => dispatch({ type: 'item', si, ii: index, change });
  const wrong = Object.keys(errors).some((k) => k.startsWith(`${at}.`));
  const err = (field: string) => errors[`${at}.${field}`];
  return (
    <Paper id={item.key} component="section" aria-label={`Item ${index + 1}`} variant="outlined" sx={{ p: 2, display: 'grid', gap: 1.5, borderColor: wrong ? 'error.main' : undefined, borderWidth: wrong ? 2 : 1, scrollMarginTop: 80 }}>
      <Box sx={{ display: 'flex', justifyContent: 'space-between', alignItems: 'center', gap: 1, flexWrap: 'wrap' }}>
        <Typography sx={{ fontWeight: 700 }}>Item {index + 1}{item.id ? '' : ' (new)'}</Typography>
        <MoveButtons what={name} index={index} count={count} onMove={(by) => dispatch({ type: 'move-item', si, ii: index, by })} onRemove={() => dispatch({ type: 'remove-item', si, ii: index })} />
      </Box>
      <TextField label="What to check" value={item.label} multiline onChange={(e) => onChange({ label: e.target.value })} error={Boolean(err('label'))} helperText={err('label')} />
      <TextField select label="Answered by" value={item.kind} onChange={(e) => onChange({ kind: e.target.value as ItemKind })}>
        {CHECK_ITEM_KINDS.map((k) => <MenuItem key={k} value={k}>{KIND_WORDS[k]}</MenuItem>)}
      </TextField>
      <KindFields item={item} at={at} errors={errors} chambers={chambers} onChange={onChange} />
      <CriticalPicker value={item.critical} onChange={(critical) => onChange({ critical })} />
      <TextField
        label="Caution (optional)"
        value={item.caution}
        multiline
        onChange={(e) => onChange({ caution: e.target.value })}
        error={Boolean(err('caution'))}
        helperText={err('caution') ?? 'Shown with this item: a safety reminder, e.g. for propellers or fuel. The manual and the club’s procedures come first.'}
      />
      {item.caution.trim() && (
        <Alert severity="warning" variant="outlined" role="note" aria-label={`Caution of item ${index + 1}`}>
          {item.caution.trim()}
        </Alert>
      )}
    </Paper>
  );
});
