import Box from '@mui/material/Box';
import Button from '@mui/material/Button';
import type { CheckOutcome } from '@breakline/sync-protocol';

const LOOK: Record<CheckOutcome, { label: string; color: 'primary' | 'error' | 'inherit' }> = {
  pass: { label: 'Pass', color: 'primary' },
  fail: { label: 'Fail', color: 'error' },
  na: { label: 'N/A', color: 'inherit' },
};

/**
 * Big answer buttons for one wet thumb; the chosen one is filled and says so to a screen reader.
 * The fill shows at once, without the usual colour fade: a fade repaints the screen for a
 * quarter of a second after each answer, and the next answer's save waits behind those frames.
 */
export function OutcomeButtons(props: {
  value: CheckOutcome | undefined;
  offer?: readonly CheckOutcome[];
  disabled?: boolean;
  onChoose: (o: CheckOutcome) => void;
}) {
  const offer = props.offer ?? ['pass', 'fail', 'na'];
  return (
    <Box sx={{ display: 'grid', gridTemplateColumns: offer.map((o) => (o === 'na' ? '0.7fr' : '1fr')).join(' '), gap: 1 }}>
      {offer.map((o) => (
        <Button
          key={o}
          size="large"
          color={LOOK[o].color}
          variant={props.value === o ? 'contained' : 'outlined'}
          aria-pressed={props.value === o}
          disabled={props.disabled}
          onClick={() => props.onChoose(o)}
          sx={{ minHeight: 56, fontSize: '1.1rem', transition: 'none' }}
        >
          {LOOK[o].label}
        </Button>
      ))}
    </Box>
  );
}
