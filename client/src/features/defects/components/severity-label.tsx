import Box from '@mui/material/Box';
import Typography from '@mui/material/Typography';
import type { DefectSeverity } from '@breakline/sync-protocol';
import { SEVERITY_META } from '../model/words';
import { SeverityIcon } from './severity-icon';

/** A severity as its word and its mark, never a colour alone. */
export function SeverityLabel({ severity }: { severity: DefectSeverity }) {
  const { word, colour } = SEVERITY_META[severity];
  return (
    <Box component="span" sx={{ display: 'inline-flex', alignItems: 'center', gap: 0.75, color: colour }}>
      <SeverityIcon severity={severity} sx={{ fontSize: 22 }} />
      <Typography component="span" sx={{ fontWeight: 700, color: colour }}>{word}</Typography>
    </Box>
  );
}
