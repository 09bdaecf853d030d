import Box from '@mui/material/Box';
import Button from '@mui/material/Button';
import { DEFECT_SEVERITIES, type DefectSeverity } from '@breakline/sync-protocol';
import { SEVERITY_META } from '../model/words';
import { SeverityIcon } from './severity-icon';

export function SeverityPicker({ value, onChange }: { value: DefectSeverity | null; onChange: (s: DefectSeverity) => void }) {
  return (
    <Box role="group" aria-label="Severity" sx={{ display: 'grid', gap: 1 }}>
      {DEFECT_SEVERITIES.map((s) => (
        <Button
          key={s}
          size="large"
          variant={value === s ? 'contained' : 'outlined'}
          color={s === 'stand-down' ? 'error' : 'secondary'}
          aria-pressed={value === s}
          startIcon={<SeverityIcon severity={s} />}
          onClick={() => onChange(s)}
          sx={{ justifyContent: 'flex-start', minHeight: 56 }}
        >
          {SEVERITY_META[s].word}: {SEVERITY_META[s].meaning.toLowerCase()}
        </Button>
      ))}
    </Box>
  );
}
