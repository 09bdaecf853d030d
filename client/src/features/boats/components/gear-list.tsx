import Typography from '@mui/material/Typography';
import type { KindFields } from '@breakline/sync-protocol';

export function GearList({ gear }: { gear: KindFields['boat']['requiredGear'] }) {
  if (gear.length === 0) return <Typography sx={{ color: 'text.secondary' }}>No required gear recorded for this boat.</Typography>;
  return (
    <Typography component="ul" sx={{ m: 0, pl: 2.5 }}>
      {gear.map((g) => (
        <li key={g.item}>
          {g.item} × {g.count}
        </li>
      ))}
    </Typography>
  );
}
