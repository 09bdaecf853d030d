import Box from '@mui/material/Box';
import Button from '@mui/material/Button';
import TextField from '@mui/material/TextField';
import Typography from '@mui/material/Typography';
import type { BoatDraft, DraftErrors } from './boat-draft';

type Gear = BoatDraft['gear'];

/** The gear the boat must carry, with how many of each. */
export function GearFields({ gear, errors, onChange }: { gear: Gear; errors: DraftErrors; onChange: (g: Gear) => void }) {
  const set = (i: number, change: Partial<Gear[number]>) => onChange(gear.map((g, j) => (j === i ? { ...g, ...change } : g)));
  return (
    <Box sx={{ display: 'grid', gap: 1.5 }}>
      <Typography variant="h6" component="h2">Required gear</Typography>
      {gear.map((g, i) => (
        <Box key={i} sx={{ display: 'grid', gridTemplateColumns: '1fr 6rem auto', gap: 1, alignItems: 'start' }}>
          <TextField label="Item" value={g.item} onChange={(e) => set(i, { item: e.target.value })} error={Boolean(errors[`gear.${i}.item`])} helperText={errors[`gear.${i}.item`]} />
          <TextField label="How many" value={g.count} onChange={(e) => set(i, { count: e.target.value })} error={Boolean(errors[`gear.${i}.count`])} helperText={errors[`gear.${i}.count`]} slotProps={{ htmlInput: { inputMode: 'numeric' } }} />
          <Button color="error" aria-label={`Remove ${g.item || 'this item'}`} onClick={() => onChange(gear.filter((_, j) => j !== i))}>Remove</Button>
        </Box>
      ))}
      <Button variant="outlined" onClick={() => onChange([...gear, { item: '', count: '1' }])}>Add an item</Button>
    </Box>
  );
}
