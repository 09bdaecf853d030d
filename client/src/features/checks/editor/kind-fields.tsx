import Box from '@mui/material/Box';
import MenuItem from '@mui/material/MenuItem';
import TextField from '@mui/material/TextField';
import Typography from '@mui/material/Typography';
import type { ItemDraft, TemplateErrors } from './template-draft';

export interface ChamberChoice {
  id: string;
  name: string;
}

interface Props {
  item: ItemDraft;
  at: string;
  errors: TemplateErrors;
  chambers: readonly ChamberChoice[];
  onChange: (change: Partial<Omit<ItemDraft, 'key' | 'id'>>) => void;
}

/** The boxes one kind of item needs: how many for a count; chamber, or unit and range, for a reading. */
export function KindFields({ item, at, errors, chambers, onChange }: Props) {
  const box = (field: 'required' | 'unit' | 'min' | 'max', label: string, inputMode?: 'numeric' | 'decimal') => (
    <TextField
      label={label}
      value={item[field]}
      onChange={(e) => onChange({ [field]: e.target.value })}
      error={Boolean(errors[`${at}.${field}`])}
      helperText={errors[`${at}.${field}`]}
      slotProps={{ htmlInput: { inputMode } }}
    />
  );
  if (item.kind === 'count') return box('required', 'How many must be there', 'numeric');
  if (item.kind !== 'reading') return null;
  const known = chambers.some((c) => c.id === item.chamberId);
  return (
    <Box sx={{ display: 'grid', gap: 1.5 }}>
      <TextField select label="What is read" value={item.chamberId} onChange={(e) => onChange({ chamberId: e.target.value })}>
        <MenuItem value="">A reading in its own unit</MenuItem>
        {chambers.map((c) => (
          <MenuItem key={c.id} value={c.id}>Pressure of the {c.name.toLowerCase()}</MenuItem>
        ))}
        {item.chamberId && !known && <MenuItem value={item.chamberId}>Pressure of chamber "{item.chamberId}" (no boat has it now)</MenuItem>}
      </TextField>
      {item.chamberId ? (
        <Typography variant="body2" sx={{ color: 'text.secondary' }}>
          The working range comes from each boat's file (the maker's figure); crews enter it in the club's pressure unit.
        </Typography>
      ) : (
        <Box sx={{ display: 'grid', gridTemplateColumns: { xs: '1fr', sm: '1fr 1fr 1fr' }, gap: 1.5 }}>
          {box('unit', 'Unit')}
          {box('min', 'Lowest acceptable (blank: none)', 'decimal')}
          {box('max', 'Highest acceptable (blank: none)', 'decimal')}
        </Box>
      )}
    </Box>
  );
}
