import Box from '@mui/material/Box';
import Checkbox from '@mui/material/Checkbox';
import FormControlLabel from '@mui/material/FormControlLabel';
import FormGroup from '@mui/material/FormGroup';
import FormLabel from '@mui/material/FormLabel';
import MenuItem from '@mui/material/MenuItem';
import TextField from '@mui/material/TextField';
import type { PatrolContext } from '../hooks/use-patrol-context';

/** The trip's driver and crew, from the club's member cards (and anyone already on the trip). */
export function CrewPicker({ driverId, crewIds, p, onChange }: {
  driverId: string; crewIds: string[]; p: PatrolContext; onChange: (driverId: string, crewIds: string[]) => void;
}) {
  const known = p.cardList.map((c) => c.fields.memberId);
  const people = [...new Set([p.userId, ...known, driverId, ...crewIds])];
  const label = (id: string) => (id === p.userId ? 'You' : p.nameOf(id));
  const toggle = (id: string, on: boolean) => onChange(driverId, on ? [...crewIds, id] : crewIds.filter((c) => c !== id));
  return (
    <Box sx={{ display: 'grid', gap: 1 }}>
      <TextField select label="Driver" value={driverId} onChange={(e) => onChange(e.target.value, crewIds.filter((c) => c !== e.target.value))}>
        {people.map((id) => <MenuItem key={id} value={id}>{label(id)}</MenuItem>)}
      </TextField>
      <Box component="fieldset" sx={{ border: 0, m: 0, p: 0 }}>
        <FormLabel component="legend">Crew</FormLabel>
        <FormGroup>
          {people.filter((id) => id !== driverId).map((id) => (
            <FormControlLabel key={id} label={label(id)} control={<Checkbox checked={crewIds.includes(id)} onChange={(e) => toggle(id, e.target.checked)} />} />
          ))}
        </FormGroup>
      </Box>
    </Box>
  );
}
