import { useEffect, useRef, type KeyboardEvent } from 'react';
import Box from '@mui/material/Box';
import Button from '@mui/material/Button';
import Typography from '@mui/material/Typography';
import BackspaceOutlined from '@mui/icons-material/BackspaceOutlined';
import { PIN_MAX_DIGITS, PIN_MIN_DIGITS } from '../members/pin';

export interface PinPadProps {
  /** Read out with the digits entered, e.g. "PIN for Ana Kereama". */
  label: string;
  value: string;
  onChange: (pin: string) => void;
  onSubmit: () => void;
  disabled?: boolean;
  submitLabel?: string;
}

const KEYS = ['1', '2', '3', '4', '5', '6', '7', '8', '9'] as const;
/** Read by a screen reader, not shown. */
const hidden = { position: 'absolute', width: 1, height: 1, overflow: 'hidden', clip: 'rect(0 0 0 0)', whiteSpace: 'nowrap' } as const;
const big = { minHeight: 72, fontSize: '1.75rem', fontWeight: 500 } as const;

/**
 * Digits in big keys for a wet thumb in the shed, with the physical keyboard working too. The
 * digits themselves are never shown, only how many there are.
 */
export function PinPad({ label, value, onChange, onSubmit, disabled = false, submitLabel = 'OK' }: PinPadProps) {
  const root = useRef<HTMLDivElement>(null);
  useEffect(() => root.current?.focus(), []);
  const add = (d: string) => !disabled && value.length < PIN_MAX_DIGITS && onChange(value + d);
  const back = () => !disabled && onChange(value.slice(0, -1));
  const ready = !disabled && value.length >= PIN_MIN_DIGITS;
  const onKey = (e: KeyboardEvent) => {
    if (/^\d$/.test(e.key)) add(e.key);
    else if (e.key === 'Backspace') back();
    else if (e.key === 'Enter' && ready) onSubmit();
    else return;
    e.preventDefault();
  };
  return (
    <Box ref={root} tabIndex={-1} onKeyDown={onKey} sx={{ outline: 'none', maxWidth: 360, mx: 'auto' }}>
      <Box role="status" sx={{ display: 'flex', justifyContent: 'center', gap: 1.5, my: 2, minHeight: 24 }}>
        <Box component="span" sx={hidden}>{`${label}: ${value.length} ${value.length === 1 ? 'digit' : 'digits'} entered`}</Box>
        {Array.from({ length: Math.max(PIN_MIN_DIGITS, value.length) }, (_, i) => (
          <Box
            key={i}
            aria-hidden
            sx={{ width: 18, height: 18, borderRadius: '50%', border: 2, borderColor: 'text.primary', bgcolor: i < value.length ? 'text.primary' : 'transparent' }}
          />
        ))}
      </Box>
      <Typography variant="body2" color="text.secondary" sx={{ textAlign: 'center', mb: 2 }}>
        {PIN_MIN_DIGITS} to {PIN_MAX_DIGITS} digits
      </Typography>
      <Box sx={{ display: 'grid', gridTemplateColumns: 'repeat(3, 1fr)', gap: 1.5 }}>
        {KEYS.map((d) => (
          <Button key={d} variant="outlined" disabled={disabled} onClick={() => add(d)} sx={big}>
            {d}
          </Button>
        ))}
        <Button variant="outlined" disabled={disabled || value.length === 0} onClick={back} aria-label="Delete the last digit" sx={big}>
          <BackspaceOutlined />
        </Button>
        <Button variant="outlined" disabled={disabled} onClick={() => add('0')} sx={big}>
          0
        </Button>
        <Button variant="contained" disabled={!ready} onClick={onSubmit} sx={{ ...big, fontSize: '1.25rem' }}>
          {submitLabel}
        </Button>
      </Box>
    </Box>
  );
}
