import { useState } from 'react';
import Alert from '@mui/material/Alert';
import Box from '@mui/material/Box';
import Typography from '@mui/material/Typography';
import { pinProblem } from '../members/pin';
import { PinPad } from './pin-pad';

export interface ChoosePinProps {
  title: string;
  intro: string;
  /** Keeps the PIN (hashing takes a moment); the PIN itself goes no further than that. */
  onChosen: (pin: string) => Promise<void>;
}

/** A new PIN typed twice, so a slip of the thumb does not lock anyone out. */
export function ChoosePin({ title, intro, onChosen }: ChoosePinProps) {
  const [first, setFirst] = useState<string | null>(null);
  const [pin, setPin] = useState('');
  const [problem, setProblem] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);

  const submit = async () => {
    const wrong = pinProblem(pin);
    if (wrong) return setProblem(wrong);
    if (first === null) {
      setFirst(pin);
      setPin('');
      setProblem(null);
      return;
    }
    if (pin !== first) {
      setFirst(null);
      setPin('');
      return setProblem('The two PINs were not the same. Choose one again.');
    }
    setBusy(true);
    try {
      await onChosen(pin);
    } finally {
      setBusy(false);
    }
  };

  return (
    <Box>
      <Typography variant="h5" component="h2" sx={{ fontWeight: 700 }}>
        {title}
      </Typography>
      <Typography color="text.secondary" sx={{ mb: 1 }}>
        {intro}
      </Typography>
      <Typography sx={{ fontWeight: 500 }}>{first === null ? 'Choose a PIN of 4 to 8 digits' : 'Enter the same PIN again'}</Typography>
      {problem && (
        <Alert severity="error" sx={{ my: 2 }}>
          {problem}
        </Alert>
      )}
      <PinPad
        label={first === null ? 'New PIN' : 'New PIN again'}
        value={pin}
        onChange={setPin}
        onSubmit={() => void submit()}
        disabled={busy}
        submitLabel={busy ? 'Saving…' : first === null ? 'Next' : 'Save'}
      />
    </Box>
  );
}
